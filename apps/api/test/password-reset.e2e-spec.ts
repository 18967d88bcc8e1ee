import { createHash } from 'node:crypto';
import { CSRF_HEADER, PASSWORD_RESET_REQUESTED_MESSAGE } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { AuditEntry } from '../src/audit/audit-entry.entity';
import { PasswordResetToken } from '../src/auth/password-reset-token.entity';
import { MailMessage } from '../src/mail/mail-message.entity';
import { startMailSink, type MailSink } from '../src/mail/sink/mail-sink';
import { User } from '../src/users/user.entity';
import { capturedMail, freePort, waitForMail } from './setup/mail';
import { anonymousBrowser, givenUser, signIn, startTestApp, TestApp, TEST_PASSWORD } from './setup/test-app';

const NEW_PASSWORD = 'a-brand-new-password';

describe('password reset by e-mail', () => {
  let t: TestApp;
  let sink: MailSink;

  beforeAll(async () => {
    const port = await freePort();
    t = await startTestApp({ SMTP_URL: `smtp://127.0.0.1:${port}`, PUBLIC_URL: 'https://evenset.shop.test/' });
    sink = await startMailSink({ port, databaseUrl: t.db.url });
  });
  afterAll(async () => {
    await sink.close();
    await t.close();
  });

  const requestLink = async (email: string) => {
    const browser = await anonymousBrowser(t.app);
    return browser.agent.post('/api/auth/password-reset').set(CSRF_HEADER, browser.csrf).send({ email });
  };
  const confirm = async (token: string, password: string) => {
    const browser = await anonymousBrowser(t.app);
    return browser.agent
      .post('/api/auth/password-reset/confirm')
      .set(CSRF_HEADER, browser.csrf)
      .send({ token, password });
  };
  const linkToken = (text: string | undefined) => {
    const match = /https:\/\/evenset\.shop\.test\/reset-password\?token=([A-Za-z0-9_-]+)/.exec(text ?? '');
    if (!match) throw new Error(`No reset link in: ${text}`);
    return match[1]!;
  };

  it('answers the same for an unknown address, and sends nothing to it', async () => {
    const user = await givenUser(t.app, ['inspector']);
    const unknown = await requestLink('nobody@nowhere.test');
    const known = await requestLink(user.email);
    expect([unknown.status, unknown.body]).toEqual([202, { message: PASSWORD_RESET_REQUESTED_MESSAGE }]);
    expect([known.status, known.body]).toEqual([unknown.status, unknown.body]);

    await waitForMail(t.app, (m) => m.envelopeTo.includes(user.email));
    const em = t.app.get(EntityManager).fork();
    expect(await em.count(MailMessage, { recipient: 'nobody@nowhere.test' })).toBe(0);
    expect((await capturedMail(t.app)).some((m) => m.envelopeTo.includes('nobody@nowhere.test'))).toBe(false);
  });

  it('resets the password through the e-mailed link, once, and signs the old sessions out', async () => {
    const user = await givenUser(t.app, ['engineer']);
    const oldSession = await signIn(t.app, user.email);
    await requestLink(user.email.toUpperCase()).then((res) => expect(res.status).toBe(202));

    const mail = await waitForMail(t.app, (m) => m.envelopeTo.includes(user.email));
    expect(mail.subject).toBe('Reset your Evenset password');
    const token = linkToken(mail.text);
    // 32 random bytes in base64url without padding are 43 characters (RFC 4648 §5).
    expect(token).toHaveLength(43);

    // Only the SHA-256 of the token is on record, computed here with Node's own crypto.
    const em = t.app.get(EntityManager).fork();
    const stored = await em.findOneOrFail(PasswordResetToken, { user: user.id });
    expect(stored.tokenHash).toBe(createHash('sha256').update(token).digest('hex'));
    expect(stored.tokenHash).not.toContain(token);
    const minutes = (stored.expiresAt.getTime() - stored.createdAt.getTime()) / 60_000;
    expect(minutes).toBeGreaterThan(29.9);
    expect(minutes).toBeLessThan(30.1);

    const tooShort = await confirm(token, 'short');
    expect(tooShort.status).toBe(400);
    expect(tooShort.body.details).toEqual([{ path: 'password', message: 'Use at least 10 characters.' }]);
    // A common password is refused too, and the link stays unspent (it works just below).
    const common = await confirm(token, 'Basketball');
    expect([common.status, common.body.details]).toEqual([
      400,
      [{ path: 'password', message: 'This password is on a list of common passwords; choose another.' }],
    ]);

    await confirm(token, NEW_PASSWORD).then((res) => expect(res.status).toBe(204));
    await signIn(t.app, user.email, NEW_PASSWORD);
    const browser = await anonymousBrowser(t.app);
    await browser.agent
      .post('/api/auth/login')
      .set(CSRF_HEADER, browser.csrf)
      .send({ email: user.email, password: TEST_PASSWORD })
      .expect(401);
    await oldSession.agent.get('/api/auth/me').expect(401);

    const again = await confirm(token, 'yet-another-password');
    expect(again.status).toBe(400);
    expect(again.body).toMatchObject({
      code: 'RESET_LINK_REFUSED',
      message: 'This reset link has already been used. Ask for a new one from the sign-in page.',
    });
    await signIn(t.app, user.email, NEW_PASSWORD);

    const fresh = t.app.get(EntityManager).fork();
    expect((await fresh.findOneOrFail(PasswordResetToken, { id: stored.id })).usedAt).toBeInstanceOf(Date);
    expect(await fresh.count(AuditEntry, { action: 'user.password-reset-by-email', subjectId: user.id })).toBe(1);
  });

  it('refuses an expired link and a made-up one', async () => {
    const user = await givenUser(t.app, ['sales']);
    await requestLink(user.email);
    const token = linkToken((await waitForMail(t.app, (m) => m.envelopeTo.includes(user.email))).text);

    const em = t.app.get(EntityManager).fork();
    const row = await em.findOneOrFail(PasswordResetToken, { user: user.id });
    row.expiresAt = new Date(Date.now() - 1000);
    await em.flush();

    const expired = await confirm(token, NEW_PASSWORD);
    expect(expired.status).toBe(400);
    expect(expired.body.message).toBe('This reset link has expired. Ask for a new one from the sign-in page.');
    const madeUp = await confirm('A'.repeat(43), NEW_PASSWORD);
    expect(madeUp.status).toBe(400);
    expect(madeUp.body.message).toBe('This reset link is not valid. Ask for a new one from the sign-in page.');
    await signIn(t.app, user.email, TEST_PASSWORD);
  });

  it('sends nothing for a deactivated account, with the same answer', async () => {
    const user = await givenUser(t.app, ['service']);
    const em = t.app.get(EntityManager).fork();
    await em.nativeUpdate(User, { id: user.id }, { active: false });
    const res = await requestLink(user.email);
    expect([res.status, res.body]).toEqual([202, { message: PASSWORD_RESET_REQUESTED_MESSAGE }]);
    expect(await em.count(PasswordResetToken, { user: user.id })).toBe(0);
  });
});
