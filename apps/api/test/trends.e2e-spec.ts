import { trendPointList, type Trend, type TrendPartNumber } from '@evenset/contracts';
import { capability, individuals, runRules, xbarR } from '@evenset/metrology';
import { ensureUser } from '../src/database/factories/user.factory';
import { type Bench, givenBench, givenLot, partRows, post, startRun, topReadings } from './setup/bench';
import { givenCustomer, givenReleasedParts, givenSoldSets } from './setup/sets';
import { type Browser, signIn, signInAs, startTestApp, TEST_PASSWORD, type TestApp } from './setup/test-app';

/*
 * The trend's limits and indexes must be exactly what @evenset/metrology's `xbarR`, `individuals`,
 * `capability` and `runRules` give for the same heights. Those functions are themselves checked
 * against the NIST/SEMATECH e-Handbook's worked examples (§6.3.2, §6.1.6) and the Western Electric
 * rules in packages/metrology/src/statistics/*.spec.ts; the heights come from the inspection routes.
 */

const OTHER_INSPECTOR = 'Rowan Lisle';

describe('trends of part height', () => {
  let t: TestApp;
  let bench: Bench;
  let admin: Browser;
  let sales: Browser;
  let heights: Record<string, number>;
  let stored: Record<string, number>;
  let ids: Record<string, string>;
  let lotIds: Record<string, string>;
  let otherInspectorId: string;
  let bandMm: { lower: number; upper: number };

  const trend = async (query: Record<string, string> = {}, who: Browser = bench.engineer) =>
    (await who.agent.get('/api/trends/RB-40').query(query).expect(200)).body as Trend;

  beforeAll(async () => {
    t = await startTestApp();
    bench = await givenBench(t);
    admin = await signInAs(t.app, ['admin']);
    sales = await signInAs(t.app, ['sales']);
    // Readings (in) against the 1.50003 in master, mid-band; L-TR-3's C2 stands 0.0001 in proud.
    const a = await givenReleasedParts(bench, 'L-TR-1', {
      A1: -0.0002,
      A2: -0.00021,
      A3: -0.00019,
      A4: -0.0002,
      A5: -0.00022,
    });
    const b = await givenReleasedParts(bench, 'L-TR-2', {
      B1: -0.00021,
      B2: -0.0002,
      B3: -0.00019,
      B4: -0.00021,
      B5: -0.0002,
    });
    heights = { ...a.heights, ...b.heights };
    ids = { ...a.ids, ...b.ids };

    // A third lot measured by another inspector, not released: trends take every measured part.
    const em = bench.em.fork();
    const other = await ensureUser(em, {
      email: 'rowan.lisle@test.example',
      displayName: OTHER_INSPECTOR,
      roles: ['inspector'],
      password: TEST_PASSWORD,
    });
    await em.flush();
    otherInspectorId = other.id;
    const inspector = await signIn(t.app, other.email);
    const lot = await givenLot(bench, 'L-TR-3', ['C1', 'C2', 'C3']);
    const run = await post(inspector, '/api/runs', {
      lotId: lot.id,
      masterId: bench.master.id,
      instrumentId: bench.indicator.id,
      unit: 'in',
      masterTemperature: 20.5,
      partTemperature: 21,
      masterStartReading: 0,
    }).expect(201);
    const rows = await bench.engineer.agent.get(`/api/lots/${lot.id}/parts`).expect(200);
    for (const row of rows.body.items as { id: string; serial: string }[]) ids[row.serial] = row.id;
    for (const [serial, reading] of [
      ['C1', -0.0002],
      ['C2', -0.0001],
      ['C3', -0.00021],
    ] as const) {
      const res = await post(inspector, `/api/runs/${run.body.id}/inspections`, {
        partId: ids[serial],
        unit: 'in',
        readings: topReadings([reading]),
      }).expect(201);
      heights[serial] = (res.body as { result: { height: number } }).result.height;
    }
    const lots = await bench.engineer.agent.get('/api/lots').query({ q: 'L-TR' }).expect(200);
    lotIds = Object.fromEntries(
      (lots.body.items as { id: string; lotNumber: string }[]).map((l) => [l.lotNumber, l.id]),
    );
    bandMm = {
      lower: bench.spec.nominalMm + bench.spec.bandLowerMm,
      upper: bench.spec.nominalMm + bench.spec.bandUpperMm,
    };
    // Trends chart the stored height (numeric, 7 decimals of a mm); the answers above carry the
    // unrounded one. The references below start from what is stored.
    const results = await bench.em.getConnection().execute<{ serial: string; height: string }[]>(
      `select p.serial, r.height_mm as height from inspection_result r
           join inspection i on i.id = r.inspection_id join part p on p.id = i.part_id`,
    );
    stored = Object.fromEntries(results.map((r) => [r.serial, Number(r.height)]));
  }, 180_000);
  afterAll(() => t.close());

  const serialsA = ['A1', 'A2', 'A3', 'A4', 'A5'];
  const serialsB = ['B1', 'B2', 'B3', 'B4', 'B5'];
  const serialsC = ['C1', 'C2', 'C3'];
  const of = (serials: string[]) => serials.map((s) => stored[s]!);

  it('lists the part numbers with a released revision', async () => {
    const res = await bench.inspector.agent.get('/api/trends').expect(200);
    expect(res.body.items as TrendPartNumber[]).toEqual([
      { partNumber: 'RB-40', revision: 'B', title: expect.any(String) },
    ]);
  });

  it('charts every measured part in lot order, with X-bar/R limits equal to xbarR on the same heights', async () => {
    const answer = await trend();
    const points = trendPointList(answer);
    expect(points.map((p) => p.serial)).toEqual([...serialsA, ...serialsB, ...serialsC]);
    expect(answer.points.height).toEqual(of([...serialsA, ...serialsB, ...serialsC]));
    // The stored heights are the computed ones to 0.1 nm.
    for (const p of points) expect(Math.abs(p.height - heights[p.serial]!)).toBeLessThanOrEqual(5e-8);
    expect(points.find((p) => p.serial === 'C1')).toMatchObject({
      inspectorName: OTHER_INSPECTOR,
      masterCode: 'MG-1.500-A',
      lotNumber: 'L-TR-3',
    });

    // Lots of 5, 5 and 3: five values a subgroup keeps 10 values (three would keep 9), so L-TR-3 is left out.
    const reference = xbarR([of(serialsA), of(serialsB)]);
    expect(answer.subgroups).toMatchObject({
      basis: 'lot',
      size: 5,
      subgroups: [
        { label: 'L-TR-1', serials: serialsA, mean: reference.means[0], range: reference.ranges[0] },
        { label: 'L-TR-2', serials: serialsB, mean: reference.means[1], range: reference.ranges[1] },
      ],
      leftOut: [{ label: 'L-TR-3', count: 3, reason: 'fewer than 5 values' }],
      trimmed: [],
      sigma: reference.sigma,
    });
    expect(answer.subgroups.xbar).toEqual(reference.xbar);
    expect(answer.subgroups.range).toEqual(reference.range);
  });

  it('gives individuals/moving-range limits, run-rule signals and Cp/Cpk equal to the metrology package', async () => {
    const answer = await trend();
    const values = of([...serialsA, ...serialsB, ...serialsC]);
    const reference = individuals(values);
    expect(answer.individuals).toEqual({
      movingRanges: reference.movingRanges,
      individuals: reference.individuals,
      movingRange: reference.movingRange,
      sigma: reference.sigma,
    });

    // C2, 0.0001 in proud of the rest, lies more than 3 sigma above the centre line.
    const expected = runRules(values, reference.individuals.centre, reference.sigma);
    const signals = answer.signals.filter((s) => s.chart === 'individuals');
    expect(signals.map((s) => [s.rule, s.index, s.side])).toEqual(expected.map((s) => [s.rule, s.index, s.side]));
    expect(signals).toContainEqual(
      expect.objectContaining({
        rule: 1,
        side: 'high',
        points: ['C2'],
        description: 'one point more than 3 sigma from the centre line (high side)',
      }),
    );

    const cap = capability(values, bandMm.lower, bandMm.upper);
    expect(answer.capability).toEqual({
      revision: 'B',
      lower: bandMm.lower,
      upper: bandMm.upper,
      count: 13,
      mean: cap.mean,
      sigma: cap.sigma,
      cp: cap.cp,
      cpk: cap.cpk,
      fewValues: true,
      warning: expect.stringMatching(/Only 13 values: .*about 30/),
    });
    expect(answer.histogram.reduce((sum, bin) => sum + bin.count, 0)).toBe(13);
    // Sturges: ⌈log2 13⌉ + 1 = 5 bins from the lowest to the highest height.
    expect(answer.histogram).toHaveLength(5);
    expect(answer.histogram[0]!.from).toBe(Math.min(...values));
    expect(answer.histogram[4]!.to).toBe(Math.max(...values));
  });

  it('groups by sold set when asked, each set a subgroup', async () => {
    const customer = await givenCustomer(sales, 'Trend Tooling');
    await givenSoldSets(sales, { customerId: customer.id, orderReference: 'TT-1' }, [
      ['A1', 'A2', 'A3', 'A4'].map((s) => ids[s]!),
      ['B1', 'B2', 'B3', 'B4'].map((s) => ids[s]!),
    ]);
    const answer = await trend({ subgroup: 'set' });
    expect(answer.subgroups.size).toBe(4);
    const groups = answer.subgroups.subgroups;
    expect(groups.map((g) => [...g.serials].sort())).toEqual([
      ['A1', 'A2', 'A3', 'A4'],
      ['B1', 'B2', 'B3', 'B4'],
    ]);
    const reference = xbarR(groups.map((g) => of(g.serials)));
    expect(answer.subgroups.xbar).toEqual(reference.xbar);
    expect(answer.subgroups.range).toEqual(reference.range);
    expect(trendPointList(answer).find((p) => p.serial === 'A1')!.setNumber).toBe(groups[0]!.label);
  });

  it('narrows the data by lot, inspector, master and inspection date', async () => {
    const serials = (a: Trend) => a.points.serial;
    const lotB = await trend({ lotIds: lotIds['L-TR-2']! });
    expect(serials(lotB)).toEqual(serialsB);
    // Points name their lot by its place in the (unfiltered) choices.
    expect(new Set(trendPointList(lotB).map((p) => p.lotNumber))).toEqual(new Set(['L-TR-2']));
    expect(serials(await trend({ lotIds: `${lotIds['L-TR-1']},${lotIds['L-TR-3']}` }))).toEqual([
      ...serialsA,
      ...serialsC,
    ]);
    expect(serials(await trend({ inspector: otherInspectorId }))).toEqual(serialsC);
    expect(serials(await trend({ inspector: OTHER_INSPECTOR.toUpperCase() }))).toEqual(serialsC);
    expect(serials(await trend({ masterId: bench.overdueMaster.id }))).toEqual([]);
    expect(serials(await trend({ masterId: bench.master.id }))).toHaveLength(13);

    const today = new Date().toISOString().slice(0, 10);
    const tomorrow = new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);
    expect(serials(await trend({ from: today, to: today }))).toHaveLength(13);
    const none = await trend({ from: tomorrow });
    expect(none.points.serial).toEqual([]);
    expect(none.points.height).toEqual([]);
    expect(none.subgroups.xbar).toBeNull();
    expect(none.individuals).toBeNull();
    expect(none.capability).toBeNull();
    // The filter choices still come from all the part number's data.
    expect(none.choices.lots.map((l) => l.lotNumber).sort()).toEqual(['L-TR-1', 'L-TR-2', 'L-TR-3']);
    expect(none.choices.inspectors.map((i) => i.name)).toContain(OTHER_INSPECTOR);

    // One lot leaves no second subgroup to chart, and says why.
    const one = await trend({ lotIds: lotIds['L-TR-1']! });
    expect(one.subgroups.xbar).toBeNull();
    expect(one.subgroups.note).toMatch(/at least 2 lots/);
    expect(one.individuals).not.toBeNull();
  });

  it('refuses malformed filters with a message on each field, and unknown part numbers', async () => {
    const res = await bench.engineer.agent
      .get('/api/trends/RB-40')
      .query({ from: '2026-13-01', lotIds: 'not-a-lot', masterId: 'x', subgroup: 'week' })
      .expect(400);
    const paths = (res.body.details as { path: string; message: string }[]).map((d) => d.path);
    expect(paths).toEqual(expect.arrayContaining(['from', 'lotIds.0', 'masterId', 'subgroup']));
    expect(res.body.details).toContainEqual({ path: 'subgroup', message: 'Choose lot or set for the subgroups.' });

    const order = await bench.engineer.agent
      .get('/api/trends/RB-40')
      .query({ from: '2026-05-02', to: '2026-05-01' })
      .expect(400);
    expect(order.body.details).toEqual([
      { path: 'to', message: 'The last inspection date must not be before the first.' },
    ]);

    const bad = await bench.engineer.agent.get('/api/trends/rb 40!').expect(400);
    expect(bad.body.details[0].path).toBe('partNumber');
    const unknown = await bench.engineer.agent.get('/api/trends/ZZ-9').expect(404);
    expect(unknown.body.message).toBe('Part number ZZ-9 was not found.');
  });

  it('lets an admin and an inspector read trends, and not sales', async () => {
    expect((await trend({}, admin)).points.serial).toHaveLength(13);
    expect((await trend({}, bench.inspector)).points.serial).toHaveLength(13);
    await sales.agent.get('/api/trends/RB-40').expect(403);
  });

  it('charts the current height: a correction replaces the inspection it supersedes', async () => {
    const lot = await givenLot(bench, 'L-TR-4', ['D1', 'D2']);
    const [d1, d2] = (await partRows(bench, lot.id)).items;
    const run = await startRun(bench, lot.id);
    const inspect = (partId: string, reading: number, correcting?: { supersedesId: string; reason: string }) =>
      post(bench.inspector, `/api/runs/${run.id}/inspections`, {
        partId,
        unit: 'in',
        readings: topReadings([reading]),
        ...correcting,
      }).expect(201);
    const first = await inspect(d1!.id, -0.0003);
    await inspect(d2!.id, -0.0002);
    await inspect(d1!.id, -0.0001, { supersedesId: first.body.id, reason: 'Read off the chamfer; measured again.' });

    // The trend reads the records in SQL; the lot's part list derives the same rule in the service.
    const rows = (await partRows(bench, lot.id)).items;
    const answer = await trend();
    const charted = new Map(trendPointList(answer).map((p) => [p.serial, p.height]));
    for (const row of rows) expect(Math.abs(charted.get(row.serial)! - row.height!)).toBeLessThanOrEqual(5e-8);
    // D1's corrected height, not its first: 0.0002 in (5.08 µm) apart.
    expect(Math.abs(charted.get('D1')! - first.body.result.height)).toBeGreaterThan(0.005);
    expect(answer.points.serial).toHaveLength(15);
  });
});
