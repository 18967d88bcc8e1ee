import { CSRF_HEADER, ROLES } from '@evenset/contracts';
import type { Role } from '@evenset/contracts';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { concretePath, listRoutes, RouteInfo } from './setup/routes';
import { Browser, signInAs, startTestApp, TestApp } from './setup/test-app';

/** Every `*.controller.ts` file under a folder. */
function controllerSources(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(entry.parentPath, entry.name);
    if (entry.isDirectory()) return controllerSources(path);
    return entry.name.endsWith('.controller.ts') ? [path] : [];
  });
}

interface ExpressLayer {
  route?: { path: string; methods: Record<string, boolean> };
}

/**
 * Every method + path Express itself routes. Middleware Nest mounts for all methods (request
 * context, logging) shows up as an all-methods route and is not an endpoint.
 */
function expressRoutes(t: TestApp): string[] {
  const express = t.app.getHttpAdapter().getInstance() as { router: { stack: ExpressLayer[] } };
  return express.router.stack.flatMap(({ route }) => {
    if (!route) return [];
    const methods = Object.keys(route.methods);
    return methods.length > 1 ? [] : methods.map((m) => `${m.toUpperCase()} ${route.path}`);
  });
}

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

  it('finds the routes of every controller in the sources, and Express serves no other route', () => {
    // A controller left out of its module would be missing here, and its routes unchecked.
    const declared = controllerSources(join(__dirname, '../src')).flatMap((file) =>
      [...readFileSync(file, 'utf8').matchAll(/@Controller\([^)]*\)[\s\S]*?export class (\w+)/g)].map((m) => m[1]!),
    );
    const checked = new Set(routes.map((r) => r.handler.split('.')[0]!));
    expect(declared.length).toBeGreaterThan(20);
    expect(declared.filter((name) => !checked.has(name))).toEqual([]);
    expect([...checked].filter((name) => !declared.includes(name))).toEqual([]);

    // Routes added to Express directly (not through a controller) would bypass the guards: the only
    // ones allowed are the OpenAPI pages, which describe the routes and hold no data.
    const listed = routes.map((r) => `${r.method} ${r.path}`);
    const served = expressRoutes(t);
    expect(listed.filter((r) => !served.includes(r))).toEqual([]);
    const extra = served.filter((r) => !listed.includes(r));
    expect(extra.filter((r) => !/^GET \/api\/docs(-json|-yaml|\/.*)?$/.test(r))).toEqual([]);
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
