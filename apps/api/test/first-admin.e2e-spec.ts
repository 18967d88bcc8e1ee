import { EntityManager } from '@mikro-orm/postgresql';
import { createHttpApp } from '../src/http-app';
import { User } from '../src/users/user.entity';
import { createTestDatabase } from './setup/test-database';
import { signIn, startTestApp, TestApp } from './setup/test-app';

describe('first admin from the environment', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({
      EVENSET_ADMIN_EMAIL: 'Owner@Shop.example',
      EVENSET_ADMIN_PASSWORD: 'first-admin-password',
    });
  });
  afterAll(() => t.close());

  it('is created at start when no admin exists, and can sign in', async () => {
    const admins = await t.app
      .get(EntityManager)
      .fork()
      .find(User, { roles: { $contains: ['admin'] } });
    expect(admins.map((u) => u.email)).toEqual(['owner@shop.example']);
    const browser = await signIn(t.app, 'owner@shop.example', 'first-admin-password');
    const me = await browser.agent.get('/api/auth/me').expect(200);
    expect(me.body.user.roles).toEqual(['admin']);
  });

  it('refuses to start with a common password for the first admin, creating no one', async () => {
    const db = await createTestDatabase();
    Object.assign(process.env, { DATABASE_URL: db.url, EVENSET_ADMIN_PASSWORD: 'Administrator' });
    const app = await createHttpApp();
    try {
      await expect(app.init()).rejects.toThrow('This password is on a list of common passwords; choose another.');
      expect(await app.get(EntityManager).fork().count(User, {})).toBe(0);
    } finally {
      await app.close();
      await db.drop();
    }
  });
});
