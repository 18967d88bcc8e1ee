import { generateKeyPairSync } from 'node:crypto';
import { MikroORM } from '@mikro-orm/postgresql';
import { Client } from 'pg';
import { DemoSeeder } from '../src/database/seeders/demo.seeder';
import { startTestApp, TestApp } from './setup/test-app';

/**
 * Every table whose rows are evidence, each with a column a forger would want to rewrite. The
 * database itself (trigger `refuse_change`, migrations) refuses UPDATE, DELETE and TRUNCATE on them,
 * so even a bug in the server, or someone at a SQL prompt as the app's user, cannot rewrite history.
 */
const PERMANENT: Record<string, string> = {
  audit_entry: 'action',
  calibration_certificate: 'sha256',
  certificate: 'payload', // an issued certificate's frozen content; its signature covers the payload
  certificate_revocation: 'reason', // revoking is a new row here, never a change to the certificate
  gauge_study: 'trials',
  gauge_study_measurement: 'reading_mm',
  gauge_study_slot: 'inspector_id',
  grind_request: 'target_height_mm',
  grind_request_step: 'status',
  inspection: 'master_reading_mm',
  inspection_reading: 'reading_mm',
  inspection_result: 'verdict',
  mail_attachment: 'content',
  mail_attempt: 'outcome',
  mail_message: 'recipient',
  master_calibration: 'calibrated_size_mm',
  matched_set: 'order_id',
  part_disposition: 'kind',
  set_member: 'height_mm',
};

/** Tables whose rows change by design; a new table must be put in one list or the other. */
const CHANGEABLE = [
  'app_user', // roles, activation, password
  'bench_run', // a run is opened and closed
  'captured_mail', // the development mail catcher's inbox, not a record
  'customer', // contact details
  'customer_order', // order details
  'instrument', // taken out of use
  'lot', // description
  'master_gauge', // taken out of use
  'material', // expansion coefficient (a released spec keeps its own frozen copy)
  'part', // serial list of a lot
  'part_current', // derived from inspection and inspection_result by a trigger, like an index
  'part_spec', // draft edits, release, supersession
  'password_reset_token', // marked used
  'schema_migration', // the migrator's bookkeeping
  'session', // the session store
];

// ROW | BEFORE | DELETE | UPDATE, and BEFORE | TRUNCATE (pg_trigger.tgtype bits, PostgreSQL's
// src/include/catalog/pg_trigger.h: TRIGGER_TYPE_ROW 1, _BEFORE 2, _DELETE 8, _UPDATE 16, _TRUNCATE 32).
const ROW_BEFORE_UPDATE_OR_DELETE = 1 | 2 | 8 | 16;
const BEFORE_TRUNCATE = 2 | 32;

describe('records are permanent in the database', () => {
  let t: TestApp;
  let db: Client;

  beforeAll(async () => {
    // The demo data signs certificates, as `npm start` arranges with its own key.
    const { privateKey } = generateKeyPairSync('ed25519');
    t = await startTestApp({
      CERTIFICATE_SIGNING_KEY: privateKey.export({ format: 'pem', type: 'pkcs8' }).toString(),
    });
    await t.app.get(MikroORM).getSeeder().seed(DemoSeeder);
    // Connected as the app's own database user, the one a server bug would use.
    db = new Client({ connectionString: t.db.url });
    await db.connect();
    // The demo data has no revocation, grind request or e-mail yet: one real-looking row of each.
    await db.query(`
      insert into certificate_revocation (id, created_at, certificate_id, reason, revoked_by_name)
        select gen_random_uuid(), now(), id, 'Issued against the wrong order.', 'Test engineer'
        from certificate order by certificate_number limit 1;
      insert into grind_request (id, created_at, request_number, part_id, original_set_id, current_height_mm,
          target_height_mm, stock_mm, window_low_mm, window_high_mm, passes, requested_by_name)
        select gen_random_uuid(), now(), 'GR-TEST-1', part_id, set_id, 38.1, 38.09, 0.01, 38.089, 38.091, '[]',
          'Test service'
        from set_member order by id limit 1;
      insert into grind_request_step (id, created_at, request_id, status, recorded_by_name)
        select gen_random_uuid(), now(), id, 'open', 'Test service' from grind_request;
      insert into mail_message (id, created_at, kind, recipient, subject, body)
        values (gen_random_uuid(), now(), 'certificate', 'buyer@test.example', 'Certificate', 'Attached.');
      insert into mail_attachment (id, created_at, message_id, filename, content_type, content)
        select gen_random_uuid(), now(), id, 'certificate.pdf', 'application/pdf', '\\x25504446'::bytea
        from mail_message;
      insert into mail_attempt (id, created_at, message_id, outcome, server_response)
        select gen_random_uuid(), now(), id, 'sent', '250 OK' from mail_message;
    `);
  }, 120_000);
  afterAll(async () => {
    await db.end();
    await t.close();
  });

  it('guards exactly the record tables, each against UPDATE, DELETE and TRUNCATE', async () => {
    const { rows: tables } = await db.query<{ name: string }>(
      `select c.relname as name from pg_class c join pg_namespace n on n.oid = c.relnamespace
       where n.nspname = 'public' and c.relkind in ('r', 'p') order by 1`,
    );
    expect(tables.map((r) => r.name)).toEqual([...Object.keys(PERMANENT), ...CHANGEABLE].sort());

    // Enabled triggers that call refuse_change, per table and kind ('O' = fires in normal operation).
    const { rows: guards } = await db.query<{ name: string; types: number[] }>(
      `select c.relname as name, array_agg(t.tgtype::int order by t.tgtype) as types
       from pg_trigger t join pg_class c on c.oid = t.tgrelid join pg_proc p on p.oid = t.tgfoid
       where p.proname = 'refuse_change' and t.tgenabled = 'O' and not t.tgisinternal
       group by c.relname order by 1`,
    );
    expect(guards).toEqual(
      Object.keys(PERMANENT)
        .sort()
        .map((name) => ({ name, types: [ROW_BEFORE_UPDATE_OR_DELETE, BEFORE_TRUNCATE] })),
    );
  });

  it.each(Object.entries(PERMANENT))('refuses to change or remove a row of %s', async (table, column) => {
    const count = async () => (await db.query<{ n: number }>(`select count(*)::int as n from "${table}"`)).rows[0]!.n;
    const before = await count();
    expect(before).toBeGreaterThan(0);
    const one = `(select id from "${table}" order by id limit 1)`;
    const refused = async (statement: string, operation: string) => {
      const error = (await db.query(statement).then(
        () => null,
        (e: unknown) => e,
      )) as { code?: string; message?: string } | null;
      expect({ code: error?.code, message: error?.message }).toEqual({
        code: '23000', // integrity_constraint_violation
        message: `rows of ${table} are permanent and cannot be ${operation}`,
      });
    };
    await refused(`update "${table}" set "${column}" = "${column}" where id = ${one}`, 'update');
    await refused(`update "${table}" set created_at = created_at - interval '1 day'`, 'update');
    await refused(`delete from "${table}" where id = ${one}`, 'delete');
    await refused(`truncate "${table}" cascade`, 'truncate');
    expect(await count()).toBe(before);
  });
});
