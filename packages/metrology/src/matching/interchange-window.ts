import { checkBand, checkHeights } from './set-spread';

/** Heights from `low` to `high`, inclusive. */
export interface HeightWindow {
  low: number;
  high: number;
}

/** The interchange window with the reason when it is empty. */
export interface InterchangeDetail {
  /** The window, or null when no height matches every sold set. */
  window: HeightWindow | null;
  /** Per sold set: the heights a new part may have to match that set alone, [max − band, min + band]. */
  perSet: HeightWindow[];
  /**
   * When the window is empty: the set whose window starts highest and the set whose window ends
   * lowest (these two alone leave no common height; they are the same set when its own spread
   * exceeds twice the band). Otherwise null.
   */
  bindingPair: [number, number] | null;
  /** When the window is empty: every set that has no common height with at least one other set (or itself). */
  conflictingSets: number[];
}

/**
 * Details of the interchange window: the heights a new part may have so that it still matches
 * every sold set within the matching band. For one set, a new height h keeps the spread within
 * the band when max − band ≤ h ≤ min + band; the window is the intersection over the sold sets
 * (brief, "Matching"). A tolerance of a few ulps absorbs decimal rounding of stored heights.
 */
export function interchangeWindowDetail(soldSets: readonly (readonly number[])[], band: number): InterchangeDetail {
  checkBand(band);
  if (!Array.isArray(soldSets) || soldSets.length === 0)
    throw new RangeError('interchange window needs at least one sold set');
  const perSet = soldSets.map((set, i) => {
    checkHeights(set, `sold set ${i}`);
    return { low: Math.max(...set) - band, high: Math.min(...set) + band };
  });
  let lowSet = 0;
  let highSet = 0;
  perSet.forEach((w, i) => {
    if (w.low > (perSet[lowSet] as HeightWindow).low) lowSet = i;
    if (w.high < (perSet[highSet] as HeightWindow).high) highSet = i;
  });
  const low = (perSet[lowSet] as HeightWindow).low;
  const high = (perSet[highSet] as HeightWindow).high;
  const slack = 8 * Number.EPSILON * Math.max(Math.abs(low), Math.abs(high), band);
  if (low <= high + slack) {
    return { window: { low, high: Math.max(low, high) }, perSet, bindingPair: null, conflictingSets: [] };
  }
  // Set i conflicts with some set when its window starts above the lowest end or ends below the highest start.
  const conflictingSets: number[] = [];
  perSet.forEach((w, i) => {
    if (w.low > high + slack || w.high < low - slack) conflictingSets.push(i);
  });
  return { window: null, perSet, bindingPair: [lowSet, highSet], conflictingSets };
}

/**
 * Interchange window of a part number: the heights a new part may have so that it matches every
 * set sold earlier within the matching band — the intersection over sold sets of
 * [max − band, min + band]; null when no height matches every sold set
 * (see {@link interchangeWindowDetail} for which sets conflict).
 */
export function interchangeWindow(soldSets: readonly (readonly number[])[], band: number): HeightWindow | null {
  return interchangeWindowDetail(soldSets, band).window;
}
