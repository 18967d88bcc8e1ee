import { CSRF_HEADER } from '@evenset/contracts';
import request from 'supertest';
import { anonymousBrowser, givenUser, signIn, startTestApp, TestApp, TEST_PASSWORD } from './setup/test-app';

describe('sign-in and sessions', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({
      LOGIN_THROTTLE_LIMIT: '5',
      LOGIN_THROTTLE_TTL_SECONDS: '60',
      TRUST_PROXY: 'loopback',
    });
  });
  afterAll(() => t.close());

  it('refuses sign-in without the CSRF token', async () => {
    const user = await givenUser(t.app, ['inspector']);
    const res = await request(t.app.getHttpServer())
      .post('/api/auth/login')
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body).toMatchObject({ code: 'CSRF_INVALID' });
  });

  it('refuses a CSRF token that belongs to another session', async () => {
    const [mine, theirs] = [await givenUser(t.app, ['inspector']), await givenUser(t.app, ['inspector'])];
    const victim = await signIn(t.app, mine.email);
    const attacker = await signIn(t.app, theirs.email);
    const res = await victim.agent.post('/api/auth/logout').set(CSRF_HEADER, attacker.csrf);
    expect([res.status, res.body.code]).toEqual([403, 'CSRF_INVALID']);
    await victim.agent.get('/api/auth/me').expect(200);
  });

  it('answers a wrong password with a plain message and no session', async () => {
    const user = await givenUser(t.app, ['inspector']);
    const browser = await anonymousBrowser(t.app);
    const res = await browser.agent
      .post('/api/auth/login')
      .set(CSRF_HEADER, browser.csrf)
      .send({ email: user.email, password: 'not-the-password' });
    expect(res.status).toBe(401);
    expect(res.body).toMatchObject({
      code: 'AUTH_INVALID',
      message: 'Wrong e-mail or password.',
    });
    await browser.agent.get('/api/auth/me').expect(401);
  });

  it('names the missing field when the form is empty', async () => {
    const browser = await anonymousBrowser(t.app);
    const res = await browser.agent.post('/api/auth/login').set(CSRF_HEADER, browser.csrf).send({ email: '' });
    expect(res.status).toBe(400);
    expect(res.body.details).toEqual(
      expect.arrayContaining([
        { path: 'email', message: 'Enter your e-mail address.' },
        { path: 'password', message: 'Enter your password.' },
      ]),
    );
  });

  it('signs in, regenerates the session id, and signs out', async () => {
    const user = await givenUser(t.app, ['engineer', 'inspector']);
    const browser = await anonymousBrowser(t.app);
    const before = await browser.agent.get('/api/auth/csrf');
    const cookieBefore = sessionCookie(before.headers['set-cookie']);
    const login = await browser.agent
      .post('/api/auth/login')
      .set(CSRF_HEADER, browser.csrf)
      .send({ email: user.email.toUpperCase(), password: TEST_PASSWORD });
    expect(login.status).toBe(200);
    expect(login.body.user).toMatchObject({
      email: user.email,
      roles: ['engineer', 'inspector'],
    });
    const cookieAfter = sessionCookie(login.headers['set-cookie']);
    // Session fixation: the id handed out before sign-in is not the one used after, and the old
    // one is not signed in (someone who planted it gains nothing).
    expect(cookieBefore).toBeDefined();
    expect(cookieAfter).toBeDefined();
    expect(cookieValue(cookieAfter)).not.toEqual(cookieValue(cookieBefore));
    await request(t.app.getHttpServer()).get('/api/auth/me').set('Cookie', cookieValue(cookieBefore)).expect(401);
    const me = await browser.agent.get('/api/auth/me').expect(200);
    expect(me.body.user.id).toBe(user.id);
    // The pre-sign-in token died with the old session.
    await browser.agent.post('/api/auth/logout').set(CSRF_HEADER, browser.csrf).expect(403);
    await browser.agent.post('/api/auth/logout').set(CSRF_HEADER, login.body.csrfToken).expect(204);
    await browser.agent.get('/api/auth/me').expect(401);
  });

  it('sets an httpOnly, SameSite cookie, secure when the request came over TLS', async () => {
    const user = await givenUser(t.app, ['sales']);
    const browser = await anonymousBrowser(t.app);
    const plain = await browser.agent
      .post('/api/auth/login')
      .set(CSRF_HEADER, browser.csrf)
      .send({ email: user.email, password: TEST_PASSWORD });
    const cookie = sessionCookie(plain.headers['set-cookie']) ?? '';
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).not.toMatch(/Secure/);

    const viaProxy = await anonymousBrowser(t.app);
    const tls = await viaProxy.agent
      .post('/api/auth/login')
      .set('X-Forwarded-Proto', 'https')
      .set(CSRF_HEADER, viaProxy.csrf)
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(tls.status).toBe(200);
    expect(sessionCookie(tls.headers['set-cookie'])).toMatch(/Secure/);
  });

  it('throttles rapid repeated attempts with 429 and a plain message', async () => {
    const user = await givenUser(t.app, ['service']);
    const browser = await anonymousBrowser(t.app);
    const statuses: number[] = [];
    for (let attempt = 0; attempt < 7; attempt += 1) {
      const res = await browser.agent
        .post('/api/auth/login')
        .set(CSRF_HEADER, browser.csrf)
        .send({ email: user.email, password: `wrong-${attempt}` });
      statuses.push(res.status);
      if (res.status === 429)
        expect(res.body).toMatchObject({
          code: 'TOO_MANY_ATTEMPTS',
          message: 'Too many attempts. Wait a minute, then try again.',
        });
    }
    expect(statuses.slice(0, 5)).toEqual([401, 401, 401, 401, 401]);
    expect(statuses.slice(5)).toEqual([429, 429]);
    // Even the right password waits out the window.
    const res = await browser.agent
      .post('/api/auth/login')
      .set(CSRF_HEADER, browser.csrf)
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(429);
  });

  it('ends the sessions of a person at once when an admin deactivates them', async () => {
    const inspector = await givenUser(t.app, ['inspector']);
    const admin = await givenUser(t.app, ['admin']);
    const inspectorBrowser = await signIn(t.app, inspector.email);
    const adminBrowser = await signIn(t.app, admin.email);
    await inspectorBrowser.agent.get('/api/auth/me').expect(200);
    await adminBrowser.agent
      .post(`/api/users/${inspector.id}/deactivate`)
      .set(CSRF_HEADER, adminBrowser.csrf)
      .expect(200);
    await inspectorBrowser.agent.get('/api/auth/me').expect(401);
    const again = await anonymousBrowser(t.app);
    const res = await again.agent
      .post('/api/auth/login')
      .set(CSRF_HEADER, again.csrf)
      .send({ email: inspector.email, password: TEST_PASSWORD });
    expect(res.status).toBe(401);
  });
});

/** `name=value` of a Set-Cookie header, as a browser sends it back. */
const cookieValue = (setCookie: string | undefined) => setCookie?.split(';')[0] ?? '';

function sessionCookie(header: string | string[] | undefined): string | undefined {
  const cookies = Array.isArray(header) ? header : header ? [header] : [];
  return cookies.find((c) => c.startsWith('evenset.sid='));
}
