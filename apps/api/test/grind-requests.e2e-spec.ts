import type { GrindRequestDetail, GrindRequestRow, Inspection, Page, ReplacementLookup } from '@evenset/contracts';
import { grindPlan } from '@evenset/metrology';
import { EntityManager } from '@mikro-orm/postgresql';
import { AuditEntry } from '../src/audit/audit-entry.entity';
import { PartDisposition } from '../src/lots/part-disposition.entity';
import { Bench, givenBench, partRows, post, startRun, topReadings } from './setup/bench';
import { releasedAt20C } from './setup/replacement-parts';
import { givenCustomer, givenSoldSets } from './setup/sets';
import { Browser, signInAs, startTestApp, TestApp } from './setup/test-app';

const IN = 25.4; // mm per inch, exactly (NIST SP 811, App. B)

describe('Grind-to-target requests', () => {
  let t: TestApp;
  let bench: Bench;
  let service: Browser;
  let ids: Record<string, string>;
  let lotId: string;
  let setId: string;
  let setNumber: string;
  let request: GrindRequestDetail;

  const check = async () => {
    const res = await service.agent.get('/api/replacements/lookup').query({ q: setNumber }).expect(200);
    const found = res.body as ReplacementLookup;
    if (found.match !== 'set') throw new Error('expected the set');
    return found;
  };
  const detail = async (id: string) =>
    (await service.agent.get(`/api/grind-requests/${id}`).expect(200)).body as GrindRequestDetail;

  beforeAll(async () => {
    t = await startTestApp();
    bench = await givenBench(t);
    const sales = await signInAs(t.app, ['sales']);
    service = await signInAs(t.app, ['service']);
    ({ ids, lotId } = await releasedAt20C(bench, 'L-GRIND', {
      // The sold set, near the bottom of the band: 38.09246, 38.092206, 38.091952, 38.09246 mm.
      'B-1': -0.0003,
      'B-2': -0.00031,
      'B-3': -0.00032,
      'B-4': -0.0003,
      // Free stock, both above the set's window: 38.09754 and 38.097794 mm.
      'G-1': -0.0001,
      'G-2': -0.00009,
    }));
    const customer = await givenCustomer(sales, 'Bolster Works');
    const [set] = await givenSoldSets(sales, { customerId: customer.id, orderReference: 'PO-7' }, [
      ['B-1', 'B-2', 'B-3', 'B-4'].map((s) => ids[s]!),
    ]);
    setId = set!.id;
    setNumber = set!.setNumber;
  }, 120_000);
  afterAll(() => t.close());

  it('offers no fitting part, only parts above the window, closest first', async () => {
    const found = await check();
    // Brief, "Matching": [38.09246 − 0.00508, 38.091952 + 0.00508] = [38.08738, 38.097032] mm,
    // cut to the tolerance band [38.08984, 38.1]: [38.08984, 38.097032], centre 38.093436 mm.
    expect(found.window!.low).toBeCloseTo(38.08984, 7);
    expect(found.window!.high).toBeCloseTo(38.097032, 7);
    expect(found.centre).toBeCloseTo(38.093436, 7);
    expect(found.fits).toEqual([]);
    // G-1 is 38.09754 − 38.093436 = 0.004104 mm above the centre, G-2 0.004358 mm.
    expect(found.grindable.map((p) => [p.serial, p.stockToCentre])).toEqual([
      ['G-1', 0.004104],
      ['G-2', 0.004358],
    ]);
  });

  it('raises a request to grind to the centre with the spec’s passes and the grinding cautions', async () => {
    const res = await post(service, '/api/grind-requests', { originalSetId: setId, partId: ids['G-1'] }).expect(201);
    request = res.body as GrindRequestDetail;
    expect(request.requestNumber).toMatch(/^GR-\d{4}-0001$/);
    expect(request).toMatchObject({ serial: 'G-1', partNumber: 'RB-40', originalSetNumber: setNumber, status: 'open' });
    expect(request.currentHeight).toBeCloseTo(38.09754, 7);
    expect(request.targetHeight).toBeCloseTo(38.093436, 7); // the window's centre
    expect(request.stock).toBeCloseTo(38.09754 - 38.093436, 9);
    expect(request.window.low).toBeCloseTo(38.08984, 7);
    expect(request.window.high).toBeCloseTo(38.097032, 7);

    // RB-40 rev B grinds 0.001 in roughing, 0.0004 in finish allowance at 0.0001 in, 2 spark-outs.
    const spec = { roughDepth: 0.001 * IN, finishAllowance: 0.0004 * IN, finishDepth: 0.0001 * IN, sparkOutPasses: 2 };
    expect(request.grinding).toEqual({
      roughDepth: 0.0254,
      finishAllowance: 0.01016,
      finishDepth: 0.00254,
      sparkOutPasses: 2,
    });
    expect(request.passes).toEqual(grindPlan({ stock: request.stock, ...spec }).passes);
    // By hand (common practice): 0.004104 mm is under the 0.01016 mm allowance, so no roughing;
    // finishing at 0.00254 mm takes 2 passes (0.00254, then 0.001564), then 2 spark-outs.
    expect(request.passes.map((p) => p.kind)).toEqual(['finish', 'finish', 'spark-out', 'spark-out']);
    expect(request.passes[0]!.depth).toBeCloseTo(0.00254, 9);
    expect(request.passes[1]!.depth).toBeCloseTo(0.001564, 9);
    expect(request.passes[1]!.remaining).toBe(0);

    const cautions = request.cautions.join(' ');
    for (const needed of [
      /rated for the spindle speed/,
      /ring-tested/,
      /guard in place/,
      /eye and face protection/,
      /held on the magnetic chuck/,
      /coolant/,
      /lifting aids/,
      /local codes, the machine maker’s instructions/,
    ])
      expect(cautions).toMatch(needed);

    // The part leaves released stock with a rework of the same target, and both are audited.
    const part = (await partRows(bench, lotId, { q: 'G-1' })).items[0]!;
    expect(part.status).toBe('rework');
    const em = t.app.get(EntityManager).fork();
    const rework = await em.findOneOrFail(PartDisposition, { part: ids['G-1'], kind: 'rework' });
    expect(rework.targetHeightMm).toBe(request.targetHeight);
    expect(rework.reason).toBe(`Grind request ${request.requestNumber}: grind to match set ${setNumber}.`);
    expect(await em.count(AuditEntry, { action: 'grind-request.create', subjectId: request.id })).toBe(1);

    const after = await check();
    expect(after.grindable.map((p) => p.serial)).toEqual(['G-2']);
    expect(after.grindRequests.map((r) => [r.requestNumber, r.status])).toEqual([[request.requestNumber, 'open']]);
  });

  it('refuses a second request for the part, and a part of the set itself', async () => {
    const again = await post(service, '/api/grind-requests', { originalSetId: setId, partId: ids['G-1'] }).expect(409);
    expect(again.body.message).toBe('Part G-1 is not released stock, so it cannot be sent. Choose a released part.');
    await post(service, '/api/grind-requests', { originalSetId: setId, partId: ids['B-1'] }).expect(409);
    await post(bench.inspector, '/api/grind-requests', { originalSetId: setId, partId: ids['G-2'] }).expect(403);
  });

  it('runs open → ground → re-inspected, the last read from a Bench inspection of the part', async () => {
    const refused = await post(bench.inspector, `/api/grind-requests/${request.id}/steps`, {
      status: 're-inspected',
    }).expect(400);
    expect(refused.body.details[0].path).toBe('status');

    const ground = await post(bench.inspector, `/api/grind-requests/${request.id}/steps`, {
      status: 'ground',
      note: 'Two finishing passes, sparked out.',
    }).expect(201);
    expect((ground.body as GrindRequestDetail).status).toBe('ground');
    expect((ground.body as GrindRequestDetail).steps.map((s) => [s.status, s.note])).toEqual([
      ['open', null],
      ['ground', 'Two finishing passes, sparked out.'],
    ]);
    const twice = await post(bench.engineer, `/api/grind-requests/${request.id}/steps`, { status: 'ground' }).expect(
      409,
    );
    expect(twice.body.message).toBe(
      `Grind request ${request.requestNumber} is already ground; only an open request can be marked as ground.`,
    );

    // Re-inspection at the Bench: 38.10008 + 25.4 × (−0.00029) = 38.092714 mm, inside the window.
    const run = await startRun(bench, lotId, { partTemperature: 20, masterTemperature: 20 });
    const measured = await post(bench.inspector, `/api/runs/${run.id}/inspections`, {
      partId: ids['G-1'],
      unit: 'in',
      readings: topReadings([-0.00029]),
    }).expect(201);
    const inspection = measured.body as Inspection;
    const now = await detail(request.id);
    expect(now.status).toBe('re-inspected');
    expect(now.reInspection).toMatchObject({
      inspectionId: inspection.id,
      verdict: inspection.result.verdict,
      insideWindow: true,
    });
    expect(now.reInspection!.height).toBeCloseTo(38.092714, 7);

    const list = (await service.agent.get('/api/grind-requests').expect(200)).body as Page<GrindRequestRow>;
    expect(list.total).toBe(1);
    expect(list.items[0]).toMatchObject({
      requestNumber: request.requestNumber,
      serial: 'G-1',
      status: 're-inspected',
    });

    // Released again, the ground part now fits the set and is no longer a grinding candidate.
    if (inspection.result.verdict === 'guard-band')
      await post(bench.engineer, `/api/parts/${ids['G-1']}/dispositions`, {
        kind: 'use-as-is',
        reason: 'Inside the set’s window after grinding.',
      }).expect(201);
    await post(bench.engineer, `/api/parts/${ids['G-1']}/release`, {}).expect(201);
    const found = await check();
    expect(found.fits.map((p) => p.serial)).toEqual(['G-1']);
    const fits = await post(service, '/api/grind-requests', { originalSetId: setId, partId: ids['G-1'] }).expect(409);
    expect(fits.body.message).toMatch(
      /^Part G-1 already fits set .*; send it as a replacement instead of grinding it\.$/,
    );
  });
});
