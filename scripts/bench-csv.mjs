#!/usr/bin/env node
// Area 2 (parse and check): a gauge export of 100,000 readings through the compiled
// parseReadingsCsv (papaparse, then every row checked and converted to mm), beside papaparse
// alone on the same bytes: the floor. Each figure comes from its own Node process, so one
// side's garbage never weighs on the other; peak RSS includes the file held in memory.
// Storing the readings (the import's other half) is measured with the import itself, not here.
import { spawnSync } from 'node:child_process';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { fileURLToPath } from 'node:url';
import { apiDist, checkBudgets, ms, percentile, printTable, ratio } from './lib/bench-stats.mjs';
import { ROOT } from './lib/paths.mjs';

const ROWS = 100_000;
const STATIONS = 25;
const TIMED_RUNS = 7;

/** The same file in every process: 4,000 parts × 25 stations, readings near 1.5 in (seeded). */
function gaugeExport() {
  let seed = 20261202;
  const next = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
  const lines = ['serial,station,reading,unit'];
  for (let i = 0; i < ROWS; i += 1) {
    const part = Math.floor(i / STATIONS) + 1;
    lines.push(
      `RB40-${String(part).padStart(5, '0')},${(i % STATIONS) + 1},${(1.4996 + next() * 0.0004).toFixed(5)},in`,
    );
  }
  return Buffer.from(`${lines.join('\r\n')}\r\n`, 'utf8');
}

function child(side, mode) {
  const require = createRequire(join(ROOT, 'apps/api/package.json'));
  const work =
    side === 'product'
      ? (() => {
          const { parseReadingsCsv } = require(apiDist('inspections/readings-csv.js'));
          return (content) => {
            const parsed = parseReadingsCsv(content);
            return { rows: parsed.readings.length, errors: parsed.errors.length };
          };
        })()
      : (() => {
          const Papa = require('papaparse');
          return (content) => ({ rows: Papa.parse(content.toString('utf8'), { delimiter: ',' }).data.length - 2 });
        })();
  const content = gaugeExport();
  const runs = mode === 'memory' ? 1 : TIMED_RUNS + 1;
  const times = [];
  let result;
  for (let i = 0; i < runs; i += 1) {
    const start = performance.now();
    result = work(content);
    times.push(performance.now() - start);
  }
  if (mode === 'time') times.shift(); // the first run warms the JIT up
  const peakMb = process.resourceUsage().maxRSS / 1024;
  process.stdout.write(JSON.stringify({ times, peakMb, bytes: content.length, ...result }));
}

function measure(side, mode) {
  const out = spawnSync(process.execPath, [fileURLToPath(import.meta.url), '--child', side, mode], {
    encoding: 'utf8',
    maxBuffer: 1 << 20,
  });
  if (out.status !== 0) throw new Error(`${side} ${mode} failed:\n${out.stderr}`);
  return JSON.parse(out.stdout);
}

if (process.argv[2] === '--child') {
  child(process.argv[3], process.argv[4]);
} else {
  const product = { time: measure('product', 'time'), memory: measure('product', 'memory') };
  const floor = { time: measure('papaparse', 'time'), memory: measure('papaparse', 'memory') };
  console.log(
    `${ROWS.toLocaleString('en')} readings (${(product.time.bytes / 1e6).toFixed(1)} MB), ` +
      `${TIMED_RUNS} timed runs per side after one warm-up; memory from a separate single-run process\n`,
  );
  const best = (t) => Math.min(...t.times);
  const median = (t) => percentile(t.times, 50);
  printTable(
    ['', 'parse + check (parseReadingsCsv)', 'floor: papaparse alone', 'ratio'],
    [
      ['best ms', ms(best(product.time)), ms(best(floor.time)), ratio(best(product.time), best(floor.time))],
      ['median ms', ms(median(product.time)), ms(median(floor.time)), ratio(median(product.time), median(floor.time))],
      [
        'first run ms',
        ms(product.memory.times[0]),
        ms(floor.memory.times[0]),
        ratio(product.memory.times[0], floor.memory.times[0]),
      ],
      [
        'peak RSS MB',
        product.memory.peakMb.toFixed(0),
        floor.memory.peakMb.toFixed(0),
        ratio(product.memory.peakMb, floor.memory.peakMb),
      ],
      ['rows accepted', product.time.rows, floor.time.rows, '—'],
    ],
  );
  const ok = checkBudgets([
    {
      text: `every row accepted (${product.time.rows} of ${ROWS}, ${product.time.errors} errors)`,
      held: product.time.rows === ROWS && product.time.errors === 0,
    },
    {
      text: `parse + check median ${ms(median(product.time))} ms < 10,000 ms (the whole import's budget)`,
      held: median(product.time) < 10_000,
    },
    { text: `peak RSS ${product.memory.peakMb.toFixed(0)} MB < 500 MB`, held: product.memory.peakMb < 500 },
  ]);
  if (!ok) process.exitCode = 1;
}
