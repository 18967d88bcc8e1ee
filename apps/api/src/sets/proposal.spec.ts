import fc from 'fast-check';
import { interchangeWindow, setSpread } from '@evenset/metrology';
import { chooseSets, narrow } from './proposal';

/** Heights in mm around 38.1 on a 0.1 µm grid, as stored. */
const height = fc.integer({ min: 0, max: 200 }).map((n) => 38.09 + n * 1e-4);
const BAND = 0.00508; // 0.0002 in

describe('set proposals', () => {
  it('narrows the window set by set exactly as the interchange window of all the sets (brief, "Matching")', () => {
    // Reference: interchangeWindow of @evenset/metrology, itself checked against the brief's definition.
    fc.assert(
      fc.property(
        fc.array(fc.array(height, { minLength: 1, maxLength: 5 }), { minLength: 1, maxLength: 6 }),
        (sets) => {
          const folded = sets.reduce<ReturnType<typeof narrow> | null>(
            (window, set) => narrow(window, Math.min(...set), Math.max(...set), BAND),
            null,
          )!;
          const reference = interchangeWindow(sets, BAND);
          if (reference === null) expect(folded.low).toBeGreaterThan(folded.high);
          else {
            expect(folded.low).toBeCloseTo(reference.low, 12);
            expect(folded.high).toBeCloseTo(reference.high, 12);
          }
        },
      ),
    );
  });

  it('proposes disjoint sets that fit the band, stay in the window and match each other', () => {
    fc.assert(
      fc.property(
        fc.array(height, { minLength: 0, maxLength: 24 }),
        fc.integer({ min: 1, max: 4 }),
        fc.integer({ min: 1, max: 6 }),
        (heights, setSize, wanted) => {
          const free = heights.map((h, i) => ({
            id: `p${i}`,
            serial: `S${i}`,
            lotNumber: 'L',
            revision: 'B',
            height: h,
          }));
          const state = { window: { low: 38.1, high: 38.107 }, conflict: false, conflicting: [], soldSets: 1 };
          const { sets, spare, window } = chooseSets(free, state, setSize, BAND, wanted);
          expect(sets.length).toBeLessThanOrEqual(wanted);
          const used = sets.flatMap((s) => s.parts.map((p) => p.id));
          expect(new Set(used).size).toBe(used.length);
          for (const set of sets) {
            expect(set.parts).toHaveLength(setSize);
            expect(set.spread).toBeLessThanOrEqual(BAND + 1e-12);
            expect(set.spread).toBeCloseTo(setSpread(set.parts.map((p) => p.height)), 12);
          }
          // Every chosen part lies in the window left by the sold sets and all chosen sets.
          if (sets.length) {
            const all = [[38.1 + 0.007 - BAND, 38.1 + BAND]].concat(sets.map((s) => s.parts.map((p) => p.height)));
            const reference = interchangeWindow(all, BAND);
            expect(reference).not.toBeNull();
            expect(window!.low).toBeCloseTo(reference!.low, 12);
          }
          expect(spare.every((p) => p.height >= 38.1 - 1e-9 && p.height <= 38.107 + 1e-9)).toBe(true);
        },
      ),
    );
  });
});
