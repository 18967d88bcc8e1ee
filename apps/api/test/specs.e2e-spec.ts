import { CSRF_HEADER } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { AuditEntry } from '../src/audit/audit-entry.entity';
import { ensureMaterial } from '../src/database/factories/material.factory';
import { STEEL } from '../src/database/seeders/shop-materials';
import { Spec } from '../src/specs/spec.entity';
import { Browser, signInAs, startTestApp, TestApp } from './setup/test-app';

describe('part specs', () => {
  let t: TestApp;
  let engineer: Browser;
  let inspector: Browser;
  let steelId: string;

  // Sign-ins hash with scrypt: slow while the API suites run in parallel.
  beforeAll(async () => {
    t = await startTestApp();
    const em = t.app.get(EntityManager).fork();
    steelId = (await ensureMaterial(em, STEEL)).id;
    await em.flush();
    engineer = await signInAs(t.app, ['engineer']);
    inspector = await signInAs(t.app, ['inspector']);
  }, 30_000);
  afterAll(() => t.close());

  const post = (path: string, body?: object) => engineer.agent.post(path).set(CSRF_HEADER, engineer.csrf).send(body);
  const put = (path: string, body: object) => engineer.agent.put(path).set(CSRF_HEADER, engineer.csrf).send(body);
  const specCount = () => t.app.get(EntityManager).fork().count(Spec, {});
  const auditOf = (id: string) =>
    t.app
      .get(EntityManager)
      .fork()
      .find(AuditEntry, { subjectId: id }, { orderBy: { createdAt: 'asc' } });

  /** RB-40 rev B of the brief, lengths in inches, station positions in inches too. */
  const definition = (overrides: Record<string, unknown> = {}) => ({
    unit: 'in',
    title: 'Riser block',
    materialId: steelId,
    displayUnit: 'in',
    nominal: 1.5,
    band: { lower: -0.0004, upper: 0 },
    matchingBand: 0.0002,
    flatness: 0.0001,
    parallelism: 0.0002,
    setSize: 4,
    heightStatistic: 'mean',
    decisionRule: 'guarded',
    plan: {
      stations: [
        { name: 'P1', x: 0.2, y: 0.2 },
        { name: 'P2', x: 1.3, y: 0.2 },
        { name: 'P3', x: 1.3, y: 1.3 },
        { name: 'P4', x: 0.2, y: 1.3 },
        { name: 'P5', x: 0.75, y: 0.75 },
      ],
    },
    ...overrides,
  });

  let counter = 0;
  const partNumber = () => `T-${(counter += 1)}`;

  it('creates a draft rev A, converting every length to millimetres once', async () => {
    const res = await post('/api/specs', { partNumber: ' rb-40x ', definition: definition() });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ partNumber: 'RB-40X', revision: 'A', status: 'draft', previousId: null });
    // 1 in = 25.4 mm exactly (NIST SP 811, App. B): 1.5 in = 38.1 mm, 0.0004 in = 0.01016 mm.
    expect(res.body.definition).toMatchObject({
      unit: 'mm',
      displayUnit: 'in',
      nominal: 38.1,
      band: { lower: -0.01016, upper: 0 },
      matchingBand: 0.00508,
      flatness: 0.00254,
      parallelism: 0.00508,
      runout: null,
      grinding: null,
    });
    expect(res.body.definition.plan.stations[1]).toEqual({ name: 'P2', x: 33.02, y: 5.08 });
    expect(res.body.effectiveMasterDriftLimit).toBe(0.00254);
    expect(res.body.material.expansionPerK).toBe(11.5);
    expect((await auditOf(res.body.id)).map((e) => e.action)).toEqual(['spec.create']);
    // An answer can be sent back as it is: it says its own unit.
    const again = await put(`/api/specs/${res.body.id}`, { definition: res.body.definition });
    expect(again.status).toBe(200);
    expect(again.body.definition).toEqual(res.body.definition);
  });

  it.each<[string, Record<string, unknown>, string, RegExp | null]>([
    ['no stations', { plan: { stations: [] } }, 'definition.plan.stations', null],
    [
      'a duplicate station name',
      {
        plan: {
          stations: [
            { name: 'P1', x: 0, y: 0 },
            { name: 'P2', x: 1, y: 0 },
            { name: 'P1', x: 0, y: 1 },
          ],
        },
      },
      'definition.plan.stations.2.name',
      /"P1"/,
    ],
    ['a band upside down', { band: { lower: 0.0002, upper: -0.0002 } }, 'definition.band.lower', null],
    ['a negative limit', { flatness: -0.0001 }, 'definition.flatness', /negative/],
    ['a zero matching band', { matchingBand: 0 }, 'definition.matchingBand', null],
    ['a set size of 0', { setSize: 0 }, 'definition.setSize', null],
    [
      'flatness with 2 stations',
      {
        plan: {
          stations: [
            { name: 'A', x: 0, y: 0 },
            { name: 'B', x: 1, y: 0 },
          ],
        },
      },
      'definition.plan.stations',
      /at least 3/,
    ],
    [
      'flatness with stations on one line',
      {
        plan: {
          stations: [
            { name: 'A', x: 0, y: 0 },
            { name: 'B', x: 1, y: 0 },
            { name: 'C', x: 3, y: 0 },
          ],
        },
      },
      'definition.plan.stations',
      /one line/,
    ],
    [
      'a height station that does not exist',
      { heightStatistic: 'station', heightStation: 'P9' },
      'definition.heightStation',
      /P9/,
    ],
    [
      'a finish depth deeper than the rough depth',
      { grinding: { roughDepth: 0.0005, finishAllowance: 0.002, finishDepth: 0.001, sparkOutPasses: 2 } },
      'definition.grinding.finishDepth',
      null,
    ],
    ['a runout limit without a circle', { runout: 0.0002 }, 'definition.plan.runoutCircles', null],
    [
      'a runout circle of 2 positions',
      {
        runout: 0.0002,
        plan: { stations: [{ name: 'A', x: 0, y: 0 }], runoutCircles: [{ name: 'OD', radius: 1, positions: 2 }] },
        flatness: null,
      },
      'definition.plan.runoutCircles.0.positions',
      null,
    ],
    ['an unknown unit', { unit: 'ft' }, 'definition.unit', null],
  ])('refuses %s, naming the field, and saves nothing', async (_case, override, path, message) => {
    const before = await specCount();
    const res = await post('/api/specs', { partNumber: partNumber(), definition: definition(override) });
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('VALIDATION_FAILED');
    const detail = (res.body.details as { path: string; message: string }[]).find((d) => d.path === path);
    expect(detail).toBeDefined();
    if (message) expect(detail?.message).toMatch(message);
    expect(await specCount()).toBe(before);
  });

  it('refuses a material that does not exist, naming the field', async () => {
    const res = await post('/api/specs', {
      partNumber: partNumber(),
      definition: definition({ materialId: '00000000-0000-4000-8000-000000000000' }),
    });
    expect(res.status).toBe(400);
    expect(res.body.details).toEqual([{ path: 'definition.materialId', message: 'There is no such material.' }]);
  });

  it('releases, freezes, revises and compares revisions', async () => {
    const created = await post('/api/specs', { partNumber: 'RB-41', definition: definition() }).expect(201);
    const id = created.body.id as string;
    await post(`/api/specs/${id}/revisions`).expect(409); // a draft is edited, not revised
    expect(created.body.frozenExpansion).toBeNull();
    const released = await post(`/api/specs/${id}/release`).expect(200);
    expect(released.body).toMatchObject({ status: 'released', revision: 'A' });
    // Release copies the material's coefficient and its source into the revision.
    expect(released.body.frozenExpansion).toEqual({
      expansionPerK: released.body.material.expansionPerK,
      source: released.body.material.source,
    });
    expect(released.body.releasedAt).toEqual(expect.any(String));

    const edit = await put(`/api/specs/${id}`, { definition: definition({ title: 'Changed' }) });
    expect(edit.status).toBe(409);
    expect(edit.body.code).toBe('SPEC_FROZEN');
    expect((await post(`/api/specs/${id}/release`)).body.code).toBe('SPEC_NOT_DRAFT');

    const revB = await post(`/api/specs/${id}/revisions`).expect(201);
    expect(revB.body).toMatchObject({ revision: 'B', status: 'draft', previousId: id });
    expect(revB.body.definition).toEqual(released.body.definition);
    expect((await post(`/api/specs/${id}/revisions`)).body.code).toBe('SPEC_REVISION_REFUSED'); // one draft at a time

    const changed = definition({
      band: { lower: -0.0003, upper: 0 },
      plan: { stations: [...definition().plan.stations, { name: 'P6', x: 0.75, y: 0.2 }] },
    });
    await put(`/api/specs/${revB.body.id}`, { definition: changed }).expect(200);
    await post(`/api/specs/${revB.body.id}/release`).expect(200);

    const revA = await engineer.agent.get(`/api/specs/${id}`).expect(200);
    expect(revA.body.status).toBe('superseded');
    expect(revA.body.definition.band.lower).toBe(-0.01016); // untouched by rev B

    const diff = await inspector.agent.get(`/api/specs/${id}/compare/${revB.body.id}`).expect(200);
    expect(diff.body.from).toMatchObject({ revision: 'A' });
    expect(diff.body.to).toMatchObject({ revision: 'B' });
    expect(diff.body.changes).toEqual([
      { field: 'band.lower', before: -0.01016, after: -0.00762 },
      { field: 'plan.stations', before: 'P1, P2, P3, P4, P5', after: 'P1, P2, P3, P4, P5, P6' },
      { field: 'plan.stations.P6.x', before: null, after: 19.05 },
      { field: 'plan.stations.P6.y', before: null, after: 5.08 },
    ]);

    expect((await auditOf(id)).map((e) => e.action)).toEqual(['spec.create', 'spec.release', 'spec.supersede']);
    expect((await auditOf(revB.body.id)).map((e) => e.action)).toEqual(['spec.revise', 'spec.update', 'spec.release']);
  });

  it('refuses a second spec for a part number that has one', async () => {
    await post('/api/specs', { partNumber: 'PP-7', definition: definition() }).expect(201);
    const res = await post('/api/specs', { partNumber: 'pp-7', definition: definition() });
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ code: 'SPEC_PART_NUMBER_TAKEN', details: [{ path: 'partNumber' }] });
  });

  it('lets an inspector read but not write, and pages, sorts and filters on the server', async () => {
    const res = await inspector.agent
      .get('/api/specs')
      .query({ q: 'RB-4', sort: 'partNumber:desc', pageSize: 2, status: 'superseded' })
      .expect(200);
    expect(res.body.total).toBe(1);
    expect(
      res.body.items.map((s: { partNumber: string; revision: string }) => `${s.partNumber} ${s.revision}`),
    ).toEqual(['RB-41 A']);
    const all = await inspector.agent.get('/api/specs').query({ pageSize: 2, sort: 'partNumber:asc' }).expect(200);
    expect(all.body.items).toHaveLength(2);
    expect(all.body.total).toBeGreaterThan(2);
    const write = await inspector.agent
      .post('/api/specs')
      .set(CSRF_HEADER, inspector.csrf)
      .send({ partNumber: partNumber(), definition: definition() });
    expect(write.status).toBe(403);
  });

  it('answers 404 for an unknown spec', async () => {
    const res = await engineer.agent.get('/api/specs/00000000-0000-4000-8000-000000000000');
    expect(res.status).toBe(404);
  });

  it('is protected by the database too: a band upside down cannot be stored', async () => {
    const conn = t.app.get(EntityManager).getConnection();
    await expect(conn.execute(`update part_spec set band_lower_mm = 1, band_upper_mm = 0`)).rejects.toThrow(
      /part_spec_band_check/,
    );
  });
});
