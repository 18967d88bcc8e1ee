import { gammaln } from 'simple-statistics';

const EPS = 1e-16;
const TINY = 1e-300;
const MAX_ITERATIONS = 500;

/**
 * Regularised lower incomplete gamma P(a, x) = γ(a, x)/Γ(a), by its series for x < a + 1 and
 * by the continued fraction for Q = 1 − P otherwise (Press et al., Numerical Recipes, §6.2).
 * Returns [P, Q] so that either tail keeps full relative accuracy.
 */
export function regularizedGamma(a: number, x: number): [number, number] {
  if (!(a > 0) || !(x >= 0)) throw new RangeError('regularizedGamma needs a > 0 and x >= 0');
  if (x === 0) return [0, 1];
  const logPrefix = -x + a * Math.log(x) - gammaln(a);
  if (x < a + 1) {
    let ap = a;
    let term = 1 / a;
    let sum = term;
    for (let i = 0; i < MAX_ITERATIONS; i++) {
      ap += 1;
      term *= x / ap;
      sum += term;
      if (Math.abs(term) < Math.abs(sum) * EPS) break;
    }
    const p = sum * Math.exp(logPrefix);
    return [p, 1 - p];
  }
  // Modified Lentz evaluation of the continued fraction for Q.
  let b = x + 1 - a;
  let c = 1 / TINY;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i < MAX_ITERATIONS; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < TINY) d = TINY;
    c = b + an / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < EPS) break;
  }
  const q = Math.exp(logPrefix) * h;
  return [1 - q, q];
}

/**
 * Regularised incomplete beta function I_x(a, b), by the continued fraction of Numerical
 * Recipes §6.4 (modified Lentz), using the symmetry I_x(a,b) = 1 − I_{1−x}(b,a) for fast
 * convergence.
 */
export function regularizedBeta(x: number, a: number, b: number): number {
  if (!(a > 0) || !(b > 0)) throw new RangeError('regularizedBeta needs a > 0 and b > 0');
  if (x <= 0) return 0;
  if (x >= 1) return 1;
  const front = Math.exp(gammaln(a + b) - gammaln(a) - gammaln(b) + a * Math.log(x) + b * Math.log1p(-x));
  if (x < (a + 1) / (a + b + 2)) return (front * betaContinuedFraction(x, a, b)) / a;
  return 1 - (front * betaContinuedFraction(1 - x, b, a)) / b;
}

function betaContinuedFraction(x: number, a: number, b: number): number {
  const qab = a + b;
  const qap = a + 1;
  const qam = a - 1;
  let c = 1;
  let d = 1 - (qab * x) / qap;
  if (Math.abs(d) < TINY) d = TINY;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= MAX_ITERATIONS; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((qam + m2) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (qab + m) * x) / ((a + m2) * (qap + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < EPS) break;
  }
  return h;
}

/** Standard normal cumulative distribution Φ(x) = ½·erfc(−x/√2), with erfc(y) = Q(½, y²) for y ≥ 0. */
export function normalCdf(x: number): number {
  if (Number.isNaN(x)) return Number.NaN;
  if (x === Infinity) return 1;
  if (x === -Infinity) return 0;
  const q = 0.5 * regularizedGamma(0.5, (x * x) / 2)[1];
  return x < 0 ? q : 1 - q;
}

/** Upper tail 1 − Φ(x), accurate far out in the tail. */
export function normalUpperTail(x: number): number {
  return normalCdf(-x);
}

/** Inverts a decreasing tail function on t ≥ 0 by bracketing and bisection to full precision. */
function invertTail(tail: (t: number) => number, target: number): number {
  let low = 0;
  let high = 1;
  while (tail(high) > target) {
    low = high;
    high *= 2;
    if (high > 1e300) return Infinity;
  }
  for (let i = 0; i < 2000; i++) {
    const mid = (low + high) / 2;
    if (mid === low || mid === high) break;
    if (tail(mid) > target) low = mid;
    else high = mid;
  }
  return (low + high) / 2;
}

/** Standard normal quantile: the x with Φ(x) = p, 0 < p < 1. */
export function normalQuantile(p: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`probability must be between 0 and 1 (exclusive), got ${p}`);
  if (p === 0.5) return 0;
  if (p < 0.5) return -normalQuantile(1 - p);
  return invertTail(normalUpperTail, 1 - p);
}

/**
 * Student's t cumulative distribution with ν degrees of freedom (ν may be non-integer, or
 * Infinity for the normal): P(T ≤ t) from the tail ½·I_{ν/(ν+t²)}(ν/2, ½) (Abramowitz & Stegun 26.7.1).
 */
export function studentTCdf(t: number, degreesOfFreedom: number): number {
  if (!(degreesOfFreedom > 0)) throw new RangeError(`degrees of freedom must be positive, got ${degreesOfFreedom}`);
  if (degreesOfFreedom === Infinity) return normalCdf(t);
  const tail = studentTUpperTail(Math.abs(t), degreesOfFreedom);
  return t >= 0 ? 1 - tail : tail;
}

function studentTUpperTail(t: number, nu: number): number {
  if (nu === Infinity) return normalUpperTail(t);
  const t2 = t * t;
  // For small t use the complementary form, so 1 − ν/(ν + t²) is not formed by cancellation.
  if (t2 < nu) return 0.5 * (1 - regularizedBeta(t2 / (nu + t2), 0.5, nu / 2));
  return 0.5 * regularizedBeta(nu / (nu + t2), nu / 2, 0.5);
}

/** Student's t quantile: the t with P(T ≤ t) = p for ν degrees of freedom (Infinity gives the normal). */
export function studentTQuantile(p: number, degreesOfFreedom: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`probability must be between 0 and 1 (exclusive), got ${p}`);
  if (!(degreesOfFreedom > 0)) throw new RangeError(`degrees of freedom must be positive, got ${degreesOfFreedom}`);
  if (p === 0.5) return 0;
  if (p < 0.5) return -studentTQuantile(1 - p, degreesOfFreedom);
  return invertTail((t) => studentTUpperTail(t, degreesOfFreedom), 1 - p);
}

/** Upper tail P(F > f) of Fisher's F distribution with (d1, d2) degrees of freedom: I_{d2/(d2+d1·f)}(d2/2, d1/2). */
export function fUpperTail(f: number, d1: number, d2: number): number {
  if (!(d1 > 0) || !(d2 > 0)) throw new RangeError('F distribution needs positive degrees of freedom');
  if (Number.isNaN(f)) return Number.NaN;
  if (f <= 0) return 1;
  if (f === Infinity) return 0;
  // Use whichever argument is small, so neither is formed as 1 − (a number near 1).
  const small = (d1 * f) / (d2 + d1 * f);
  const large = d2 / (d2 + d1 * f);
  if (small < large) return 1 - regularizedBeta(small, d1 / 2, d2 / 2);
  return regularizedBeta(large, d2 / 2, d1 / 2);
}
