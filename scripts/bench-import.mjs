#!/usr/bin/env node
// Area 2 (the whole import): a gauge export of 100,000 readings (4,000 parts × 25 stations)
// uploaded to POST /api/runs/:id/readings/import of the built API, which parses, checks, computes
// and stores every part's inspection in one transaction; timed from the upload's first byte to the
// answer, with the API process's peak memory (VmHWM). The floor is PostgreSQL's own COPY (psql
// \copy, one transaction) of the very rows the import stored (inspections, readings, results, with
// new ids), into the same tables with their indexes and keys. The database, evenset_bench_write
// (or BENCH_WRITE_DATABASE_URL), is made afresh for each run: migrated, demo data, then through the
// API a 25-station spec and a lot of 4,000 parts per timed import.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { checkBudgets, ms, printTable, ratio } from './lib/bench-stats.mjs';
import {
  benchDatabaseUrl,
  fileForm,
  freshDemoDatabase,
  givenGridLot,
  peakRssMb,
  signIn,
  sql,
  startApi,
  startRun,
} from './lib/bench-server.mjs';

const PARTS = 4_000;
const STATIONS = 25;
const IMPORTS = 2;
const TABLES = ['inspection', 'inspection_result', 'inspection_reading'];
const url = process.env.BENCH_WRITE_DATABASE_URL ?? benchDatabaseUrl('evenset_bench_write');

/** The gauge export for `serials`: every station once, readings a few tenths below the master (seeded). */
function gaugeExport(serials, stations) {
  let seed = 20261202;
  const next = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
  const lines = ['serial,station,reading,unit'];
  for (const serial of serials)
    for (const station of stations) lines.push(`${serial},${station},${(-0.0003 + next() * 0.0002).toFixed(5)},in`);
  return Buffer.from(`${lines.join('\r\n')}\r\n`, 'utf8');
}

async function counts(runId) {
  const [row] = await sql(
    url,
    `select (select count(*)::int from inspection where run_id = $1) as inspections,
            (select count(*)::int from inspection_result r join inspection i on i.id = r.inspection_id where i.run_id = $1) as results,
            (select count(*)::int from inspection_reading x join inspection i on i.id = x.inspection_id where i.run_id = $1) as readings`,
    [runId],
  );
  return row;
}

function psql(args) {
  const out = spawnSync('psql', ['-X', '-q', '-v', 'ON_ERROR_STOP=1', '-d', url, ...args], { encoding: 'utf8' });
  if (out.status !== 0) throw new Error(`psql failed:\n${out.stderr}`);
}

/**
 * Writes the rows run `runId` stored to CSV files with new ids (the inspection ids mapped
 * consistently), then times one psql session COPYing them back in one transaction.
 */
async function copyFloor(runId, dir) {
  const columns = {};
  for (const table of TABLES)
    columns[table] = (
      await sql(
        url,
        `select column_name as name from information_schema.columns where table_name = $1 order by ordinal_position`,
        [table],
      )
    ).map((c) => c.name);
  const pick = (table, alias) =>
    columns[table]
      .map((c) =>
        c === 'id'
          ? table === 'inspection'
            ? 'm.new'
            : 'gen_random_uuid()'
          : c === 'inspection_id'
            ? 'm.new'
            : `${alias}.${c}`,
      )
      .join(', ');
  const file = (table) => join(dir, `${table}.csv`);
  const unload = [
    `create temp table m as select id as old, gen_random_uuid() as new from inspection where run_id = '${runId}';`,
    `\\copy (select ${pick('inspection', 'i')} from inspection i join m on m.old = i.id) to '${file('inspection')}' csv`,
    `\\copy (select ${pick('inspection_result', 'r')} from inspection_result r join m on m.old = r.inspection_id) to '${file('inspection_result')}' csv`,
    `\\copy (select ${pick('inspection_reading', 'x')} from inspection_reading x join m on m.old = x.inspection_id) to '${file('inspection_reading')}' csv`,
  ];
  writeFileSync(join(dir, 'unload.sql'), unload.join('\n'));
  psql(['-f', join(dir, 'unload.sql')]);
  const load = TABLES.map((t) => `\\copy ${t} (${columns[t].join(', ')}) from '${file(t)}' csv`);
  writeFileSync(join(dir, 'load.sql'), load.join('\n'));
  const started = performance.now();
  psql(['-1', '-f', join(dir, 'load.sql')]);
  return performance.now() - started;
}

await freshDemoDatabase(url);
const { base, child } = await startApi(url);
const dir = mkdtempSync(join(tmpdir(), 'evenset-bench-import-'));
try {
  const engineer = await signIn(base, 'engineer@kestrel.example');
  const inspector = await signIn(base, 'inspector@kestrel.example');
  const startRss = peakRssMb(child.pid);
  const rounds = [];
  for (let i = 1; i <= IMPORTS; i += 1) {
    const prefix = `IM${i}-`;
    const { lot, stations } = await givenGridLot(engineer, {
      partNumber: `IMPORT-25-${i}`,
      lotNumber: `L-IMPORT-${i}`,
      parts: PARTS,
      prefix,
    });
    const run = await startRun(inspector, lot.id);
    const serials = Array.from({ length: PARTS }, (_, p) => `${prefix}${String(p + 1).padStart(5, '0')}`);
    const content = gaugeExport(serials, stations);
    const started = performance.now();
    const answer = await inspector.call('POST', `/api/runs/${run.id}/readings/import`, fileForm(content, 'export.csv'));
    const importMs = performance.now() - started;
    const stored = await counts(run.id);
    if (answer.readings !== PARTS * STATIONS || stored.readings !== PARTS * STATIONS || stored.inspections !== PARTS)
      throw new Error(`Import ${i} stored ${JSON.stringify(stored)}; expected ${PARTS} parts × ${STATIONS} readings.`);
    const copyMs = await copyFloor(run.id, dir);
    rounds.push({ importMs, copyMs, bytes: content.length, stored });
  }
  const peakMb = peakRssMb(child.pid);
  const best = (key) => Math.min(...rounds.map((r) => r[key]));
  const worst = (key) => Math.max(...rounds.map((r) => r[key]));
  console.log(
    `${(PARTS * STATIONS).toLocaleString('en')} readings (${(rounds[0].bytes / 1e6).toFixed(1)} MB, ` +
      `${PARTS.toLocaleString('en')} parts × ${STATIONS} stations) imported ${IMPORTS} times into a fresh run each; ` +
      `time from the upload to the answer on loopback; floor: psql \\copy of the ${(
        PARTS *
        (STATIONS + 2)
      ).toLocaleString('en')} rows each import stored, one transaction\n`,
  );
  printTable(
    ['', 'import: POST /api/runs/:id/readings/import', 'floor: COPY of the same rows', 'ratio'],
    [
      ...rounds.map((r, i) => [`import ${i + 1} ms`, ms(r.importMs), ms(r.copyMs), ratio(r.importMs, r.copyMs)]),
      ['best ms', ms(best('importMs')), ms(best('copyMs')), ratio(best('importMs'), best('copyMs'))],
      ['API peak RSS MB (VmHWM)', peakMb.toFixed(0), '—', '—'],
      ['API RSS MB before the imports', startRss.toFixed(0), '—', '—'],
    ],
  );
  const ok = checkBudgets([
    { text: `slowest import ${ms(worst('importMs'))} ms < 10,000 ms`, held: worst('importMs') < 10_000 },
    { text: `API peak RSS ${peakMb.toFixed(0)} MB < 500 MB`, held: peakMb < 500 },
  ]);
  if (!ok) process.exitCode = 1;
} finally {
  child.kill('SIGTERM');
  rmSync(dir, { recursive: true, force: true });
}
