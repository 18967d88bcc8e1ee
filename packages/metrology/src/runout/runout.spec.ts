import fc from 'fast-check';
import { loadHighs, minimaxPlaneByLp } from '../testing/highs-reference';
import { runout, totalRunout } from './runout';

function limacon(
  n: number,
  radius: number,
  a: number,
  b: number,
  extra: (theta: number) => number = () => 0,
): number[] {
  return Array.from({ length: n }, (_, k) => {
    const theta = (2 * Math.PI * k) / n;
    return radius + a * Math.cos(theta) + b * Math.sin(theta) + extra(theta);
  });
}

describe('runout', () => {
  // Definitions (ISO 1101 circular runout: full indicator movement; limaçon model r = R + a cos θ + b sin θ).
  it('separates a pure once-per-revolution reading into eccentricity and phase, with no form error', () => {
    const readings = limacon(24, 0.0125, 0.003, -0.004);
    const r = runout(readings);
    expect(r.eccentricity).toBeCloseTo(0.005, 14);
    expect(r.phase).toBeCloseTo(Math.atan2(-0.004, 0.003) + 2 * Math.PI, 12);
    expect(r.phaseDegrees).toBeCloseTo((r.phase * 180) / Math.PI, 12);
    expect(r.circularRunout).toBeCloseTo(Math.max(...readings) - Math.min(...readings), 15);
    expect(r.roundnessLeastSquares).toBeLessThan(1e-15);
    expect(r.roundnessMinimumZone).toBeLessThan(1e-15);
  });

  // Orthogonality of cos 3θ to {1, cos θ, sin θ} on equally spaced angles, and the Chebyshev
  // alternation theorem: cos 3θ has 6 alternating extremes (more than 3 + 1), so its best
  // approximation by R + a cos θ + b sin θ is zero and both roundness values are its range 2c.
  it('keeps a three-lobe form as roundness and out of the eccentricity', () => {
    const readings = limacon(36, 5, 0.002, 0.001, (t) => 0.0004 * Math.cos(3 * t));
    const r = runout(readings);
    expect(r.leastSquares.a).toBeCloseTo(0.002, 14);
    expect(r.leastSquares.b).toBeCloseTo(0.001, 14);
    expect(r.roundnessLeastSquares).toBeCloseTo(0.0008, 14);
    expect(r.roundnessMinimumZone).toBeCloseTo(0.0008, 14);
  });

  // Reference: HiGHS (npm `highs`) solving the minimax limaçon as an LP:
  // min h s.t. c <= r_k − a cos θ_k − b sin θ_k <= c + h.
  it('finds the minimum-zone roundness of the linear programme', async () => {
    const highs = await loadHighs();
    await fc.assert(
      fc.asyncProperty(
        fc.array(fc.double({ min: -0.01, max: 0.01, noNaN: true }), { minLength: 4, maxLength: 120 }),
        async (form) => {
          const n = form.length;
          const readings = form.map((f, k) => 2 + 0.003 * Math.cos((2 * Math.PI * k) / n + 0.4) + f);
          const r = runout(readings);
          const cos = readings.map((_, k) => Math.cos((2 * Math.PI * k) / n));
          const sin = readings.map((_, k) => Math.sin((2 * Math.PI * k) / n));
          const lp = minimaxPlaneByLp(highs, cos, sin, readings);
          // Floor: the solver's feasibility tolerance (1e-10 of the scaled readings' spread).
          const floor = 1e-10 * (Math.max(...readings) - Math.min(...readings));
          expect(Math.abs(r.roundnessMinimumZone - lp.measuredZone)).toBeLessThanOrEqual(
            1e-9 * lp.measuredZone + floor,
          );
          expect(r.roundnessMinimumZone).toBeLessThanOrEqual(r.roundnessLeastSquares + 1e-15);
        },
      ),
      { numRuns: 80 },
    );
  });

  // Property: adding any limaçon (re-centring the part) changes neither roundness value.
  it('gives roundness independent of eccentricity', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -0.01, max: 0.01, noNaN: true }), { minLength: 5, maxLength: 60 }),
        fc.double({ min: -0.05, max: 0.05, noNaN: true }),
        fc.double({ min: -0.05, max: 0.05, noNaN: true }),
        (form, a, b) => {
          const moved = limacon(form.length, 0, a, b, (t) => form[Math.round((t * form.length) / (2 * Math.PI))] ?? 0);
          const before = runout(form);
          const after = runout(moved);
          expect(after.roundnessLeastSquares).toBeCloseTo(before.roundnessLeastSquares, 12);
          expect(after.roundnessMinimumZone).toBeCloseTo(before.roundnessMinimumZone, 12);
        },
      ),
      { numRuns: 100 },
    );
  });

  it('fits three readings exactly', () => {
    const r = runout([0.001, 0.004, -0.002]);
    expect(r.roundnessLeastSquares).toBe(0);
    expect(r.roundnessMinimumZone).toBe(0);
    expect(r.circularRunout).toBeCloseTo(0.006, 15);
  });

  // Definition (ISO 1101 total runout): the full indicator movement over every circle, pooled.
  it('gives total runout over all circles', () => {
    expect(totalRunout([[0.001, 0.003, 0.002], [0.004, 0.0005], [0.002]])).toBeCloseTo(0.0035, 15);
  });

  it('rejects too few or non-finite readings', () => {
    expect(() => runout([0.1, 0.2])).toThrow(/at least 3 equally spaced readings, got 2/);
    expect(() => runout([0.1, Number.NaN, 0.2, 0.3])).toThrow(/reading 1 is not a finite number/);
    expect(() => totalRunout([])).toThrow(/at least one circle/);
    expect(() => totalRunout([[0.1], []])).toThrow(/circle 1 has no readings/);
  });
});
