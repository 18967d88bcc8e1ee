import { formatLength, interchangeWindowDetail, type HeightWindow, type LengthUnit } from '@evenset/metrology';
import { toMm } from '../common/units/lengths';

/** The heights a replacement for one set may have, and why there are none when there are none. */
export interface ReplacementWindow {
  /** [highest − band, lowest + band] of the set; null when the set's own spread exceeds twice the band. */
  setWindow: HeightWindow | null;
  /** `setWindow` ∩ the spec's tolerance band; null when empty. */
  window: HeightWindow | null;
  centre: number | null;
  explanation: string;
}

/** A few ulps of the largest magnitude: stored decimals such as 38.09754 − 0.00508 land a hair off. */
const slack = (...values: number[]) => 8 * Number.EPSILON * Math.max(...values.map(Math.abs));

/**
 * The replacement window of a set (brief, "Matching"): a new part matches the set within the band
 * when highest − band ≤ h ≤ lowest + band (`interchangeWindowDetail` for this one set), and it
 * must also conform, so the window is cut to the spec's tolerance band. Limits are rounded to the
 * stored length scale, so the centre is a height that can be stored and ground to as written.
 */
export function replacementWindow(
  heights: readonly number[],
  band: number,
  tolerance: HeightWindow,
  unit: LengthUnit,
): ReplacementWindow {
  const show = (mm: number) => formatLength(mm, unit, { level: 'fine' });
  const range = (w: HeightWindow) => `${show(w.low)} to ${show(w.high)}`;
  const detail = interchangeWindowDetail([heights], band);
  const own = detail.perSet[0]!;
  if (!detail.window)
    return {
      setWindow: null,
      window: null,
      centre: null,
      explanation: `The set's own heights are ${show(Math.max(...heights) - Math.min(...heights))} apart, more than twice the matching band (${show(band)}): no single height matches all of them.`,
    };
  const setWindow = { low: toMm(own.low, 'mm'), high: toMm(own.high, 'mm') };
  const low = Math.max(setWindow.low, tolerance.low);
  const high = Math.min(setWindow.high, tolerance.high);
  if (low > high + slack(low, high)) {
    const side = setWindow.low > tolerance.high ? 'above' : 'below';
    return {
      setWindow,
      window: null,
      centre: null,
      explanation: `The heights that match this set (${range(setWindow)}) lie entirely ${side} the spec's tolerance band (${range(tolerance)}): no conforming part can match it.`,
    };
  }
  const window = { low, high: Math.max(low, high) };
  const centre = toMm((window.low + window.high) / 2, 'mm');
  const cut = window.low > setWindow.low || window.high < setWindow.high ? ', cut to the spec’s tolerance band' : '';
  return {
    setWindow,
    window,
    centre,
    explanation: `A replacement must measure ${range(window)}: within ${show(band)} of every part of the set${cut}.`,
  };
}
