import fc from 'fast-check';
import { errorFunction } from 'simple-statistics';
import {
  fUpperTail,
  normalCdf,
  normalQuantile,
  regularizedBeta,
  regularizedGamma,
  studentTCdf,
  studentTQuantile,
} from './distributions';

describe('distributions', () => {
  // Closed forms of Student's t: ν = 1 is the Cauchy law, F(t) = ½ + atan(t)/π; ν = 2 has
  // F(t) = ½ + t / (2√(2 + t²)) (standard results, e.g. Abramowitz & Stegun §26.7).
  it('matches the closed forms of Student t for 1 and 2 degrees of freedom', () => {
    fc.assert(
      fc.property(fc.double({ min: -50, max: 50, noNaN: true }), (t) => {
        expect(studentTCdf(t, 1)).toBeCloseTo(0.5 + Math.atan(t) / Math.PI, 13);
        expect(studentTCdf(t, 2)).toBeCloseTo(0.5 + t / (2 * Math.sqrt(2 + t * t)), 13);
      }),
    );
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 0.999, noNaN: true }), (p) => {
        expect(studentTQuantile(p, 1)).toBeCloseTo(Math.tan(Math.PI * (p - 0.5)), 8);
        expect(studentTQuantile(p, 2)).toBeCloseTo((2 * p - 1) / Math.sqrt(2 * p * (1 - p)), 10);
      }),
    );
  });

  // JCGM 100:2008 Table G.2, t_p(ν) for p = 95 %, 95.45 %, 99 % (two-decimal table, from memory;
  // t_99(16) = 2.92 is also in references.md [memory+computed]).
  it('reproduces the GUM Table G.2 coverage factors', () => {
    const table: [number, number, number][] = [
      [1, 0.95, 12.71],
      [2, 0.9545, 4.53],
      [5, 0.99, 4.03],
      [10, 0.95, 2.23],
      [16, 0.99, 2.92],
      [20, 0.9545, 2.13],
      [Infinity, 0.9545, 2.0],
      [Infinity, 0.99, 2.576],
    ];
    for (const [nu, p, k] of table) {
      expect(Math.abs(studentTQuantile((1 + p) / 2, nu) - k)).toBeLessThanOrEqual(0.005);
    }
  });

  // Independent library: simple-statistics' error function (accuracy 1.2e-7), Φ(x) = ½(1 + erf(x/√2)).
  it('agrees with simple-statistics for the normal distribution', () => {
    fc.assert(
      fc.property(fc.double({ min: -6, max: 6, noNaN: true }), (x) => {
        expect(Math.abs(normalCdf(x) - 0.5 * (1 + errorFunction(x / Math.SQRT2)))).toBeLessThan(2e-7);
      }),
    );
    // Normal quantiles 1.959964 (97.5 %) and 2.575829 (99.5 %), from memory.
    expect(normalQuantile(0.975)).toBeCloseTo(1.959964, 6);
    expect(normalQuantile(0.995)).toBeCloseTo(2.575829, 6);
    expect(normalQuantile(0.025)).toBeCloseTo(-1.959964, 6);
  });

  // Identities: P(1, x) = 1 − e^(−x); I_x(1, b) = 1 − (1 − x)^b; I_x(a, 1) = x^a;
  // F(2, d) upper tail = (1 + 2f/d)^(−d/2); F(1, ν) upper tail at t² = 2·P(T > t).
  it('satisfies closed-form identities of the incomplete gamma and beta functions', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 30, noNaN: true }),
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        fc.double({ min: 0.2, max: 20, noNaN: true }),
        (x, u, b) => {
          expect(regularizedGamma(1, x)[0]).toBeCloseTo(-Math.expm1(-x), 13);
          expect(regularizedBeta(u, 1, b)).toBeCloseTo(1 - (1 - u) ** b, 12);
          expect(regularizedBeta(u, b, 1)).toBeCloseTo(u ** b, 12);
          expect(fUpperTail(x, 2, b)).toBeCloseTo((1 + (2 * x) / b) ** (-b / 2), 12);
          expect(fUpperTail(x * x, 1, b)).toBeCloseTo(2 * (1 - studentTCdf(x, b)), 12);
        },
      ),
    );
  });

  it('rejects impossible arguments', () => {
    expect(() => studentTQuantile(1, 5)).toThrow(/between 0 and 1/);
    expect(() => studentTCdf(1, 0)).toThrow(/degrees of freedom must be positive/);
    expect(() => regularizedBeta(0.5, 0, 1)).toThrow(RangeError);
  });
});
