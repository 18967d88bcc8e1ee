import { oneWayAnova } from './anova';

// NIST Statistical Reference Datasets, ANOVA "SiRstv" (certified values; references.md).
const SIRSTV = [
  [196.3052, 196.124, 196.189, 196.2569, 196.3403],
  [196.3042, 196.3825, 196.1669, 196.3257, 196.0422],
  [196.1303, 196.2005, 196.2889, 196.0343, 196.1811],
  [196.2795, 196.1748, 196.1494, 196.1485, 195.9885],
  [196.2119, 196.1051, 196.185, 196.0052, 196.209],
];

describe('oneWayAnova', () => {
  it('reproduces the NIST StRD SiRstv certified values', () => {
    const a = oneWayAnova(SIRSTV);
    const close = (value: number, certified: number): void =>
      expect(Math.abs(value / certified - 1)).toBeLessThan(1e-9);
    close(a.betweenSumOfSquares, 5.11462616e-2);
    close(a.withinSumOfSquares, 2.1663656e-1);
    close(a.f, 1.18046237440255);
    close(a.residualStandardDeviation, 1.04076068334656e-1);
    expect(a.betweenDegreesOfFreedom).toBe(4);
    expect(a.withinDegreesOfFreedom).toBe(20);
  });

  it('rejects empty groups', () => {
    expect(() => oneWayAnova([[1, 2], []])).toThrow(/group 1 has no values/);
  });
});
