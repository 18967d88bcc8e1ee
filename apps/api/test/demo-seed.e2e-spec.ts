import { generateKeyPairSync } from 'node:crypto';
import { grindPlan } from '@evenset/metrology';
import {
  GRINDING_CAUTION_ITEMS,
  specDefinitionSchema,
  type GrindRequestDetail,
  type Interchange,
  type ReplacementCheck,
  type SetRow,
} from '@evenset/contracts';
import { MikroORM } from '@mikro-orm/postgresql';
import { DemoSeeder } from '../src/database/seeders/demo.seeder';
import { LR90_REV_A, PP6_REV_A, RB40_REV_A, RB40_REV_B } from '../src/database/seeders/demo-specs';
import { signInAs, startTestApp, TestApp } from './setup/test-app';
import { CSRF_HEADER } from '@evenset/contracts';

describe('demo data', () => {
  let t: TestApp;
  beforeAll(async () => {
    // The seed signs its certificates; the app must verify them with the same key, as `npm start` arranges.
    const { privateKey } = generateKeyPairSync('ed25519');
    t = await startTestApp({
      CERTIFICATE_SIGNING_KEY: privateKey.export({ format: 'pem', type: 'pkcs8' }).toString(),
    });
  });
  afterAll(() => t.close());

  it('passes the same validation as an engineer’s input', () => {
    for (const definition of [RB40_REV_A, RB40_REV_B, PP6_REV_A, LR90_REV_A]) {
      const parsed = specDefinitionSchema.safeParse({
        ...definition,
        materialId: '00000000-0000-4000-8000-000000000000',
      });
      expect(parsed.error?.issues ?? []).toEqual([]);
    }
  });

  it('seeds once, however often it runs, with a master in each calibration state', async () => {
    const orm = t.app.get(MikroORM);
    await orm.getSeeder().seed(DemoSeeder);
    await orm.getSeeder().seed(DemoSeeder);
    const engineer = await signInAs(t.app, ['engineer']);
    const specs = await engineer.agent.get('/api/specs').query({ sort: 'partNumber:asc' }).expect(200);
    expect(
      specs.body.items.map(
        (s: { partNumber: string; revision: string; status: string }) => `${s.partNumber} ${s.revision} ${s.status}`,
      ),
    ).toEqual(['LR-90 A released', 'PP-6 A released', 'RB-40 A superseded', 'RB-40 B released']);
    const masters = await engineer.agent.get('/api/masters').query({ sort: 'code:asc' }).expect(200);
    expect(masters.body.items.map((m: { code: string; status: string }) => `${m.code} ${m.status}`)).toEqual([
      'MG-1.000-A due-soon',
      'MG-1.500-A in-service',
      'MG-12-A overdue',
    ]);
    const materials = await engineer.agent.get('/api/materials').expect(200);
    expect(materials.body.total).toBe(7);
    const instruments = await engineer.agent.get('/api/instruments').query({ usable: 'true' }).expect(200);
    expect(instruments.body.total).toBe(3);

    // The lots tell the story through the server's own results (brief, demo scenario).
    const lots = await engineer.agent.get('/api/lots').query({ sort: 'lotNumber:asc' }).expect(200);
    expect(
      lots.body.items.map((l: { lotNumber: string; partCount: number }) => `${l.lotNumber} ${l.partCount}`),
    ).toEqual([
      'L-2025-118 4',
      'L-2025-131 2',
      'L-2026-041 6',
      'L-2026-044 4',
      'L-2026-047 4',
      'L-2026-052 8',
      'L-2026-GS1 10',
    ]);
    const lotId = (lotNumber: string) =>
      (lots.body.items as { id: string; lotNumber: string }[]).find((l) => l.lotNumber === lotNumber)!.id;
    const lot041 = lotId('L-2026-041');
    const rows = await engineer.agent.get(`/api/lots/${lot041}/parts`).expect(200);
    expect(
      Object.fromEntries(
        rows.body.items.map((r: { serial: string; status: string; verdict: string }) => [
          r.serial,
          `${r.status} ${r.verdict}`,
        ]),
      ),
    ).toEqual({
      'RB40-0401': 'released conforms',
      'RB40-0402': 'released conforms',
      'RB40-0403': 'released guard-band',
      'RB40-0404': 'rework does-not-conform',
      'RB40-0405': 'scrap does-not-conform',
      'RB40-0406': 'released conforms',
    });

    // Sold sets with genuine certificates; this year's PP-6 lot no longer matches last year's pair.
    const sales = await signInAs(t.app, ['sales']);
    const sets = await sales.agent.get('/api/sets').query({ sort: 'setNumber:asc' }).expect(200);
    expect(
      (sets.body.items as SetRow[]).map(
        (s) => `${s.partNumber} ${s.customerName} ${s.orderReference} ${s.serials.join(' ')}`,
      ),
    ).toEqual([
      'RB-40 Marrow Creek Tooling MC-4471 RB40-1183 RB40-1182 RB40-1184 RB40-1181',
      'PP-6 Fenbridge Fixture Works FB-2025-118 PP6-1312 PP6-1311',
    ]);
    const certificates = await sales.agent.get('/api/certificates').expect(200);
    expect(certificates.body.total).toBe(2);
    for (const certificate of certificates.body.items as { verificationCode: string }[]) {
      const verified = await sales.agent.get(`/api/verify/${certificate.verificationCode}`).expect(200);
      expect(verified.body.status).toBe('genuine');
    }
    const pp6 = (await sales.agent.get('/api/interchange/PP-6').expect(200)).body as Interchange;
    expect(pp6.window).not.toBeNull();
    const pp6Rows = await engineer.agent.get(`/api/lots/${lotId('L-2026-044')}/parts`).expect(200);
    expect(
      (pp6Rows.body.items as { serial: string; outsideWindow: boolean | null }[])
        .filter((r) => r.outsideWindow)
        .map((r) => r.serial),
    ).toEqual(expect.arrayContaining(['PP6-0441', 'PP6-0442']));
    // Seeding hashes the demo people's passwords (scrypt): slow on a busy machine.
  }, 90_000);

  it('answers the replacement checks of the demo: RB-40 spares that fit, a PP-6 pair that needs grinding', async () => {
    const service = await signInAs(t.app, ['service']);
    const marrow = await service.agent.get('/api/certificates').query({ q: 'Marrow Creek' }).expect(200);
    const lookup = async (q: string) =>
      (await service.agent.get('/api/replacements/lookup').query({ q }).expect(200)).body as ReplacementCheck;

    // By the certificate number: the window worked by hand from the brief's definition,
    // [highest − band, lowest + band] of the set, cut to the tolerance band.
    const rb40 = await lookup(marrow.body.items[0].certificateNumber as string);
    const heights = rb40.set.members.map((m) => m.height);
    const low = Math.max(Math.max(...heights) - rb40.set.matchingBand, rb40.tolerance.low);
    const high = Math.min(Math.min(...heights) + rb40.set.matchingBand, rb40.tolerance.high);
    expect(rb40.window!.low).toBeCloseTo(low, 9);
    expect(rb40.window!.high).toBeCloseTo(high, 9);
    const centre = (low + high) / 2;
    expect(rb40.fits.length).toBeGreaterThanOrEqual(12);
    for (const fit of rb40.fits) expect(fit.height >= low - 1e-9 && fit.height <= high + 1e-9).toBe(true);
    const distances = rb40.fits.map((fit) => Math.abs(fit.height - centre));
    // Closest first; heights symmetric about the centre tie (to float noise) and go by serial.
    distances.slice(1).forEach((d, i) => expect(d).toBeGreaterThanOrEqual(distances[i]! - 1e-9));

    // By a serial of the Fenbridge pair: this year's parallels are all above its window.
    const pp6 = await lookup('PP6-1311');
    expect(pp6.set.customerName).toBe('Fenbridge Fixture Works');
    expect(pp6.fits).toEqual([]);
    expect(pp6.grindable.map((p) => p.serial)).toEqual(expect.arrayContaining(['PP6-0441', 'PP6-0442']));
    for (const part of pp6.grindable) expect(part.height).toBeGreaterThan(pp6.window!.high);

    const part = pp6.grindable[0]!;
    const res = await service.agent
      .post('/api/grind-requests')
      .set(CSRF_HEADER, service.csrf)
      .send({ originalSetId: pp6.set.id, partId: part.id })
      .expect(201);
    const request = res.body as GrindRequestDetail;
    expect(request.targetHeight).toBeCloseTo(pp6.centre!, 6);
    expect(request.stock).toBeCloseTo(part.height - pp6.centre!, 6);
    // The plan is @evenset/metrology's grindPlan with PP-6's grinding figures (checked against a hand count there).
    const plan = grindPlan({ stock: request.stock, ...request.grinding! });
    expect(request.passes.map((p) => p.kind)).toEqual(plan.passes.map((p) => p.kind));
    expect(request.cautions).toEqual([...GRINDING_CAUTION_ITEMS]);
  }, 60_000);

  it('lists every demo part in its lot exactly as its own page shows it (status, height, result)', async () => {
    // The lot list reads the records in one SQL pass (lot-part-facts.ts); the part page reads them
    // as entities through PartStatusService. Every demo part must come out the same both ways.
    const engineer = await signInAs(t.app, ['engineer']);
    const lots = await engineer.agent.get('/api/lots').query({ pageSize: '100' }).expect(200);
    const seen = new Set<string>();
    for (const lot of lots.body.items as { id: string }[]) {
      const rows = await engineer.agent.get(`/api/lots/${lot.id}/parts`).query({ pageSize: '500' }).expect(200);
      for (const row of rows.body.items as { id: string; status: string; height: number | null; verdict: string }[]) {
        const part = await engineer.agent.get(`/api/parts/${row.id}`).expect(200);
        const current = (
          part.body.inspections as { supersededById: string | null; result: { height: number; verdict: string } }[]
        ).find((i) => i.supersededById === null);
        expect([row.status, row.height, row.verdict]).toEqual([
          part.body.status,
          current?.result.height ?? null,
          current?.result.verdict ?? null,
        ]);
        seen.add(row.status);
      }
    }
    // Held, guard-band and use-as-is rows are compared the same way in lots and inspections tests.
    expect([...seen].sort()).toEqual(['conforms', 'not-inspected', 'released', 'rework', 'scrap']);
  }, 120_000);
});
