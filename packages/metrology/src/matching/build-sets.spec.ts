import fc from 'fast-check';
import { buildSets, type PartHeight } from './build-sets';
import { fitsBand } from './set-spread';

/**
 * Independent reference: exhaustive search over every way of forming disjoint sets, keeping
 * the most sets and then the smallest total spread. The lowest unused part is either left over
 * or put in a set with any k − 1 of the later parts, so every collection is visited once.
 */
function exhaustive(parts: readonly PartHeight[], k: number, band: number): { count: number; total: number } {
  let best = { count: 0, total: 0 };
  const used = new Array<boolean>(parts.length).fill(false);
  const walk = (from: number, count: number, total: number): void => {
    let i = from;
    while (i < parts.length && used[i]) i++;
    if (i >= parts.length) {
      if (count > best.count || (count === best.count && total < best.total - 1e-12)) best = { count, total };
      return;
    }
    used[i] = true;
    walk(i + 1, count, total); // part i left over
    const chosen: number[] = [i];
    const choose = (start: number): void => {
      if (chosen.length === k) {
        const heights = chosen.map((c) => (parts[c] as PartHeight).height);
        const low = Math.min(...heights);
        const high = Math.max(...heights);
        if (fitsBand(low, high, band)) walk(i + 1, count + 1, total + (high - low));
        return;
      }
      for (let j = start; j < parts.length; j++) {
        if (used[j]) continue;
        used[j] = true;
        chosen.push(j);
        choose(j + 1);
        chosen.pop();
        used[j] = false;
      }
    };
    choose(i + 1);
    used[i] = false;
  };
  walk(0, 0, 0);
  return best;
}

const parts = fc
  .array(fc.integer({ min: 0, max: 30 }), { minLength: 0, maxLength: 9 })
  .map((hs) => hs.map((h, i) => ({ id: `S${i}`, height: 1.5 + h / 100000 })));

describe('buildSets', () => {
  // Optimality (proof in build-sets.ts) checked against exhaustive search on small random inputs.
  it('makes as many sets as exhaustive search, with the same smallest total spread', () => {
    fc.assert(
      fc.property(
        parts,
        fc.integer({ min: 1, max: 4 }),
        fc.integer({ min: 0, max: 12 }).map((b) => b / 100000),
        (input, k, band) => {
          const result = buildSets(input, k, band);
          const reference = exhaustive(input, k, band);
          expect(result.sets.length).toBe(reference.count);
          const total = result.spreads.reduce((s, v) => s + v, 0);
          expect(Math.abs(total - reference.total)).toBeLessThanOrEqual(1e-12);
          // Valid sets: right size, within the band, disjoint, and leftovers complete the parts.
          const heightOf = new Map(input.map((p) => [p.id, p.height]));
          const seen = new Set<string>();
          result.sets.forEach((set, i) => {
            expect(set).toHaveLength(k);
            const hs = set.map((id) => heightOf.get(id) as number);
            expect(fitsBand(Math.min(...hs), Math.max(...hs), band)).toBe(true);
            expect(result.spreads[i]).toBeCloseTo(Math.max(...hs) - Math.min(...hs), 15);
            for (const id of set) {
              expect(seen.has(id)).toBe(false);
              seen.add(id);
            }
          });
          for (const id of result.leftover) {
            expect(seen.has(id)).toBe(false);
            seen.add(id);
          }
          expect(seen.size).toBe(input.length);
        },
      ),
      { numRuns: 400 },
    );
  });

  it('proposes RB-40 style sets of four from released parts', () => {
    const released = [1.49985, 1.4999, 1.49992, 1.49995, 1.49996, 1.49998, 1.5, 1.50001, 1.50012].map((height, i) => ({
      id: `RB40-${100 + i}`,
      height,
    }));
    const r = buildSets(released, 4, 0.0002);
    expect(r.sets).toHaveLength(2);
    expect(r.leftover).toHaveLength(1);
  });

  it('rejects duplicate ids, a bad set size and a negative band', () => {
    expect(() =>
      buildSets(
        [
          { id: 'A', height: 1 },
          { id: 'A', height: 1 },
        ],
        2,
        0.1,
      ),
    ).toThrow(/part id "A" appears twice/);
    expect(() => buildSets([], 0, 0.1)).toThrow(/set size must be a whole number >= 1/);
    expect(() => buildSets([], 2, -1)).toThrow(/matching band/);
    expect(() => buildSets([{ id: 'B', height: Number.NaN }], 2, 0.1)).toThrow(
      /part "B": height is not a finite number/,
    );
  });
});
