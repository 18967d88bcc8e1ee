import { CSRF_HEADER, type Inspection, type PartDetail } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { AuditEntry } from '../src/audit/audit-entry.entity';
import { InspectionReading } from '../src/inspections/inspection-reading.entity';
import { InspectionResult } from '../src/inspections/inspection-result.entity';
import { Inspection as InspectionRow } from '../src/inspections/inspection.entity';
import { Bench, givenBench, givenLot, partRows, post, startRun, topReadings } from './setup/bench';
import { listRoutes } from './setup/routes';
import { startTestApp, TestApp } from './setup/test-app';

const IN = 25.4; // mm per inch, exactly (NIST SP 811, App. B)

describe('Bench runs and inspections', () => {
  let t: TestApp;
  let bench: Bench;

  beforeAll(async () => {
    t = await startTestApp();
    bench = await givenBench(t);
  }, 60_000);
  afterAll(() => t.close());

  const count = (entity: typeof InspectionRow | typeof InspectionReading | typeof InspectionResult) =>
    t.app.get(EntityManager).fork().count(entity, {});
  const inspect = (runId: string, body: object) => post(bench.inspector, `/api/runs/${runId}/inspections`, body);

  it('stores a height equal to the hand computation of the brief’s formula, referred to 20 °C', async () => {
    const lot = await givenLot(bench, 'L-HAND', ['H-1']);
    const part = (await partRows(bench, lot.id)).items[0]!;
    const run = await startRun(bench, lot.id, {
      masterStartReading: 0.0001,
      partTemperature: 21,
      masterTemperature: 20.5,
    });
    const readings = [-0.0001, -0.00011, -0.00009, -0.0001, -0.0001];
    const res = await inspect(run.id, { partId: part.id, unit: 'in', readings: topReadings(readings) }).expect(201);
    const inspection = res.body as Inspection;

    // Brief, "Height by comparison": height = master calibrated size + (part reading − master
    // reading), corrected to 20 °C (ISO 1) for both expansion coefficients and temperatures.
    // A length L20 at 20 °C measures L20·(1 + α·(t − 20)) at t, and the indicator shows
    // L_part(t_P) − L_master(t_M) = d, so height = (L_S·(1 + α_M·(t_M − 20)) + d) / (1 + α_P·(t_P − 20)).
    const masterSize = 38.10008; // MG-1.500-A's calibration in force (demo data)
    const alpha = 11.5e-6; // gauge steel, ISO 3650 / GUM H.1
    const meanPart = readings.reduce((a, b) => a + b, 0) / readings.length; // RB-40 rev B: mean of the top stations
    const d = (meanPart - 0.0001) * IN;
    const expected = (masterSize * (1 + alpha * (20.5 - 20)) + d) / (1 + alpha * (21 - 20));
    expect(inspection.result.height).toBeCloseTo(expected, 9);
    expect(inspection.result.heightUncorrected).toBeCloseTo(masterSize + d, 9);
    expect(inspection.partExpansionPerK).toBe(11.5);
    expect(inspection.masterCalibrationId).toBe(bench.master.currentCalibration!.id);

    // k = 2 and U = 2·u_c (JCGM 100:2008 §6.2); flatness of five readings 0.00002 in apart.
    expect(inspection.result.coverageFactor).toBe(2);
    expect(inspection.result.expandedUncertainty).toBeCloseTo(2 * inspection.result.combinedUncertainty, 12);
    expect(inspection.result.flatness!.minimumZone).toBeGreaterThan(0);
    expect(inspection.result.flatness!.minimumZone).toBeLessThanOrEqual(0.00002 * IN + 1e-9);
    expect(inspection.result.parallelism).toEqual({ value: expect.any(Number), datum: 'surface plate' });
    // Part on the plate: parallelism is the range of the top readings (ISO 1101 zone parallel to the plate).
    expect(inspection.result.parallelism!.value).toBeCloseTo(0.00002 * IN, 9);
    expect(inspection.readings.map((r) => r.station)).toEqual(['P1', 'P2', 'P3', 'P4', 'P5']);
    // The answer is built from the rows as stored (values rounded to the columns' scales), without
    // reading them again: it must equal what reading them back gives.
    const detail = (await bench.inspector.agent.get(`/api/parts/${part.id}`).expect(200)).body as PartDetail;
    expect(detail.inspections).toEqual([inspection]);

    const stored = await t.app.get(EntityManager).fork().findOneOrFail(InspectionResult, { inspection: inspection.id });
    expect(stored.heightMm).toBeCloseTo(expected, 7);
    const audit = await t.app
      .get(EntityManager)
      .fork()
      .count(AuditEntry, { action: 'inspection.create', subjectId: inspection.id });
    expect(audit).toBe(1);
  });

  it('refuses missing, unknown, duplicated and non-finite readings by station, saving nothing', async () => {
    const lot = await givenLot(bench, 'L-BAD', ['B-1']);
    const part = (await partRows(bench, lot.id)).items[0]!;
    const run = await startRun(bench, lot.id);
    const before = await count(InspectionRow);
    const res = await inspect(run.id, {
      partId: part.id,
      unit: 'in',
      readings: [
        { station: 'P1', reading: 0 },
        { station: 'P1', reading: 0.0001 },
        { station: 'P9', reading: 0 },
        { station: 'P2', reading: 0 },
        { station: 'P3', reading: 0 },
      ],
    }).expect(400);
    const messages = (res.body.details as { message: string }[]).map((d) => d.message);
    expect(messages).toEqual(
      expect.arrayContaining([
        'Station P1 has more than one reading.',
        'There is no station "P9" in the plan.',
        'Readings are missing for stations P4, P5.',
      ]),
    );
    // JSON carries no NaN or Infinity; a string or null in its place is refused by the contract.
    await inspect(run.id, { partId: part.id, unit: 'in', readings: [{ station: 'P1', reading: null }] }).expect(400);
    expect(await count(InspectionRow)).toBe(before);
  });

  it('refuses a run on an overdue master with a clear message', async () => {
    const lot = await givenLot(bench, 'L-OVERDUE', ['O-1']);
    const res = await post(bench.inspector, '/api/runs', {
      lotId: lot.id,
      masterId: bench.overdueMaster.id,
      instrumentId: bench.indicator.id,
      unit: 'in',
      masterTemperature: 20,
      partTemperature: 20,
      masterStartReading: 0,
    }).expect(409);
    expect(res.body.code).toBe('GAUGE_NOT_USABLE');
    expect(res.body.message).toBe(
      'MG-12-A cannot be used at the Bench: its calibration is overdue. Choose another master.',
    );
  });

  it('flags every inspection of a run whose master check drifted beyond the limit', async () => {
    const lot = await givenLot(bench, 'L-DRIFT', ['D-1', 'D-2']);
    const parts = (await partRows(bench, lot.id)).items;
    const run = await startRun(bench, lot.id);
    for (const part of parts)
      await inspect(run.id, { partId: part.id, unit: 'in', readings: topReadings([-0.0001]) }).expect(201);
    // RB-40 rev B names no drift limit: the default, one tenth (0.0001 in), applies.
    const ended = await post(bench.inspector, `/api/runs/${run.id}/end`, {
      unit: 'in',
      masterEndReading: 0.00015,
    }).expect(200);
    expect(ended.body).toMatchObject({ flagged: true, driftLimit: 0.00254 });
    expect(ended.body.drift).toBeCloseTo(0.00015 * IN, 9);
    const rows = (await partRows(bench, lot.id)).items;
    expect(rows.map((r) => [r.runFlagged, r.status])).toEqual([
      [true, 'held'],
      [true, 'held'],
    ]);
    await inspect(run.id, { partId: parts[0]!.id, unit: 'in', readings: topReadings([0]) }).expect(409);
  });

  it('takes the master material’s coefficient as it is at each save, the run’s other facts as at its start', async () => {
    const lot = await givenLot(bench, 'L-ALPHA', ['A-1', 'A-2']);
    const [first, second] = (await partRows(bench, lot.id)).items;
    const run = await startRun(bench, lot.id);
    const save = async (partId: string) =>
      (await inspect(run.id, { partId, unit: 'in', readings: topReadings([-0.0001]) }).expect(201)).body as Inspection;
    const steel = { name: bench.steel.name, source: bench.steel.source, confidence: bench.steel.confidence };
    const setSteel = (expansionPerK: number) =>
      bench.engineer.agent
        .put(`/api/materials/${bench.steel.id}`)
        .set(CSRF_HEADER, bench.engineer.csrf)
        .send({ ...steel, expansionPerK })
        .expect(200);
    expect((await save(first!.id)).masterExpansionPerK).toBe(11.5);
    await setSteel(12);
    try {
      const after = await save(second!.id);
      expect(after.masterExpansionPerK).toBe(12);
      // The part's coefficient is the spec's, frozen at its release.
      expect(after.partExpansionPerK).toBe(11.5);
    } finally {
      await setSteel(11.5);
    }
  });

  it('keeps a corrected inspection beside the one that supersedes it, with the reason', async () => {
    const lot = await givenLot(bench, 'L-CORR', ['C-1']);
    const part = (await partRows(bench, lot.id)).items[0]!;
    const run = await startRun(bench, lot.id);
    const first = (await inspect(run.id, { partId: part.id, unit: 'in', readings: topReadings([-0.0003]) }).expect(201))
      .body as Inspection;
    await inspect(run.id, {
      partId: part.id,
      unit: 'in',
      readings: topReadings([-0.0001]),
      supersedesId: first.id,
    }).expect(400);
    const second = (
      await inspect(run.id, {
        partId: part.id,
        unit: 'in',
        readings: topReadings([-0.0001]),
        supersedesId: first.id,
        reason: 'P1 was read off the chamfer; measured again.',
      }).expect(201)
    ).body as Inspection;
    const again = await inspect(run.id, {
      partId: part.id,
      unit: 'in',
      readings: topReadings([-0.0001]),
      supersedesId: first.id,
      reason: 'A second correction of the same record.',
    }).expect(409);
    expect(again.body.code).toBe('INSPECTION_SUPERSEDE_REFUSED');

    const detail = (await bench.inspector.agent.get(`/api/parts/${part.id}`).expect(200)).body as PartDetail;
    expect(detail.inspections.map((i) => [i.id, i.supersededById, i.supersedesId, i.reason])).toEqual([
      [second.id, null, first.id, 'P1 was read off the chamfer; measured again.'],
      [first.id, second.id, null, null],
    ]);
    const row = (await partRows(bench, lot.id)).items[0]!;
    expect(row.height).toBeCloseTo(second.result.height, 9);
    // The save's answer is built from the rows as stored, without reading them back: it must be
    // what a later read of the same inspection shows.
    expect(detail.inspections[0]).toEqual(second);
    expect(detail.inspections[1]).toEqual({ ...first, supersededById: second.id });
  });

  it('has no route that changes or deletes an inspection, and the database refuses it', async () => {
    const writes = listRoutes(t.app).filter(
      (r) => ['PUT', 'PATCH', 'DELETE'].includes(r.method) && /runs|inspection|readings|parts/.test(r.path),
    );
    expect(writes).toEqual([]);
    const conn = t.app.get(EntityManager).fork().getConnection();
    for (const table of ['inspection', 'inspection_reading', 'inspection_result']) {
      await expect(conn.execute(`update "${table}" set created_at = now()`)).rejects.toThrow(/permanent/);
      await expect(conn.execute(`delete from "${table}"`)).rejects.toThrow(/permanent/);
      await expect(conn.execute(`truncate "${table}" cascade`)).rejects.toThrow(/permanent/);
    }
  });

  it('only an inspector records readings; an engineer cannot', async () => {
    const lot = await givenLot(bench, 'L-ROLE', ['R-1']);
    const run = await startRun(bench, lot.id);
    const res = await bench.engineer.agent
      .post(`/api/runs/${run.id}/inspections`)
      .set(CSRF_HEADER, bench.engineer.csrf)
      .send({});
    expect(res.status).toBe(403);
  });
});
