/* global fetch, FormData, Blob */
// Faults: the database stopped under a running API, the API killed in the middle of a large CSV
// import, and a mail server that is down when a certificate is e-mailed.
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { ROOT } from '../lib/paths.mjs';
import { sleep, stopApi, waitFor } from './app.mjs';

const requireFromRoot = createRequire(join(ROOT, 'package.json'));

/** (a) PostgreSQL stops: health says so, requests get a clear 503; it starts again: service resumes alone. */
export async function databaseDownCheck({ api, cluster, engineer, admin, check, resumeSeconds }) {
  cluster.stop();
  const health = await fetch(`${api.baseUrl}/api/health`);
  const healthBody = await health.json();
  const request = await engineer.request('GET', '/api/lots');
  const write = await admin.request('POST', '/api/customers', {
    name: 'Stress Down Ltd',
    contactEmail: 'down@stress.example',
  });
  check(
    'database down: /api/health answers 503 and says the database is down',
    health.status === 503 && healthBody.database?.status === 'down',
    `health ${health.status}, database ${healthBody.database?.status}`,
  );
  check(
    'database down: requests answer 503 DATABASE_UNAVAILABLE',
    request.status === 503 &&
      request.body?.code === 'DATABASE_UNAVAILABLE' &&
      write.status === 503 &&
      write.body?.code === 'DATABASE_UNAVAILABLE',
    `GET /api/lots ${request.status} ${request.body?.code}, POST /api/customers ${write.status} ${write.body?.code}`,
  );
  const stoppedAt = Date.now();
  cluster.start();
  const started = Date.now();
  const back = await waitFor(
    async () => (await fetch(`${api.baseUrl}/api/health`)).status === 200,
    resumeSeconds * 1000,
    100,
  );
  const after = (Date.now() - started) / 1000;
  const lots = await engineer.request('GET', '/api/lots');
  const created = await admin.request('POST', '/api/customers', {
    name: 'Stress Back Ltd',
    contactEmail: 'back@stress.example',
  });
  check(
    `database back: health 200 within ${resumeSeconds} s and requests work, same API process`,
    back && lots.status === 200 && created.status === 201 && api.child.exitCode === null,
    `health 200 ${after.toFixed(1)} s after PostgreSQL was up again (down ${((started - stoppedAt) / 1000).toFixed(1)} s); ` +
      `GET /api/lots ${lots.status}, POST /api/customers ${created.status}; API pid ${api.pid} still running`,
  );
}

/** A released 10-station spec (RB-40's rules, a 2 × 5 grid), so 10,000 parts make 100,000 rows. */
async function gridSpec(engineer, db) {
  const { RB40_REV_B } = requireFromRoot(join(ROOT, 'apps/api/dist/database/seeders/demo-specs.js'));
  const material = (await db.query(`select material_id from part_spec where part_number = 'RB-40' limit 1`)).rows[0]
    .material_id;
  const stations = Array.from({ length: 10 }, (_, i) => ({
    name: `G${i + 1}`,
    x: 0.2 + (i % 5) * 0.3,
    y: i < 5 ? 0.2 : 1.3,
  }));
  const definition = { ...RB40_REV_B, materialId: material, plan: { stations, datumStations: [], runoutCircles: [] } };
  const spec = await engineer.expect(
    'POST',
    '/api/specs',
    { partNumber: `GRID-${Date.now() % 100000}`, definition },
    201,
  );
  await engineer.expect('POST', `/api/specs/${spec.id}/release`, undefined, 200);
  return { id: spec.id, stations };
}

async function lotWithRun(engineer, inspector, db, specId, lotNumber) {
  const lot = await engineer.expect(
    'POST',
    '/api/lots',
    { lotNumber, specId, quantity: 10_000, grindDate: '2026-11-20' },
    201,
  );
  for (let start = 0; start < 10_000; start += 1000) {
    await engineer.expect(
      'POST',
      `/api/lots/${lot.id}/parts`,
      { pattern: { prefix: `${lotNumber}-`, start, count: 1000, digits: 5 } },
      201,
    );
  }
  const ids = (
    await db.query(
      `select (select id from master_gauge where code = 'MG-1.500-A') as master, (select id from instrument where code = 'IND-01') as instrument`,
    )
  ).rows[0];
  const run = await inspector.expect(
    'POST',
    '/api/runs',
    {
      lotId: lot.id,
      masterId: ids.master,
      instrumentId: ids.instrument,
      unit: 'in',
      masterTemperature: 20.5,
      partTemperature: 21,
      masterStartReading: 0,
    },
    201,
  );
  return { lotId: lot.id, runId: run.id };
}

function csvFor(lotNumber, stations) {
  const rows = ['serial,station,reading,unit'];
  for (let p = 0; p < 10_000; p++) {
    const serial = `${lotNumber}-${String(p).padStart(5, '0')}`;
    stations.forEach((s, i) =>
      rows.push(`${serial},${s.name},${(-0.0002 + 0.00002 * Math.sin(p * 7.3 + i * 1.7)).toFixed(6)},in`),
    );
  }
  return rows.join('\n');
}

const upload = (session, runId, csv) => {
  const form = new FormData();
  form.append('file', new Blob([csv], { type: 'text/csv' }), 'readings.csv');
  return session.request('POST', `/api/runs/${runId}/readings/import`, form);
};

const countsOf = async (db, lotId) =>
  (
    await db.query(
      `select count(distinct i.id)::int as inspections, count(r.id)::int as readings
         from inspection i join part p on p.id = i.part_id left join inspection_reading r on r.inspection_id = i.id
        where p.lot_id = $1`,
      [lotId],
    )
  ).rows[0];

/** (b) SIGKILL during a 100,000-row import, restart: the import is all there or not there at all. */
export async function importKillCheck({ api, restart, db, engineer, inspector, check }) {
  const spec = await gridSpec(engineer, db);
  const tag = Date.now() % 100000;

  // A full import first, to know how long one takes and that the file is good.
  const whole = await lotWithRun(engineer, inspector, db, spec.id, `L-WHOLE-${tag}`);
  const wholeCsv = csvFor(`L-WHOLE-${tag}`, spec.stations);
  const t0 = Date.now();
  const done = await upload(inspector, whole.runId, wholeCsv);
  const importMs = Date.now() - t0;
  const wholeCounts = await countsOf(db, whole.lotId);
  check(
    'import: a 100,000-row CSV imports whole',
    done.status === 201 && wholeCounts.readings === 100_000 && wholeCounts.inspections === 10_000,
    `${done.status} in ${(importMs / 1000).toFixed(1)} s; ${wholeCounts.inspections} inspections, ${wholeCounts.readings} readings`,
  );

  // The same size of import again, with the API killed half way through it.
  const cut = await lotWithRun(engineer, inspector, db, spec.id, `L-CUT-${tag}`);
  const cutCsv = csvFor(`L-CUT-${tag}`, spec.stations);
  const killAfter = Math.max(50, Math.round(importMs / 2));
  const pending = upload(inspector, cut.runId, cutCsv).catch((error) => ({ status: 'connection lost', error }));
  await sleep(killAfter);
  const open = (
    await db.query(
      `select count(*)::int as n from pg_stat_activity
        where datname = current_database() and pid <> pg_backend_pid() and xact_start is not null`,
    )
  ).rows[0].n;
  await stopApi(api, 'SIGKILL');
  const answer = await pending;
  const next = await restart();
  const cutCounts = await countsOf(db, cut.lotId);
  const allOrNothing =
    (cutCounts.readings === 0 && cutCounts.inspections === 0) ||
    (cutCounts.readings === 100_000 && cutCounts.inspections === 10_000);
  check(
    'import: SIGKILL in the middle of a 100,000-row import leaves all of it or none',
    allOrNothing && answer.status !== 201,
    `killed at ${killAfter} ms (transactions open then: ${open}); client saw ${answer.status}; ` +
      `after restart ${cutCounts.inspections} inspections, ${cutCounts.readings} readings`,
  );
  // Nothing half-done is left in the way: the same file imports after the restart.
  const again = await upload(inspector, cut.runId, cutCsv);
  const againCounts = await countsOf(db, cut.lotId);
  check(
    'import: after the restart the same file imports whole',
    again.status === 201 && againCounts.readings === 100_000,
    `${again.status}; ${againCounts.inspections} inspections, ${againCounts.readings} readings`,
  );
  return next;
}

/** (c) The mail server is down: certificates are still issued; the failed send is retried once it is up. */
export async function mailDownCheck({ db, databaseUrl, smtpPort, sales, admin, setId, check }) {
  const certificate = await sales.request('POST', `/api/sets/${setId}/certificates`);
  const emailed = await sales.request('POST', `/api/certificates/${certificate.body?.id}/email`, {
    recipient: 'buyer@stress.example',
  });
  const attempts = async (messageId) =>
    (await db.query('select count(*)::int as n from mail_attempt where message_id = $1', [messageId])).rows[0].n;
  const messageId = emailed.body?.messageId;
  check(
    'mail down: the certificate is issued and the failed send is on record',
    certificate.status === 201 &&
      emailed.status === 200 &&
      emailed.body?.status === 'failed' &&
      (await attempts(messageId)) === 1,
    `certificate ${certificate.status} (${certificate.body?.certificateNumber ?? certificate.body?.code ?? '?'}); e-mail ${emailed.body?.status}: ${emailed.body?.error}`,
  );
  const { startMailSink } = requireFromRoot(join(ROOT, 'apps/api/dist/mail/sink/mail-sink.js'));
  const sink = await startMailSink({ port: smtpPort, databaseUrl });
  try {
    const retried = await admin.request('POST', `/api/outbox/messages/${messageId}/retry`);
    const caught = await waitFor(
      async () =>
        (
          await db.query(
            `select count(*)::int as n from captured_mail where envelope_to::text ilike '%buyer@stress.example%'`,
          )
        ).rows[0].n > 0,
      10_000,
    ).catch(() => false);
    check(
      'mail back: a retry sends the queued message',
      retried.status === 200 && retried.body?.status === 'sent' && (await attempts(messageId)) === 2,
      `retry ${retried.status} ${retried.body?.status}; ${await attempts(messageId)} attempts on record; caught by the sink: ${caught}`,
    );
  } finally {
    await sink.close();
  }
}
