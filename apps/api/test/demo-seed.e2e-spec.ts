import { specDefinitionSchema } from '@evenset/contracts';
import { MikroORM } from '@mikro-orm/postgresql';
import { DemoSeeder } from '../src/database/seeders/demo.seeder';
import { LR90_REV_A, PP6_REV_A, RB40_REV_A, RB40_REV_B } from '../src/database/seeders/demo-specs';
import { signInAs, startTestApp, TestApp } from './setup/test-app';

describe('demo data', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
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
    expect(instruments.body.total).toBe(2);

    // The lots tell the story through the server's own results (brief, demo scenario).
    const lots = await engineer.agent.get('/api/lots').query({ sort: 'lotNumber:asc' }).expect(200);
    expect(
      lots.body.items.map((l: { lotNumber: string; partCount: number }) => `${l.lotNumber} ${l.partCount}`),
    ).toEqual(['L-2026-041 6', 'L-2026-044 4', 'L-2026-047 4']);
    const lot041 = lots.body.items[0].id as string;
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
    // Seeding hashes the demo people's passwords (scrypt): slow on a busy machine.
  }, 60_000);
});
