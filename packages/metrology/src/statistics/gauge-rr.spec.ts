import fc from 'fast-check';
import { gaugeRR } from './gauge-rr';

// Houf & Berman (1988), thermal impedance, 10 parts × 3 operators × 3 trials (references.md [seen]).
const HOUF_BERMAN = `37 38 37 | 41 41 40 | 41 42 41
42 41 43 | 42 42 42 | 43 42 43
30 31 31 | 31 31 31 | 29 30 28
42 43 42 | 43 43 43 | 42 42 42
28 30 29 | 29 30 29 | 31 29 29
42 42 43 | 45 45 45 | 44 46 45
25 26 27 | 28 28 30 | 29 27 27
40 40 40 | 43 42 42 | 43 43 41
25 25 25 | 27 29 28 | 26 26 26
35 34 34 | 35 35 34 | 35 34 35`
  .split('\n')
  .map((line) => line.split('|').map((cell) => cell.trim().split(/\s+/).map(Number)));

describe('gaugeRR', () => {
  // Published two-way ANOVA with interaction (Montgomery, Introduction to SQC, after Houf & Berman):
  // MS parts 437.328, operators 19.633, interaction 2.6951, error 0.5111; variance components
  // part 48.29, operator 0.56, interaction 0.73, repeatability 0.51, gauge 1.80; P/T = 6σ/40 = 0.20
  // with spec limits 18 and 58 (references.md, [computed; matches the published two decimals]).
  it('reproduces the Houf & Berman study', () => {
    const r = gaugeRR({ values: HOUF_BERMAN, tolerance: 58 - 18 });
    const ms = Object.fromEntries(r.anova.map((row) => [row.source, row.meanSquare]));
    expect(ms.part).toBeCloseTo(437.328, 3);
    expect(ms.operator).toBeCloseTo(19.633, 3);
    expect(ms['part × operator']).toBeCloseTo(2.6951, 4);
    expect(ms.repeatability).toBeCloseTo(0.5111, 4);
    expect(r.variance.part).toBeCloseTo(48.29, 2);
    expect(r.variance.operator).toBeCloseTo(0.56, 2);
    expect(r.variance.interaction).toBeCloseTo(0.73, 2);
    expect(r.variance.repeatability).toBeCloseTo(0.51, 2);
    expect(r.grr ** 2).toBeCloseTo(1.8, 2);
    expect((r.pctGrrOfTolerance ?? 0) / 100).toBeCloseTo(0.2, 2);
    // Derived from the published components: ndc = floor(1.41·√48.29/√1.80) = 7.
    expect(r.ndc).toBe(Math.floor((1.41 * Math.sqrt(48.29)) / Math.sqrt(1.8)));
    expect(r.pctGrrOfTotal).toBeCloseTo((100 * Math.sqrt(1.8)) / Math.sqrt(1.8 + 48.29), 0);
    const dof = Object.fromEntries(r.anova.map((row) => [row.source, row.degreesOfFreedom]));
    expect(dof).toEqual({ part: 9, operator: 2, 'part × operator': 18, repeatability: 60, total: 89 });
  });

  // Properties of the method: the sums of squares add up to the total, each component follows
  // the expected-mean-square formula, and a negative estimate is set to 0.
  it('partitions the total sum of squares and clamps negative variance components', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 2, max: 6 }),
        fc.integer({ min: 2, max: 4 }),
        fc.integer({ min: 2, max: 4 }),
        fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 96, maxLength: 96 }),
        (p, o, r, noise) => {
          let k = 0;
          const values = Array.from({ length: p }, (_, i) =>
            Array.from({ length: o }, () =>
              Array.from({ length: r }, () => 10 + i + (noise[k++ % noise.length] as number)),
            ),
          );
          const g = gaugeRR({ values });
          const row = Object.fromEntries(g.anova.map((x) => [x.source, x]));
          const sum =
            row.part!.sumOfSquares +
            row.operator!.sumOfSquares +
            row['part × operator']!.sumOfSquares +
            row.repeatability!.sumOfSquares;
          expect(sum).toBeCloseTo(row.total!.sumOfSquares, 8);
          const expectedOperator = (row.operator!.meanSquare - row['part × operator']!.meanSquare) / (p * r);
          expect(g.variance.operator).toBeCloseTo(Math.max(0, expectedOperator), 12);
          expect(g.variance.interaction).toBeCloseTo(
            Math.max(0, (row['part × operator']!.meanSquare - row.repeatability!.meanSquare) / r),
            12,
          );
          for (const v of Object.values(g.variance)) expect(v).toBeGreaterThanOrEqual(0);
          expect(g.grr).toBeCloseTo(Math.hypot(g.repeatability, g.reproducibility), 12);
        },
      ),
    );
  });

  it('rejects unbalanced studies by position', () => {
    expect(() =>
      gaugeRR({
        values: [
          [
            [1, 2],
            [1, 2],
          ],
          [[1, 2], [1]],
        ],
      }),
    ).toThrow(/part 1, operator 1 has 1 trials; expected 2/);
    expect(() =>
      gaugeRR({
        values: [
          [
            [1, 2],
            [1, 2],
          ],
          [[1, 2]],
        ],
      }),
    ).toThrow(/part 1 has 1 operators; expected 2/);
    expect(() =>
      gaugeRR({
        values: [
          [
            [1, 2],
            [1, 2],
          ],
        ],
      }),
    ).toThrow(/at least 2 parts/);
    expect(() => gaugeRR({ values: HOUF_BERMAN, tolerance: 0 })).toThrow(/tolerance must be a positive width/);
  });
});
