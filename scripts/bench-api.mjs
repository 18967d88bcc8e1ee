#!/usr/bin/env node
// Area 3: lot review and trends on a part number with 500 lots and 20,000 inspected parts, through
// the built API over HTTP (autocannon, one connection: the response time one engineer sees), beside
// GET /api/health on the same server as the floor. The data and the server: scripts/lib/bench-data.mjs.
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { checkBudgets, ms, percentile, printTable, ratio } from './lib/bench-stats.mjs';
import { BENCH_URL, benchName, ensureBenchData, PARTS_PER_LOT, signIn, sql, startApi } from './lib/bench-data.mjs';
import { ROOT } from './lib/paths.mjs';

const PAGE_SIZE = 50;
const require = createRequire(join(ROOT, 'package.json'));
const autocannon = require('autocannon');

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
  const lot = await measure(`${base}/api/lots/${lotId}`, cookie, 100);
  const review = await measure(`${base}/api/lots/${lotId}/parts?page=0&pageSize=${PAGE_SIZE}`, cookie, 100);
  const trends = await measure(`${base}/api/trends/${encodeURIComponent(partNumber)}`, cookie, 30);
  console.log(
    `${benchName}${made ? ' (made now)' : ''}: part number ${partNumber} with ${lots} lots and ` +
      `${parts.toLocaleString('en')} parts; one connection, sequential requests after 3 warm-up ones\n`,
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
      line('lot review: GET /api/lots/:id (counts, spread, interchange window)', lot),
      line(`lot review: GET /api/lots/:id/parts (${PARTS_PER_LOT} parts, pageSize ${PAGE_SIZE})`, review),
      line('trends: GET /api/trends/:partNumber', trends),
      line('floor: GET /api/health', health),
    ],
  );
  const [lotP95, reviewP95, trendsP95] = [lot, review, trends].map((times) => percentile(times, 95));
  const ok = checkBudgets([
    { text: `lot p95 ${ms(lotP95)} ms < 150 ms`, held: lotP95 < 150 },
    { text: `lot review p95 ${ms(reviewP95)} ms < 150 ms`, held: reviewP95 < 150 },
    { text: `trends p95 ${ms(trendsP95)} ms < 300 ms`, held: trendsP95 < 300 },
  ]);
  if (!ok) process.exitCode = 1;
} finally {
  child.kill('SIGTERM');
}
