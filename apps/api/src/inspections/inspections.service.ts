import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/postgresql';
import { randomUUID } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import type {
  CorrectionImpact,
  CreateInspectionInput,
  CreateRunInput,
  EndRunInput,
  Inspection as InspectionView,
  Run as RunView,
  SessionUser,
  Verdict,
} from '@evenset/contracts';
import { AuditService, type AuditRecord } from '../audit/audit.service';
import { NotFoundException, ValidationFailedException } from '../common/errors/domain.exception';
import { gaugeStatus, todayIso } from '../common/gauges/gauge-status';
import { toMm } from '../common/units/lengths';
import { insertAll } from '../database/bulk-insert';
import { Instrument } from '../instruments/instrument.entity';
import { Lot } from '../lots/lot.entity';
import { Part } from '../lots/part.entity';
import { MasterCalibration } from '../masters/master-calibration.entity';
import { MasterGauge } from '../masters/master-gauge.entity';
import { DEFAULT_MASTER_DRIFT_LIMIT_MM } from '../specs/spec.entity';
import { BenchRun } from './bench-run.entity';
import { computeResult } from './compute-result';
import { InspectionReading } from './inspection-reading.entity';
import { InspectionResult, resultView } from './inspection-result.entity';
import { Inspection } from './inspection.entity';
import {
  entityFacts,
  inspectionView,
  storedFacts,
  type StoredInspection,
  type StoredReading,
  type StoredResult,
} from './inspection-views';
import {
  GaugeNotUsableException,
  InspectionSupersedeException,
  ReadingsRefusedException,
  RunEndedException,
  RunNotYoursException,
} from './inspections.exception';
import { matchReadings, planStations, type StationValue } from './measurement-plan';
import { RecentRuns, runFactsOf, type CalibrationFacts, type RunFacts } from './run-facts';

/** A part as recording needs it: no entity, so an import of thousands stays out of the unit of work. */
export type PartRef = Pick<Part, 'id' | 'serial'>;

/** One part's readings ready to record (mm, plan order). */
export interface PartReadings {
  part: PartRef;
  values: StationValue[];
  supersedes?: Inspection;
  reason?: string;
}

/** What a save reads afresh of its run, with the part it saves. */
interface SaveCheck {
  ended: boolean;
  masterExpansionPerK: number;
  partId: string | null;
  serial: string | null;
}
const SAVE_CHECK_SQL = `
  select b.ended_at is not null as ended, m.expansion_per_k::float8 as "masterExpansionPerK",
         p.id as "partId", p.serial
    from bench_run b
    join master_gauge g on g.id = b.master_id
    join material m on m.id = g.material_id
    left join part p on p.id = ? and p.lot_id = b.lot_id
   where b.id = ?`;

/** Another inspector may view a run, never record in it nor end it. */
function ownRun(actor: SessionUser, run: Pick<RunFacts, 'inspectorId' | 'inspectorName'>): void {
  if (run.inspectorId !== actor.id) throw new RunNotYoursException(run.inspectorName);
}

// Columns written in bulk by `record`, with their SQL types (as in the migration).
const INSPECTION_COLUMNS = {
  id: 'uuid',
  created_at: 'timestamptz',
  part_id: 'uuid',
  run_id: 'uuid',
  spec_id: 'uuid',
  master_calibration_id: 'uuid',
  instrument_id: 'uuid',
  instrument_resolution_mm: 'numeric',
  master_reading_mm: 'numeric',
  master_temperature_c: 'numeric',
  part_temperature_c: 'numeric',
  part_expansion_per_k: 'numeric',
  master_expansion_per_k: 'numeric',
  inspector_id: 'uuid',
  inspector_name: 'text',
  supersedes_id: 'uuid',
  reason: 'text',
};
const RESULT_COLUMNS = {
  id: 'uuid',
  created_at: 'timestamptz',
  inspection_id: 'uuid',
  reason: 'text',
  master_calibration_id: 'uuid',
  height_mm: 'numeric',
  expanded_uncertainty_mm: 'numeric',
  flatness_mm: 'numeric',
  parallelism_mm: 'numeric',
  runout_mm: 'numeric',
  verdict: 'text',
  computed: 'jsonb',
};
const READING_COLUMNS = {
  id: 'uuid',
  created_at: 'timestamptz',
  inspection_id: 'uuid',
  position: 'int',
  station: 'text',
  kind: 'text',
  reading_mm: 'numeric',
};

/** What `record` wrote: per part, and the rows as stored when asked for (else empty). */
export interface Recorded {
  parts: { id: string; part: PartRef; verdict: Verdict }[];
  rows: Record<'inspections' | 'readings' | 'results', Record<string, unknown>[]>;
}

/** The stored inputs of an inspection that its computation reads. */
type StoredInputs = Pick<
  Inspection,
  | 'spec'
  | 'masterReadingMm'
  | 'instrumentResolutionMm'
  | 'masterTemperatureC'
  | 'partTemperatureC'
  | 'partExpansionPerK'
  | 'masterExpansionPerK'
>;

/** A result's columns computed from an inspection's stored inputs and a master calibration. */
function resultRow(
  inputs: StoredInputs,
  values: StationValue[],
  calibration: CalibrationFacts,
  reason: string,
  at: Date,
) {
  const computed = computeResult({
    spec: inputs.spec,
    values,
    masterSizeMm: calibration.calibratedSizeMm,
    masterExpandedUncertaintyMm: calibration.expandedUncertaintyMm,
    masterCoverageFactor: calibration.coverageFactor,
    masterReadingMm: inputs.masterReadingMm,
    resolutionMm: inputs.instrumentResolutionMm,
    partTemperatureC: inputs.partTemperatureC,
    masterTemperatureC: inputs.masterTemperatureC,
    partExpansionPerK: inputs.partExpansionPerK,
    masterExpansionPerK: inputs.masterExpansionPerK,
  });
  return {
    id: randomUUID(),
    reason,
    heightMm: computed.height,
    expandedUncertaintyMm: computed.expandedUncertainty,
    flatnessMm: computed.flatness?.minimumZone ?? null,
    parallelismMm: computed.parallelism?.value ?? null,
    runoutMm: computed.runout ? Math.max(...computed.runout.circles.map((c) => c.circularRunout)) : null,
    verdict: computed.verdict,
    computed,
    createdAt: at,
  };
}

@Injectable()
export class InspectionsService {
  /** Shared by every request of this process: a run's fixed facts never change (see run-facts.ts). */
  private readonly recentRuns = new RecentRuns();

  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  async startRun(actor: SessionUser, input: CreateRunInput): Promise<RunView> {
    const lot = await this.em.findOne(Lot, { id: input.lotId });
    if (!lot) throw new ValidationFailedException([{ path: 'lotId', message: 'There is no such lot.' }]);
    const today = todayIso();
    const master = await this.em.findOne(MasterGauge, { id: input.masterId });
    if (!master) throw new ValidationFailedException([{ path: 'masterId', message: 'There is no such master gauge.' }]);
    const masterStatus = gaugeStatus(master.currentCalibration?.dueOn ?? null, today, master.retiredAt !== null);
    if (!master.currentCalibration || !['in-service', 'due-soon'].includes(masterStatus))
      throw new GaugeNotUsableException('master', master.code, masterStatus);
    const instrument = await this.em.findOne(Instrument, { id: input.instrumentId });
    if (!instrument)
      throw new ValidationFailedException([{ path: 'instrumentId', message: 'There is no such instrument.' }]);
    const instrumentStatus = gaugeStatus(instrument.calibrationDueOn, today, instrument.retiredAt !== null);
    if (!['in-service', 'due-soon'].includes(instrumentStatus))
      throw new GaugeNotUsableException('instrument', instrument.code, instrumentStatus);

    const run = this.em.create(BenchRun, {
      lot,
      master,
      masterCalibration: master.currentCalibration,
      instrument,
      inspectorId: actor.id,
      inspectorName: actor.displayName,
      // Rounded to the stored 0.01 °C, so a recomputation from the stored row gives the same result.
      masterTemperatureC: roundCelsius(input.masterTemperature),
      partTemperatureC: roundCelsius(input.partTemperature),
      masterStartReadingMm: toMm(input.masterStartReading, input.unit),
      driftLimitMm: lot.spec.masterDriftLimitMm ?? DEFAULT_MASTER_DRIFT_LIMIT_MM,
      createdAt: new Date(),
    });
    this.em.persist(run);
    this.audit.record(actor, {
      action: 'run.start',
      subjectType: 'run',
      subjectId: run.id,
      after: {
        lot: lot.lotNumber,
        master: master.code,
        calibrationId: run.masterCalibration.id,
        instrument: instrument.code,
        masterTemperatureC: run.masterTemperatureC,
        partTemperatureC: run.partTemperatureC,
        masterStartReadingMm: run.masterStartReadingMm,
      },
    });
    await this.em.flush();
    return this.runView(run);
  }

  async endRun(actor: SessionUser, id: string, input: EndRunInput): Promise<RunView> {
    const run = await this.getRun(id);
    ownRun(actor, run);
    if (run.endedAt) throw new RunEndedException();
    run.masterEndReadingMm = toMm(input.masterEndReading, input.unit);
    run.endedAt = new Date();
    this.audit.record(actor, {
      action: 'run.end',
      subjectType: 'run',
      subjectId: run.id,
      after: { masterEndReadingMm: run.masterEndReadingMm, driftMm: run.drift(), flagged: run.flagged() },
    });
    await this.em.flush();
    return this.runView(run);
  }

  async viewRun(id: string): Promise<RunView> {
    return this.runView(await this.getRun(id));
  }

  /** Records one part's inspection from readings in the body's unit, computed by the server. */
  async inspect(actor: SessionUser, runId: string, input: CreateInspectionInput): Promise<InspectionView> {
    const { run, part } = await this.savingTo(runId, input.partId);
    if (!part)
      throw new ValidationFailedException([
        { path: 'partId', message: `There is no such part in lot ${run.lotNumber}.` },
      ]);
    const { values, problems } = matchReadings(
      planStations(run.spec.plan),
      input.readings.map((r) => ({ station: r.station, reading: toMm(r.reading, input.unit) })),
    );
    if (problems.length) throw new ReadingsRefusedException(problems);
    const supersedes = input.supersedesId ? await this.supersedable(part, input.supersedesId) : undefined;
    const { rows } = await this.record(actor, run, [{ part, values, supersedes, reason: input.reason }], true);
    // The view from the rows as stored (rounded to the columns' scales, as a read gives them),
    // without reading them again or making entities of them; a new inspection is corrected by nothing yet.
    const readings = (rows.readings as unknown as StoredReading[]).sort((a, b) => a.position - b.position);
    return inspectionView(
      storedFacts(rows.inspections[0] as unknown as StoredInspection, part, run),
      readings.map((r) => ({ station: r.station, kind: r.kind, reading: r.reading_mm })),
      (rows.results as unknown as StoredResult[]).map((r) =>
        resultView({
          ...r,
          masterCalibrationId: r.master_calibration_id,
          createdAt: r.created_at,
        }),
      ),
      undefined,
    );
  }

  /** A run that may still take inspections. */
  async openRun(id: string): Promise<BenchRun> {
    const run = await this.getRun(id);
    if (run.endedAt) throw new RunEndedException();
    return run;
  }

  /**
   * An open run to save to, and the part of its lot being saved (if it is one), in one query: what
   * can change of the run is read now, the rest comes from an earlier read of the same run.
   */
  private async savingTo(runId: string, partId: string): Promise<{ run: RunFacts; part: PartRef | undefined }> {
    const [now] = await this.em.getConnection().execute<SaveCheck[]>(SAVE_CHECK_SQL, [partId, runId]);
    if (!now) throw new NotFoundException('This run');
    if (now.ended) throw new RunEndedException();
    let fixed = this.recentRuns.get(runId);
    if (!fixed) {
      fixed = runFactsOf(await this.getRun(runId));
      this.recentRuns.remember(fixed);
    }
    return {
      run: { ...fixed, masterExpansionPerK: now.masterExpansionPerK },
      part: now.partId ? { id: now.partId, serial: now.serial! } : undefined,
    };
  }

  /**
   * Computes and stores the inspections of one run: inspections, their readings, first results and
   * audit entries, all or none. Written with bulk inserts rather than the unit of work, so a CSV of
   * 100,000 readings stays within seconds: in slices of parts, one statement each, each written
   * while the next is computed (PostgreSQL stores while Node computes), all in one transaction, so
   * that no statement carries more than a slice and the event loop serves other requests in
   * between. A single slice (a bench save) is one statement, atomic by itself, with no BEGIN and
   * COMMIT round trips.
   */
  async record(actor: SessionUser, run: RunFacts, parts: PartReadings[], returnRows = false): Promise<Recorded> {
    ownRun(actor, run);
    const now = new Date();
    const recorded: Recorded = { parts: [], rows: { inspections: [], readings: [], results: [] } };
    const stored = returnRows ? recorded.rows : undefined;
    if (parts.length <= SLICE) {
      const slice = await sliceRows(actor, run, parts, now);
      recorded.parts.push(...slice.recorded);
      await this.writeSlice(this.em, actor, slice, stored);
      return recorded;
    }
    return this.em.transactional(async (em) => {
      const failures: unknown[] = [];
      let writing = Promise.resolve();
      for (let start = 0; start < parts.length && !failures.length; start += SLICE) {
        const slice = await sliceRows(actor, run, parts.slice(start, start + SLICE), now);
        recorded.parts.push(...slice.recorded);
        // At most one slice waits while another is written: computing runs ahead of PostgreSQL
        // otherwise, and every slice of a large file would be held in memory at once.
        await writing;
        if (failures.length) break;
        writing = this.writeSlice(em, actor, slice, stored).catch((error: unknown) => {
          failures.push(error);
        });
      }
      await writing;
      if (failures.length) throw failures[0];
      return recorded;
    });
  }

  /**
   * One slice's rows in one statement (inspections before the rows that refer to them, and the
   * audit entries with them); with `stored`, the rows as stored go there.
   */
  private async writeSlice(
    em: EntityManager,
    actor: SessionUser,
    slice: SliceRows,
    stored: Recorded['rows'] | undefined,
  ): Promise<void> {
    let written: Record<string, unknown>[][];
    try {
      written = await insertAll(
        em,
        [
          { table: 'inspection', columns: INSPECTION_COLUMNS, rows: slice.inspections },
          { table: 'inspection_reading', columns: READING_COLUMNS, rows: slice.readings },
          { table: 'inspection_result', columns: RESULT_COLUMNS, rows: slice.results },
          this.audit.rows(actor, slice.audits),
        ],
        stored !== undefined,
      );
    } catch (error) {
      if (error instanceof UniqueConstraintViolationException)
        throw new InspectionSupersedeException('That inspection has already been corrected; correct the newest one.');
      throw error;
    }
    const [inspections, readings, results] = written;
    stored?.inspections.push(...inspections!);
    stored?.readings.push(...readings!);
    stored?.results.push(...results!);
  }

  /**
   * After a master calibration is corrected: every inspection whose result in force used the
   * superseded calibration gets a new result computed with the correcting one (appended, never
   * rewritten). Runs in the caller's unit of work; answers the verdicts that change.
   */
  async recomputeForCorrection(
    actor: SessionUser,
    superseded: MasterCalibration,
    correcting: MasterCalibration,
    reason: string,
  ): Promise<Omit<CorrectionImpact, 'certificates'>> {
    const candidates = await this.em.find(
      InspectionResult,
      { masterCalibration: superseded },
      { populate: ['inspection', 'inspection.part', 'inspection.part.lot', 'inspection.spec'] },
    );
    const inspections = [...new Map(candidates.map((r) => [r.inspection.id, r.inspection])).values()];
    const latest = await this.latestResults(inspections.map((i) => i.id));
    const readings = await this.readingsOf(inspections.map((i) => i.id));
    const impact: Omit<CorrectionImpact, 'certificates'> = { recomputed: 0, changed: [] };
    for (const inspection of inspections) {
      const before = latest.get(inspection.id);
      if (!before || before.masterCalibration.id !== superseded.id) continue;
      const values = matchReadings(
        planStations(inspection.spec.plan),
        (readings.get(inspection.id) ?? []).map((r) => ({ station: r.station, reading: r.readingMm })),
      ).values;
      const after = this.em.create(InspectionResult, {
        ...resultRow(inspection, values, correcting, `master calibration corrected: ${reason}`, new Date()),
        inspection,
        masterCalibration: correcting,
      });
      this.em.persist(after);
      impact.recomputed += 1;
      this.audit.record(actor, {
        action: 'inspection.recompute',
        subjectType: 'inspection',
        subjectId: inspection.id,
        before: { heightMm: before.heightMm, verdict: before.verdict, calibrationId: superseded.id },
        after: { heightMm: after.heightMm, verdict: after.verdict, calibrationId: correcting.id },
        reason,
      });
      if (after.verdict !== before.verdict)
        impact.changed.push({
          partId: inspection.part.id,
          serial: inspection.part.serial,
          lotNumber: inspection.part.lot.lotNumber,
          inspectionId: inspection.id,
          heightBefore: before.heightMm,
          heightAfter: after.heightMm,
          before: before.verdict,
          after: after.verdict,
        });
    }
    return impact;
  }

  /** Full views of inspections (readings, every result, supersession marks, run flag). */
  async views(inspections: Inspection[]): Promise<InspectionView[]> {
    if (!inspections.length) return [];
    const ids = inspections.map((i) => i.id);
    await this.em.populate(inspections, ['part', 'run']);
    const readings = await this.readingsOf(ids);
    const results = await this.em.find(
      InspectionResult,
      { inspection: { $in: ids } },
      { orderBy: { createdAt: 'desc', id: 'asc' } },
    );
    const correctedBy = new Map(
      (await this.em.find(Inspection, { supersedes: { $in: ids } })).map((c) => [c.supersedes!.id, c.id]),
    );
    return inspections.map((i) =>
      inspectionView(
        entityFacts(i),
        (readings.get(i.id) ?? []).map((r) => ({ station: r.station, kind: r.kind, reading: r.readingMm })),
        results.filter((r) => r.inspection.id === i.id).map((r) => r.toView()),
        correctedBy.get(i.id),
      ),
    );
  }

  /** The result in force (newest) of each inspection. */
  async latestResults(inspectionIds: string[]): Promise<Map<string, InspectionResult>> {
    const results = await this.em.find(
      InspectionResult,
      { inspection: { $in: inspectionIds } },
      { orderBy: { createdAt: 'asc', id: 'asc' } },
    );
    return new Map(results.map((r) => [r.inspection.id, r]));
  }

  private async readingsOf(inspectionIds: string[]): Promise<Map<string, InspectionReading[]>> {
    const rows = await this.em.find(
      InspectionReading,
      { inspection: { $in: inspectionIds } },
      { orderBy: { position: 'asc' } },
    );
    const byInspection = new Map<string, InspectionReading[]>();
    for (const row of rows) {
      const list = byInspection.get(row.inspection.id) ?? [];
      list.push(row);
      byInspection.set(row.inspection.id, list);
    }
    return byInspection;
  }

  /** The inspection a correction may supersede: the same part's, not corrected already. */
  async supersedable(part: PartRef, id: string): Promise<Inspection> {
    const old = await this.em.findOne(Inspection, { id, part: part.id });
    if (!old) throw new InspectionSupersedeException(`There is no such inspection of part ${part.serial}.`);
    if (await this.em.count(Inspection, { supersedes: old }))
      throw new InspectionSupersedeException('That inspection has already been corrected; correct the newest one.');
    return old;
  }

  private async getRun(id: string): Promise<BenchRun> {
    const run = await this.em.findOne(BenchRun, { id });
    if (!run) throw new NotFoundException('This run');
    return run;
  }

  private async runView(run: BenchRun): Promise<RunView> {
    const spec = run.lot.spec;
    return {
      id: run.id,
      lot: { id: run.lot.id, lotNumber: run.lot.lotNumber },
      spec: { id: spec.id, partNumber: spec.partNumber, revision: spec.revision },
      master: { id: run.master.id, code: run.master.code, calibrationId: run.masterCalibration.id },
      instrument: { id: run.instrument.id, code: run.instrument.code, resolution: run.instrument.resolutionMm },
      inspector: run.inspectorName,
      masterTemperature: run.masterTemperatureC,
      partTemperature: run.partTemperatureC,
      masterStartReading: run.masterStartReadingMm,
      masterEndReading: run.masterEndReadingMm,
      drift: run.drift(),
      driftLimit: run.driftLimitMm,
      flagged: run.flagged(),
      endedAt: run.endedAt?.toISOString() ?? null,
      inspections: await this.em.count(Inspection, { run }),
      createdAt: run.createdAt.toISOString(),
    };
  }
}

/** Parts written at a time (a few MB of rows), and computed between two turns of the event loop. */
const SLICE = 200;
const TURN = 20;

/** The rows recording writes for some parts of one run, keyed by column; results computed here. */
interface SliceRows {
  inspections: Record<string, unknown>[];
  readings: Record<string, unknown>[];
  results: Record<string, unknown>[];
  audits: AuditRecord[];
  recorded: Recorded['parts'];
}

/** The rows of `parts`, yielding to the event loop every few parts: queued writes go on meanwhile. */
async function sliceRows(actor: SessionUser, run: RunFacts, parts: PartReadings[], now: Date): Promise<SliceRows> {
  const { spec, calibration } = run;
  const inputs = {
    spec,
    masterReadingMm: run.masterStartReadingMm,
    instrumentResolutionMm: run.instrumentResolutionMm,
    masterTemperatureC: run.masterTemperatureC,
    partTemperatureC: run.partTemperatureC,
    partExpansionPerK: spec.expansionPerK(),
    masterExpansionPerK: run.masterExpansionPerK,
  };
  const rows: SliceRows = { inspections: [], readings: [], results: [], audits: [], recorded: [] };
  for (const [i, { part, values, supersedes, reason }] of parts.entries()) {
    if (i > 0 && i % TURN === 0) await new Promise((resolve) => setImmediate(resolve));
    const id = randomUUID();
    rows.inspections.push({
      id,
      created_at: now,
      part_id: part.id,
      run_id: run.id,
      spec_id: spec.id,
      master_calibration_id: calibration.id,
      instrument_id: run.instrumentId,
      instrument_resolution_mm: inputs.instrumentResolutionMm,
      master_reading_mm: inputs.masterReadingMm,
      master_temperature_c: inputs.masterTemperatureC,
      part_temperature_c: inputs.partTemperatureC,
      part_expansion_per_k: inputs.partExpansionPerK,
      master_expansion_per_k: inputs.masterExpansionPerK,
      inspector_id: actor.id,
      inspector_name: actor.displayName,
      supersedes_id: supersedes?.id ?? null,
      reason: reason ?? null,
    });
    values.forEach((v, position) =>
      rows.readings.push({
        id: randomUUID(),
        created_at: now,
        inspection_id: id,
        position,
        station: v.name,
        kind: v.kind,
        reading_mm: v.reading,
      }),
    );
    const result = resultRow(inputs, values, calibration, 'inspection', now);
    rows.results.push({
      id: result.id,
      created_at: now,
      inspection_id: id,
      reason: result.reason,
      master_calibration_id: calibration.id,
      height_mm: result.heightMm,
      expanded_uncertainty_mm: result.expandedUncertaintyMm,
      flatness_mm: result.flatnessMm,
      parallelism_mm: result.parallelismMm,
      runout_mm: result.runoutMm,
      verdict: result.verdict,
      computed: result.computed,
    });
    rows.audits.push({
      action: supersedes ? 'inspection.correct' : 'inspection.create',
      subjectType: 'inspection',
      subjectId: id,
      after: {
        part: part.serial,
        run: run.id,
        readings: values.length,
        heightMm: result.heightMm,
        verdict: result.verdict,
        supersedes: supersedes?.id,
      },
      reason,
    });
    rows.recorded.push({ id, part, verdict: result.verdict });
  }
  return rows;
}

function roundCelsius(value: number): number {
  return Math.round(value * 100) / 100;
}
