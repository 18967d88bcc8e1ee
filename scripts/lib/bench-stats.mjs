// Small helpers shared by the .mjs benchmarks: percentiles and a Markdown table, so every area
// prints its figure, the baseline measured in the same run, and their ratio the same way.
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT } from './paths.mjs';

/** Nearest-rank percentile (p in 0..100) of a list of numbers. */
export function percentile(values, p) {
  const sorted = [...values].sort((a, b) => a - b);
  const rank = Math.max(1, Math.ceil((p / 100) * sorted.length));
  return sorted[rank - 1];
}

/** Prints a Markdown table; numbers right-aligned. */
export function printTable(header, rows) {
  const cells = [header, ...rows].map((r) => r.map(String));
  const widths = header.map((_, i) => Math.max(3, ...cells.map((r) => r[i].length)));
  const line = (r) => `| ${r.map((c, i) => (i === 0 ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join(' | ')} |`;
  console.log(line(cells[0]));
  console.log(`| ${widths.map((w, i) => (i === 0 ? '-'.repeat(w) : `${'-'.repeat(w - 1)}:`)).join(' | ')} |`);
  cells.slice(1).forEach((r) => console.log(line(r)));
}

export const ms = (value) => value.toFixed(1);
export const ratio = (figure, floor) => `${(figure / floor).toFixed(1)}×`;

/** The compiled API module at apps/api/dist/<path>; the benchmarks measure what `npm start` runs. */
export function apiDist(path) {
  const file = join(ROOT, 'apps/api/dist', path);
  if (!existsSync(file)) {
    console.error(`${file} is missing: build the API first (npm run build -w @evenset/api).`);
    process.exit(1);
  }
  return file;
}

/**
 * Prints our own targets (set by us, beyond the budgets the product must keep): each one missed is
 * reported, and does not fail the run.
 */
export function checkTargets(targets) {
  const missed = targets.filter((t) => !t.held);
  if (missed.length === 0) console.log(`\nOwn targets met: ${targets.map((t) => t.text).join('; ')}.`);
  else missed.forEach((t) => console.log(`\nOwn target missed (reported, not failing the run): ${t.text}.`));
}

/** Prints whether each budget held; returns false when one did not. */
export function checkBudgets(budgets) {
  const missed = budgets.filter((b) => !b.held);
  if (missed.length === 0) console.log(`\nBudgets met: ${budgets.map((b) => b.text).join('; ')}.`);
  else missed.forEach((b) => console.log(`\nBudget MISSED: ${b.text}.`));
  return missed.length === 0;
}
