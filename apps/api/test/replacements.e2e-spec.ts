import type { AllocatedReplacement, ReplacementCheck, ReplacementLookup } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { AuditEntry } from '../src/audit/audit-entry.entity';
import { MatchedSet } from '../src/sets/matched-set.entity';
import { ensureSpec } from '../src/database/factories/spec.factory';
import { RB40_REV_B } from '../src/database/seeders/demo-specs';
import { SetMember } from '../src/sets/set-member.entity';
import type { Spec } from '../src/specs/spec.entity';
import { Bench, givenBench, post } from './setup/bench';
import { releasedAt20C } from './setup/replacement-parts';
import { givenCustomer, givenSoldSets } from './setup/sets';
import { Browser, signInAs, startTestApp, TestApp } from './setup/test-app';

describe('Replacement checks', () => {
  let t: TestApp;
  let bench: Bench;
  let sales: Browser;
  let service: Browser;
  let ids: Record<string, string>;
  let setId: string;
  let setNumber: string;
  let customerName: string;

  const lookup = async (q: string) =>
    (await service.agent.get('/api/replacements/lookup').query({ q }).expect(200)).body as ReplacementLookup;
  const check = async (q: string) => {
    const found = await lookup(q);
    if (found.match !== 'set') throw new Error(`expected one set for ${q}`);
    return found as ReplacementCheck;
  };
  const em = () => t.app.get(EntityManager).fork();

  beforeAll(async () => {
    t = await startTestApp();
    bench = await givenBench(t);
    sales = await signInAs(t.app, ['sales']);
    service = await signInAs(t.app, ['service']);
    ({ ids } = await releasedAt20C(bench, 'L-REPL', {
      // The sold set: 38.09754, 38.097286, 38.097032, 38.09754 mm.
      'A-1': -0.0001,
      'A-2': -0.00011,
      'A-3': -0.00012,
      'A-4': -0.0001,
      // Free stock: 38.096016, 38.096524, 38.095508, 38.096778 and 38.091952 mm.
      'F-1': -0.00016,
      'F-2': -0.00014,
      'F-3': -0.00018,
      'F-4': -0.00013,
      'F-5': -0.00032,
    }));
    const customer = await givenCustomer(sales, 'Arbor Tooling');
    customerName = customer.name;
    const [set] = await givenSoldSets(sales, { customerId: customer.id, orderReference: 'PO-100' }, [
      ['A-1', 'A-2', 'A-3', 'A-4'].map((s) => ids[s]!),
    ]);
    setId = set!.id;
    setNumber = set!.setNumber;
  }, 120_000);
  afterAll(() => t.close());

  it('finds the original set by serial and by certificate number, with its window cut to the spec band', async () => {
    const bySerial = await check('a-3');
    expect(bySerial.set).toMatchObject({
      id: setId,
      setNumber,
      kind: 'set',
      customerName,
      orderReference: 'PO-100',
      partNumber: 'RB-40',
      revision: 'B',
      displayUnit: 'in',
    });
    expect(bySerial.foundBy).toBe(`Serial A-3 (RB-40) is in set ${setNumber}.`);
    expect(bySerial.set.members.map((m) => m.serial).sort()).toEqual(['A-1', 'A-2', 'A-3', 'A-4']);
    const heights = Object.fromEntries(bySerial.set.members.map((m) => [m.serial, m.height]));
    expect(heights['A-2']).toBeCloseTo(38.097286, 7);
    expect(heights['A-3']).toBeCloseTo(38.097032, 7);

    // Brief, "Matching": a new part matches the set when highest − band ≤ h ≤ lowest + band.
    // Band 0.0002 in = 0.00508 mm: [38.09754 − 0.00508, 38.097032 + 0.00508] = [38.09246, 38.102112].
    // Cut to RB-40 rev B's tolerance band 1.5000 in +0/−0.0004 in = [38.08984, 38.1]: [38.09246, 38.1].
    expect(bySerial.set.matchingBand).toBeCloseTo(0.00508, 9);
    expect(bySerial.tolerance).toEqual({ nominal: 38.1, low: 38.08984, high: 38.1 });
    expect(bySerial.setWindow!.low).toBeCloseTo(38.09246, 7);
    expect(bySerial.setWindow!.high).toBeCloseTo(38.102112, 7);
    expect(bySerial.window!.low).toBeCloseTo(38.09246, 7);
    expect(bySerial.window!.high).toBeCloseTo(38.1, 7);
    expect(bySerial.centre).toBeCloseTo(38.09623, 7);
    expect(bySerial.explanation).toMatch(/cut to the spec’s tolerance band/);

    const certificate = await post(sales, `/api/sets/${setId}/certificates`).expect(201);
    const number = (certificate.body as { certificateNumber: string }).certificateNumber;
    const byCertificate = await check(number);
    expect(byCertificate.set.id).toBe(setId);
    expect(byCertificate.foundBy).toBe(`Certificate ${number} is for set ${setNumber}.`);
    expect(byCertificate.window).toEqual(bySerial.window);
  });

  it('lists fitting parts closest to the window centre first and never offers a part outside the window', async () => {
    const found = await check(setNumber);
    // Centre 38.09623 mm (above). Distances by hand: F-1 |38.096016 − 38.09623| = 0.000214,
    // F-2 0.000294, F-4 0.000548, F-3 0.000722 mm. (The uncut window's centre, 38.097286, would
    // give F-4, F-2, F-1, F-3 instead.) F-5 at 38.091952 lies below the window's 38.09246.
    expect(found.fits.map((p) => p.serial)).toEqual(['F-1', 'F-2', 'F-4', 'F-3']);
    expect(found.fits.map((p) => p.distance)).toEqual([0.000214, 0.000294, 0.000548, 0.000722]);
    expect(found.fits[0]).toMatchObject({ lotNumber: 'L-REPL', revision: 'B', stockToCentre: null });
    // Grinding only removes stock: nothing released lies above the window, and F-5 is below it.
    expect(found.grindable).toEqual([]);
    expect(JSON.stringify(found)).not.toContain('F-5');
  });

  it('lists the choices when a serial was sold under several part numbers', async () => {
    // RB-41: another part number with RB-40 rev B's definition, its parts serialled like set A's.
    const spec = await ensureSpec(bench.em, {
      partNumber: 'RB-41',
      revision: 'A',
      status: 'released',
      material: bench.steel,
      definition: RB40_REV_B,
    });
    await bench.em.flush();
    const rb41 = await releasedAt20C(
      bench,
      'L-RB41',
      { 'A-1': -0.0002, 'A-2': -0.0002, 'A-3': -0.0002, 'A-4': -0.0002 },
      spec as Spec,
    );
    const customer = await givenCustomer(sales, 'Collet House');
    const sold = await post(sales, '/api/sets', {
      partNumber: 'RB-41',
      customerId: customer.id,
      orderReference: 'PO-41',
      sets: [{ partIds: Object.values(rb41.ids) }],
    }).expect(201);
    const rb41Set = (sold.body as { items: { setNumber: string }[] }).items[0]!.setNumber;

    const found = await lookup('A-2');
    if (found.match !== 'choices') throw new Error('expected choices');
    expect(found.message).toBe('Serial A-2 was sold under 2 part numbers. Choose the set the customer holds.');
    expect(found.choices.map((c) => [c.partNumber, c.setNumber, c.customerName])).toEqual([
      ['RB-40', setNumber, customerName],
      ['RB-41', rb41Set, 'Collet House'],
    ]);
    expect((await check(rb41Set)).set.partNumber).toBe('RB-41');
  });

  it('says plainly when nothing was found or the serial is still in stock', async () => {
    const none = await service.agent.get('/api/replacements/lookup').query({ q: 'EC-1999-0001' }).expect(404);
    expect(none.body).toMatchObject({ code: 'NOTHING_FOUND' });
    expect(none.body.message).toMatch(/No certificate, set or sold serial "EC-1999-0001" was found/);
    const stock = await service.agent.get('/api/replacements/lookup').query({ q: 'F-5' }).expect(404);
    expect(stock.body.message).toBe(
      "Serial F-5 (RB-40) is in stock, not in a sold set. Search by the certificate number or a serial of the customer's set.",
    );
    const empty = await service.agent.get('/api/replacements/lookup').query({ q: '  ' }).expect(400);
    expect(empty.body.details).toEqual([{ path: 'q', message: 'Enter a certificate number or a serial.' }]);
    await bench.inspector.agent.get('/api/replacements/lookup').query({ q: 'A-1' }).expect(403);
  });

  it('refuses a part outside the window and bad input, saving nothing', async () => {
    const before = await em().count(MatchedSet, {});
    const outside = await post(service, '/api/replacements', {
      originalSetId: setId,
      partId: ids['F-5'],
      orderReference: 'RMA-7',
    }).expect(409);
    expect(outside.body.code).toBe('REPLACEMENT_REFUSED');
    expect(outside.body.message).toBe(
      'Part F-5 measures 1.49968 in, outside the window 1.49970 in to 1.50000 in. Choose a part from the list of fitting parts.',
    );
    const missing = await post(service, '/api/replacements', { originalSetId: setId, partId: ids['F-1'] }).expect(400);
    expect(missing.body.details).toEqual([{ path: 'orderReference', message: 'Enter the order reference.' }]);
    const ofASet = await post(service, '/api/replacements', {
      originalSetId: setId,
      partId: ids['A-1'],
      orderReference: 'RMA-7',
    }).expect(409);
    expect(ofASet.body.code).toBe('PART_TAKEN');
    expect(await em().count(MatchedSet, {})).toBe(before);
  });

  it('allocates a fitting part as a replacement for the same customer; a part taken meanwhile gets 409', async () => {
    const res = await post(service, '/api/replacements', {
      originalSetId: setId,
      partId: ids['F-1'],
      orderReference: 'RMA-1',
    }).expect(201);
    const made = res.body as AllocatedReplacement;
    expect(made).toMatchObject({ originalSetId: setId, customerName, orderReference: 'RMA-1', serial: 'F-1' });
    expect(made.setNumber).toMatch(/^S-\d{4}-\d{4}$/);
    expect(made.height).toBeCloseTo(38.096016, 7);

    const stored = await em().findOneOrFail(MatchedSet, { id: made.id }, { populate: ['replacesSet'] });
    expect(stored).toMatchObject({ kind: 'replacement', partNumber: 'RB-40' });
    expect(stored.replacesSet!.id).toBe(setId);
    expect(stored.matchingBandMm).toBeCloseTo(0.00508, 9);
    expect(stored.order.reference).toBe('RMA-1');
    expect(stored.order.customer.name).toBe(customerName);
    const members = await em().find(SetMember, { set: made.id });
    expect(members.map((m) => [m.part.serial, m.position, m.heightMm])).toEqual([['F-1', 1, 38.096016]]);
    expect(await em().count(AuditEntry, { action: 'set.replacement', subjectId: made.id })).toBe(1);

    const again = await post(service, '/api/replacements', {
      originalSetId: setId,
      partId: ids['F-1'],
      orderReference: 'RMA-2',
    }).expect(409);
    expect(again.body).toMatchObject({
      code: 'PART_TAKEN',
      message: 'Part F-1 was allocated to another set a moment ago. Search again and choose another part.',
    });

    // Two people send F-2 at the same moment: exactly one succeeds.
    const both = await Promise.all([
      post(service, '/api/replacements', { originalSetId: setId, partId: ids['F-2'], orderReference: 'RMA-3' }),
      post(sales, '/api/replacements', { originalSetId: setId, partId: ids['F-2'], orderReference: 'RMA-4' }),
    ]);
    expect(both.map((r) => r.status).sort()).toEqual([201, 409]);
    expect(both.find((r) => r.status === 409)!.body.code).toBe('PART_TAKEN');
    expect(await em().count(SetMember, { part: ids['F-2'] })).toBe(1);

    // The replacement's serial leads back to the set it replaced, which now lists it.
    const viaReplacement = await check('F-1');
    expect(viaReplacement.set.id).toBe(setId);
    expect(viaReplacement.foundBy).toBe(
      `Serial F-1 (RB-40) is in replacement ${made.setNumber}, a replacement for set ${setNumber}.`,
    );
    expect(viaReplacement.fits.map((p) => p.serial)).toEqual(['F-4', 'F-3']);
    expect(viaReplacement.replacements.map((r) => r.serial).sort()).toEqual(['F-1', 'F-2']);

    // The replacement's own certificate is issued through the certificates route.
    await post(sales, `/api/sets/${made.id}/certificates`).expect(201);
  });
});
