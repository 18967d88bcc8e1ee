#!/usr/bin/env node
// npm run test:stress: load and fault checks against the built app (not part of `npm test`).
// Runs on a throwaway PostgreSQL cluster of its own (port EVENSET_STRESS_PG_PORT, default 54399),
// because one check stops the database; the shared development cluster is never touched.
// STRESS_SECONDS bounds the load phase (default 60). Exits non-zero when any check fails.
import pg from 'pg';
import { buildIfStale } from './lib/build.mjs';
import { API_DB_CLI } from './lib/paths.mjs';
import { run } from './lib/run.mjs';
import { SIGNING_KEY, Session, freePort, startApi, stopApi } from './stress/app.mjs';
import { createCluster } from './stress/cluster.mjs';
import { databaseDownCheck, importKillCheck, mailDownCheck } from './stress/faults.mjs';
import { loadCheck, setRaceCheck } from './stress/load.mjs';

const PG_PORT = Number(process.env.EVENSET_STRESS_PG_PORT ?? 54399);
const SECONDS = Number(process.env.STRESS_SECONDS ?? 60);
const results = [];
const check = (name, pass, figures) => {
  results.push({ name, pass, figures });
  console.log(`${pass ? 'PASS' : 'FAIL'}  ${name}\n      ${figures}`);
};
const phase = (title) => console.log(`\n== ${title} (${new Date().toISOString().slice(11, 19)} UTC)`);

const began = Date.now();
let cluster;
let api;
let db;
try {
  buildIfStale(['contracts', 'metrology', 'api']);
  phase(`Throwaway PostgreSQL on 127.0.0.1:${PG_PORT}, migrated and seeded`);
  cluster = createCluster(PG_PORT);
  for (const command of ['migrate', 'seed']) {
    run(process.execPath, [API_DB_CLI, command], {
      env: { DATABASE_URL: cluster.url, CERTIFICATE_SIGNING_KEY: SIGNING_KEY, LOG_LEVEL: 'warn' },
      quiet: true,
    });
  }
  db = new pg.Client({ connectionString: cluster.url });
  // The checking connection must outlive the database stop; it reconnects afterwards.
  await db.connect();

  const port = await freePort();
  // Nothing listens here until the mail check starts a sink on it.
  const smtpPort = await freePort();
  const start = () => startApi({ port, databaseUrl: cluster.url, smtpUrl: `smtp://127.0.0.1:${smtpPort}` });
  api = await start();
  console.log(`API pid ${api.pid} on ${api.baseUrl}; SMTP_URL points at closed port ${smtpPort}`);
  const admin = await Session.signIn(api.baseUrl, 'admin@kestrel.example');
  const engineer = await Session.signIn(api.baseUrl, 'engineer@kestrel.example');
  const sales = await Session.signIn(api.baseUrl, 'sales@kestrel.example');
  const inspector = await Session.signIn(api.baseUrl, 'inspector@kestrel.example');

  phase(`Load: 50 inspectors saving, 20 readers, up to ${SECONDS} s`);
  await loadCheck({
    baseUrl: api.baseUrl,
    db,
    admin,
    engineer,
    seconds: SECONDS,
    inspectors: 50,
    readers: 20,
    partsPerInspector: Number(process.env.STRESS_PARTS ?? 100),
    check,
  });

  phase('Sets: 20 concurrent allocations of the same parts');
  const race = await setRaceCheck({ baseUrl: api.baseUrl, db, admin, check });

  phase('Fault: mail server down');
  if (race.setId)
    await mailDownCheck({ db, databaseUrl: cluster.url, smtpPort, sales, admin, setId: race.setId, check });
  else check('mail down', false, 'no set was allocated to certify');

  phase('Fault: PostgreSQL stopped and started under the running API');
  await db.end();
  await databaseDownCheck({ api, cluster, engineer, admin, check, resumeSeconds: 30 });
  db = new pg.Client({ connectionString: cluster.url });
  await db.connect();

  phase('Fault: SIGKILL during a 100,000-row CSV import');
  api = await importKillCheck({ api, restart: start, db, engineer, inspector, check });
} catch (error) {
  check('stress run completed', false, error instanceof Error ? error.stack : String(error));
} finally {
  if (api) await stopApi(api);
  await db?.end().catch(() => undefined);
  cluster?.remove();
}

const failed = results.filter((r) => !r.pass);
console.log(
  `\n${results.length - failed.length} of ${results.length} checks passed in ${((Date.now() - began) / 1000).toFixed(0)} s` +
    (failed.length ? `; FAILED: ${failed.map((r) => r.name).join('; ')}` : ''),
);
process.exitCode = failed.length ? 1 : 0;
