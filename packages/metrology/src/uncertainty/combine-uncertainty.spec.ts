import fc from 'fast-check';
import { combineUncertainty, standardUncertaintyOf, type UncertaintyComponent } from './combine-uncertainty';

// GUM H.1 end-gauge calibration (JCGM 100:2008 Annex H.1; figures in references.md). Lengths in nm.
const lS = 50.000623e6; // nm
const theta = -0.1; // °C
const alphaS = 11.5e-6; // /°C

describe('combineUncertainty', () => {
  // Inputs as tabulated in GUM Table H.1 [seen]; u_c = 32 nm [seen]; 31.71 nm from the rounded
  // table, ν_eff ≈ 16.7 truncated to 16, k = t_99(16) = 2.92, U_99 = 93 nm [memory+computed].
  it('reproduces the GUM H.1 budget from its tabulated inputs', () => {
    const components: UncertaintyComponent[] = [
      { name: 'calibration of standard', standardUncertainty: 25, degreesOfFreedom: 18 },
      { name: 'measured difference', standardUncertainty: 9.7, degreesOfFreedom: 25.6 },
      {
        name: 'expansion coefficient of standard',
        standardUncertainty: 1.2e-6,
        sensitivity: 0,
        degreesOfFreedom: Infinity,
      },
      { name: 'temperature of bed', standardUncertainty: 0.41, sensitivity: 0 },
      {
        name: 'difference of expansion coefficients',
        standardUncertainty: 0.58e-6,
        sensitivity: -lS * theta,
        degreesOfFreedom: 50,
      },
      {
        name: 'difference of temperatures',
        standardUncertainty: 0.029,
        sensitivity: -lS * alphaS,
        degreesOfFreedom: 2,
      },
    ];
    const r = combineUncertainty(components, { coverage: { probability: 0.99 } });
    expect(Math.round(r.combinedStandardUncertainty)).toBe(32);
    expect(r.combinedStandardUncertainty).toBeCloseTo(31.71, 2);
    expect(r.components[4]?.contribution).toBeCloseTo(2.9, 1);
    expect(r.components[5]?.contribution).toBeCloseTo(16.7, 1);
    expect(r.effectiveDegreesOfFreedom).toBeGreaterThan(16);
    expect(r.effectiveDegreesOfFreedom).toBeLessThan(17);
    expect(r.coverageFactor).toBeCloseTo(2.92, 2);
    expect(Math.round(r.expandedUncertainty)).toBe(93);
  });

  // The same budget from the unrounded inputs: u(d) combined from its three parts
  // (5.8 nm, 24 dof; 3.9 nm, 5 dof; 6.7 nm, 8 dof), rectangular ±1e-6 /°C and ±0.05 °C
  // [seen]; u_c = 31.66 nm [memory+computed]; ν(d) = 25.6 [seen] from inputs rounded to two digits.
  it('reproduces the GUM H.1 budget from its unrounded inputs', () => {
    const d = combineUncertainty([
      { name: 'repeated observations', standardUncertainty: 5.8, degreesOfFreedom: 24 },
      { name: 'random effects of comparator', standardUncertainty: 3.9, degreesOfFreedom: 5 },
      { name: 'systematic effects of comparator', standardUncertainty: 6.7, degreesOfFreedom: 8 },
    ]);
    expect(d.combinedStandardUncertainty).toBeCloseTo(9.7, 1);
    expect(Math.abs(d.effectiveDegreesOfFreedom - 25.6)).toBeLessThan(0.5);
    const r = combineUncertainty([
      { name: 'calibration of standard', value: 75, distribution: 'normal', coverageFactor: 3, degreesOfFreedom: 18 },
      {
        name: 'measured difference',
        standardUncertainty: d.combinedStandardUncertainty,
        degreesOfFreedom: d.effectiveDegreesOfFreedom,
      },
      { name: 'expansion coefficient of standard', value: 2e-6, distribution: 'rectangular', sensitivity: 0 },
      {
        name: 'difference of expansion coefficients',
        value: 1e-6,
        distribution: 'rectangular',
        sensitivity: -lS * theta,
        degreesOfFreedom: 50,
      },
      {
        name: 'difference of temperatures',
        value: 0.05,
        distribution: 'rectangular',
        sensitivity: -lS * alphaS,
        degreesOfFreedom: 2,
      },
    ]);
    expect(r.combinedStandardUncertainty).toBeCloseTo(31.66, 2);
    expect(r.components[0]?.standardUncertainty).toBe(25);
  });

  // GUM H.1.3.4 [seen]: bed temperature 0.2 °C standard uncertainty combined with a cyclic
  // (arcsine) variation of amplitude 0.5 °C gives 0.41 °C. Divisors: JCGM 100:2008 §4.3.7
  // (rectangular a/√3), §4.3.9 (triangular a/√6), arcsine a/√2.
  it('evaluates distributions by their GUM divisors', () => {
    const bed = combineUncertainty([
      { name: 'mean temperature', standardUncertainty: 0.2 },
      { name: 'cyclic variation', value: 0.5, distribution: 'arcsine' },
    ]);
    expect(bed.combinedStandardUncertainty).toBeCloseTo(0.41, 2);
    expect(standardUncertaintyOf({ name: 'r', value: Math.sqrt(3), distribution: 'rectangular' })).toBeCloseTo(1, 15);
    expect(standardUncertaintyOf({ name: 't', value: Math.sqrt(6), distribution: 'triangular' })).toBeCloseTo(1, 15);
    expect(standardUncertaintyOf({ name: 'n', value: 0.6, distribution: 'normal' })).toBeCloseTo(0.3, 15);
  });

  // GUM Table G.2 (from memory): for ν = ∞, p = 95.45 % gives k = 2.00; p = 95 % gives 1.96.
  it('takes k from the normal distribution when every degree of freedom is infinite', () => {
    const r = combineUncertainty(
      [
        { name: 'a', standardUncertainty: 3 },
        { name: 'b', standardUncertainty: 4 },
      ],
      { coverage: { probability: 0.9545 } },
    );
    expect(r.combinedStandardUncertainty).toBe(5);
    expect(r.effectiveDegreesOfFreedom).toBe(Infinity);
    expect(r.coverageFactor).toBeCloseTo(2.0, 2);
    expect(
      combineUncertainty([{ name: 'a', standardUncertainty: 1 }], { coverage: { probability: 0.95 } }).coverageFactor,
    ).toBeCloseTo(1.96, 2);
    expect(combineUncertainty([{ name: 'a', standardUncertainty: 1 }]).coverageFactor).toBe(2);
  });

  it('is not broken by zero sensitivities, zero uncertainties or a zero total', () => {
    const r = combineUncertainty([
      { name: 'unused', standardUncertainty: 7, sensitivity: 0, degreesOfFreedom: 3 },
      { name: 'nothing', standardUncertainty: 0, degreesOfFreedom: 1 },
    ]);
    expect(r.combinedStandardUncertainty).toBe(0);
    expect(r.effectiveDegreesOfFreedom).toBe(Infinity);
    expect(r.expandedUncertainty).toBe(0);
    expect(r.components.every((c) => c.varianceShare === 0)).toBe(true);
  });

  // Law of propagation for uncorrelated inputs: u_c² = Σ(c·u)²; Welch–Satterthwaite bounds
  // min ν_i <= ν_eff <= Σ ν_i (a known property of the formula).
  it('obeys the root-sum-of-squares law and the Welch–Satterthwaite bounds', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.tuple(
            fc.double({ min: 1e-6, max: 10, noNaN: true }),
            fc.double({ min: -5, max: 5, noNaN: true }),
            fc.integer({ min: 1, max: 60 }),
          ),
          { minLength: 1, maxLength: 8 },
        ),
        (rows) => {
          fc.pre(rows.some(([, c]) => Math.abs(c) > 1e-3));
          const r = combineUncertainty(
            rows.map(([u, c, nu], i) => ({
              name: `c${i}`,
              standardUncertainty: u,
              sensitivity: c,
              degreesOfFreedom: nu,
            })),
          );
          const rss = Math.sqrt(rows.reduce((s, [u, c]) => s + (u * c) ** 2, 0));
          expect(r.combinedStandardUncertainty).toBeCloseTo(rss, 10);
          const contributing = rows.filter(([u, c]) => u * Math.abs(c) > 0);
          expect(r.effectiveDegreesOfFreedom).toBeGreaterThanOrEqual(
            Math.min(...contributing.map(([, , nu]) => nu)) * (1 - 1e-12),
          );
          expect(r.effectiveDegreesOfFreedom).toBeLessThanOrEqual(
            contributing.reduce((s, [, , nu]) => s + nu, 0) * (1 + 1e-12),
          );
        },
      ),
    );
  });

  it('rejects bad components with their name', () => {
    expect(() => combineUncertainty([])).toThrow(/at least one component/);
    expect(() => combineUncertainty([{ name: 'probe', standardUncertainty: -1 }])).toThrow(
      /"probe": standard uncertainty must be finite and >= 0/,
    );
    expect(() => combineUncertainty([{ name: 'probe', standardUncertainty: 1, degreesOfFreedom: 0 }])).toThrow(
      /"probe": degrees of freedom must be positive/,
    );
    expect(() =>
      combineUncertainty([{ name: 'probe', standardUncertainty: 1 }], { coverage: { probability: 1.2 } }),
    ).toThrow(/coverage probability/);
  });
});
