import { CSRF_HEADER } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { AuditEntry } from '../src/audit/audit-entry.entity';
import { addDays, todayIso } from '../src/common/gauges/gauge-status';
import { Browser, signInAs, startTestApp, TestApp } from './setup/test-app';

describe('instruments', () => {
  let t: TestApp;
  let engineer: Browser;
  let inspector: Browser;
  const today = todayIso();

  // Sign-ins hash with scrypt: slow while the API suites run in parallel.
  beforeAll(async () => {
    t = await startTestApp();
    engineer = await signInAs(t.app, ['engineer']);
    inspector = await signInAs(t.app, ['inspector']);
  }, 30_000);
  afterAll(() => t.close());

  const send = (method: 'post' | 'put', path: string, body: object) =>
    engineer.agent[method](path).set(CSRF_HEADER, engineer.csrf).send(body);
  const indicator = {
    code: 'ind-7',
    kind: 'indicator',
    description: 'Test indicator',
    unit: 'in',
    resolution: 0.0001,
    calibrationDueOn: addDays(today, 100),
  };

  it('records an indicator with a tenth resolution in millimetres, with an audit entry', async () => {
    const res = await send('post', '/api/instruments', indicator);
    expect(res.status).toBe(201);
    // 0.0001 in = 0.00254 mm (1 in = 25.4 mm exactly, NIST SP 811, App. B).
    expect(res.body).toMatchObject({ code: 'IND-7', resolution: 0.00254, status: 'in-service' });
    const updated = await send('put', `/api/instruments/${res.body.id}`, {
      ...indicator,
      calibrationDueOn: addDays(today, 20),
    });
    expect(updated.body.status).toBe('due-soon');
    const entries = await t.app
      .get(EntityManager)
      .fork()
      .find(AuditEntry, { subjectId: res.body.id }, { orderBy: { createdAt: 'asc' } });
    expect(entries.map((e) => e.action)).toEqual(['instrument.create', 'instrument.update']);
    expect(entries[1]?.before).toMatchObject({ calibrationDueOn: addDays(today, 100) });
  });

  it('lists only in-date, unretired instruments for the Bench', async () => {
    await send('post', '/api/instruments', {
      ...indicator,
      code: 'HG-LATE',
      kind: 'height-gauge',
      unit: 'mm',
      resolution: 0.001,
      calibrationDueOn: addDays(today, -1),
    }).expect(201);
    const retired = await send('post', '/api/instruments', { ...indicator, code: 'IND-OLD' }).expect(201);
    await send('post', `/api/instruments/${retired.body.id}/retire`, { reason: 'Spindle sticks.' }).expect(200);
    const all = await inspector.agent.get('/api/instruments').query({ sort: 'code:asc' }).expect(200);
    expect(all.body.items.map((i: { code: string; status: string }) => `${i.code} ${i.status}`)).toEqual([
      'HG-LATE overdue',
      'IND-7 due-soon',
      'IND-OLD retired',
    ]);
    const usable = await inspector.agent.get('/api/instruments').query({ usable: 'true' }).expect(200);
    expect(usable.body.items.map((i: { code: string }) => i.code)).toEqual(['IND-7']);
  });

  it('refuses bad input naming the field, a duplicate code, and writes by an inspector', async () => {
    const bad = await send('post', '/api/instruments', {
      ...indicator,
      code: 'X-1',
      resolution: -0.001,
      kind: 'laser',
    });
    expect(bad.status).toBe(400);
    expect(bad.body.details.map((d: { path: string }) => d.path).sort()).toEqual(['kind', 'resolution']);
    const twin = await send('post', '/api/instruments', indicator);
    expect(twin.status).toBe(409);
    expect(twin.body.code).toBe('GAUGE_CODE_TAKEN');
    const denied = await inspector.agent.post('/api/instruments').set(CSRF_HEADER, inspector.csrf).send(indicator);
    expect(denied.status).toBe(403);
  });
});
