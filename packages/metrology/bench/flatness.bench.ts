/**
 * Benchmark: exact orthogonal minimum-zone flatness against the same data solved as a linear
 * programme by a general-purpose solver (HiGHS, npm `highs`). Run through `npm run bench`.
 *
 * Each measurement runs in its own Node process (started with --expose-gc), so its peak
 * resident memory is its own and one solver's memory does not count against the other.
 * Like for like: the LP solves the linearised (vertical) zone — min h with
 * c + a·x + b·y ≤ z ≤ c + a·x + b·y + h — so its result is compared with the vertical zone that
 * `flatness` computes exactly from the same hull candidates; the orthogonal minimum zone, the
 * product's figure, is printed beside it.
 */
import { spawnSync } from 'node:child_process';
import highsLoader from 'highs';
import { flatness, type Point3 } from '../src';
import { minimaxPlaneByLp } from '../src/testing/highs-reference';
import { seededRandom } from '../src/testing/seeded-random';

const SIZES = [1_000, 10_000, 100_000, 1_000_000];
/** Above this size the LP is not run: HiGHS (WebAssembly, 2 GiB memory) aborts on 2,000,000 rows. */
const LP_LIMIT = 100_000;

/**
 * A near-level ground surface on a grid over 100 mm × 100 mm at 25.4 mm: a small tilt, a 1 µm
 * crown and ±1 µm of uniform noise (lengths in mm). Same seed, same surface in every process.
 */
function surface(count: number, seed = 2024): Point3[] {
  const random = seededRandom(seed + count);
  const side = Math.ceil(Math.sqrt(count));
  const points: Point3[] = new Array<Point3>(count);
  for (let i = 0; i < count; i++) {
    const x = ((i % side) / (side - 1)) * 100 - 50;
    const y = (Math.floor(i / side) / (side - 1)) * 100 - 50;
    const crown = 0.001 * (1 - (x * x + y * y) / 5000);
    points[i] = { x, y, z: 25.4 + 2e-5 * x - 1e-5 * y + crown + 0.002 * (random() - 0.5) };
  }
  return points;
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1
    ? (sorted[mid] as number)
    : ((sorted[mid - 1] as number) + (sorted[mid] as number)) / 2;
}

function collect(): void {
  (globalThis as { gc?: () => void }).gc?.();
}

interface ExactResult {
  method: 'exact';
  count: number;
  /** Best (smallest) time of the timed runs, and their median. */
  ms: number;
  medianMs: number;
  runs: number;
  zone: number;
  verticalZone: number;
  leastSquares: number;
  hullVertices: number;
  peakRssMb: number;
}

interface LpResult {
  method: 'lp';
  count: number;
  ms: number;
  medianMs: number;
  runs: number;
  verticalZone: number;
  objective: number;
  peakRssMb: number;
}

/** Timed runs per size (after warm-up runs on the same data, which let the JIT settle). */
function runsFor(count: number): { warm: number; timed: number } {
  if (count <= 10_000) return { warm: 40, timed: 31 };
  if (count <= 100_000) return { warm: 10, timed: 9 };
  return { warm: 2, timed: 5 };
}

/** Peak memory of one process that builds the points and computes their flatness once. */
function memoryWorker(count: number): { peakRssMb: number; inputRssMb: number } {
  flatness(surface(1_000, 7));
  const points = surface(count);
  collect();
  const inputRssMb = process.memoryUsage().rss / 1024 / 1024;
  flatness(points);
  return { peakRssMb: process.resourceUsage().maxRSS / 1024, inputRssMb };
}

function exactWorker(count: number): ExactResult {
  for (let k = 0; k < 3; k++) flatness(surface(50_000, 7 + k));
  const points = surface(count);
  const { warm, timed } = runsFor(count);
  let result = flatness(points);
  for (let k = 1; k < warm; k++) result = flatness(points);
  const times: number[] = [];
  for (let k = 0; k < timed; k++) {
    const start = performance.now();
    result = flatness(points);
    times.push(performance.now() - start);
  }
  return {
    method: 'exact',
    count,
    ms: Math.min(...times),
    medianMs: median(times),
    runs: times.length,
    zone: result.minimumZone,
    verticalZone: result.vertical?.zone ?? Number.NaN,
    leastSquares: result.leastSquares,
    hullVertices: result.hullVertices,
    peakRssMb: process.resourceUsage().maxRSS / 1024,
  };
}

async function lpWorker(count: number): Promise<LpResult> {
  const highs = await highsLoader();
  const solve = (points: readonly Point3[]): ReturnType<typeof minimaxPlaneByLp> => {
    const x = Float64Array.from(points, (p) => p.x);
    const y = Float64Array.from(points, (p) => p.y);
    const z = Float64Array.from(points, (p) => p.z);
    return minimaxPlaneByLp(highs, x, y, z);
  };
  solve(surface(2_000, 7));
  const points = surface(count);
  let result = solve(points);
  const runs = count <= 10_000 ? 15 : 3;
  const times: number[] = [];
  for (let k = 0; k < runs; k++) {
    const start = performance.now();
    result = solve(points);
    times.push(performance.now() - start);
  }
  return {
    method: 'lp',
    count,
    ms: Math.min(...times),
    medianMs: median(times),
    runs,
    verticalZone: result.measuredZone,
    objective: result.zone,
    peakRssMb: process.resourceUsage().maxRSS / 1024,
  };
}

function spawnWorker<T>(method: 'exact' | 'lp' | 'memory', count: number): T {
  const child = spawnSync(process.execPath, ['--expose-gc', __filename, 'worker', method, String(count)], {
    encoding: 'utf8',
    maxBuffer: 1 << 24,
  });
  const last = child.stdout.trim().split('\n').at(-1) ?? '';
  if (child.status !== 0 || !last.startsWith('{')) {
    throw new Error(
      `${method} worker for ${count} points failed (exit ${String(child.status)}): ${child.stderr.slice(0, 500)}`,
    );
  }
  return JSON.parse(last) as T;
}

const um = (mm: number): string => (mm * 1000).toFixed(4);
const pad = (text: string, width: number): string => text.padStart(width);

function main(): void {
  console.log('Exact minimum zone (this package) vs linear programme (HiGHS), near-level surfaces at 25.4 mm,');
  console.log('100 mm × 100 mm grid, 1 µm crown, ±1 µm noise. Times: best / median of repeated runs after warm-up;');
  console.log('the ratio uses the best times. Each measurement runs in its own process. "exact MB" is the peak');
  console.log('RSS of a process that builds the points as {x, y, z} objects and computes flatness once (input');
  console.log('included); "LP MB" is the peak RSS of the LP timing process.');
  console.log(`Node ${process.version}, ${process.platform}/${process.arch}.\n`);
  const header = [
    pad('points', 9),
    pad('exact ms', 13),
    pad('LP ms', 15),
    pad('LP/exact', 9),
    pad('vertical zone µm', 17),
    pad('LP zone µm', 11),
    pad('|diff|/zone', 12),
    pad('orthogonal µm', 14),
    pad('hull', 6),
    pad('exact MB', 9),
    pad('LP MB', 7),
  ].join(' ');
  console.log(header);
  console.log('-'.repeat(header.length));
  const failures: string[] = [];
  for (const count of SIZES) {
    const exact = spawnWorker<ExactResult>('exact', count);
    const memory = spawnWorker<{ peakRssMb: number; inputRssMb: number }>('memory', count);
    exact.peakRssMb = memory.peakRssMb;
    const lp = count <= LP_LIMIT ? spawnWorker<LpResult>('lp', count) : null;
    const diff = lp === null ? Number.NaN : Math.abs(lp.verticalZone - exact.verticalZone) / exact.verticalZone;
    console.log(
      [
        pad(count.toLocaleString('en-US'), 9),
        pad(`${exact.ms.toFixed(1)} / ${exact.medianMs.toFixed(1)}`, 13),
        pad(lp === null ? 'skipped' : `${lp.ms.toFixed(1)} / ${lp.medianMs.toFixed(1)}`, 15),
        pad(lp === null ? '—' : `${(lp.ms / exact.ms).toFixed(0)}×`, 9),
        pad(um(exact.verticalZone), 17),
        pad(lp === null ? '—' : um(lp.verticalZone), 11),
        pad(lp === null ? '—' : diff.toExponential(1), 12),
        pad(um(exact.zone), 14),
        pad(String(exact.hullVertices), 6),
        pad(exact.peakRssMb.toFixed(0), 9),
        pad(lp === null ? '—' : lp.peakRssMb.toFixed(0), 7),
      ].join(' '),
    );
    if (count === 10_000 && lp !== null) {
      if (lp.ms / exact.ms < 20)
        failures.push(`10,000 points: exact is only ${(lp.ms / exact.ms).toFixed(1)}× faster than the LP (target 20×)`);
      if (!(diff <= 1e-9))
        failures.push(`10,000 points: results differ by ${diff.toExponential(2)} of the zone (target 1e-9)`);
    }
    if (count === 1_000_000) {
      if (exact.medianMs >= 2000)
        failures.push(`1,000,000 points took ${exact.medianMs.toFixed(0)} ms (target < 2000 ms)`);
      if (exact.peakRssMb >= 300)
        failures.push(`1,000,000 points peaked at ${exact.peakRssMb.toFixed(0)} MB (target < 300 MB)`);
    }
  }
  console.log(
    '\nLP skipped above 100,000 points: HiGHS (WebAssembly, 2 GiB memory) aborts building the 2,000,000-row model.',
  );
  console.log(
    '"vertical zone" and "LP zone" are the same linearised problem; "orthogonal" is the ISO 12781 minimum zone.',
  );
  if (failures.length > 0) {
    console.log(`\nTargets missed:\n  ${failures.join('\n  ')}`);
    process.exitCode = 1;
  } else {
    console.log('\nTargets met: ≥ 20× faster than the LP at 10,000 points with results equal within 1e-9 of the zone;');
    console.log('1,000,000 points in under 2 s and 300 MB.');
  }
}

if (process.argv[2] === 'worker') {
  const method = process.argv[3];
  const count = Number(process.argv[4]);
  const run =
    method === 'lp' ? lpWorker(count) : Promise.resolve(method === 'memory' ? memoryWorker(count) : exactWorker(count));
  run.then(
    (result) => console.log(JSON.stringify(result)),
    (error: unknown) => {
      console.error(error);
      process.exitCode = 1;
    },
  );
} else {
  main();
}
