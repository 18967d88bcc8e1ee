import { checkBand, fitsBand } from './set-spread';

/** A released part offered for set building. */
export interface PartHeight {
  id: string;
  height: number;
}

/** Proposed matched sets. */
export interface BuiltSets {
  /** Part ids of each set, each set in ascending height, sets in ascending height. */
  sets: string[][];
  /** Spread (highest − lowest) of each set, same order. */
  spreads: number[];
  /** Ids of the parts left over, in ascending height. */
  leftover: string[];
}

/**
 * Builds the largest possible number of disjoint sets of `setSize` parts whose spread is within
 * the matching band; among those, the one with the smallest total spread.
 *
 * Method: sort by height (positions 0…n−1) and run a dynamic programme over prefixes,
 *   best(i) = better of best(i−1) [part i−1 left over] and best(i−k) + {parts i−k … i−1}
 *   (only when that window fits the band), comparing (more sets, then smaller total spread).
 *
 * Why windows of k consecutive parts suffice (so the programme is optimal). Take any solution
 * and let Φ = Σ over its sets of (last position − first position), a non-negative integer.
 * 1. Crossing sets. If the position ranges of sets S and T overlap, replace them by L = the k
 *    lowest and H = the k highest parts of S ∪ T. With S holding the lowest part: max L ≤ max S
 *    (S has k parts), so spread L ≤ spread S; at most k parts lie below min T, so min H ≥ min T,
 *    and max H is max T or max S, giving spread H ≤ spread T or ≤ spread S resp. (min H ≥ min S).
 *    Both still fit, the total spread does not grow (span L + span H ≤ span of S ∪ T minus the
 *    gap between them ≤ spread S + spread T when they overlap), and Φ strictly falls.
 * 2. Gaps. If a left-over part lies inside a set's position range, swap it for the set's top
 *    part: the set's spread does not grow and Φ strictly falls.
 * Applying 1 and 2 while possible ends (Φ falls each time) with the same number of sets, no
 * larger total spread, and every set a run of k consecutive positions. Hence an optimum — in
 * number of sets and then in total spread — exists among such windows, and choosing disjoint
 * windows is an interval problem that the prefix programme solves exactly.
 * Checked against exhaustive search on small random inputs in build-sets.spec.ts.
 */
export function buildSets(parts: readonly PartHeight[], setSize: number, band: number): BuiltSets {
  checkBand(band);
  if (!Number.isInteger(setSize) || setSize < 1)
    throw new RangeError(`set size must be a whole number >= 1, got ${String(setSize)}`);
  if (!Array.isArray(parts)) throw new RangeError('parts must be an array');
  const seen = new Set<string>();
  parts.forEach((p, i) => {
    if (p === null || typeof p !== 'object' || typeof p.id !== 'string' || p.id === '')
      throw new RangeError(`part ${i} has no id`);
    if (seen.has(p.id)) throw new RangeError(`part id "${p.id}" appears twice`);
    seen.add(p.id);
    if (typeof p.height !== 'number' || !Number.isFinite(p.height))
      throw new RangeError(`part "${p.id}": height is not a finite number`);
  });

  const sorted = parts.map((p, i) => ({ ...p, index: i })).sort((a, b) => a.height - b.height || a.index - b.index);
  const n = sorted.length;
  const k = setSize;
  const count = new Int32Array(n + 1);
  const total = new Float64Array(n + 1);
  const tookWindow = new Uint8Array(n + 1);
  for (let i = 1; i <= n; i++) {
    count[i] = count[i - 1] as number;
    total[i] = total[i - 1] as number;
    if (i >= k) {
      const low = (sorted[i - k] as PartHeight).height;
      const high = (sorted[i - 1] as PartHeight).height;
      if (fitsBand(low, high, band)) {
        const c = (count[i - k] as number) + 1;
        const t = (total[i - k] as number) + (high - low);
        if (c > (count[i] as number) || (c === count[i] && t < (total[i] as number))) {
          count[i] = c;
          total[i] = t;
          tookWindow[i] = 1;
        }
      }
    }
  }
  const sets: string[][] = [];
  const spreads: number[] = [];
  const leftover: string[] = [];
  for (let i = n; i > 0;) {
    if (tookWindow[i] === 1) {
      const members = sorted.slice(i - k, i);
      sets.push(members.map((m) => m.id));
      spreads.push((members[k - 1] as PartHeight).height - (members[0] as PartHeight).height);
      i -= k;
    } else {
      leftover.push((sorted[i - 1] as PartHeight).id);
      i -= 1;
    }
  }
  return { sets: sets.reverse(), spreads: spreads.reverse(), leftover: leftover.reverse() };
}
