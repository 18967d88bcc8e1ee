#!/usr/bin/env node
// Area 1 (Bench save): 20 inspectors, each signed in with a session of their own and a run of
// their own, saving one inspection of 25 stations after another (POST /api/runs/:id/inspections,
// each a different part) against the built API, all at once: response times on loopback
// (autocannon, one connection per inspector), which is the server's time to check, compute,
// store and answer plus one loopback round trip. The floor is bare `pg`: 20 clients at once, each
// inserting the same rows one save stores (the inspection, its 25 readings, its result and its
// audit entry, copied from a saved one with new ids, each for a part of its own) in one
// transaction per save, timed from BEGIN to COMMIT.
// The database, evenset_bench_write (or BENCH_WRITE_DATABASE_URL), is made afresh for each run.
import { randomUUID } from 'node:crypto';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { checkBudgets, ms, percentile, printTable, ratio } from './lib/bench-stats.mjs';
import {
  benchDatabaseUrl,
  freshDemoDatabase,
  givenGridLot,
  signIn,
  sql,
  startApi,
  startRun,
} from './lib/bench-server.mjs';
import { ROOT } from './lib/paths.mjs';

const INSPECTORS = 20;
const WARM_UP = 5;
const SAVES = 40;
const require = createRequire(join(ROOT, 'package.json'));
const autocannon = require('autocannon');
const { Client } = require('pg');
const url = process.env.BENCH_WRITE_DATABASE_URL ?? benchDatabaseUrl('evenset_bench_write');
const ACCOUNTS = ['inspector@kestrel.example', 'inspector2@kestrel.example', 'inspector3@kestrel.example'];

/** Readings a few tenths below the master, different for every save (seeded). */
let seed = 20261202;
const reading = () => -0.0003 + ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648) * 0.0002;

/**
 * One inspector saving `amount` inspections one after another over one connection, each of the
 * next of `partIds`; answers the response times (ms) and fails on any answer but 201.
 */
function inspector(base, session, runId, partIds, stations, amount) {
  const { cookie, 'x-csrf-token': csrf } = session.headers();
  const body = () =>
    JSON.stringify({
      partId: partIds.shift(),
      unit: 'in',
      readings: stations.map((station) => ({ station, reading: Number(reading().toFixed(5)) })),
    });
  return new Promise((resolve, reject) => {
    const times = [];
    let bad = 0;
    const instance = autocannon(
      {
        url: `${base}/api/runs/${runId}/inspections`,
        connections: 1,
        amount,
        timeout: 60,
        requests: [
          {
            method: 'POST',
            headers: { cookie, 'x-csrf-token': csrf, 'content-type': 'application/json' },
            setupRequest: (request) => ({ ...request, body: body() }),
          },
        ],
      },
      (error, result) => {
        if (error) reject(error);
        else if (bad > 0 || result.errors > 0)
          reject(new Error(`${bad} answers other than 201, ${result.errors} errors`));
        else resolve(times);
      },
    );
    instance.on('response', (_client, status, _bytes, time) => (status === 201 ? times.push(time) : (bad += 1)));
  });
}

/** The rows one save stored (inspection, readings, result, audit entry), to copy with new ids. */
async function savedRows(inspectionId) {
  const [inspection] = await sql(url, 'select * from inspection where id = $1', [inspectionId]);
  const readings = await sql(url, 'select * from inspection_reading where inspection_id = $1 order by position', [
    inspectionId,
  ]);
  const [result] = await sql(url, 'select * from inspection_result where inspection_id = $1', [inspectionId]);
  const [audit] = await sql(url, `select * from audit_entry where subject_type = 'inspection' and subject_id = $1`, [
    inspectionId,
  ]);
  return { inspection, readings, result, audit };
}

/** A multi-row INSERT of `rows` (objects keyed by column) with bind parameters. */
function insert(table, rows) {
  const columns = Object.keys(rows[0]);
  const values = rows.flatMap((r) => columns.map((c) => r[c]));
  const tuples = rows.map((_, i) => `(${columns.map((_c, j) => `$${i * columns.length + j + 1}`).join(', ')})`);
  return { text: `insert into ${table} (${columns.join(', ')}) values ${tuples.join(', ')}`, values };
}

/**
 * One pg client saving copies of `rows` one after another, each for the next of `partIds` (one
 * part a save, as the inspectors do: saves of one part wait for each other); answers
 * BEGIN-to-COMMIT times (ms).
 */
async function bareClient(rows, partIds, amount) {
  const client = new Client({ connectionString: url });
  await client.connect();
  const times = [];
  try {
    for (let i = 0; i < amount; i += 1) {
      const id = randomUUID();
      const started = performance.now();
      await client.query('begin');
      await client.query(insert('inspection', [{ ...rows.inspection, id, part_id: partIds.shift() }]));
      await client.query(
        insert(
          'inspection_reading',
          rows.readings.map((r) => ({ ...r, id: randomUUID(), inspection_id: id })),
        ),
      );
      await client.query(insert('inspection_result', [{ ...rows.result, id: randomUUID(), inspection_id: id }]));
      await client.query(insert('audit_entry', [{ ...rows.audit, id: randomUUID(), subject_id: id }]));
      await client.query('commit');
      times.push(performance.now() - started);
    }
  } finally {
    await client.end();
  }
  return times;
}

await freshDemoDatabase(url);
const { base, child } = await startApi(url);
try {
  const engineer = await signIn(base, 'engineer@kestrel.example');
  const perInspector = WARM_UP + SAVES;
  // Each save is of a part of its own: the first half for the product, the second for the floor.
  const saves = INSPECTORS * perInspector;
  const { lot, stations } = await givenGridLot(engineer, {
    partNumber: 'SAVE-25',
    lotNumber: 'L-SAVE',
    parts: 2 * saves,
    prefix: 'SV-',
  });
  const parts = [];
  for (let page = 0; parts.length < 2 * saves; page += 1)
    parts.push(...(await engineer.call('GET', `/api/lots/${lot.id}/parts?pageSize=500&page=${page}`)).items);
  const floorParts = parts.slice(saves).map((p) => p.id);
  const floorPartsOf = (i) => floorParts.slice(i * perInspector, (i + 1) * perInspector);
  const inspectors = [];
  for (let i = 0; i < INSPECTORS; i += 1) {
    const session = await signIn(base, ACCOUNTS[i % ACCOUNTS.length]);
    const run = await startRun(session, lot.id);
    inspectors.push({ session, run, partIds: parts.slice(i * perInspector, (i + 1) * perInspector).map((p) => p.id) });
  }
  const all = (amount) =>
    Promise.all(inspectors.map((s) => inspector(base, s.session, s.run.id, s.partIds, stations, amount)));
  await all(WARM_UP);
  const started = performance.now();
  const product = (await all(SAVES)).flat();
  const productSeconds = (performance.now() - started) / 1000;
  const [{ n: stored }] = await sql(url, 'select count(*)::int as n from inspection where spec_id = $1', [lot.spec.id]);
  if (stored !== saves) throw new Error(`${stored} inspections stored, expected ${saves}.`);

  const [{ id: sample }] = await sql(url, 'select id from inspection where spec_id = $1 limit 1', [lot.spec.id]);
  const rows = await savedRows(sample);
  const floorClients = Array.from({ length: INSPECTORS }, (_, i) => floorPartsOf(i));
  await Promise.all(floorClients.map((partIds) => bareClient(rows, partIds, WARM_UP)));
  const floorStarted = performance.now();
  const floor = (await Promise.all(floorClients.map((partIds) => bareClient(rows, partIds, SAVES)))).flat();
  const floorSeconds = (performance.now() - floorStarted) / 1000;

  console.log(
    `${INSPECTORS} inspectors at once, ${SAVES} saves each after ${WARM_UP} warm-up ones; ` +
      `${stations.length} stations per inspection; product: response time on loopback; floor: BEGIN to COMMIT\n`,
  );
  const line = (name, times, seconds) => [
    name,
    times.length,
    ms(percentile(times, 50)),
    ms(percentile(times, 95)),
    ms(Math.max(...times)),
    (times.length / seconds).toFixed(0),
    ratio(percentile(times, 50), percentile(floor, 50)),
  ];
  printTable(
    ['', 'saves', 'p50 ms', 'p95 ms', 'max ms', 'saves/s', 'p50 / floor'],
    [
      line('save: POST /api/runs/:id/inspections', product, productSeconds),
      line('floor: bare pg insert of the same rows', floor, floorSeconds),
    ],
  );
  const [p50, floor50] = [percentile(product, 50), percentile(floor, 50)];
  const ok = checkBudgets([
    {
      text: `save p50 ${ms(p50)} ms within 3× the floor's ${ms(floor50)} ms (${ratio(p50, floor50)})`,
      held: p50 <= 3 * floor50,
    },
  ]);
  if (!ok) process.exitCode = 1;
} finally {
  child.kill('SIGTERM');
}
