import { generateKeyPairSync } from 'node:crypto';
import type { Home } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { addDays, todayIso } from '../src/common/gauges/gauge-status';
import { MailAttempt } from '../src/mail/mail-attempt.entity';
import { MailMessage } from '../src/mail/mail-message.entity';
import { Bench, givenBench, givenLot, partRows, post, startRun, topReadings } from './setup/bench';
import { releasedAt20C } from './setup/replacement-parts';
import { givenCustomer, givenSoldSets } from './setup/sets';
import { anonymousBrowser, Browser, givenUser, signIn, signInAs, startTestApp, TestApp } from './setup/test-app';

/*
 * The fixture, by hand (RB-40 rev B: band 38.08984–38.1 mm, set of 4, matching band 0.00508 mm;
 * heights = 38.10008 mm + 25.4 × reading at 20 °C, brief "Height by comparison", NIST SP 811 App. B):
 * - L-WAIT: 3 parts, one inspected at +0.001 in (38.12548 mm, above the band) → 2 not inspected,
 *   1 does not conform.
 * - L-OTHER: 1 part, not inspected, in a run another inspector started.
 * - L-HELD: 2 parts inspected, the run's end check drifted 0.00015 in (> 0.0001 in) → 2 held.
 * - L-STOCK: B-1..B-4 sold as one set (38.09246, 38.092206, 38.091952, 38.09246 mm), so the window
 *   is [38.091952 − 0.00508, 38.09246 + 0.00508] ∩ band = [38.08984, 38.097032]; F-1..F-5 at
 *   −0.0002 in (38.09500 mm) inside it; G-1, G-2 (38.09754, 38.097794 mm) above it.
 *   F-1 goes out as a replacement; G-1 and G-2 get grind requests, G-2 is marked ground.
 *   Free stock inside the window: F-2..F-5 = 4 parts → 1 set of 4.
 */
describe('Home page per role', () => {
  let t: TestApp;
  let bench: Bench;
  let sales: Browser;
  let service: Browser;
  let admin: Browser;
  let otherInspector: Browser;
  let setNumber: string;
  let certificateNumber: string;
  let replacementNumber: string;
  const lots: Record<string, string> = {};
  const runs: string[] = [];
  const grindNumbers: string[] = [];
  const keys = generateKeyPairSync('ed25519');

  const home = async (who: Browser) => (await who.agent.get('/api/home').expect(200)).body as Home;

  beforeAll(async () => {
    t = await startTestApp({
      CERTIFICATE_SIGNING_KEY: keys.privateKey.export({ format: 'pem', type: 'pkcs8' }).toString(),
      SMTP_URL: '',
    });
    bench = await givenBench(t);
    sales = await signInAs(t.app, ['sales']);
    service = await signInAs(t.app, ['service']);
    admin = await signInAs(t.app, ['admin']);
    otherInspector = await signInAs(t.app, ['inspector']);

    const wait = await givenLot(bench, 'L-WAIT', ['W-1', 'W-2', 'W-3']);
    lots['L-WAIT'] = wait.id;
    const waitRun = await startRun(bench, wait.id);
    runs.push(waitRun.id);
    const w1 = (await partRows(bench, wait.id, { q: 'W-1' })).items[0]!;
    const verdict = await post(bench.inspector, `/api/runs/${waitRun.id}/inspections`, {
      partId: w1.id,
      unit: 'in',
      readings: topReadings([0.001]),
    }).expect(201);
    expect(verdict.body.result.verdict).toBe('does-not-conform');

    const held = await givenLot(bench, 'L-HELD', ['H-1', 'H-2']);
    lots['L-HELD'] = held.id;
    const heldRun = await startRun(bench, held.id);
    runs.push(heldRun.id);
    for (const part of (await partRows(bench, held.id)).items)
      await post(bench.inspector, `/api/runs/${heldRun.id}/inspections`, {
        partId: part.id,
        unit: 'in',
        readings: topReadings([-0.0001]),
      }).expect(201);
    await post(bench.inspector, `/api/runs/${heldRun.id}/end`, { unit: 'in', masterEndReading: 0.00015 }).expect(200);

    // Another inspector's run: not on the first inspector's home page.
    const other = await givenLot(bench, 'L-OTHER', ['O-1']);
    await post(otherInspector, '/api/runs', {
      lotId: other.id,
      masterId: bench.master.id,
      instrumentId: bench.indicator.id,
      unit: 'in',
      masterTemperature: 20,
      partTemperature: 20,
      masterStartReading: 0,
    }).expect(201);

    const { ids } = await releasedAt20C(bench, 'L-STOCK', {
      'B-1': -0.0003,
      'B-2': -0.00031,
      'B-3': -0.00032,
      'B-4': -0.0003,
      'F-1': -0.0002,
      'F-2': -0.0002,
      'F-3': -0.0002,
      'F-4': -0.0002,
      'F-5': -0.0002,
      'G-1': -0.0001,
      'G-2': -0.00009,
    });
    const customer = await givenCustomer(sales, 'Bolster Works');
    const [set] = await givenSoldSets(sales, { customerId: customer.id, orderReference: 'PO-1' }, [
      ['B-1', 'B-2', 'B-3', 'B-4'].map((s) => ids[s]!),
    ]);
    setNumber = set!.setNumber;
    certificateNumber = (await post(sales, `/api/sets/${set!.id}/certificates`).expect(201)).body.certificateNumber;
    replacementNumber = (
      await post(service, '/api/replacements', {
        originalSetId: set!.id,
        partId: ids['F-1'],
        orderReference: 'RMA-1',
      }).expect(201)
    ).body.setNumber;
    for (const serial of ['G-1', 'G-2']) {
      const res = await post(service, '/api/grind-requests', { originalSetId: set!.id, partId: ids[serial] });
      expect(res.status).toBe(201);
      grindNumbers.push(res.body.requestNumber);
      if (serial === 'G-2')
        await post(bench.inspector, `/api/grind-requests/${res.body.id}/steps`, { status: 'ground' }).expect(201);
    }

    // Two messages: the newest attempt of one failed, of the other went through.
    const em = t.app.get(EntityManager).fork();
    for (const outcome of ['failed', 'sent'] as const) {
      const message = em.create(MailMessage, {
        kind: 'digest',
        recipient: `${outcome}@test.example`,
        subject: `A ${outcome} message`,
        body: 'Hello.',
        createdAt: new Date(),
      });
      em.create(MailAttempt, {
        message,
        outcome,
        error: outcome === 'failed' ? 'Connection refused.' : null,
        createdAt: new Date(),
      });
    }
    await em.flush();

    // One person deactivated by the admin: the last change made.
    const leaver = await givenUser(t.app, ['sales'], 'leaver@test.example');
    await post(admin, `/api/users/${leaver.id}/deactivate`).expect(200);
  }, 180_000);
  afterAll(() => t.close());

  it('answers only the sections of the roles the person holds', async () => {
    expect(Object.keys(await home(bench.inspector)).sort()).toEqual(['inspector']);
    expect(Object.keys(await home(sales)).sort()).toEqual(['sales']);
    expect(Object.keys(await home(admin)).sort()).toEqual(['admin']);
    const both = await givenUser(t.app, ['engineer', 'service'], 'both@test.example');
    const answer = await home(await signIn(t.app, both.email));
    expect(Object.keys(answer).sort()).toEqual(['engineer', 'service']);
  });

  it('shows the inspector the lots with parts not inspected yet and only their own runs', async () => {
    const { inspector } = await home(bench.inspector);
    expect(inspector!.lotsWaiting).toEqual([
      { lotId: expect.any(String), lotNumber: 'L-OTHER', partNumber: 'RB-40', notInspected: 1, parts: 1 },
      { lotId: lots['L-WAIT'], lotNumber: 'L-WAIT', partNumber: 'RB-40', notInspected: 2, parts: 3 },
    ]);
    // Newest first: L-STOCK's run (11 parts), L-HELD's (2), L-WAIT's (1); L-OTHER's is not theirs.
    expect(inspector!.recentRuns.map((r) => [r.lotNumber, r.inspections, r.endedAt === null])).toEqual([
      ['L-STOCK', 11, true],
      ['L-HELD', 2, false],
      ['L-WAIT', 1, true],
    ]);
    const other = await home(otherInspector);
    expect(other.inspector!.recentRuns.map((r) => [r.lotNumber, r.inspections])).toEqual([['L-OTHER', 0]]);
  });

  it('shows the engineer parts to decide, masters due or overdue and open grind requests', async () => {
    const { engineer } = await home(bench.engineer);
    expect(engineer!.awaitingDisposition).toEqual([
      { lotId: lots['L-HELD'], lotNumber: 'L-HELD', partNumber: 'RB-40', doesNotConform: 0, guardBand: 0, held: 2 },
      { lotId: lots['L-WAIT'], lotNumber: 'L-WAIT', partNumber: 'RB-40', doesNotConform: 1, guardBand: 0, held: 0 },
    ]);
    // The demo masters are dated from today: MG-12-A 5 days overdue, MG-1.000-A due in 12 days
    // (inside the 30 days, common practice), MG-1.500-A due in 165 days.
    const today = todayIso();
    expect(engineer!.mastersDue.map((m) => [m.code, m.dueOn, m.overdue])).toEqual([
      ['MG-12-A', addDays(today, -5), true],
      ['MG-1.000-A', addDays(today, 12), false],
    ]);
    expect(engineer!.grindRequests).toEqual({ open: 1, ground: 1 });
    // Signals are those the Trends page lists for the part number's default view (lots as subgroups).
    const trend = (await bench.engineer.agent.get('/api/trends/RB-40').expect(200)).body as { signals: unknown[] };
    expect(engineer!.runRuleSignals).toEqual([{ partNumber: 'RB-40', signals: trend.signals.length }]);
    expect(trend.signals.length).toBeGreaterThan(0);
  });

  it('shows sales the sets free stock makes and the recent certificates', async () => {
    const { sales: section } = await home(sales);
    expect(section!.stock).toEqual([
      { partNumber: 'RB-40', title: expect.any(String), setSize: 4, displayUnit: 'in', available: 4, sets: 1 },
    ]);
    expect(section!.recentCertificates.map((c) => [c.certificateNumber, c.setNumber, c.partNumber])).toEqual([
      [certificateNumber, setNumber, 'RB-40'],
    ]);
  });

  it('shows service the open replacement cases and the recent replacements', async () => {
    const { service: section } = await home(service);
    expect(section!.openCases.map((c) => [c.requestNumber, c.serial, c.status])).toEqual([
      [grindNumbers[0], 'G-1', 'open'],
      [grindNumbers[1], 'G-2', 'ground'],
    ]);
    expect(section!.recentReplacements.map((r) => [r.setNumber, r.replacesSetNumber])).toEqual([
      [replacementNumber, setNumber],
    ]);
  });

  it('shows the admin people, outbox failures and the latest audit entries', async () => {
    const { admin: section } = await home(admin);
    // engineer, inspector (givenBench), sales, service, admin, second inspector, engineer+service:
    // 7 active; the leaver inactive.
    expect(section!.people).toEqual({ active: 7, inactive: 1 });
    expect(section!.outboxFailures).toBe(1);
    expect(section!.recentAudit).toHaveLength(5);
    expect(section!.recentAudit[0]).toMatchObject({ action: 'user.deactivate', subjectType: 'user' });
    const times = section!.recentAudit.map((a) => a.createdAt);
    expect([...times].sort().reverse()).toEqual(times);
  });

  it('is refused to anyone not signed in', async () => {
    await (await anonymousBrowser(t.app)).agent.get('/api/home').expect(401);
  });
});
