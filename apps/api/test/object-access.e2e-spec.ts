import { generateKeyPairSync } from 'node:crypto';
import { CSRF_HEADER, ROLES, type Certificate as CertificateView, type Verification } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import request from 'supertest';
import { tokenHash } from '../src/auth/password-reset.service';
import { PasswordResetToken } from '../src/auth/password-reset-token.entity';
import { Certificate } from '../src/certificates/certificate.entity';
import { Inspection } from '../src/inspections/inspection.entity';
import { Bench, givenBench, givenLot, post, RB40_STATIONS, startRun, topReadings } from './setup/bench';
import { concretePath, listRoutes } from './setup/routes';
import { givenCustomer, givenReleasedParts, givenSoldSets } from './setup/sets';
import {
  anonymousBrowser,
  Browser,
  givenUser,
  signIn,
  signInAs,
  startTestApp,
  TestApp,
  TEST_PASSWORD,
} from './setup/test-app';

const UUID = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/i;

/**
 * An attacker with a valid session and a guessed (or leaked) id: what the roles allow is checked by
 * the role matrix; these checks are about whose record it is.
 */
describe('access to other people’s records', () => {
  let t: TestApp;
  let bench: Bench;
  let admin: Browser;

  beforeAll(async () => {
    const { privateKey } = generateKeyPairSync('ed25519');
    t = await startTestApp({
      CERTIFICATE_SIGNING_KEY: privateKey.export({ format: 'pem', type: 'pkcs8' }).toString(),
    });
    bench = await givenBench(t);
    admin = await signInAs(t.app, ['admin']);
  }, 60_000);
  afterAll(() => t.close());

  it('lets an inspector record in and end only their own bench run', async () => {
    const lot = await givenLot(bench, 'L-OWN', ['W-1', 'W-2']);
    const run = await startRun(bench, lot.id);
    const parts = await bench.engineer.agent.get(`/api/lots/${lot.id}/parts`).expect(200);
    const [first] = parts.body.items as { id: string }[];
    const other = await signInAs(t.app, ['inspector']);
    const refusal = {
      code: 'RUN_NOT_YOURS',
      message: 'This bench run belongs to Test inspector; start a run of your own.',
    };

    const save = await post(other, `/api/runs/${run.id}/inspections`, {
      partId: first!.id,
      unit: 'in',
      readings: topReadings([-0.0002]),
    });
    expect([save.status, save.body]).toEqual([403, expect.objectContaining(refusal)]);
    const csv = ['serial,station,reading,unit', ...RB40_STATIONS.map((s) => `W-2,${s},-0.0002,in`)].join('\n');
    const imported = await other.agent
      .post(`/api/runs/${run.id}/readings/import`)
      .set(CSRF_HEADER, other.csrf)
      .attach('file', Buffer.from(csv, 'utf8'), 'readings.csv');
    expect([imported.status, imported.body]).toEqual([403, expect.objectContaining(refusal)]);
    const ended = await post(other, `/api/runs/${run.id}/end`, { unit: 'in', masterEndReading: 0 });
    expect([ended.status, ended.body]).toEqual([403, expect.objectContaining(refusal)]);
    expect(await t.app.get(EntityManager).fork().count(Inspection, { run: run.id })).toBe(0);

    // Others may still look at it, and its own inspector goes on working in it.
    const viewed = await other.agent.get(`/api/runs/${run.id}`).expect(200);
    expect(viewed.body.endedAt ?? null).toBeNull();
    await post(bench.inspector, `/api/runs/${run.id}/inspections`, {
      partId: first!.id,
      unit: 'in',
      readings: topReadings([-0.0002]),
    }).expect(201);
    await post(bench.inspector, `/api/runs/${run.id}/end`, { unit: 'in', masterEndReading: 0 }).expect(200);
  });

  it('changes only the signed-in person’s preferences, whatever id the body names', async () => {
    const victim = await givenUser(t.app, ['engineer']);
    const attacker = await signInAs(t.app, ['inspector']);
    await attacker.agent
      .patch('/api/me/preferences')
      .set(CSRF_HEADER, attacker.csrf)
      .send({ displayUnit: 'mm', id: victim.id, userId: victim.id })
      .expect(200);
    expect((await attacker.agent.get('/api/auth/me').expect(200)).body.user.displayUnit).toBe('mm');
    const victimSession = await signIn(t.app, victim.email);
    expect((await victimSession.agent.get('/api/auth/me').expect(200)).body.user.displayUnit).toBe('in');
  });

  it('lets a reset link change only the password of the person it was made for', async () => {
    const owner = await givenUser(t.app, ['sales']);
    const bystander = await givenUser(t.app, ['admin']);
    const bystanderSession = await signIn(t.app, bystander.email);
    const em = t.app.get(EntityManager).fork();
    const token = 'a-token-only-this-test-knows-0123456789';
    em.persist(
      em.create(PasswordResetToken, {
        user: owner,
        tokenHash: tokenHash(token),
        expiresAt: new Date(Date.now() + 10 * 60_000),
        createdAt: new Date(),
      }),
    );
    await em.flush();

    const browser = await anonymousBrowser(t.app);
    await browser.agent
      .post('/api/auth/password-reset/confirm')
      .set(CSRF_HEADER, browser.csrf)
      .send({ token, password: 'granite-surface-plate', email: bystander.email, userId: bystander.id })
      .expect(204);
    await signIn(t.app, owner.email, 'granite-surface-plate');
    await signIn(t.app, bystander.email, TEST_PASSWORD);
    await bystanderSession.agent.get('/api/auth/me').expect(200);
  });

  it('refuses a deactivated person’s old session on every route at once', async () => {
    const person = await givenUser(t.app, [...ROLES]);
    const old = await signIn(t.app, person.email);
    await old.agent.get('/api/auth/me').expect(200);
    await post(admin, `/api/users/${person.id}/deactivate`).expect(200);

    const failures: string[] = [];
    for (const route of listRoutes(t.app).filter((r) => !r.isPublic)) {
      const method = route.method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
      const res = await old.agent[method](concretePath(route.path)).set(CSRF_HEADER, old.csrf).send({});
      if (res.status !== 401 || res.body.code !== 'NOT_SIGNED_IN')
        failures.push(`${route.method} ${route.path} → ${res.status}`);
    }
    expect(failures).toEqual([]);
  });

  it('applies a change of roles to a signed-in session at its next request', async () => {
    const person = await givenUser(t.app, ['sales', 'inspector']);
    const session = await signIn(t.app, person.email);
    await session.agent.get('/api/customers').expect(200);
    await admin.agent
      .put(`/api/users/${person.id}/roles`)
      .set(CSRF_HEADER, admin.csrf)
      .send({ roles: ['inspector'] })
      .expect(200);
    const res = await session.agent.get('/api/customers');
    expect([res.status, res.body.code]).toEqual([403, 'FORBIDDEN']);
  });

  describe('with a certificate issued to a customer', () => {
    let sales: Browser;
    let certificate: CertificateView;
    const customerName = 'Quillfield Gauge Works';

    beforeAll(async () => {
      sales = await signInAs(t.app, ['sales']);
      const serials = ['Q-1', 'Q-2', 'Q-3', 'Q-4'];
      const { ids } = await givenReleasedParts(bench, 'L-CERT', {
        'Q-1': -0.0003,
        'Q-2': -0.00031,
        'Q-3': -0.00032,
        'Q-4': -0.0003,
      });
      const customer = await givenCustomer(sales, customerName);
      const [set] = await givenSoldSets(sales, { customerId: customer.id, orderReference: 'PO-Q-1' }, [
        serials.map((s) => ids[s]!),
      ]);
      const issued = await post(sales, `/api/sets/${set!.id}/certificates`, {}).expect(201);
      certificate = issued.body as CertificateView;
    }, 60_000);

    it('shows the public check exactly the signed certificate, with no internal id or address', async () => {
      const res = await request(t.app.getHttpServer()).get(`/api/verify/${certificate.verificationCode}`).expect(200);
      const answer = res.body as Verification;
      expect(Object.keys(answer).sort()).toEqual(['checkedAt', 'facts', 'revocation', 'signatureValid', 'status']);
      const row = await t.app.get(EntityManager).fork().findOneOrFail(Certificate, { id: certificate.id });
      expect(answer.facts).toEqual(JSON.parse(row.payload));
      expect(answer.facts?.customer.name).toBe(customerName);
      const text = JSON.stringify(answer);
      expect(text).not.toMatch(UUID);
      expect(text).not.toContain('@');
      expect(text).not.toContain(certificate.customerId);
    });

    it('shows a customer, its order, set and certificate to the reading roles only, even with the right ids', async () => {
      const reads = [
        `/api/customers/${certificate.customerId}`,
        `/api/sets/${certificate.setId}`,
        `/api/certificates/${certificate.id}`,
        `/api/certificates/${certificate.id}/pdf`,
      ];
      const inspector = bench.inspector;
      for (const path of reads) {
        const res = await inspector.agent.get(path);
        expect([path, res.status, JSON.stringify(res.body)]).toEqual([
          path,
          403,
          expect.not.stringContaining(customerName),
        ]);
      }
      const service = await signInAs(t.app, ['service']);
      const readers = { sales, service, engineer: bench.engineer, admin };
      for (const [role, reader] of Object.entries(readers))
        for (const path of reads)
          expect([role, path, (await reader.agent.get(path)).status]).toEqual([role, path, 200]);
      // Writing an order is for sales: service and engineers read only.
      for (const [role, writer] of Object.entries({ service, engineer: bench.engineer })) {
        const res = await post(writer, `/api/customers/${certificate.customerId}/orders`, { reference: 'PO-FORGED' });
        expect([role, res.status]).toEqual([role, 403]);
      }
    });
  });
});
