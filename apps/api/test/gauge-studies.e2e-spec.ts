import { generateKeyPairSync } from 'node:crypto';
import { gaugeRR } from '@evenset/metrology';
import type { GaugeStudyDetail, GaugeStudySummary, GaugeStudyTurn, WaitingGaugeStudy } from '@evenset/contracts';
import { EntityManager, MikroORM } from '@mikro-orm/postgresql';
import { toMm } from '../src/common/units/lengths';
import { DemoSeeder } from '../src/database/seeders/demo.seeder';
import {
  DEMO_GAUGE_STUDY_NAME,
  DEMO_UNIT_IN,
  HOUF_BERMAN,
  demoReadingIn,
} from '../src/database/seeders/demo-gauge-study';
import { ensureLot } from '../src/database/factories/lot.factory';
import { ensureSpec } from '../src/database/factories/spec.factory';
import { PP6_REV_A } from '../src/database/seeders/demo-specs';
import { Part } from '../src/lots/part.entity';
import type { Spec } from '../src/specs/spec.entity';
import { GaugeStudySlot } from '../src/gauge-studies/gauge-study-slot.entity';
import { gaugeStudySchedule } from '../src/gauge-studies/schedule';
import { givenBench, givenLot, post, type Bench } from './setup/bench';
import { givenUser, signIn, signInAs, startTestApp, type Browser, type TestApp } from './setup/test-app';
import { listRoutes } from './setup/routes';

describe('gauge studies', () => {
  let t: TestApp;
  let bench: Bench;
  let partIds: string[];
  let inspectors: { id: string; browser: Browser }[];

  beforeAll(async () => {
    // The demo seed signs certificates; the app verifies them with the same key.
    const { privateKey } = generateKeyPairSync('ed25519');
    t = await startTestApp({
      CERTIFICATE_SIGNING_KEY: privateKey.export({ format: 'pem', type: 'pkcs8' }).toString(),
    });
    bench = await givenBench(t);
    const lot = await givenLot(
      bench,
      'L-GS-T',
      Array.from({ length: 10 }, (_, i) => `GS-${String(i + 1).padStart(2, '0')}`),
    );
    const parts = await bench.em.find(Part, { lot }, { orderBy: { serial: 'asc' } });
    partIds = parts.map((p) => p.id);
    inspectors = [];
    for (let i = 0; i < 3; i++) {
      const user = await givenUser(t.app, ['inspector']);
      inspectors.push({ id: user.id, browser: await signIn(t.app, user.email) });
    }
  });
  afterAll(() => t.close());

  const setup = (fields: Record<string, unknown> = {}) =>
    post(bench.engineer, '/api/gauge-studies', {
      name: 'Height, three inspectors',
      specId: bench.spec.id,
      partIds,
      inspectorIds: inspectors.map((i) => i.id),
      trials: 2,
      instrumentId: bench.indicator.id,
      masterId: bench.master.id,
      ...fields,
    });

  const turn = async (browser: Browser, id: string) =>
    (await browser.agent.get(`/api/gauge-studies/${id}/next`).expect(200)).body as GaugeStudyTurn;

  it('refuses a study with bad counts, unknown parts or people who are not inspectors, field by field, saving nothing', async () => {
    const counts = await setup({ partIds: partIds.slice(0, 1), inspectorIds: [inspectors[0]!.id], trials: 7 }).expect(
      400,
    );
    const paths = (counts.body.details as { path: string }[]).map((d) => d.path).sort();
    expect(paths).toEqual(['inspectorIds', 'partIds', 'trials']);

    // A part of another part number, a part that does not exist, and an engineer as inspector.
    const pp6 = await ensureSpec(bench.em, {
      partNumber: 'PP-6',
      revision: 'A',
      status: 'released',
      material: bench.steel,
      definition: PP6_REV_A,
    });
    const lotOther = await ensureLot(bench.em, {
      lotNumber: 'L-GS-OTHER',
      spec: pp6 as Spec,
      grindDate: '2026-11-20',
      serials: ['OTHER-1'],
    });
    const other = await bench.em.findOneOrFail(Part, { lot: lotOther });
    const engineerUser = await givenUser(t.app, ['engineer']);
    const res = await setup({
      partIds: [...partIds.slice(0, 3), other.id, '00000000-0000-4000-8000-000000000000'],
      inspectorIds: [inspectors[0]!.id, engineerUser.id],
    }).expect(400);
    expect(res.body.code).toBe('VALIDATION_FAILED');
    expect(res.body.details).toEqual([
      { path: 'partIds.3', message: 'OTHER-1 is not a RB-40 part.' },
      { path: 'partIds.4', message: 'There is no such part.' },
      { path: 'inspectorIds.1', message: `${engineerUser.displayName} is not an inspector.` },
    ]);
    const overdue = await setup({ masterId: bench.overdueMaster.id }).expect(400);
    expect(overdue.body.details).toEqual([{ path: 'masterId', message: expect.stringMatching(/MG-12-A/) }]);
    const list = await bench.engineer.agent.get('/api/gauge-studies').expect(200);
    expect(list.body.items).toEqual([]);
    // The choices the set-up form offers: active inspectors only.
    const choices = await bench.engineer.agent.get('/api/gauge-studies/inspectors').expect(200);
    const ids = (choices.body.items as { id: string }[]).map((c) => c.id);
    expect(ids).toEqual(expect.arrayContaining(inspectors.map((i) => i.id)));
    expect(ids).not.toContain(engineerUser.id);
  });

  it('schedules every part once per trial for each inspector, in a random order drawn again from the stored seed', async () => {
    const study = (await setup().expect(201)).body as GaugeStudyDetail;
    expect(study).toMatchObject({ parts: 10, trials: 2, planned: 60, measured: 0, complete: false, result: null });
    const slots = await t.app
      .get(EntityManager)
      .fork()
      .find(GaugeStudySlot, { study: study.id }, { orderBy: { inspectorPosition: 'asc', sequence: 'asc' } });
    const orders = new Set<string>();
    for (const [j, inspector] of inspectors.entries()) {
      const own = slots.filter((s) => s.inspector.id === inspector.id);
      expect(own.map((s) => s.sequence)).toEqual(Array.from({ length: 20 }, (_, i) => i + 1));
      for (const trial of [1, 2]) {
        const serials = own.filter((s) => s.trial === trial).map((s) => s.part.serial);
        expect([...serials].sort()).toEqual(study.partList.map((p) => p.serial));
        orders.add(serials.join());
      }
      own.slice(1).forEach((s, i) => expect(s.part.id).not.toBe(own[i]!.part.id));
      // The stored order is the one the seed draws (parts in serial order, inspectors as chosen).
      const drawn = gaugeStudySchedule(study.seed, 10, 3, 2).filter((s) => s.inspector === j);
      expect(own.map((s) => [s.trial, s.part.serial])).toEqual(
        drawn.map((s) => [s.trial, study.partList[s.part]!.serial]),
      );
    }
    // Six independent shuffles of ten parts: equal orders would be a broken shuffle (1 in 10! each).
    expect(orders.size).toBe(6);
  });

  it('shows an inspector only their own next part, never a result, and keeps every measurement', async () => {
    const study = (await setup({ name: 'Blind check', trials: 2 }).expect(201)).body as GaugeStudyDetail;
    const [a, b] = inspectors as [(typeof inspectors)[0], (typeof inspectors)[0]];
    const first = await turn(a.browser, study.id);
    expect(first).toMatchObject({ measured: 0, planned: 20, lastSaved: null });
    expect(Object.keys(first.next!).sort()).toEqual(['sequence', 'serial', 'slotId', 'trial']);

    // Inspector a measures; b's turn does not move, and b cannot save into a's slot.
    const afterOne = (
      await post(a.browser, `/api/gauge-studies/${study.id}/measurements`, {
        slotId: first.next!.slotId,
        unit: 'in',
        reading: -0.0002,
      }).expect(201)
    ).body as GaugeStudyTurn;
    expect(afterOne.measured).toBe(1);
    expect(afterOne.lastSaved).toEqual({ measurementId: expect.any(String), serial: first.next!.serial, sequence: 1 });
    // Nothing measured comes back: only the typo guard's expectation, the same before and after.
    const { expectedReadingMm, bandWidthMm, ...rest } = afterOne;
    expect([expectedReadingMm, bandWidthMm]).toEqual([first.expectedReadingMm, first.bandWidthMm]);
    expect(JSON.stringify(rest)).not.toMatch(/reading|height|-0\.0002|0\.00508/i);
    expect((await turn(b.browser, study.id)).measured).toBe(0);
    const foreign = await post(b.browser, `/api/gauge-studies/${study.id}/measurements`, {
      slotId: afterOne.next!.slotId,
      unit: 'in',
      reading: 0,
    }).expect(400);
    expect(foreign.body.details).toEqual([{ path: 'slotId', message: 'This is not one of your measurements.' }]);

    // The same slot twice (a double Enter) and a slot out of order are refused.
    await post(a.browser, `/api/gauge-studies/${study.id}/measurements`, {
      slotId: first.next!.slotId,
      unit: 'in',
      reading: -0.0002,
    }).expect(409);
    const later = await t.app
      .get(EntityManager)
      .fork()
      .findOneOrFail(GaugeStudySlot, { study: study.id, inspector: a.id, sequence: 5 });
    const outOfOrder = await post(a.browser, `/api/gauge-studies/${study.id}/measurements`, {
      slotId: later.id,
      unit: 'in',
      reading: 0,
    }).expect(409);
    expect(outOfOrder.body.code).toBe('SLOT_OUT_OF_ORDER');

    // A slip corrected: a new record supersedes the first, with its reason; both stay on record.
    const corrected = await post(
      a.browser,
      `/api/gauge-studies/${study.id}/measurements/${afterOne.lastSaved!.measurementId}/corrections`,
      { unit: 'in', reading: -0.00021, reason: 'Typed 0.0002 for 0.00021.' },
    ).expect(201);
    expect((corrected.body as GaugeStudyTurn).measured).toBe(1);
    await post(
      b.browser,
      `/api/gauge-studies/${study.id}/measurements/${afterOne.lastSaved!.measurementId}/corrections`,
      { unit: 'in', reading: 0, reason: 'Not mine to correct.' },
    ).expect(409);
    await post(
      a.browser,
      `/api/gauge-studies/${study.id}/measurements/${afterOne.lastSaved!.measurementId}/corrections`,
      { unit: 'in', reading: 0, reason: 'Twice.' },
    ).expect(409);

    const detail = (await bench.engineer.agent.get(`/api/gauge-studies/${study.id}`).expect(200))
      .body as GaugeStudyDetail;
    expect(
      detail.measurements.map((m) => [m.readingMm, m.supersedesId === null, m.supersededById === null, m.reason]),
    ).toEqual([
      [toMm(-0.0002, 'in'), true, false, null],
      [toMm(-0.00021, 'in'), false, true, 'Typed 0.0002 for 0.00021.'],
    ]);
    // Height = master's calibrated size (38.10008 mm after its correction) + reading.
    expect(detail.measurements[1]!.heightMm).toBeCloseTo(38.10008 + toMm(-0.00021, 'in'), 9);
    expect(detail.progress.map((p) => p.measured)).toEqual([1, 0, 0]);

    // Inspectors never open the study's page; a stranger to the study does not see it at all.
    await a.browser.agent.get(`/api/gauge-studies/${study.id}`).expect(403);
    const stranger = await signInAs(t.app, ['inspector']);
    await stranger.agent.get(`/api/gauge-studies/${study.id}/next`).expect(404);
    const waiting = (await stranger.agent.get('/api/gauge-studies/waiting').expect(200)).body
      .items as WaitingGaugeStudy[];
    expect(waiting).toEqual([]);
    const mine = (await a.browser.agent.get('/api/gauge-studies/waiting').expect(200)).body
      .items as WaitingGaugeStudy[];
    expect(mine.find((w) => w.id === study.id)).toMatchObject({ measured: 1, planned: 20, partNumber: 'RB-40' });
  });

  it('has no route that changes or deletes a study or a measurement, and the database refuses it', async () => {
    const writes = listRoutes(t.app).filter(
      (r) => ['PUT', 'PATCH', 'DELETE'].includes(r.method) && r.path.includes('gauge-studies'),
    );
    expect(writes).toEqual([]);
    const conn = t.app.get(EntityManager).fork().getConnection();
    for (const table of ['gauge_study', 'gauge_study_slot', 'gauge_study_measurement']) {
      await expect(conn.execute(`update "${table}" set created_at = now()`)).rejects.toThrow(/permanent/);
      await expect(conn.execute(`delete from "${table}"`)).rejects.toThrow(/permanent/);
      await expect(conn.execute(`truncate "${table}" cascade`)).rejects.toThrow(/permanent/);
    }
  });

  /*
   * The demo study holds Houf & Berman (1988)'s thermal-impedance data (10 parts × 3 operators ×
   * 3 trials, as printed in Montgomery, Introduction to Statistical Quality Control, §8.7), each value
   * v read as (v − 50) × 0.00001 in. Published: MS parts 437.328, operators 19.633, interaction
   * 2.6951, error 0.5111; variance components part 48.29, operator 0.56, interaction 0.73,
   * repeatability 0.51, gauge 1.80; P/T = 6σ/(58 − 18) = 0.20. In the demo's unit every sum of
   * squares, mean square and variance is the published one × (0.00001 in)²; ratios are unchanged.
   */
  it('reproduces the published Houf & Berman analysis on the demo study, and equals gaugeRR on the same numbers', async () => {
    const orm = t.app.get(MikroORM);
    await orm.getSeeder().seed(DemoSeeder);
    await orm.getSeeder().seed(DemoSeeder);
    const list = (await bench.engineer.agent.get('/api/gauge-studies').expect(200)).body.items as GaugeStudySummary[];
    const demos = list.filter((s) => s.name === DEMO_GAUGE_STUDY_NAME);
    expect(demos).toHaveLength(1);
    expect(demos[0]).toMatchObject({ parts: 10, trials: 3, planned: 90, measured: 90, complete: true });
    const study = (await bench.engineer.agent.get(`/api/gauge-studies/${demos[0]!.id}`).expect(200))
      .body as GaugeStudyDetail;
    const r = study.result!;
    const s2 = toMm(DEMO_UNIT_IN, 'in') ** 2;
    const ms = Object.fromEntries(r.anova.map((row) => [row.source, row.meanSquare / s2]));
    expect(ms.part).toBeCloseTo(437.328, 3);
    expect(ms.operator).toBeCloseTo(19.633, 3);
    expect(ms['part × operator']).toBeCloseTo(2.6951, 4);
    expect(ms.repeatability).toBeCloseTo(0.5111, 4);
    expect(r.variance.part / s2).toBeCloseTo(48.29, 2);
    expect(r.variance.operator / s2).toBeCloseTo(0.56, 2);
    expect(r.variance.interaction / s2).toBeCloseTo(0.73, 2);
    expect(r.variance.repeatability / s2).toBeCloseTo(0.51, 2);
    expect(r.grr ** 2 / s2).toBeCloseTo(1.8, 2);
    expect(r.tolerance).toBeCloseTo(toMm(0.0004, 'in'), 12);
    expect(r.pctGrrOfTolerance / 100).toBeCloseTo(0.2, 2);
    expect(r.ndc).toBe(Math.floor((1.41 * Math.sqrt(48.29)) / Math.sqrt(1.8)));
    expect(r.verdictOfTolerance).toBe('may-be-acceptable');
    expect(r.anova.map((row) => row.degreesOfFreedom)).toEqual([9, 2, 18, 60, 89]);

    // The same numbers through the metrology package directly: the readings in mm, and the band.
    const direct = gaugeRR({
      values: HOUF_BERMAN.map((part) => part.map((cell) => cell.map((v) => toMm(demoReadingIn(v), 'in')))),
      tolerance: toMm(0.0004, 'in'),
    });
    r.anova.forEach((row, i) => {
      const want = direct.anova[i]!;
      expect(row.source).toBe(want.source);
      expect(row.sumOfSquares / s2).toBeCloseTo(want.sumOfSquares / s2, 6);
      expect(row.meanSquare / s2).toBeCloseTo(want.meanSquare / s2, 6);
      if (want.f !== null) expect(row.f).toBeCloseTo(want.f, 6);
      if (want.pValue !== null) expect(row.pValue).toBeCloseTo(want.pValue, 9);
    });
    expect(r.pctGrrOfTotal).toBeCloseTo(direct.pctGrrOfTotal, 6);
    expect(r.pctGrrOfTolerance).toBeCloseTo(direct.pctGrrOfTolerance!, 6);
    expect(r.ndc).toBe(direct.ndc);
    // Seeding the whole demo twice over: slower than one request.
  }, 120_000);
});
