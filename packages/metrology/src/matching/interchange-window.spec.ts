import fc from 'fast-check';
import { fitsBand } from './set-spread';
import { interchangeWindow, interchangeWindowDetail } from './interchange-window';

const height = fc.integer({ min: 14990, max: 15010 }).map((t) => t / 10000); // inch, to a tenth
const soldSet = fc.array(height, { minLength: 1, maxLength: 5 });

describe('interchangeWindow', () => {
  // Definition (brief, "Matching"): the intersection over sold sets of [max − band, min + band].
  it('is the intersection of the per-set windows', () => {
    const w = interchangeWindow(
      [
        [1.5, 1.5001, 1.5002],
        [1.5001, 1.5003],
      ],
      0.0002,
    );
    expect(w?.low).toBeCloseTo(1.5001, 12);
    expect(w?.high).toBeCloseTo(1.5002, 12);
  });

  // Property: a height in the window matches every sold set within the band (the set with the new
  // part still fits the band); a height a measurable step outside it fails at least one.
  it('contains exactly the heights that match every sold set', () => {
    fc.assert(
      fc.property(
        fc.array(soldSet, { minLength: 1, maxLength: 6 }),
        fc.integer({ min: 0, max: 6 }).map((t) => t / 10000),
        height,
        (candidates, band, h) => {
          // Sold sets were built within the band.
          const sets = candidates.filter((s) => fitsBand(Math.min(...s), Math.max(...s), band));
          fc.pre(sets.length > 0);
          const w = interchangeWindow(sets, band);
          const matchesAll = sets.every((s) => fitsBand(Math.min(h, ...s), Math.max(h, ...s), band));
          if (w === null) {
            expect(matchesAll).toBe(false);
          } else {
            const inside = h >= w.low - 1e-12 && h <= w.high + 1e-12;
            expect(matchesAll).toBe(inside);
          }
        },
      ),
      { numRuns: 500 },
    );
  });

  // When the window is empty, the reported sets really conflict (pairwise check by brute force).
  it('names the sets that conflict when no height can match them all', () => {
    fc.assert(
      fc.property(
        fc.array(soldSet, { minLength: 1, maxLength: 6 }),
        fc.integer({ min: 0, max: 4 }).map((t) => t / 10000),
        (sets, band) => {
          const detail = interchangeWindowDetail(sets, band);
          if (detail.window !== null) {
            expect(detail.conflictingSets).toEqual([]);
            return;
          }
          const windows = sets.map((s) => ({ low: Math.max(...s) - band, high: Math.min(...s) + band }));
          const disjoint = (i: number, j: number): boolean =>
            windows[i]!.low > windows[j]!.high + 1e-12 || windows[j]!.low > windows[i]!.high + 1e-12;
          const [a, b] = detail.bindingPair as [number, number];
          expect(disjoint(a, b)).toBe(true);
          const expected = sets.map((_, i) => i).filter((i) => sets.some((_, j) => disjoint(i, j)));
          expect(detail.conflictingSets).toEqual(expected);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('rejects a negative band and empty input', () => {
    expect(() => interchangeWindow([[1]], -0.0001)).toThrow(/matching band must be a finite number >= 0/);
    expect(() => interchangeWindow([], 0.0002)).toThrow(/at least one sold set/);
    expect(() => interchangeWindow([[1.5], []], 0.0002)).toThrow(/sold set 1 has no heights/);
  });
});
