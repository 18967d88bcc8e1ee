import { interchangeWindowDetail, type HeightWindow } from '@evenset/metrology';

/** A set sold earlier, as the window sees it. */
export interface SoldSet {
  id: string;
  setNumber: string;
  customerName: string;
  heights: number[];
}

/** Where new parts of a part number must fall: the window, or why there is none. */
export interface WindowState {
  /** Null when nothing is sold yet or when sold sets disagree. */
  window: HeightWindow | null;
  /** True when sold sets leave no common height. */
  conflict: boolean;
  conflicting: SoldSet[];
  /** How many sold sets the window comes from. */
  soldSets: number;
}

/** The window over sold sets, with the sets that conflict when there is none. */
export function windowOf(sold: readonly SoldSet[], band: number): WindowState {
  const counted = sold.filter((s) => s.heights.length > 0);
  if (!counted.length) return { window: null, conflict: false, conflicting: [], soldSets: 0 };
  const detail = interchangeWindowDetail(
    counted.map((s) => s.heights),
    band,
  );
  return {
    window: detail.window,
    conflict: detail.window === null,
    conflicting: detail.conflictingSets.map((i) => counted[i]!),
    soldSets: counted.length,
  };
}

/** True when `height` may join sets sold before (never when they disagree). */
export function insideWindow(state: WindowState, height: number): boolean {
  return !state.conflict && inWindow(state.window, height);
}

/** True when `height` lies in `window`; a null window (nothing sold yet) holds every height. */
export function inWindow(window: HeightWindow | null, height: number): boolean {
  if (!window) return true;
  const slack = 1e-9; // heights are stored to 1e-7 mm; this only absorbs binary noise
  return height >= window.low - slack && height <= window.high + slack;
}
