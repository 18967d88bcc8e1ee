import { flatnessOfArrays } from '../form/flatness';

/** The limaçon r(θ) = R + a·cos θ + b·sin θ fitted to the readings. */
export interface LimaconFit {
  /** Mean reading (the limaçon's constant term). */
  radius: number;
  a: number;
  b: number;
}

/** Runout and form of one circle of indicator readings. Lengths in the readings' unit. */
export interface RunoutResult {
  /** Full indicator movement over the revolution: max − min of the readings. */
  circularRunout: number;
  /** √(a² + b²) of the least-squares limaçon: the once-per-revolution part. */
  eccentricity: number;
  /**
   * Angle of the once-per-revolution high point, radians in [0, 2π), measured from the first
   * reading in the direction the readings were taken (a·cos θ + b·sin θ = e·cos(θ − phase)).
   */
  phase: number;
  /** `phase` in degrees. */
  phaseDegrees: number;
  /** Range of the residuals after the least-squares limaçon. */
  roundnessLeastSquares: number;
  /** Smallest range of residuals over all limaçons (minimax / Chebyshev zone). */
  roundnessMinimumZone: number;
  leastSquares: LimaconFit;
  /** The limaçon of the minimum zone; its radius is the zone's mid-line. */
  minimumZone: LimaconFit;
  /** Residual of each reading after the least-squares limaçon. */
  residuals: number[];
}

function checkReadings(readings: readonly number[], what: string): void {
  if (!Array.isArray(readings)) throw new RangeError(`${what} must be an array of numbers`);
  readings.forEach((r, i) => {
    if (typeof r !== 'number' || !Number.isFinite(r)) {
      throw new RangeError(`${what}: reading ${i} is not a finite number (${String(r)})`);
    }
  });
}

/**
 * Circular runout and roundness from indicator readings at N equally spaced angles over one
 * revolution (θ_k = 2πk/N, k = 0…N−1, the first position not repeated at the end).
 *
 * Circular runout is the full indicator movement (ISO 1101 / ASME Y14.5). The readings are
 * separated with the limaçon model r(θ) = R + a·cos θ + b·sin θ, the first-order form of an
 * eccentric circle (ISO 12181-2 least-squares reference circle, linearised): for equally spaced
 * angles its least-squares coefficients are R = mean, a = (2/N)Σ r·cos θ, b = (2/N)Σ r·sin θ.
 * Eccentricity = √(a² + b²); least-squares roundness = range of residuals.
 *
 * Minimum-zone roundness: minimise over (R, a, b) the largest |residual|; R drops out, so it
 * is the smallest range of r_k − a·cos θ_k − b·sin θ_k, i.e. the vertical width of the 3-D
 * points (cos θ_k, sin θ_k, r_k). That width is computed exactly from the points' convex hull
 * (see `minimumWidth`). Because {1, cos, sin} is a Haar system on the circle, the optimum is
 * fixed by 4 readings alternating between the two limaçons (Chebyshev alternation).
 */
export function runout(readings: readonly number[]): RunoutResult {
  checkReadings(readings, 'runout');
  const n = readings.length;
  if (n < 3) throw new RangeError(`runout needs at least 3 equally spaced readings, got ${n}`);
  const cos = new Float64Array(n);
  const sin = new Float64Array(n);
  let sum = 0;
  let low = Infinity;
  let high = -Infinity;
  for (let k = 0; k < n; k++) {
    const theta = (2 * Math.PI * k) / n;
    cos[k] = Math.cos(theta);
    sin[k] = Math.sin(theta);
    const r = readings[k] as number;
    sum += r;
    if (r < low) low = r;
    if (r > high) high = r;
  }
  const radius = sum / n;
  let sa = 0;
  let sb = 0;
  for (let k = 0; k < n; k++) {
    const r = (readings[k] as number) - radius;
    sa += r * (cos[k] as number);
    sb += r * (sin[k] as number);
  }
  const a = (2 / n) * sa;
  const b = (2 / n) * sb;
  const residuals: number[] = [];
  let rLow = Infinity;
  let rHigh = -Infinity;
  let spread = 0;
  for (let k = 0; k < n; k++) {
    const e = (readings[k] as number) - radius - a * (cos[k] as number) - b * (sin[k] as number);
    residuals.push(e);
    if (e < rLow) rLow = e;
    if (e > rHigh) rHigh = e;
    spread = Math.max(spread, Math.abs((readings[k] as number) - radius));
  }

  let minimumZone: LimaconFit = { radius: radius + (rLow + rHigh) / 2, a, b };
  let roundnessMinimumZone = rHigh - rLow;
  if (n > 3 && spread > 0) {
    // Scale the readings to about ±1 so the hull works on well-proportioned coordinates.
    const z = new Float64Array(n);
    for (let k = 0; k < n; k++) z[k] = ((readings[k] as number) - radius) / spread;
    const zone = flatnessOfArrays({ x: cos, y: sin, z }).vertical;
    if (zone !== null && zone.zone * spread < roundnessMinimumZone) {
      roundnessMinimumZone = zone.zone * spread;
      minimumZone = {
        radius: radius + ((zone.low + zone.high) / 2) * spread,
        a: zone.slopeX * spread,
        b: zone.slopeY * spread,
      };
    }
  } else {
    // Three readings (or identical readings) are fitted exactly by the limaçon.
    roundnessMinimumZone = n === 3 ? 0 : roundnessMinimumZone;
  }

  let phase = Math.atan2(b, a);
  if (phase < 0) phase += 2 * Math.PI;
  const eccentricity = Math.hypot(a, b);
  return {
    circularRunout: high - low,
    eccentricity,
    phase: eccentricity === 0 ? 0 : phase,
    phaseDegrees: eccentricity === 0 ? 0 : (phase * 180) / Math.PI,
    roundnessLeastSquares: n === 3 ? 0 : rHigh - rLow,
    roundnessMinimumZone: Math.min(roundnessMinimumZone, n === 3 ? 0 : rHigh - rLow),
    leastSquares: { radius, a, b },
    minimumZone,
    residuals,
  };
}

/**
 * Total runout: the full indicator movement over all readings of every circle on the surface,
 * pooled (ISO 1101 / ASME Y14.5 total runout). Circles may have different numbers of readings.
 */
export function totalRunout(circles: readonly (readonly number[])[]): number {
  if (!Array.isArray(circles) || circles.length === 0) throw new RangeError('total runout needs at least one circle');
  let low = Infinity;
  let high = -Infinity;
  circles.forEach((circle, c) => {
    checkReadings(circle, `total runout, circle ${c}`);
    if (circle.length === 0) throw new RangeError(`total runout: circle ${c} has no readings`);
    for (const r of circle) {
      if (r < low) low = r;
      if (r > high) high = r;
    }
  });
  return high - low;
}
