import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import { randomInt } from 'node:crypto';
import type {
  ApiErrorDetail,
  CreateGaugeStudyInput,
  GaugeCorrectionInput,
  GaugeMeasurementInput,
  GaugeStudyDetail,
  GaugeStudyMeasurement as MeasurementView,
  GaugeStudySummary,
  GaugeStudyTurn,
  SessionUser,
  WaitingGaugeStudy,
} from '@evenset/contracts';
import { AuditService } from '../audit/audit.service';
import { NotFoundException, ValidationFailedException } from '../common/errors/domain.exception';
import { gaugeStatus, todayIso } from '../common/gauges/gauge-status';
import { toMm } from '../common/units/lengths';
import { Instrument } from '../instruments/instrument.entity';
import { Part } from '../lots/part.entity';
import { MasterGauge } from '../masters/master-gauge.entity';
import { Spec } from '../specs/spec.entity';
import { User } from '../users/user.entity';
import { analyseGaugeStudy } from './analysis';
import {
  GaugeCorrectionRefusedException,
  SlotAlreadyMeasuredException,
  SlotOutOfOrderException,
} from './gauge-studies.exception';
import { GaugeStudyMeasurement } from './gauge-study-measurement.entity';
import { GaugeStudySlot } from './gauge-study-slot.entity';
import { GaugeStudy } from './gauge-study.entity';
import { gaugeStudySchedule } from './schedule';

/** Sums of mm values to the stored 0.1 nm, so a height is the same digits whether computed or read back. */
const roundMm = (mm: number) => Math.round(mm * 1e7) / 1e7;

/** A study's slots and measurements, with which measurement is in force for each slot. */
interface StudyState {
  slots: GaugeStudySlot[];
  measurements: GaugeStudyMeasurement[];
  /** slot id → the measurement in force (the last of its chain of corrections). */
  inForce: Map<string, GaugeStudyMeasurement>;
  supersededBy: Map<string, string>;
}

@Injectable()
export class GaugeStudiesService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  /** `seed` is drawn at random; the demo seeder passes its own so the demo schedule is always the same. */
  async create(
    actor: SessionUser,
    input: CreateGaugeStudyInput,
    seed = randomInt(0, 2 ** 31 - 1),
  ): Promise<GaugeStudyDetail> {
    const problems: ApiErrorDetail[] = [];
    const spec = await this.em.findOne(Spec, { id: input.specId });
    if (!spec || spec.status !== 'released')
      problems.push({ path: 'specId', message: 'Choose a released spec revision.' });

    const parts = await this.em.find(Part, { id: { $in: input.partIds } });
    const partById = new Map(parts.map((p) => [p.id, p]));
    input.partIds.forEach((id, i) => {
      const part = partById.get(id);
      if (!part) problems.push({ path: `partIds.${i}`, message: 'There is no such part.' });
      else if (spec && part.partNumber !== spec.partNumber)
        problems.push({ path: `partIds.${i}`, message: `${part.serial} is not a ${spec.partNumber} part.` });
    });

    const people = await this.em.find(User, { id: { $in: input.inspectorIds } });
    const personById = new Map(people.map((u) => [u.id, u]));
    input.inspectorIds.forEach((id, i) => {
      const person = personById.get(id);
      if (!person || !person.active)
        problems.push({ path: `inspectorIds.${i}`, message: 'There is no such active person.' });
      else if (!person.roles.includes('inspector'))
        problems.push({ path: `inspectorIds.${i}`, message: `${person.displayName} is not an inspector.` });
    });

    const today = todayIso();
    const instrument = await this.em.findOne(Instrument, { id: input.instrumentId });
    if (!instrument) problems.push({ path: 'instrumentId', message: 'There is no such instrument.' });
    else if (
      !['in-service', 'due-soon'].includes(gaugeStatus(instrument.calibrationDueOn, today, !!instrument.retiredAt))
    )
      problems.push({
        path: 'instrumentId',
        message: `${instrument.code} is retired or past its calibration due date.`,
      });
    const master = await this.em.findOne(MasterGauge, { id: input.masterId });
    const calibration = master?.currentCalibration ?? null;
    if (!master) problems.push({ path: 'masterId', message: 'There is no such master gauge.' });
    else if (
      !calibration ||
      !['in-service', 'due-soon'].includes(gaugeStatus(calibration.dueOn, today, !!master.retiredAt))
    )
      problems.push({ path: 'masterId', message: `${master.code} is retired or past its calibration due date.` });

    if (problems.length || !spec || !instrument || !master || !calibration)
      throw new ValidationFailedException(problems);

    const study = this.em.create(GaugeStudy, {
      name: input.name,
      spec,
      instrument,
      master,
      masterCalibration: calibration,
      trials: input.trials,
      seed,
      createdById: actor.id,
      createdByName: actor.displayName,
      createdAt: new Date(),
    });
    this.em.persist(study);
    // Parts in serial order and inspectors in the order chosen: the order of the analysis.
    const orderedParts = input.partIds.map((id) => partById.get(id)!).sort((a, b) => a.serial.localeCompare(b.serial));
    const inspectors = input.inspectorIds.map((id) => personById.get(id)!);
    for (const slot of gaugeStudySchedule(study.seed, orderedParts.length, inspectors.length, input.trials)) {
      const inspector = inspectors[slot.inspector]!;
      this.em.persist(
        this.em.create(GaugeStudySlot, {
          study,
          part: orderedParts[slot.part]!,
          inspector,
          inspectorName: inspector.displayName,
          inspectorPosition: slot.inspector + 1,
          trial: slot.trial,
          sequence: slot.sequence,
          createdAt: new Date(),
        }),
      );
    }
    this.audit.record(actor, {
      action: 'gauge-study.create',
      subjectType: 'gauge-study',
      subjectId: study.id,
      after: {
        name: study.name,
        partNumber: spec.partNumber,
        revision: spec.revision,
        serials: orderedParts.map((p) => p.serial),
        inspectors: inspectors.map((u) => u.displayName),
        trials: study.trials,
        instrument: instrument.code,
        master: master.code,
        calibrationId: calibration.id,
        seed: study.seed,
      },
    });
    await this.em.flush();
    return this.detail(study.id);
  }

  async list(): Promise<{ items: GaugeStudySummary[] }> {
    const studies = await this.em.find(GaugeStudy, {}, { orderBy: { createdAt: 'desc' } });
    const items: GaugeStudySummary[] = [];
    for (const study of studies) items.push(this.summary(study, await this.state(study)));
    return { items };
  }

  async detail(id: string): Promise<GaugeStudyDetail> {
    const study = await this.getStudy(id);
    const state = await this.state(study);
    const summary = this.summary(study, state);
    const partList = uniqueBy(
      state.slots.map((s) => s.part),
      (p) => p.id,
    ).sort((a, b) => a.serial.localeCompare(b.serial));
    const inspectors = this.inspectors(state.slots);
    const measurements: MeasurementView[] = state.measurements.map((m) => ({
      id: m.id,
      slotId: m.slot.id,
      partId: m.slot.part.id,
      serial: m.slot.part.serial,
      inspectorId: m.slot.inspector.id,
      trial: m.slot.trial,
      sequence: m.slot.sequence,
      readingMm: m.readingMm,
      heightMm: m.heightMm,
      supersedesId: m.supersedes?.id ?? null,
      supersededById: state.supersededBy.get(m.id) ?? null,
      reason: m.reason,
      recordedBy: m.recordedByName,
      createdAt: m.createdAt.toISOString(),
    }));
    let result: GaugeStudyDetail['result'] = null;
    if (summary.complete) {
      const partIndex = new Map(partList.map((p, i) => [p.id, i]));
      const values = partList.map(() => inspectors.map(() => Array.from({ length: study.trials }, () => 0)));
      for (const slot of state.slots) {
        const cell = values[partIndex.get(slot.part.id)!]![slot.inspectorPosition - 1]!;
        cell[slot.trial - 1] = state.inForce.get(slot.id)!.heightMm;
      }
      result = analyseGaugeStudy(values, study.spec.nominalMm, study.spec.bandUpperMm - study.spec.bandLowerMm);
    }
    return {
      ...summary,
      specId: study.spec.id,
      nominalMm: study.spec.nominalMm,
      bandLowerMm: study.spec.bandLowerMm,
      bandUpperMm: study.spec.bandUpperMm,
      instrument: { id: study.instrument.id, code: study.instrument.code },
      master: {
        id: study.master.id,
        code: study.master.code,
        calibratedSizeMm: study.masterCalibration.calibratedSizeMm,
        certificateNumber: study.masterCalibration.certificateNumber,
      },
      seed: study.seed,
      partList: partList.map((p) => ({ id: p.id, serial: p.serial })),
      progress: inspectors.map((person) => {
        const own = state.slots.filter((s) => s.inspector.id === person.id);
        return {
          ...person,
          planned: own.length,
          measured: own.filter((s) => state.inForce.has(s.id)).length,
        };
      }),
      measurements,
      result,
    };
  }

  async inspectorChoices(): Promise<{ items: { id: string; displayName: string }[] }> {
    const people = await this.em.find(
      User,
      { active: true, roles: { $contains: ['inspector'] } },
      { orderBy: { displayName: 'asc' } },
    );
    return { items: people.map((u) => ({ id: u.id, displayName: u.displayName })) };
  }

  /** The studies with measurements still waiting for this inspector. */
  async waiting(actor: SessionUser): Promise<{ items: WaitingGaugeStudy[] }> {
    const slots = await this.em.find(GaugeStudySlot, { inspector: actor.id }, { populate: ['study'] });
    const studies = uniqueBy(
      slots.map((s) => s.study),
      (s) => s.id,
    );
    const items: WaitingGaugeStudy[] = [];
    for (const study of studies) {
      const turn = await this.turn(actor, study.id);
      if (turn.next)
        items.push({
          id: study.id,
          name: study.name,
          partNumber: study.spec.partNumber,
          instrument: study.instrument.code,
          master: study.master.code,
          measured: turn.measured,
          planned: turn.planned,
        });
    }
    return { items: items.sort((a, b) => a.name.localeCompare(b.name)) };
  }

  /** The inspector's next part, by serial only: no measurement of the study is ever shown here. */
  async turn(actor: SessionUser, id: string): Promise<GaugeStudyTurn> {
    const study = await this.getStudy(id);
    const state = await this.state(study);
    const own = state.slots.filter((s) => s.inspector.id === actor.id).sort((a, b) => a.sequence - b.sequence);
    if (!own.length) throw new NotFoundException('Gauge study');
    const next = own.find((s) => !state.inForce.has(s.id)) ?? null;
    const latest = state.measurements
      .filter((m) => m.slot.inspector.id === actor.id && !state.supersededBy.has(m.id))
      .sort((a, b) => b.createdAt.getTime() - a.createdAt.getTime() || b.slot.sequence - a.slot.sequence)[0];
    return {
      studyId: study.id,
      name: study.name,
      partNumber: study.spec.partNumber,
      instrument: study.instrument.code,
      master: study.master.code,
      measured: own.filter((s) => state.inForce.has(s.id)).length,
      planned: own.length,
      expectedReadingMm: roundMm(
        study.spec.nominalMm +
          (study.spec.bandLowerMm + study.spec.bandUpperMm) / 2 -
          study.masterCalibration.calibratedSizeMm,
      ),
      bandWidthMm: roundMm(study.spec.bandUpperMm - study.spec.bandLowerMm),
      next: next ? { slotId: next.id, serial: next.part.serial, trial: next.trial, sequence: next.sequence } : null,
      lastSaved: latest
        ? { measurementId: latest.id, serial: latest.slot.part.serial, sequence: latest.slot.sequence }
        : null,
    };
  }

  async measure(actor: SessionUser, id: string, input: GaugeMeasurementInput): Promise<GaugeStudyTurn> {
    const slot = await this.em.findOne(GaugeStudySlot, { id: input.slotId, study: id, inspector: actor.id });
    if (!slot)
      throw new ValidationFailedException([{ path: 'slotId', message: 'This is not one of your measurements.' }]);
    if (await this.em.count(GaugeStudyMeasurement, { slot })) throw new SlotAlreadyMeasuredException(slot.part.serial);
    // The Bench gives the parts in the schedule's order; an earlier slot still open means a stale page.
    const [open] = await this.em.getConnection().execute<{ n: string }[]>(
      `select count(*) as n from gauge_study_slot s where s.study_id = ? and s.inspector_id = ? and s.sequence < ?
         and not exists (select 1 from gauge_study_measurement m where m.slot_id = s.id)`,
      [id, actor.id, slot.sequence],
    );
    if (Number(open?.n ?? 0) > 0) throw new SlotOutOfOrderException();
    const study = await this.getStudy(id);
    const readingMm = toMm(input.reading, input.unit);
    const measurement = this.em.create(GaugeStudyMeasurement, {
      slot,
      readingMm,
      heightMm: roundMm(study.masterCalibration.calibratedSizeMm + readingMm),
      recordedById: actor.id,
      recordedByName: actor.displayName,
      createdAt: new Date(),
    });
    this.em.persist(measurement);
    this.audit.record(actor, {
      action: 'gauge-study.measure',
      subjectType: 'gauge-study',
      subjectId: study.id,
      after: {
        measurementId: measurement.id,
        serial: slot.part.serial,
        trial: slot.trial,
        sequence: slot.sequence,
        readingMm,
      },
    });
    try {
      await this.em.flush();
    } catch (error) {
      // Another save of the same slot won the race (a double Enter, a second tab).
      if (error instanceof UniqueConstraintViolationException) throw new SlotAlreadyMeasuredException(slot.part.serial);
      throw error;
    }
    return this.turn(actor, id);
  }

  /** A new measurement superseding one of the inspector's own, with a reason; both stay on record. */
  async correct(
    actor: SessionUser,
    id: string,
    measurementId: string,
    input: GaugeCorrectionInput,
  ): Promise<GaugeStudyTurn> {
    await this.turn(actor, id);
    const old = await this.em.findOne(GaugeStudyMeasurement, { id: measurementId, slot: { study: id } });
    if (!old) throw new NotFoundException('Measurement');
    if (old.slot.inspector.id !== actor.id)
      throw new GaugeCorrectionRefusedException('Only the inspector who made a measurement can correct it.');
    if (await this.em.count(GaugeStudyMeasurement, { supersedes: old }))
      throw new GaugeCorrectionRefusedException('This measurement has already been corrected; correct the newer one.');
    const study = await this.getStudy(id);
    const readingMm = toMm(input.reading, input.unit);
    const correction = this.em.create(GaugeStudyMeasurement, {
      slot: old.slot,
      readingMm,
      heightMm: roundMm(study.masterCalibration.calibratedSizeMm + readingMm),
      recordedById: actor.id,
      recordedByName: actor.displayName,
      supersedes: old,
      reason: input.reason,
      createdAt: new Date(),
    });
    this.em.persist(correction);
    this.audit.record(actor, {
      action: 'gauge-study.correct',
      subjectType: 'gauge-study',
      subjectId: study.id,
      before: { measurementId: old.id, readingMm: old.readingMm },
      after: { measurementId: correction.id, serial: old.slot.part.serial, readingMm },
      reason: input.reason,
    });
    try {
      await this.em.flush();
    } catch (error) {
      if (error instanceof UniqueConstraintViolationException)
        throw new GaugeCorrectionRefusedException(
          'This measurement has already been corrected; correct the newer one.',
        );
      throw error;
    }
    return this.turn(actor, id);
  }

  private async getStudy(id: string): Promise<GaugeStudy> {
    const study = await this.em.findOne(GaugeStudy, { id });
    if (!study) throw new NotFoundException('Gauge study');
    return study;
  }

  private async state(study: GaugeStudy): Promise<StudyState> {
    const slots = await this.em.find(
      GaugeStudySlot,
      { study },
      { orderBy: { inspectorPosition: 'asc', sequence: 'asc' } },
    );
    const measurements = await this.em.find(
      GaugeStudyMeasurement,
      { slot: { study } },
      { orderBy: { createdAt: 'asc', id: 'asc' } },
    );
    const supersededBy = new Map<string, string>();
    for (const m of measurements) if (m.supersedes) supersededBy.set(m.supersedes.id, m.id);
    const inForce = new Map<string, GaugeStudyMeasurement>();
    for (const m of measurements) if (!supersededBy.has(m.id)) inForce.set(m.slot.id, m);
    return { slots, measurements, inForce, supersededBy };
  }

  private inspectors(slots: GaugeStudySlot[]): { id: string; displayName: string }[] {
    return uniqueBy(slots, (s) => s.inspector.id)
      .sort((a, b) => a.inspectorPosition - b.inspectorPosition)
      .map((s) => ({ id: s.inspector.id, displayName: s.inspectorName }));
  }

  private summary(study: GaugeStudy, state: StudyState): GaugeStudySummary {
    const measured = state.slots.filter((s) => state.inForce.has(s.id)).length;
    return {
      id: study.id,
      name: study.name,
      partNumber: study.spec.partNumber,
      revision: study.spec.revision,
      parts: new Set(state.slots.map((s) => s.part.id)).size,
      inspectors: this.inspectors(state.slots),
      trials: study.trials,
      measured,
      planned: state.slots.length,
      complete: state.slots.length > 0 && measured === state.slots.length,
      createdBy: study.createdByName,
      createdAt: study.createdAt.toISOString(),
    };
  }
}

function uniqueBy<T>(items: T[], key: (item: T) => string): T[] {
  const seen = new Map<string, T>();
  for (const item of items) if (!seen.has(key(item))) seen.set(key(item), item);
  return [...seen.values()];
}
