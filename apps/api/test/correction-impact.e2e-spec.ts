import { CSRF_HEADER, type CalibrationRecorded, type PartDetail } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { addDays, todayIso } from '../src/common/gauges/gauge-status';
import { minimalPdf } from '../src/database/factories/certificate-file';
import { InspectionResult } from '../src/inspections/inspection-result.entity';
import { Bench, givenBench, givenLot, partRows, post, topReadings } from './setup/bench';
import { startTestApp, TestApp } from './setup/test-app';

const IN = 25.4; // mm per inch, exactly (NIST SP 811, App. B)

describe('a corrected master calibration recomputes the heights measured against it', () => {
  let t: TestApp;
  let bench: Bench;

  beforeAll(async () => {
    t = await startTestApp();
    bench = await givenBench(t);
  }, 60_000);
  afterAll(() => t.close());

  const calibrate = (masterId: string, fields: Record<string, string | number>) => {
    const form = {
      calibratedOn: addDays(todayIso(), -10),
      dueOn: addDays(todayIso(), 355),
      unit: 'in',
      expandedUncertainty: 0.000003,
      coverageFactor: 2,
      certificateNumber: 'KW-IMPACT',
      ...fields,
    };
    let req = bench.engineer.agent.post(`/api/masters/${masterId}/calibrations`).set(CSRF_HEADER, bench.engineer.csrf);
    for (const [name, value] of Object.entries(form)) req = req.field(name, String(value));
    return req.attach('certificate', minimalPdf('KW-IMPACT'), 'cert.pdf');
  };

  it('appends new results and reports the parts whose verdict changes, before → after', async () => {
    const master = await post(bench.engineer, '/api/masters', {
      code: 'MG-IMPACT',
      description: '1.5 in block',
      unit: 'in',
      nominal: 1.5,
      materialId: bench.steel.id,
    }).expect(201);
    const first = (await calibrate(master.body.id, { calibratedSize: 1.500004 }).expect(201))
      .body as CalibrationRecorded;
    expect(first.impact).toBeNull();

    const lot = await givenLot(bench, 'L-IMPACT', ['I-1', 'I-2', 'I-3']);
    const ids = Object.fromEntries((await partRows(bench, lot.id)).items.map((r) => [r.serial, r.id]));
    const run = await post(bench.inspector, '/api/runs', {
      lotId: lot.id,
      masterId: master.body.id,
      instrumentId: bench.indicator.id,
      unit: 'in',
      masterTemperature: 20,
      partTemperature: 20,
      masterStartReading: 0,
    }).expect(201);
    // At 20 °C, height = master size + mean reading; RB-40 rev B band 1.4996…1.5000 in.
    const readings: Record<string, number> = { 'I-1': -0.0002, 'I-2': -0.0005, 'I-3': -0.0008 };
    for (const [serial, reading] of Object.entries(readings))
      await post(bench.inspector, `/api/runs/${run.body.id}/inspections`, {
        partId: ids[serial],
        unit: 'in',
        readings: topReadings([reading]),
      }).expect(201);

    // The certificate is reissued: the master is 0.0003 in larger than first stated.
    const correction = (
      await calibrate(master.body.id, {
        calibratedSize: 1.500304,
        supersedesId: first.current!.id,
        reason: 'Certificate reissued: size transposed on the first issue.',
        certificateNumber: 'KW-IMPACT-R1',
      }).expect(201)
    ).body as CalibrationRecorded;

    expect(correction.impact!.recomputed).toBe(3);
    const changed = correction.impact!.changed.map((c) => [
      c.serial,
      c.before,
      c.after,
      c.heightAfter - c.heightBefore,
    ]);
    expect(changed).toHaveLength(2);
    expect(changed).toEqual(
      expect.arrayContaining([
        ['I-1', 'conforms', 'does-not-conform', expect.closeTo(0.0003 * IN, 9)],
        ['I-2', 'does-not-conform', 'conforms', expect.closeTo(0.0003 * IN, 9)],
      ]),
    );

    // Results are appended: the first stays, the newest (with the correction's reason) is in force.
    const detail = (await bench.engineer.agent.get(`/api/parts/${ids['I-1']}`).expect(200)).body as PartDetail;
    const inspection = detail.inspections[0]!;
    expect(inspection.results).toHaveLength(2);
    expect(inspection.result.reason).toBe(
      'master calibration corrected: Certificate reissued: size transposed on the first issue.',
    );
    expect(inspection.result.masterCalibrationId).toBe(correction.current!.id);
    expect(inspection.masterCalibrationId).toBe(first.current!.id);
    expect(detail.status).toBe('does-not-conform');
    expect(await t.app.get(EntityManager).fork().count(InspectionResult, { inspection: inspection.id })).toBe(2);
  });
});
