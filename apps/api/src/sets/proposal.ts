import { buildSets, setSpread, type HeightWindow } from '@evenset/metrology';
import type { FreePart } from '@evenset/contracts';
import { insideWindow, inWindow, type WindowState } from './window';

/** Proposed sets and the parts left over, all matching sets sold before and each other. */
export interface SetChoice<P extends FreePart> {
  sets: { parts: P[]; spread: number }[];
  spare: P[];
  /** The window once the chosen sets are sold too. */
  window: HeightWindow | null;
}

/**
 * Chooses up to `wanted` sets from free parts inside the window. `buildSets` gives the most sets
 * of `setSize` whose spread fits the band (with the smallest total spread); from those, sets are
 * taken smallest spread first, each only when it still matches the sets sold before and those
 * already taken — so the whole proposal can be allocated as it stands and leaves a window behind.
 */
export function chooseSets<P extends FreePart>(
  free: readonly P[],
  state: WindowState,
  setSize: number,
  band: number,
  wanted: number,
): SetChoice<P> {
  const inside = free.filter((p) => insideWindow(state, p.height));
  const byId = new Map(inside.map((p) => [p.id, p]));
  const built = buildSets(
    inside.map((p) => ({ id: p.id, height: p.height })),
    setSize,
    band,
  );
  const candidates = built.sets
    .map((ids) => ids.map((id) => byId.get(id)!))
    .map((parts) => ({ parts, spread: setSpread(parts.map((p) => p.height)) }))
    .sort((a, b) => a.spread - b.spread || a.parts[0]!.height - b.parts[0]!.height);
  let window = state.window;
  const chosen: SetChoice<P>['sets'] = [];
  for (const candidate of candidates) {
    if (chosen.length >= wanted) break;
    const low = candidate.parts[0]!.height;
    const high = candidate.parts[candidate.parts.length - 1]!.height;
    if (!inWindow(window, low) || !inWindow(window, high)) continue;
    chosen.push(candidate);
    window = narrow(window, low, high, band);
  }
  chosen.sort((a, b) => a.parts[0]!.height - b.parts[0]!.height);
  const used = new Set(chosen.flatMap((s) => s.parts.map((p) => p.id)));
  return { sets: chosen, spare: inside.filter((p) => !used.has(p.id)), window };
}

/** The window after a set spanning [low, high] is sold: its own window [high − band, low + band] intersected. */
export function narrow(window: HeightWindow | null, low: number, high: number, band: number): HeightWindow {
  const own = { low: high - band, high: low + band };
  return window ? { low: Math.max(window.low, own.low), high: Math.min(window.high, own.high) } : own;
}
