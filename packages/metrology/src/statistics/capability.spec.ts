import { capability } from './capability';

describe('capability', () => {
  // NIST/SEMATECH e-Handbook §6.1.6 example [memory+computed]: USL 20, LSL 8, μ 16, σ 2 →
  // Cp 1.0, Cpu 0.6667, Cpl 1.3333, Cpk 0.6667. Inputs 14, 16, 18 have mean 16 and sample σ 2.
  it('reproduces the handbook example', () => {
    const c = capability([14, 16, 18], 8, 20);
    expect(c.mean).toBe(16);
    expect(c.sigma).toBe(2);
    expect(c.cp).toBeCloseTo(1.0, 4);
    expect(c.cpu).toBeCloseTo(0.6667, 4);
    expect(c.cpl).toBeCloseTo(1.3333, 4);
    expect(c.cpk).toBeCloseTo(0.6667, 4);
  });

  it('uses a supplied sigma (e.g. R̄/d2) instead of the sample one', () => {
    const c = capability([14, 16, 18], 8, 20, { sigma: 1 });
    expect(c.cp).toBeCloseTo(2, 12);
    expect(c.cpk).toBeCloseTo(4 / 3, 12);
  });

  it('rejects reversed limits, too few values and a zero spread', () => {
    expect(() => capability([1, 2], 3, 1)).toThrow(/lower < upper/);
    expect(() => capability([1], 0, 3)).toThrow(/at least 2 values/);
    expect(() => capability([2, 2, 2], 0, 3)).toThrow(/positive standard deviation/);
  });
});
