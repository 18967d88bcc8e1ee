import type { AuditEntry as AuditView, AuditFacets, Page } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { AuditEntry } from '../src/audit/audit-entry.entity';
import { Browser, signInAs, startTestApp, TestApp } from './setup/test-app';

/**
 * The audit log reads entries written beforehand with known times, actors and values, so every
 * filter's answer can be written down by hand.
 */
describe('Audit log', () => {
  let t: TestApp;
  let engineer: Browser;
  const ada = '11111111-1111-4111-8111-111111111111';
  const ben = '22222222-2222-4222-8222-222222222222';

  const list = async (query: Record<string, string | number> = {}) =>
    (await engineer.agent.get('/api/audit').query(query).expect(200)).body as Page<AuditView>;

  beforeAll(async () => {
    t = await startTestApp();
    engineer = await signInAs(t.app, ['engineer']);
    const em = t.app.get(EntityManager).fork();
    const at = (iso: string) => new Date(iso);
    const rows: Partial<AuditEntry>[] = [
      {
        createdAt: at('2026-11-01T08:00:00Z'),
        actorId: ada,
        actorName: 'Ada Reyes',
        action: 'lot.create',
        subjectType: 'lot',
        subjectId: 'lot-1',
        after: { lotNumber: 'L-1', quantity: 10 },
      },
      {
        createdAt: at('2026-11-02T09:00:00Z'),
        actorId: ben,
        actorName: 'Ben Okafor',
        action: 'spec.release',
        subjectType: 'spec',
        subjectId: 'spec-1',
        before: { status: 'draft' },
        after: { status: 'released' },
      },
      {
        createdAt: at('2026-11-02T23:59:59Z'),
        actorId: ada,
        actorName: 'Ada Reyes',
        action: 'part.disposition',
        subjectType: 'part',
        subjectId: 'part-1',
        after: { kind: 'scrap' },
        reason: 'Chipped corner 100% visible',
      },
      {
        createdAt: at('2026-11-03T00:00:00Z'),
        actorName: 'system',
        action: 'lot.create',
        subjectType: 'lot',
        subjectId: 'lot-2',
        after: { lotNumber: 'L-2', quantity: 4 },
      },
      {
        createdAt: at('2026-11-04T12:00:00Z'),
        actorId: ben,
        actorName: 'Ben Okafor',
        action: 'user.roles',
        subjectType: 'user',
        subjectId: 'user-1',
        before: { roles: ['sales'] },
        after: { roles: ['sales', 'service'] },
      },
    ];
    for (const row of rows) em.create(AuditEntry, row as AuditEntry);
    await em.flush();
  }, 60_000);
  afterAll(() => t.close());

  const subjects = (page: Page<AuditView>) => page.items.map((e) => e.subjectId);

  it('lists newest first, paged, with the total', async () => {
    const first = await list({ pageSize: 2 });
    expect(first.total).toBe(5);
    expect(subjects(first)).toEqual(['user-1', 'lot-2']);
    expect(subjects(await list({ pageSize: 2, page: 2 }))).toEqual(['lot-1']);
    expect(subjects(await list({ sort: 'createdAt:asc', pageSize: 2 }))).toEqual(['lot-1', 'spec-1']);
    const [roles] = (await list({ pageSize: 1 })).items;
    expect(roles).toMatchObject({
      actorId: ben,
      actorName: 'Ben Okafor',
      action: 'user.roles',
      before: { roles: ['sales'] },
      after: { roles: ['sales', 'service'] },
      reason: null,
      createdAt: '2026-11-04T12:00:00.000Z',
    });
  });

  it('filters by action, actor, subject and calendar days (both ends included)', async () => {
    expect(subjects(await list({ action: 'lot.create' }))).toEqual(['lot-2', 'lot-1']);
    expect(subjects(await list({ actorId: ada }))).toEqual(['part-1', 'lot-1']);
    expect(subjects(await list({ subjectType: 'spec' }))).toEqual(['spec-1']);
    expect(subjects(await list({ subjectId: 'part-1' }))).toEqual(['part-1']);
    // 2026-11-02 holds 09:00:00 and 23:59:59; 00:00:00 of the 3rd belongs to the next day.
    expect(subjects(await list({ from: '2026-11-02', to: '2026-11-02' }))).toEqual(['part-1', 'spec-1']);
    expect(subjects(await list({ from: '2026-11-03' }))).toEqual(['user-1', 'lot-2']);
    expect(subjects(await list({ to: '2026-11-01' }))).toEqual(['lot-1']);
    expect(subjects(await list({ action: 'lot.create', actorId: ada }))).toEqual(['lot-1']);
  });

  it('finds text in the names, the reason and the values before and after', async () => {
    expect(subjects(await list({ q: 'okafor' }))).toEqual(['user-1', 'spec-1']);
    expect(subjects(await list({ q: 'L-2' }))).toEqual(['lot-2']);
    expect(subjects(await list({ q: 'draft' }))).toEqual(['spec-1']);
    // "%" is a character to find, not a wildcard.
    expect(subjects(await list({ q: '100%' }))).toEqual(['part-1']);
    expect((await list({ q: '%' })).total).toBe(1);
  });

  it('offers the values the filters can take', async () => {
    const facets = (await engineer.agent.get('/api/audit/facets').expect(200)).body as AuditFacets;
    expect(facets.actions).toEqual(['lot.create', 'part.disposition', 'spec.release', 'user.roles']);
    expect(facets.subjectTypes).toEqual(['lot', 'part', 'spec', 'user']);
    expect(facets.actors).toEqual([
      { id: ada, name: 'Ada Reyes' },
      { id: ben, name: 'Ben Okafor' },
    ]);
  });

  it('refuses bad filters with field messages, and people outside engineer and admin', async () => {
    const bad = await engineer.agent.get('/api/audit').query({ from: '2026-13-01', actorId: 'x' }).expect(400);
    expect((bad.body.details as { path: string }[]).map((d) => d.path).sort()).toEqual(['actorId', 'from']);
    const backwards = await engineer.agent
      .get('/api/audit')
      .query({ from: '2026-11-05', to: '2026-11-01' })
      .expect(400);
    expect(backwards.body.details[0]).toEqual({ path: 'to', message: 'The last day cannot be before the first day.' });
    const admin = await signInAs(t.app, ['admin']);
    await admin.agent.get('/api/audit').expect(200);
    for (const role of ['inspector', 'sales', 'service'] as const)
      await (await signInAs(t.app, [role])).agent.get('/api/audit').expect(403);
  });
});
