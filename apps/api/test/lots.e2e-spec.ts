import type { Disposition, LotDetail, PartDetail, Spec } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { AuditEntry } from '../src/audit/audit-entry.entity';
import { Bench, givenBench, givenLot, partRows, post, startRun, topReadings } from './setup/bench';
import { startTestApp, TestApp } from './setup/test-app';

const IN = 25.4; // mm per inch, exactly (NIST SP 811, App. B)

describe('lots, parts, review and dispositions', () => {
  let t: TestApp;
  let bench: Bench;

  beforeAll(async () => {
    t = await startTestApp();
    bench = await givenBench(t);
  }, 60_000);
  afterAll(() => t.close());

  const newLot = (lotNumber: string, specId = bench.spec.id, quantity = 8) =>
    post(bench.engineer, '/api/lots', { lotNumber, specId, quantity, grindDate: '2026-11-25', notes: 'Second shift' });

  it('creates a lot on a released revision only, with a unique lot number', async () => {
    const res = await newLot('l-2026-100').expect(201);
    expect(res.body).toMatchObject({
      lotNumber: 'L-2026-100',
      quantity: 8,
      partCount: 0,
      spec: { partNumber: 'RB-40', revision: 'B' },
    });
    expect((await newLot('L-2026-100').expect(409)).body.code).toBe('LOT_NUMBER_TAKEN');
    const draft = await post(bench.engineer, `/api/specs/${bench.spec.id}/revisions`).expect(201);
    const refused = await newLot('L-2026-101', (draft.body as Spec).id).expect(400);
    expect(refused.body.details[0].path).toBe('specId');
    const list = await bench.inspector.agent.get('/api/lots').query({ q: '2026-100' }).expect(200);
    expect(list.body.total).toBe(1);
    await post(bench.inspector, '/api/lots', {}).expect(403);
  });

  it('makes serials from a pattern (previewed first) or one by one, unique per part number', async () => {
    const lot = (await newLot('L-SER', bench.spec.id, 6).expect(201)).body as { id: string };
    const pattern = { prefix: 'rb40-', start: 98, count: 3, digits: 4 };
    const preview = await post(bench.engineer, `/api/lots/${lot.id}/parts/preview`, pattern).expect(200);
    expect(preview.body).toEqual({ serials: ['RB40-0098', 'RB40-0099', 'RB40-0100'], taken: [] });
    await post(bench.engineer, `/api/lots/${lot.id}/parts`, { pattern }).expect(201);
    const again = await post(bench.engineer, `/api/lots/${lot.id}/parts/preview`, { ...pattern, start: 100 }).expect(
      200,
    );
    expect(again.body.taken).toEqual(['RB40-0100']);
    const dup = await post(bench.engineer, `/api/lots/${lot.id}/parts`, { serials: ['RB40-0101', 'RB40-0100'] }).expect(
      409,
    );
    expect(dup.body.message).toContain('RB40-0100');
    await post(bench.engineer, `/api/lots/${lot.id}/parts`, { serials: ['RB40-0200', 'RB40-0200'] }).expect(400);
    const tooMany = await post(bench.engineer, `/api/lots/${lot.id}/parts`, {
      serials: ['A1', 'A2', 'A3', 'A4'],
    }).expect(409);
    expect(tooMany.body.code).toBe('LOT_FULL');
    const one = await post(bench.engineer, `/api/lots/${lot.id}/parts`, { serials: ['rb40-0500'] }).expect(201);
    expect(one.body.items).toMatchObject([{ serial: 'RB40-0500', status: 'not-inspected' }]);
    const badDigits = await post(bench.engineer, `/api/lots/${lot.id}/parts/preview`, {
      ...pattern,
      start: 9999,
    }).expect(400);
    expect(badDigits.body.details[0].message).toBe('The last number (10001) needs more than 4 digits.');
  });

  describe('review and disposition of a measured lot', () => {
    let lotId: string;
    let ids: Record<string, string>;

    beforeAll(async () => {
      const lot = await givenLot(bench, 'L-REVIEW', ['S-1', 'S-2', 'S-3', 'S-4', 'S-5', 'S-6']);
      lotId = lot.id;
      const rows = (await partRows(bench, lotId)).items;
      ids = Object.fromEntries(rows.map((r) => [r.serial, r.id]));
      // At 20 °C, height = 38.10008 mm (MG-1.500-A) + mean reading; band 38.08984…38.1 mm, guarded.
      const run = await startRun(bench, lotId, { partTemperature: 20, masterTemperature: 20 });
      const readings: Record<string, number[]> = {
        'S-1': [-0.0002], // mid-band: conforms
        'S-2': [-0.00005], // 0.0013 mm under the top limit, inside U: guard band
        'S-3': [0.0001], // above the band
        'S-4': [-0.0002, -0.0002, -0.0002, -0.0002, 0], // centre 0.0002 in high: flatness fails
        'S-5': [-0.00021], // conforms
      };
      for (const [serial, values] of Object.entries(readings))
        await post(bench.inspector, `/api/runs/${run.id}/inspections`, {
          partId: ids[serial],
          unit: 'in',
          readings: topReadings(values),
        }).expect(201);
    }, 30_000);

    it('lists every part with its results and verdicts, sorted on the server', async () => {
      const { items, total } = await partRows(bench, lotId, { sort: 'height:desc', pageSize: '4' });
      expect(total).toBe(6);
      expect(items.map((r) => [r.serial, r.status])).toEqual([
        ['S-3', 'does-not-conform'],
        ['S-2', 'guard-band'],
        ['S-4', 'does-not-conform'], // mean of its readings: −0.00016 in
        ['S-1', 'conforms'],
      ]);
      const all = (await partRows(bench, lotId)).items;
      const s4 = all.find((r) => r.serial === 'S-4')!;
      expect(s4.verdicts).toEqual({
        height: 'conforms',
        flatness: 'does-not-conform',
        parallelism: 'guard-band', // range 0.0002 in: on the limit, within U of it
        runout: null,
      });
      // Four corners level and the centre 0.0002 in high: the zone is 0.0002 in (to the tilt's cosine).
      expect(s4.flatness).toBeCloseTo(0.0002 * IN, 6);
      expect(all.find((r) => r.serial === 'S-6')).toMatchObject({ status: 'not-inspected', height: null });
      const failing = await partRows(bench, lotId, { status: 'does-not-conform' });
      expect(failing.items.map((r) => r.serial).sort()).toEqual(['S-3', 'S-4']);
    });

    it('gives the lot’s counts by status and its height spread', async () => {
      const lot = (await bench.inspector.agent.get(`/api/lots/${lotId}`).expect(200)).body as LotDetail;
      expect(lot.counts).toMatchObject({ conforms: 2, 'guard-band': 1, 'does-not-conform': 2, 'not-inspected': 1 });
      expect(lot.spec).toMatchObject({ nominal: 38.1, band: { lower: -0.01016, upper: 0 }, decisionRule: 'guarded' });
      const heights = (await partRows(bench, lotId)).items.flatMap((r) => (r.height === null ? [] : [r.height]));
      expect(lot.heightSpread).toMatchObject({ parts: 5, lowest: Math.min(...heights), highest: Math.max(...heights) });
      expect(lot.heightSpread!.spread).toBeCloseTo((0.0001 + 0.00021) * IN, 9);
    });

    it('plans a rework to mid-band with the spec’s passes and the grinding cautions', async () => {
      const res = await post(bench.engineer, `/api/parts/${ids['S-3']}/dispositions`, { kind: 'rework' }).expect(201);
      const rework = (res.body as Disposition).rework!;
      expect(rework.targetHeight).toBeCloseTo(38.1 - 0.00508, 9); // the middle of 38.08984…38.1
      expect(rework.stockToRemove).toBeCloseTo(38.10262 - 38.09492, 7);
      // 0.0077 mm under RB-40's 0.01016 mm finish allowance: finishing at 0.00254 mm, then 2 spark-outs.
      expect(rework.passes!.map((p) => p.kind)).toEqual([
        'finish',
        'finish',
        'finish',
        'finish',
        'spark-out',
        'spark-out',
      ]);
      expect(rework.cautions).toMatch(/ring-tested.*eye and face protection.*licensed practice/s);
      expect((await partRows(bench, lotId, { q: 'S-3' })).items[0]!.status).toBe('rework');
    });

    it('scraps or accepts for use as is only with a reason, and releases only what may go', async () => {
      await post(bench.engineer, `/api/parts/${ids['S-4']}/dispositions`, { kind: 'scrap' }).expect(400);
      await post(bench.engineer, `/api/parts/${ids['S-4']}/dispositions`, {
        kind: 'scrap',
        reason: 'Face dished; not worth regrinding.',
      }).expect(201);
      await post(bench.engineer, `/api/parts/${ids['S-2']}/dispositions`, {
        kind: 'use-as-is',
        reason: 'Customer accepts guard-band parts for spares.',
      }).expect(201);
      await post(bench.inspector, `/api/parts/${ids['S-2']}/release`, {}).expect(403);
      await post(bench.engineer, `/api/parts/${ids['S-2']}/release`, {}).expect(201);
      await post(bench.engineer, `/api/parts/${ids['S-1']}/release`, { note: 'Lot review 2026-11-26' }).expect(201);
      const refused = await post(bench.engineer, `/api/parts/${ids['S-4']}/release`, {}).expect(409);
      expect(refused.body.code).toBe('DISPOSITION_REFUSED');
      await post(bench.engineer, `/api/parts/${ids['S-5']}/dispositions`, {
        kind: 'scrap',
        reason: 'Not needed.',
      }).expect(409);

      const statuses = Object.fromEntries((await partRows(bench, lotId)).items.map((r) => [r.serial, r.status]));
      expect(statuses).toMatchObject({
        'S-1': 'released',
        'S-2': 'released',
        'S-3': 'rework',
        'S-4': 'scrap',
        'S-5': 'conforms',
      });
      const detail = (await bench.engineer.agent.get(`/api/parts/${ids['S-2']}`).expect(200)).body as PartDetail;
      expect(detail.dispositions.map((d) => d.kind)).toEqual(['release', 'use-as-is']);
      const em = t.app.get(EntityManager).fork();
      expect(
        await em.count(AuditEntry, { subjectId: ids['S-2'], action: { $in: ['part.use-as-is', 'part.release'] } }),
      ).toBe(2);
      const conn = em.getConnection();
      await expect(conn.execute(`update "part_disposition" set reason = 'x'`)).rejects.toThrow(/permanent/);
      await expect(conn.execute(`delete from "part_disposition"`)).rejects.toThrow(/permanent/);
    });
  });

  it('keeps a released revision’s expansion coefficient when the material is edited later', async () => {
    const spec = (await bench.engineer.agent.get(`/api/specs/${bench.spec.id}`).expect(200)).body as Spec;
    expect(spec.frozenExpansion).toEqual({
      expansionPerK: 11.5,
      source: 'ISO 3650:1998; JCGM 100:2008 (GUM) example H.1',
    });
    const material = spec.material;
    await bench.engineer.agent
      .put(`/api/materials/${material.id}`)
      .set('x-csrf-token', bench.engineer.csrf)
      .send({ name: material.name, expansionPerK: 12, source: 'Re-measured', confidence: 'firm' })
      .expect(200);
    const after = (await bench.engineer.agent.get(`/api/specs/${bench.spec.id}`).expect(200)).body as Spec;
    expect(after.frozenExpansion!.expansionPerK).toBe(11.5);
    const lot = await givenLot(bench, 'L-FROZEN', ['F-1']);
    const run = await startRun(bench, lot.id);
    const part = (await partRows(bench, lot.id)).items[0]!;
    const res = await post(bench.inspector, `/api/runs/${run.id}/inspections`, {
      partId: part.id,
      unit: 'in',
      readings: topReadings([-0.0002]),
    }).expect(201);
    expect(res.body).toMatchObject({ partExpansionPerK: 11.5, masterExpansionPerK: 12 });
  });
});
