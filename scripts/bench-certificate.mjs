#!/usr/bin/env node
// Area 5: the certificate PDF of a 4-part set (the compiled renderer `npm start` runs, fed a frozen
// signed payload from the demo data), beside pdfkit writing one empty A4 page: the floor any PDF
// from this library pays. Both run in this one process, alternating, after a warm-up.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { apiDist, checkBudgets, ms, percentile, printTable, ratio } from './lib/bench-stats.mjs';
import { ROOT } from './lib/paths.mjs';

const RUNS = 50;
const WARM_UP = 5;
const BUDGET_P95_MS = 300;

const require = createRequire(join(ROOT, 'apps/api/package.json'));
const { renderCertificatePdf } = require(apiDist('certificates/certificate-pdf.js'));
const PDFDocument = require('pdfkit');
const facts = JSON.parse(readFileSync(join(ROOT, 'scripts/fixtures/certificate-4-parts.json'), 'utf8'));

function emptyPage() {
  return new Promise((resolve, reject) => {
    const doc = new PDFDocument({ size: 'A4' });
    const chunks = [];
    doc.on('data', (chunk) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}

async function time(work) {
  const start = performance.now();
  const bytes = (await work()).length;
  return { ms: performance.now() - start, bytes };
}

for (let i = 0; i < WARM_UP; i += 1) {
  await renderCertificatePdf(facts);
  await emptyPage();
}
const certificate = [];
const floor = [];
for (let i = 0; i < RUNS; i += 1) {
  certificate.push(await time(() => renderCertificatePdf(facts)));
  floor.push(await time(emptyPage));
}

const certificateMs = certificate.map((r) => r.ms);
const floorMs = floor.map((r) => r.ms);
const line = (label, pick) => [
  label,
  ms(pick(certificateMs)),
  ms(pick(floorMs)),
  ratio(pick(certificateMs), pick(floorMs)),
];
console.log(`${facts.members.length}-part set certificate, ${RUNS} runs each after ${WARM_UP} warm-up runs\n`);
printTable(
  ['', 'certificate PDF ms', 'floor: pdfkit empty A4 page ms', 'ratio'],
  [
    line('p50', (v) => percentile(v, 50)),
    line('p95', (v) => percentile(v, 95)),
    line('max', (v) => Math.max(...v)),
    ['PDF bytes', certificate[0].bytes, floor[0].bytes, '—'],
  ],
);
const p95 = percentile(certificateMs, 95);
if (!checkBudgets([{ text: `certificate PDF p95 ${ms(p95)} ms < ${BUDGET_P95_MS} ms`, held: p95 < BUDGET_P95_MS }]))
  process.exitCode = 1;
