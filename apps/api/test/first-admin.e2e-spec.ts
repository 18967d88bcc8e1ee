import { EntityManager } from '@mikro-orm/postgresql';
import { User } from '../src/users/user.entity';
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
});
