import fc from 'fast-check';
import { grindPlan, stockToRemove } from './grind-plan';

describe('grindPlan', () => {
  // Check value (common practice): 0.010 in of stock in 0.001 in passes, the last 0.001 in at
  // 0.0002 in per pass: 9 roughing and 5 finishing passes.
  it('plans 9 roughing and 5 finishing passes for 0.010 in of stock', () => {
    const plan = grindPlan({
      stock: 0.01,
      roughDepth: 0.001,
      finishAllowance: 0.001,
      finishDepth: 0.0002,
      sparkOutPasses: 2,
    });
    expect(plan.roughPasses).toBe(9);
    expect(plan.finishPasses).toBe(5);
    expect(plan.sparkOutPasses).toBe(2);
    expect(plan.passes).toHaveLength(16);
    expect(plan.passes.filter((p) => p.kind === 'rough').every((p) => p.depth === 0.001)).toBe(true);
    expect(plan.passes.filter((p) => p.kind === 'finish').every((p) => p.depth === 0.0002)).toBe(true);
    expect(plan.passes[8]?.remaining).toBe(0.001);
    expect(plan.passes[13]?.remaining).toBe(0);
  });

  // Check value (common practice): a part at 0.650 in ground to 0.648 in has 0.002 in of stock.
  it('gives 0.002 in of stock from 0.650 in to 0.648 in', () => {
    expect(stockToRemove(0.65, 0.648)).toBe(0.002);
    expect(() => stockToRemove(0.648, 0.65)).toThrow(/above the current height/);
  });

  // Properties: the passes remove exactly the stock, none is deeper than its set depth, and the
  // pass counts are the fewest that can do it.
  it('removes exactly the stock with no pass deeper than allowed', () => {
    const tenths = (max: number): fc.Arbitrary<number> => fc.integer({ min: 1, max }).map((t) => t / 10000);
    fc.assert(
      fc.property(
        tenths(400),
        tenths(20),
        fc.integer({ min: 0, max: 40 }).map((t) => t / 10000),
        tenths(5),
        fc.integer({ min: 0, max: 4 }),
        (stock, rough, allowance, finish, spark) => {
          const plan = grindPlan({
            stock,
            roughDepth: rough,
            finishAllowance: allowance,
            finishDepth: finish,
            sparkOutPasses: spark,
          });
          const removed = plan.passes.reduce((s, p) => s + p.depth, 0);
          expect(removed).toBeCloseTo(stock, 12);
          for (const p of plan.passes) {
            if (p.kind === 'rough') expect(p.depth).toBeLessThanOrEqual(rough + 1e-15);
            if (p.kind === 'finish') expect(p.depth).toBeLessThanOrEqual(finish + 1e-15);
          }
          const roughStock = Math.max(0, stock - allowance);
          expect(plan.roughPasses).toBe(Math.ceil(Math.round((roughStock / rough) * 1e6) / 1e6));
          expect(plan.passes.at(-1)?.remaining ?? 0).toBe(0);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('rejects impossible settings', () => {
    expect(() =>
      grindPlan({ stock: -0.001, roughDepth: 0.001, finishAllowance: 0, finishDepth: 0.0002, sparkOutPasses: 0 }),
    ).toThrow(/stock must be/);
    expect(() =>
      grindPlan({ stock: 0.01, roughDepth: 0, finishAllowance: 0, finishDepth: 0.0002, sparkOutPasses: 0 }),
    ).toThrow(/rough depth must be positive/);
    expect(() =>
      grindPlan({ stock: 0.01, roughDepth: 0.001, finishAllowance: 0, finishDepth: 0.0002, sparkOutPasses: 1.5 }),
    ).toThrow(/spark-out passes/);
  });
});
