import type { Session, SessionUser } from '@evenset/contracts';
import { CSRF_HEADER } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { AuditEntry } from '../src/audit/audit-entry.entity';
import { User } from '../src/users/user.entity';
import { anonymousBrowser, Browser, givenUser, signIn, startTestApp, TestApp } from './setup/test-app';

describe('Display unit preference', () => {
  let t: TestApp;
  let person: Browser;
  let id: string;

  const patch = (who: Browser, body: object) =>
    who.agent.patch('/api/me/preferences').set(CSRF_HEADER, who.csrf).send(body);
  const em = () => t.app.get(EntityManager).fork();

  beforeAll(async () => {
    t = await startTestApp();
    const user = await givenUser(t.app, ['inspector', 'sales'], 'pat@test.example');
    id = user.id;
    person = await signIn(t.app, user.email);
  }, 60_000);
  afterAll(() => t.close());

  it('starts in inches, switches to millimetres for the person only, with an audit entry', async () => {
    expect(((await person.agent.get('/api/auth/me').expect(200)).body as Session).user.displayUnit).toBe('in');
    const res = await patch(person, { displayUnit: 'mm' }).expect(200);
    expect(res.body as SessionUser).toMatchObject({ id, displayUnit: 'mm', roles: ['inspector', 'sales'] });
    // Read afresh on the next request: every page the person opens now shows millimetres.
    expect(((await person.agent.get('/api/auth/me').expect(200)).body as Session).user.displayUnit).toBe('mm');
    expect((await em().findOneOrFail(User, { id })).displayUnit).toBe('mm');
    const entries = await em().find(AuditEntry, { action: 'user.preferences', subjectId: id });
    expect(entries.map((e) => [e.actorId, e.before, e.after])).toEqual([
      [id, { displayUnit: 'in' }, { displayUnit: 'mm' }],
    ]);
  });

  it('records nothing when the unit does not change, and switches back', async () => {
    await patch(person, { displayUnit: 'mm' }).expect(200);
    expect(await em().count(AuditEntry, { action: 'user.preferences', subjectId: id })).toBe(1);
    await patch(person, { displayUnit: 'in' }).expect(200);
    expect(await em().count(AuditEntry, { action: 'user.preferences', subjectId: id })).toBe(2);
    expect((await em().findOneOrFail(User, { id })).displayUnit).toBe('in');
  });

  it('refuses an unknown unit with a field message and changes nothing', async () => {
    const res = await patch(person, { displayUnit: 'cm' }).expect(400);
    expect(res.body.details).toEqual([{ path: 'displayUnit', message: 'Choose inch or millimetre.' }]);
    await patch(person, {}).expect(400);
    expect((await em().findOneOrFail(User, { id })).displayUnit).toBe('in');
    expect(await em().count(AuditEntry, { action: 'user.preferences', subjectId: id })).toBe(2);
  });

  it('needs the CSRF token and a signed-in person', async () => {
    await person.agent.patch('/api/me/preferences').send({ displayUnit: 'mm' }).expect(403);
    const anonymous = await anonymousBrowser(t.app);
    await patch(anonymous, { displayUnit: 'mm' }).expect(401);
    expect((await em().findOneOrFail(User, { id })).displayUnit).toBe('in');
  });
});
