import { normalCdf } from './distributions';

/** Control-chart constants for subgroups of size n. */
export interface ChartConstants {
  n: number;
  /** Expected range of n standard normal values. */
  d2: number;
  /** Standard deviation of that range. */
  d3: number;
  /** X-bar chart limit factor: grand mean ± A2·R̄, A2 = 3/(d2·√n). */
  A2: number;
  /** Range chart lower limit factor: D3 = max(0, 1 − 3·d3/d2). */
  D3: number;
  /** Range chart upper limit factor: D4 = 1 + 3·d3/d2. */
  D4: number;
  /** Individuals chart factor (with moving ranges of 2): E2 = 3/d2. */
  E2: number;
}

/** Smallest and largest supported subgroup size. */
export const CHART_SUBGROUP_MIN = 2;
export const CHART_SUBGROUP_MAX = 25;

const STEP = 0.02;
const HALF_SPAN = 9;
const cache = new Map<number, ChartConstants>();
let phiTable: Float64Array | null = null;

/** Φ on the grid s_k = −HALF_SPAN + k·STEP, far enough right for s + w (w up to 2·HALF_SPAN). */
function phi(): Float64Array {
  if (phiTable === null) {
    const count = Math.round((4 * HALF_SPAN) / STEP) + 1;
    phiTable = new Float64Array(count);
    for (let k = 0; k < count; k++) phiTable[k] = normalCdf(-HALF_SPAN + k * STEP);
  }
  return phiTable;
}

function simpsonWeight(k: number, last: number): number {
  if (k === 0 || k === last) return 1;
  return k % 2 === 1 ? 4 : 2;
}

function power(x: number, n: number): number {
  let r = 1;
  for (let i = 0; i < n; i++) r *= x;
  return r;
}

/**
 * Control-chart constants computed from their definitions rather than copied from a table:
 *   d2 = E[W] = ∫ [1 − Φ(x)ⁿ − (1 − Φ(x))ⁿ] dx   (Tippett 1925),
 *   E[W²] = 2∫∫_{s<t} [1 − (1 − Φ(s))ⁿ − Φ(t)ⁿ + (Φ(t) − Φ(s))ⁿ] ds dt,  d3 = √(E[W²] − d2²),
 * where W is the range of n independent standard normal values; then A2 = 3/(d2√n),
 * D3 = max(0, 1 − 3d3/d2), D4 = 1 + 3d3/d2 (ASTM E2587; NIST/SEMATECH e-Handbook §6.3.2).
 * Both integrals use composite Simpson on a 0.02 grid over ±9 (truncation below 1e-15;
 * quadrature error below 1e-8). Results are cached per n.
 */
export function chartConstants(n: number): ChartConstants {
  if (!Number.isInteger(n) || n < CHART_SUBGROUP_MIN || n > CHART_SUBGROUP_MAX) {
    throw new RangeError(
      `subgroup size must be an integer from ${CHART_SUBGROUP_MIN} to ${CHART_SUBGROUP_MAX}, got ${n}`,
    );
  }
  const cached = cache.get(n);
  if (cached !== undefined) return { ...cached };
  const table = phi();
  const last = Math.round((2 * HALF_SPAN) / STEP);

  let d2 = 0;
  for (let i = 0; i <= last; i++) {
    const p = table[i] as number;
    d2 += simpsonWeight(i, last) * (1 - power(p, n) - power(1 - p, n));
  }
  d2 *= STEP / 3;

  // Substitute t = s + w (w ≥ 0): a rectangle in (s, w) whose nodes reuse the Φ table.
  let second = 0;
  for (let j = 0; j <= last; j++) {
    let inner = 0;
    for (let i = 0; i <= last; i++) {
      const ps = table[i] as number;
      const pt = table[i + j] as number;
      inner += simpsonWeight(i, last) * (1 - power(1 - ps, n) - power(pt, n) + power(pt - ps, n));
    }
    second += simpsonWeight(j, last) * inner;
  }
  second *= 2 * (STEP / 3) * (STEP / 3);
  const d3 = Math.sqrt(second - d2 * d2);
  const result: ChartConstants = {
    n,
    d2,
    d3,
    A2: 3 / (d2 * Math.sqrt(n)),
    D3: Math.max(0, 1 - (3 * d3) / d2),
    D4: 1 + (3 * d3) / d2,
    E2: 3 / d2,
  };
  cache.set(n, result);
  return { ...result };
}
