import { Client } from 'pg';
import { TOUCH_INTERVAL_MS } from '../src/session/session-store';
import { signInAs, startTestApp, type Browser, type TestApp } from './setup/test-app';

/*
 * Sessions roll: each answer sets a cookie good for 12 hours from now. The stored expiry is written
 * at most once a minute per session (src/session/session-store.ts), so most requests cost no
 * session write; this checks that it is still written, and that a session is still refused after
 * its stored expiry.
 */
describe('rolling session expiry', () => {
  let t: TestApp;
  let db: Client;
  let engineer: Browser;

  const storedExpiry = async () =>
    (await db.query<{ expire: Date }>('select expire from session order by expire desc limit 1')).rows[0]!.expire;
  const later = (ms: number) => {
    const now = Date.now();
    jest.spyOn(Date, 'now').mockReturnValue(now + ms);
  };

  beforeAll(async () => {
    t = await startTestApp();
    db = new Client({ connectionString: t.db.url });
    await db.connect();
    engineer = await signInAs(t.app, ['engineer']);
  });
  afterEach(() => jest.restoreAllMocks());
  afterAll(async () => {
    await db.end();
    await t.close();
  });

  it('writes the new expiry on the first request, then not again within the interval', async () => {
    const signedIn = await storedExpiry();
    later(5_000);
    await engineer.agent.get('/api/auth/me').expect(200);
    const touched = await storedExpiry();
    expect(touched.getTime()).toBeGreaterThan(signedIn.getTime());
    later(10_000);
    await engineer.agent.get('/api/auth/me').expect(200);
    expect(await storedExpiry()).toEqual(touched);
  });

  it('writes it again once the interval has passed', async () => {
    const before = await storedExpiry();
    later(TOUCH_INTERVAL_MS + 60_000);
    await engineer.agent.get('/api/auth/me').expect(200);
    expect((await storedExpiry()).getTime()).toBeGreaterThan(before.getTime() + TOUCH_INTERVAL_MS);
  });

  it('refuses a session once its stored expiry has passed', async () => {
    await db.query(`update session set expire = now() - interval '1 second'`);
    await engineer.agent.get('/api/auth/me').expect(401);
  });
});
