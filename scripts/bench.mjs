#!/usr/bin/env node
// Benchmarks (not part of `npm test`). Each area's benchmark is TypeScript: it is compiled with
// the workspace's own TypeScript into node_modules/.cache/evenset-bench, then run with plain Node,
// so no compiler sits in the measured processes. Areas of the product itself are plain .mjs
// scripts (scripts/bench-*.mjs) that load the API's compiled modules, built first if stale.
// Add an area to AREAS to benchmark it.
// Usage: npm run bench [-- <part of an area name>]
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildIfStale } from './lib/build.mjs';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const tsc = path.join(root, 'node_modules', 'typescript', 'bin', 'tsc');

/**
 * name: shown in the output; project: tsconfig that compiles the benchmark; entry: compiled file to
 * run; or script: a plain .mjs benchmark of the built API (no project to compile).
 */
const AREAS = [
  {
    name: 'metrology: exact minimum-zone flatness vs a general LP solver',
    project: 'packages/metrology/bench/tsconfig.json',
    entry: 'node_modules/.cache/evenset-bench/metrology/bench/flatness.bench.js',
  },
  {
    name: 'csv: 100,000 readings parsed and checked vs papaparse alone',
    script: 'scripts/bench-csv.mjs',
  },
  {
    name: 'certificates: PDF of a 4-part set vs an empty pdfkit page',
    script: 'scripts/bench-certificate.mjs',
  },
  {
    name: 'api: lot review and trends on 500 lots / 20,000 parts vs GET /api/health',
    script: 'scripts/bench-api.mjs',
  },
  {
    name: 'web: first render of the Bench and lot review, and the parts grid of a 10,000-part lot, vs the sign-in page',
    script: 'scripts/bench-web.mjs',
  },
  {
    name: 'save: one 25-station inspection under 20 concurrent inspectors vs a bare pg insert',
    script: 'scripts/bench-save.mjs',
  },
  {
    name: 'import: 100,000 readings stored through the API vs PostgreSQL COPY',
    script: 'scripts/bench-import.mjs',
  },
];

const filters = process.argv.slice(2);
let failed = false;
let apiBuilt = false;
for (const area of AREAS) {
  if (filters.length > 0 && !filters.some((f) => area.name.includes(f))) continue;
  console.log(`\n=== ${area.name} ===\n`);
  if (area.script) {
    try {
      if (!apiBuilt) buildIfStale(['contracts', 'metrology', 'api']);
      apiBuilt = true;
    } catch (error) {
      console.error(`could not build the API: ${error.message}`);
      failed = true;
      continue;
    }
    const run = spawnSync(process.execPath, [path.join(root, area.script)], { cwd: root, stdio: 'inherit' });
    if (run.status !== 0) failed = true;
    continue;
  }
  const build = spawnSync(process.execPath, [tsc, '-p', path.join(root, area.project)], {
    cwd: root,
    stdio: 'inherit',
  });
  if (build.status !== 0) {
    console.error(`could not compile ${area.project}`);
    failed = true;
    continue;
  }
  const run = spawnSync(process.execPath, [path.join(root, area.entry)], { cwd: root, stdio: 'inherit' });
  if (run.status !== 0) failed = true;
}
process.exitCode = failed ? 1 : 0;
