import { CSRF_HEADER } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { AuditEntry } from '../src/audit/audit-entry.entity';
import { Browser, givenUser, signIn, startTestApp, TestApp } from './setup/test-app';

describe('people (admin)', () => {
  let t: TestApp;
  let admin: Browser;
  let adminId: string;
  // Sign-ins hash with scrypt: slow while the API suites run in parallel.
  beforeAll(async () => {
    t = await startTestApp();
    const user = await givenUser(t.app, ['admin'], 'chief@test.example');
    adminId = user.id;
    admin = await signIn(t.app, user.email);
  }, 30_000);
  afterAll(() => t.close());

  const post = (path: string, body?: object) => admin.agent.post(path).set(CSRF_HEADER, admin.csrf).send(body);

  it('creates a person who can then sign in, and records who did it', async () => {
    const res = await post('/api/users', {
      email: ' New.Inspector@Test.example ',
      displayName: 'Ada Inspector',
      roles: ['inspector'],
      password: 'long-enough-pass',
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      email: 'new.inspector@test.example',
      roles: ['inspector'],
      active: true,
    });
    await signIn(t.app, 'new.inspector@test.example', 'long-enough-pass');
    const entries = await t.app.get(EntityManager).fork().find(AuditEntry, { subjectId: res.body.id });
    expect(entries.map((e) => [e.action, e.actorId])).toEqual([['user.create', adminId]]);
  });

  it('names every field at fault and saves nothing', async () => {
    const res = await post('/api/users', {
      email: 'not-an-address',
      displayName: '',
      roles: [],
      password: 'short',
    });
    expect(res.status).toBe(400);
    const paths = (res.body.details as { path: string }[]).map((d) => d.path).sort();
    expect(paths).toEqual(['displayName', 'email', 'password', 'roles']);
    const list = await admin.agent.get('/api/users').query({ q: 'not-an-address' }).expect(200);
    expect(list.body.total).toBe(0);
  });

  it('refuses a common password, whatever its case, when creating a person or resetting a password', async () => {
    const refusal = {
      code: 'VALIDATION_FAILED',
      details: [{ path: 'password', message: 'This password is on a list of common passwords; choose another.' }],
    };
    const created = await post('/api/users', {
      email: 'weak@test.example',
      displayName: 'Weak Password',
      roles: ['sales'],
      password: 'PassWord123',
    });
    expect([created.status, created.body]).toEqual([400, expect.objectContaining(refusal)]);
    expect((await admin.agent.get('/api/users').query({ q: 'weak@test.example' }).expect(200)).body.total).toBe(0);

    const person = await givenUser(t.app, ['inspector']);
    const reset = await post(`/api/users/${person.id}/password`, { password: 'QWERTYUIOP' });
    expect([reset.status, reset.body]).toEqual([400, expect.objectContaining(refusal)]);
    await signIn(t.app, person.email);
  });

  it('refuses a second person with the same e-mail, naming the field', async () => {
    await post('/api/users', {
      email: 'twin@test.example',
      displayName: 'First',
      roles: ['sales'],
      password: 'long-enough-pass',
    }).expect(201);
    const res = await post('/api/users', {
      email: 'TWIN@test.example',
      displayName: 'Second',
      roles: ['sales'],
      password: 'long-enough-pass',
    });
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({
      code: 'USER_EMAIL_TAKEN',
      details: [{ path: 'email' }],
    });
  });

  it('pages, sorts and searches on the server', async () => {
    for (const n of [1, 2, 3]) await givenUser(t.app, ['service'], `pager-${n}@test.example`);
    const page = await admin.agent
      .get('/api/users')
      .query({ q: 'pager-', pageSize: 2, page: 0, sort: 'email:desc' })
      .expect(200);
    expect(page.body.total).toBe(3);
    expect(page.body.items.map((u: { email: string }) => u.email)).toEqual([
      'pager-3@test.example',
      'pager-2@test.example',
    ]);
    const next = await admin.agent
      .get('/api/users')
      .query({ q: 'pager-', pageSize: 2, page: 1, sort: 'email:desc' })
      .expect(200);
    expect(next.body.items.map((u: { email: string }) => u.email)).toEqual(['pager-1@test.example']);
    const bad = await admin.agent.get('/api/users').query({ sort: 'email;drop' });
    expect(bad.status).toBe(400);
    expect(bad.body.details[0].path).toBe('sort');
  });

  it('changes roles with a before/after audit entry', async () => {
    const person = await givenUser(t.app, ['sales']);
    const res = await admin.agent
      .put(`/api/users/${person.id}/roles`)
      .set(CSRF_HEADER, admin.csrf)
      .send({ roles: ['sales', 'service'] });
    expect(res.status).toBe(200);
    expect(res.body.roles).toEqual(['sales', 'service']);
    const [entry] = await t.app
      .get(EntityManager)
      .fork()
      .find(AuditEntry, { subjectId: person.id, action: 'user.roles' });
    expect(entry?.before).toMatchObject({ roles: ['sales'] });
    expect(entry?.after).toMatchObject({ roles: ['sales', 'service'] });
  });

  it('does not let an admin lock themselves out', async () => {
    const drop = await admin.agent
      .put(`/api/users/${adminId}/roles`)
      .set(CSRF_HEADER, admin.csrf)
      .send({ roles: ['engineer'] });
    expect(drop.status).toBe(409);
    expect(drop.body.code).toBe('SELF_LOCKOUT');
    const off = await post(`/api/users/${adminId}/deactivate`);
    expect(off.status).toBe(409);
  });

  it('reactivates a person and resets a password', async () => {
    const person = await givenUser(t.app, ['inspector']);
    await post(`/api/users/${person.id}/deactivate`).expect(200);
    const back = await post(`/api/users/${person.id}/reactivate`).expect(200);
    expect(back.body.active).toBe(true);
    await post(`/api/users/${person.id}/password`, {
      password: 'a-brand-new-one',
    }).expect(204);
    await signIn(t.app, person.email, 'a-brand-new-one');
  });

  it('answers 404 for an unknown person and 400 for a malformed id', async () => {
    const missing = await post('/api/users/00000000-0000-4000-8000-000000000000/deactivate');
    expect(missing.status).toBe(404);
    const malformed = await post('/api/users/42/deactivate');
    expect(malformed.status).toBe(400);
    expect(malformed.body.details[0].path).toBe('id');
  });

  it('keeps audit entries permanent: the database refuses to change or remove one', async () => {
    const conn = t.app.get(EntityManager).getConnection();
    await expect(conn.execute(`update audit_entry set action = 'forged'`)).rejects.toThrow(/permanent/);
    await expect(conn.execute(`delete from audit_entry`)).rejects.toThrow(/permanent/);
    await expect(conn.execute(`truncate audit_entry`)).rejects.toThrow(/permanent/);
  });
});
