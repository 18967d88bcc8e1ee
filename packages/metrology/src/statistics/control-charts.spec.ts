import { chartConstants } from './chart-constants';
import { individuals, xbarR } from './control-charts';

describe('individuals (I-MR) chart', () => {
  // NIST/SEMATECH e-Handbook §6.3.2.2 example [memory+computed, references.md]: mean 50.81,
  // mean moving range 1.8778, limits 55.8041 / 45.8159, MR upper limit 6.1348. The handbook used
  // the 3-decimal constants (d2 = 1.128, D4 = 3.267); ours are exact, so allow the effect of
  // rounding those constants (±0.0005 in d2 moves the limits by 0.0022, in D4 the MR limit by 0.001).
  it('reproduces the handbook example', () => {
    const values = [49.6, 47.6, 49.9, 51.3, 47.8, 51.2, 52.6, 52.4, 53.6, 52.1];
    const chart = individuals(values);
    expect(chart.mean).toBeCloseTo(50.81, 10);
    expect(chart.meanMovingRange).toBeCloseTo(1.8778, 4);
    expect(Math.abs(chart.individuals.upper - 55.8041)).toBeLessThanOrEqual(0.0025);
    expect(Math.abs(chart.individuals.lower - 45.8159)).toBeLessThanOrEqual(0.0025);
    expect(Math.abs(chart.movingRange.upper - 6.1348)).toBeLessThanOrEqual(0.0012);
    expect(chart.movingRange.lower).toBe(0);
    expect(chart.movingRanges).toHaveLength(9);
  });

  it('needs two values', () => {
    expect(() => individuals([1])).toThrow(/at least 2 values/);
    expect(() => individuals([1, Number.NaN])).toThrow(/value 1 is not a finite number/);
  });
});

describe('X-bar/R chart', () => {
  // Definitions (ASTM E2587; NIST e-Handbook §6.3.2.1): limits x̿ ± A2·R̄, range limits D3·R̄ and
  // D4·R̄, here with the table's A2 = 0.577 and D4 = 2.114 for n = 5 (±1e-3 of R̄).
  it('places the limits by the published constants', () => {
    const subgroups = [
      [38.1002, 38.1005, 38.0999, 38.1003, 38.1001],
      [38.1004, 38.1, 38.1002, 38.1006, 38.1003],
      [38.0998, 38.1001, 38.1003, 38.1, 38.1002],
      [38.1001, 38.1004, 38.1005, 38.0999, 38.1],
    ];
    const chart = xbarR(subgroups);
    const ranges = subgroups.map((g) => Math.max(...g) - Math.min(...g));
    const rBar = ranges.reduce((s, r) => s + r, 0) / ranges.length;
    const means = subgroups.map((g) => g.reduce((s, v) => s + v, 0) / g.length);
    const grand = means.reduce((s, m) => s + m, 0) / means.length;
    expect(chart.meanRange).toBeCloseTo(rBar, 12);
    expect(chart.grandMean).toBeCloseTo(grand, 12);
    expect(Math.abs(chart.xbar.upper - (grand + 0.577 * rBar))).toBeLessThanOrEqual(1e-3 * rBar);
    expect(Math.abs(chart.xbar.lower - (grand - 0.577 * rBar))).toBeLessThanOrEqual(1e-3 * rBar);
    expect(Math.abs(chart.range.upper - 2.114 * rBar)).toBeLessThanOrEqual(1e-3 * rBar);
    expect(chart.range.lower).toBe(0);
    expect(chart.sigma).toBeCloseTo(rBar / chartConstants(5).d2, 12);
  });

  it('needs equal subgroups of 2 to 25 values', () => {
    expect(() => xbarR([[1, 2]])).toThrow(/at least 2 subgroups/);
    expect(() =>
      xbarR([
        [1, 2, 3],
        [1, 2],
      ]),
    ).toThrow(/subgroup 1 has 2 values; every subgroup needs 3/);
    expect(() => xbarR([[1], [2]])).toThrow(/subgroup size must be an integer from 2 to 25/);
  });
});
