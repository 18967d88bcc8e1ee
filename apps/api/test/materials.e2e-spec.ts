import { CSRF_HEADER } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { AuditEntry } from '../src/audit/audit-entry.entity';
import { Browser, signInAs, startTestApp, TestApp } from './setup/test-app';

describe('materials', () => {
  let t: TestApp;
  let engineer: Browser;
  // Sign-ins hash with scrypt: slow while the API suites run in parallel.
  beforeAll(async () => {
    t = await startTestApp();
    engineer = await signInAs(t.app, ['engineer']);
  }, 30_000);
  afterAll(() => t.close());

  const send = (method: 'post' | 'put', path: string, body: object) =>
    engineer.agent[method](path).set(CSRF_HEADER, engineer.csrf).send(body);

  it('creates and edits a material with audit entries, naming its source', async () => {
    const created = await send('post', '/api/materials', {
      name: 'Zirconia ceramic',
      expansionPerK: 9.2,
      source: 'From memory: about 9.2–9.5',
      confidence: 'from memory',
    });
    expect(created.status).toBe(201);
    const edited = await send('put', `/api/materials/${created.body.id}`, {
      ...created.body,
      id: undefined,
      expansionPerK: 9.5,
    });
    expect(edited.status).toBe(200);
    expect(edited.body.expansionPerK).toBe(9.5);
    const entries = await t.app
      .get(EntityManager)
      .fork()
      .find(AuditEntry, { subjectId: created.body.id }, { orderBy: { createdAt: 'asc' } });
    expect(entries.map((e) => e.action)).toEqual(['material.create', 'material.update']);
    expect(entries[1]?.before).toMatchObject({ expansionPerK: 9.2 });
    const list = await engineer.agent.get('/api/materials').query({ q: 'zirconia' }).expect(200);
    expect(list.body.total).toBe(1);
  });

  it('refuses a duplicate name and a coefficient without a source', async () => {
    const body = { name: 'Brass', expansionPerK: 19, source: 'From memory', confidence: 'from memory' };
    await send('post', '/api/materials', body).expect(201);
    const twin = await send('post', '/api/materials', body);
    expect(twin.status).toBe(409);
    expect(twin.body.details[0].path).toBe('name');
    const bad = await send('post', '/api/materials', { ...body, name: 'Bronze', source: '' });
    expect(bad.status).toBe(400);
    expect(bad.body.details[0].path).toBe('source');
  });
});
