#!/usr/bin/env node
// Area 3: lot review and trends on a part number with 500 lots and 20,000 inspected parts, through
// the built API over HTTP (autocannon, one connection: the response time one engineer sees), beside
// GET /api/health on the same server as the floor. The data lives in its own database
// (evenset_bench, or BENCH_DATABASE_URL), made once: migrated, demo data, then 500 lots copied in
// SQL from one inspected demo part. Reused while it holds them; drop it to start over.
/* global fetch -- Node 20 has it; the lint config predates it in .mjs scripts */
import { spawn, spawnSync } from 'node:child_process';
import { generateKeyPairSync, randomBytes } from 'node:crypto';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { checkBudgets, ms, percentile, printTable, ratio } from './lib/bench-stats.mjs';
import { API_DB_CLI, API_DIST_MAIN, ROOT, WEB_DIST } from './lib/paths.mjs';
import { LOCAL_DATABASE_URL } from './lib/postgres.mjs';

const LOTS = 500;
const PARTS_PER_LOT = 40;
const PAGE_SIZE = 50;
const require = createRequire(join(ROOT, 'package.json'));
const { Client } = require('pg');
const autocannon = require('autocannon');

const withDatabase = (url, name) => Object.assign(new URL(url), { pathname: `/${name}` }).toString();
const BENCH_URL =
  process.env.BENCH_DATABASE_URL ?? withDatabase(process.env.DATABASE_URL ?? LOCAL_DATABASE_URL, 'evenset_bench');
const benchName = new URL(BENCH_URL).pathname.slice(1);
// One certificate key for the demo data and the server, kept with nothing else: this is a throwaway.
const signingKey = generateKeyPairSync('ed25519').privateKey.export({ format: 'pem', type: 'pkcs8' }).toString();

async function sql(url, text, values) {
  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    return (await client.query(text, values)).rows;
  } finally {
    await client.end();
  }
}

function cli(command) {
  const out = spawnSync(process.execPath, [API_DB_CLI, command], {
    env: { ...process.env, DATABASE_URL: BENCH_URL, CERTIFICATE_SIGNING_KEY: signingKey, LOG_LEVEL: 'warn' },
    encoding: 'utf8',
  });
  if (out.status !== 0) throw new Error(`${command} of ${benchName} failed:\n${out.stderr}${out.stdout}`);
}

/** 500 lots × 40 parts of the part number of one inspected demo part, each with run, inspection, readings and result. */
async function enlarge() {
  const [t] = await sql(
    BENCH_URL,
    `select i.id as inspection, i.run_id as run, l.spec_id as spec, p.part_number as part_number
       from inspection i join inspection_result r on r.inspection_id = i.id
       join part p on p.id = i.part_id join lot l on l.id = p.lot_id
      where i.supersedes_id is null and r.verdict = 'conforms'
      order by i.created_at limit 1`,
  );
  if (!t) throw new Error('The demo data holds no conforming inspection to copy.');
  const client = new Client({ connectionString: BENCH_URL });
  await client.connect();
  try {
    await client.query('begin');
    await client.query(
      `insert into lot (id, created_at, lot_number, spec_id, quantity, grind_date)
       select gen_random_uuid(), now(), 'BL-' || lpad(g::text, 4, '0'), $1, $2, date '2024-01-01' + g
         from generate_series(1, $3::int) g`,
      [t.spec, PARTS_PER_LOT, LOTS],
    );
    await client.query(
      `insert into bench_run (id, created_at, lot_id, master_id, master_calibration_id, instrument_id, inspector_id,
              inspector_name, master_temperature_c, part_temperature_c, master_start_reading_mm, master_end_reading_mm,
              drift_limit_mm, ended_at)
       select gen_random_uuid(), r.created_at, l.id, r.master_id, r.master_calibration_id, r.instrument_id, r.inspector_id,
              r.inspector_name, r.master_temperature_c, r.part_temperature_c, r.master_start_reading_mm,
              r.master_end_reading_mm, r.drift_limit_mm, r.ended_at
         from lot l cross join bench_run r where l.lot_number like 'BL-%' and r.id = $1`,
      [t.run],
    );
    await client.query(
      `insert into part (id, created_at, lot_id, part_number, serial)
       select gen_random_uuid(), now(), l.id, $1, l.lot_number || '-' || lpad(g::text, 2, '0')
         from lot l cross join generate_series(1, $2::int) g where l.lot_number like 'BL-%'`,
      [t.part_number, PARTS_PER_LOT],
    );
    await client.query(
      `insert into inspection (id, created_at, part_id, run_id, spec_id, master_calibration_id, instrument_id,
              instrument_resolution_mm, master_reading_mm, master_temperature_c, part_temperature_c,
              part_expansion_per_k, master_expansion_per_k, inspector_id, inspector_name)
       select gen_random_uuid(), now() + (row_number() over (order by p.serial)) * interval '1 ms', p.id, r.id,
              i.spec_id, i.master_calibration_id, i.instrument_id, i.instrument_resolution_mm, i.master_reading_mm,
              i.master_temperature_c, i.part_temperature_c, i.part_expansion_per_k, i.master_expansion_per_k,
              i.inspector_id, i.inspector_name
         from part p join lot l on l.id = p.lot_id join bench_run r on r.lot_id = l.id
         cross join inspection i where l.lot_number like 'BL-%' and i.id = $1`,
      [t.inspection],
    );
    await client.query(
      `insert into inspection_reading (id, created_at, inspection_id, position, station, kind, reading_mm)
       select gen_random_uuid(), n.created_at, n.id, x.position, x.station, x.kind, x.reading_mm
         from inspection n join part p on p.id = n.part_id join lot l on l.id = p.lot_id
         cross join inspection_reading x where l.lot_number like 'BL-%' and x.inspection_id = $1`,
      [t.inspection],
    );
    // Heights spread by ±0.0005 mm around the copied one, deterministic per serial, within the band.
    await client.query(
      `insert into inspection_result (id, created_at, inspection_id, reason, master_calibration_id, height_mm,
              expanded_uncertainty_mm, flatness_mm, parallelism_mm, runout_mm, verdict, computed)
       select gen_random_uuid(), n.created_at, n.id, x.reason, x.master_calibration_id, h.height,
              x.expanded_uncertainty_mm, x.flatness_mm, x.parallelism_mm, x.runout_mm, x.verdict,
              jsonb_set(x.computed, '{height}', to_jsonb(h.height))
         from inspection n join part p on p.id = n.part_id join lot l on l.id = p.lot_id
         cross join inspection_result x
         cross join lateral (select x.height_mm + ((abs(hashtext(p.serial)) % 21) - 10) * 0.00005 as height) h
        where l.lot_number like 'BL-%' and x.inspection_id = $1`,
      [t.inspection],
    );
    await client.query('commit');
  } catch (error) {
    await client.query('rollback');
    throw error;
  } finally {
    await client.end();
  }
  await sql(BENCH_URL, 'analyze');
}

async function ensureBenchData() {
  const admin = withDatabase(BENCH_URL, 'postgres');
  const exists = (await sql(admin, 'select 1 from pg_database where datname = $1', [benchName])).length > 0;
  if (exists) {
    const [row] = await sql(BENCH_URL, `select count(*)::int as n from part where serial like 'BL-%'`).catch(() => [
      { n: 0 },
    ]);
    if (row.n === LOTS * PARTS_PER_LOT) return false;
    await sql(admin, `drop database "${benchName}" with (force)`);
  }
  await sql(admin, `create database "${benchName}"`);
  cli('migrate');
  cli('seed');
  await enlarge();
  return true;
}

async function startApi() {
  const port = 44000 + Math.floor(Math.random() * 1000);
  const child = spawn(process.execPath, [API_DIST_MAIN], {
    env: {
      ...process.env,
      NODE_ENV: 'production',
      HOST: '127.0.0.1',
      PORT: String(port),
      DATABASE_URL: BENCH_URL,
      WEB_DIST,
      SESSION_SECRET: randomBytes(32).toString('hex'),
      CERTIFICATE_SIGNING_KEY: signingKey,
      LOG_LEVEL: 'error',
      SMTP_URL: 'smtp://127.0.0.1:9',
      LOGIN_THROTTLE_LIMIT: '1000',
    },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  const base = `http://127.0.0.1:${port}`;
  for (let i = 0; i < 150; i += 1) {
    if (
      await fetch(`${base}/api/health`).then(
        (r) => r.ok,
        () => false,
      )
    )
      return { base, child };
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  child.kill();
  throw new Error('The API did not answer /api/health within 30 s.');
}

/** Signs in as the demo engineer; returns the Cookie header to send. */
async function signIn(base) {
  const jar = new Map();
  const keep = (res) =>
    res.headers.getSetCookie().forEach((c) => {
      const [pair] = c.split(';');
      const at = pair.indexOf('=');
      jar.set(pair.slice(0, at), pair.slice(at + 1));
    });
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join('; ');
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  keep(csrfRes);
  const { csrfToken } = await csrfRes.json();
  const login = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-csrf-token': csrfToken, cookie: cookie() },
    body: JSON.stringify({ email: 'engineer@kestrel.example', password: 'evenset-demo-1' }),
  });
  if (login.status !== 200) throw new Error(`Sign-in failed: ${login.status} ${await login.text()}`);
  keep(login);
  return cookie();
}

/** Response times (ms) of `amount` sequential requests after a few warm-up ones; fails on any non-200. */
async function measure(url, cookie, amount, warmUp = 3) {
  const once = (n, record) =>
    new Promise((resolve, reject) => {
      const instance = autocannon(
        { url, connections: 1, amount: n, headers: { cookie }, timeout: 120 },
        (error, result) => (error ? reject(error) : resolve(result)),
      );
      instance.on('response', (_client, status, _bytes, time) => record(status, time));
    });
  await once(warmUp, () => undefined);
  const times = [];
  let bad = 0;
  const result = await once(amount, (status, time) => (status === 200 ? times.push(time) : (bad += 1)));
  if (bad > 0 || result.errors > 0) throw new Error(`${url}: ${bad} non-200 answers, ${result.errors} errors`);
  return times;
}

const made = await ensureBenchData();
const [{ partNumber, lotId, parts, lots }] = await sql(
  BENCH_URL,
  `select p.part_number as "partNumber", (select id from lot where lot_number = 'BL-0250') as "lotId",
          count(*)::int as parts, count(distinct p.lot_id)::int as lots
     from part p where p.part_number = (select part_number from part where serial = 'BL-0250-01') group by 1, 2`,
);
const { base, child } = await startApi();
try {
  const cookie = await signIn(base);
  const health = await measure(`${base}/api/health`, cookie, 500);
  const review = await measure(`${base}/api/lots/${lotId}/parts?page=0&pageSize=${PAGE_SIZE}`, cookie, 100);
  const trends = await measure(`${base}/api/trends/${encodeURIComponent(partNumber)}`, cookie, 3, 1);
  console.log(
    `${benchName}${made ? ' (made now)' : ''}: part number ${partNumber} with ${lots} lots and ` +
      `${parts.toLocaleString('en')} parts; one connection, sequential requests after warm-up ones (3; 1 for trends, which is slow)\n`,
  );
  const line = (name, times) => [
    name,
    times.length,
    ms(percentile(times, 50)),
    ms(percentile(times, 95)),
    ms(Math.max(...times)),
    ratio(percentile(times, 95), percentile(health, 95)),
  ];
  printTable(
    ['', 'requests', 'p50 ms', 'p95 ms', 'max ms', 'p95 / floor'],
    [
      line(`lot review: GET /api/lots/:id/parts (${PARTS_PER_LOT} parts, pageSize ${PAGE_SIZE})`, review),
      line('trends: GET /api/trends/:partNumber', trends),
      line('floor: GET /api/health', health),
    ],
  );
  const [reviewP95, trendsP95] = [percentile(review, 95), percentile(trends, 95)];
  const ok = checkBudgets([
    { text: `lot review p95 ${ms(reviewP95)} ms < 150 ms`, held: reviewP95 < 150 },
    { text: `trends p95 ${ms(trendsP95)} ms < 300 ms`, held: trendsP95 < 300 },
  ]);
  if (!ok) process.exitCode = 1;
} finally {
  child.kill('SIGTERM');
}
