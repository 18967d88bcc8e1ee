import { CSRF_HEADER, ROLES } from '@evenset/contracts';
import type { Role } from '@evenset/contracts';
import request from 'supertest';
import { concretePath, listRoutes, RouteInfo } from './setup/routes';
import { Browser, signInAs, startTestApp, TestApp } from './setup/test-app';

// Deny by default, checked over every route Nest knows of, so a route added later without its
// roles fails here.
describe('role matrix', () => {
  let t: TestApp;
  let routes: RouteInfo[];
  const browsers = new Map<Role, Browser>();

  beforeAll(async () => {
    t = await startTestApp();
    routes = listRoutes(t.app);
    for (const role of ROLES) browsers.set(role, await signInAs(t.app, [role]));
    // One scrypt sign-in per role: slow on a busy machine.
  }, 30_000);
  afterAll(() => t.close());

  const call = (client: request.Agent | ReturnType<typeof request>, route: RouteInfo, csrf?: string) => {
    const method = route.method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
    const req = (client as unknown as Record<typeof method, (url: string) => request.Test>)[method](
      concretePath(route.path),
    );
    return csrf ? req.set(CSRF_HEADER, csrf) : req;
  };

  it('finds the routes of every module', () => {
    const paths = routes.map((r) => `${r.method} ${r.path}`);
    expect(paths).toEqual(
      expect.arrayContaining(['POST /api/auth/login', 'GET /api/users', 'POST /api/users', 'GET /api/health']),
    );
  });

  it('has every route declare its roles or declare itself public', () => {
    const undeclared = routes.filter((r) => !r.isPublic && (!r.roles || r.roles.length === 0)).map((r) => r.handler);
    expect(undeclared).toEqual([]);
  });

  it('answers 401 to an anonymous caller on every non-public route', async () => {
    const failures: string[] = [];
    for (const route of routes.filter((r) => !r.isPublic)) {
      const res = await call(request(t.app.getHttpServer()), route);
      if (res.status !== 401) failures.push(`${route.method} ${route.path} → ${res.status}`);
    }
    expect(failures).toEqual([]);
  });

  it('answers 403 to every signed-in role outside a route’s list', async () => {
    const failures: string[] = [];
    for (const route of routes.filter((r) => !r.isPublic)) {
      for (const role of ROLES.filter((r) => !route.roles?.includes(r))) {
        const browser = browsers.get(role)!;
        const res = await call(browser.agent, route, browser.csrf);
        if (res.status !== 403 || res.body.code !== 'FORBIDDEN')
          failures.push(`${role}: ${route.method} ${route.path} → ${res.status}`);
      }
    }
    expect(failures).toEqual([]);
  });

  it('refuses every state-changing request without the CSRF token, even from an allowed role', async () => {
    const writes = routes.filter((r) => r.method !== 'GET');
    expect(writes.length).toBeGreaterThan(0);
    const failures: string[] = [];
    for (const route of writes) {
      const role = route.isPublic ? 'inspector' : route.roles![0]!;
      const res = await call(browsers.get(role)!.agent, route);
      if (res.status !== 403 || res.body.code !== 'CSRF_INVALID')
        failures.push(`${route.method} ${route.path} → ${res.status}`);
    }
    expect(failures).toEqual([]);
  });
});
