import type { INestApplication } from '@nestjs/common';
import type { Role } from '@evenset/contracts';
import { CSRF_HEADER } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { createHttpApp } from '../../src/http-app';
import { ensureUser } from '../../src/database/factories/user.factory';
import { createTestDatabase, TestDatabase } from './test-database';

export const TEST_PASSWORD = 'correct-horse-battery';

export interface TestApp {
  app: INestApplication;
  db: TestDatabase;
  close(): Promise<void>;
}

/** The real app on its own copy of the migrated database; `env` overrides settings for one file. */
export async function startTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const db = await createTestDatabase();
  Object.assign(
    process.env,
    {
      NODE_ENV: 'test',
      LOG_LEVEL: 'silent',
      WEB_DIST: '/nonexistent',
      DATABASE_URL: db.url,
    },
    env,
  );
  const app = await createHttpApp();
  await app.init();
  return {
    app,
    db,
    close: async () => {
      await app.close();
      await db.drop();
    },
  };
}

/** A person with the given roles, created through the same factory the demo seeder uses. */
export async function givenUser(
  app: INestApplication,
  roles: Role[],
  email = `${roles.join('-')}-${Math.random().toString(36).slice(2, 8)}@test.example`,
) {
  const em = app.get(EntityManager).fork();
  const user = await ensureUser(em, {
    email,
    displayName: `Test ${roles.join(' ')}`,
    roles,
    password: TEST_PASSWORD,
  });
  await em.flush();
  return user;
}

/** A cookie-keeping client holding a CSRF token for its session. */
export interface Browser {
  agent: TestAgent;
  csrf: string;
}

export async function anonymousBrowser(app: INestApplication): Promise<Browser> {
  const agent = request.agent(app.getHttpServer());
  const res = await agent.get('/api/auth/csrf').expect(200);
  return { agent, csrf: (res.body as { csrfToken: string }).csrfToken };
}

export async function signIn(app: INestApplication, email: string, password = TEST_PASSWORD): Promise<Browser> {
  const browser = await anonymousBrowser(app);
  const res = await browser.agent
    .post('/api/auth/login')
    .set(CSRF_HEADER, browser.csrf)
    .send({ email, password })
    .expect(200);
  return {
    agent: browser.agent,
    csrf: (res.body as { csrfToken: string }).csrfToken,
  };
}

export async function signInAs(app: INestApplication, roles: Role[]): Promise<Browser> {
  const user = await givenUser(app, roles);
  return signIn(app, user.email);
}
