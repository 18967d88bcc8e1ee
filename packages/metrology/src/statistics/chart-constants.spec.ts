import { chartConstants } from './chart-constants';
import { normalCdf } from './distributions';

// NIST/SEMATECH e-Handbook of Statistical Methods §6.3.2.1 (same table in ASTM E2587), as copied
// into references.md. The printed table was built from rounded d2 and d3, so compare at ±1e-3.
const PUBLISHED: Record<number, { d2: number; A2: number; D3: number; D4: number }> = {
  2: { d2: 1.128, A2: 1.88, D3: 0, D4: 3.267 },
  3: { d2: 1.693, A2: 1.023, D3: 0, D4: 2.574 },
  4: { d2: 2.059, A2: 0.729, D3: 0, D4: 2.282 },
  5: { d2: 2.326, A2: 0.577, D3: 0, D4: 2.114 },
  6: { d2: 2.534, A2: 0.483, D3: 0, D4: 2.004 },
  7: { d2: 2.704, A2: 0.419, D3: 0.076, D4: 1.924 },
  8: { d2: 2.847, A2: 0.373, D3: 0.136, D4: 1.864 },
  9: { d2: 2.97, A2: 0.337, D3: 0.184, D4: 1.816 },
  10: { d2: 3.078, A2: 0.308, D3: 0.223, D4: 1.777 },
};

/**
 * d2 by a second, independent route: the distribution of the range,
 * P(W <= w) = n ∫ φ(x) [Φ(x + w) − Φ(x)]^(n−1) dx, and E[W] = ∫₀^∞ (1 − P(W <= w)) dw,
 * both by Simpson's rule on a 0.01 grid (w on the same grid, so Φ(x + w) is a table lookup).
 */
function d2ByRangeDistribution(n: number): number {
  const h = 0.01;
  const xs = 1800; // x from −9 to 9
  const ws = 1200; // w from 0 to 12
  const Phi = Float64Array.from({ length: xs + ws + 1 }, (_, k) => normalCdf(-9 + k * h));
  const weight = (k: number, last: number): number => (k === 0 || k === last ? 1 : k % 2 === 1 ? 4 : 2);
  let expected = 0;
  for (let j = 0; j <= ws; j++) {
    let cdf = 0;
    for (let i = 0; i <= xs; i++) {
      const x = -9 + i * h;
      const density = Math.exp(-0.5 * x * x) / Math.sqrt(2 * Math.PI);
      cdf += weight(i, xs) * density * ((Phi[i + j] as number) - (Phi[i] as number)) ** (n - 1);
    }
    expected += weight(j, ws) * (1 - (n * cdf * h) / 3);
  }
  return (expected * h) / 3;
}

describe('chartConstants', () => {
  it('matches the published table for n = 2 … 10 within ±1e-3', () => {
    for (let n = 2; n <= 10; n++) {
      const c = chartConstants(n);
      const p = PUBLISHED[n] as { d2: number; A2: number; D3: number; D4: number };
      expect(Math.abs(c.d2 - p.d2)).toBeLessThanOrEqual(1e-3);
      expect(Math.abs(c.A2 - p.A2)).toBeLessThanOrEqual(1e-3);
      expect(Math.abs(c.D3 - p.D3)).toBeLessThanOrEqual(1e-3);
      expect(Math.abs(c.D4 - p.D4)).toBeLessThanOrEqual(1e-3);
    }
  });

  // Numerical integration of the expected range by another formula, and the exact values
  // d2(2) = 2/√π, d2(3) = 3/√π, d3(2) = √(2 − 4/π) (E|X1 − X2| and Var|X1 − X2| for normals; from memory).
  it('computes d2 as the expected range of n normal values', () => {
    for (const n of [2, 3, 5, 8]) expect(chartConstants(n).d2).toBeCloseTo(d2ByRangeDistribution(n), 7);
    expect(chartConstants(2).d2).toBeCloseTo(2 / Math.sqrt(Math.PI), 9);
    expect(chartConstants(3).d2).toBeCloseTo(3 / Math.sqrt(Math.PI), 9);
    expect(chartConstants(2).d3).toBeCloseTo(Math.sqrt(2 - 4 / Math.PI), 8);
  });

  it('rejects subgroup sizes outside 2 … 25', () => {
    expect(() => chartConstants(1)).toThrow(/subgroup size must be an integer from 2 to 25, got 1/);
    expect(() => chartConstants(2.5)).toThrow(RangeError);
    expect(() => chartConstants(26)).toThrow(RangeError);
  });
});
