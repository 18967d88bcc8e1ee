import type { FreePart, HeightWindowView, Proposal } from '@evenset/contracts';
import { fitsBand, setSpread } from '@evenset/metrology';

/** A proposed set as sales is shaping it; `key` stays put while parts move. */
export interface DraftSet {
  key: number;
  parts: FreePart[];
}

/** The sets about to be allocated and the free parts left to swap in. */
export interface Draft {
  sets: DraftSet[];
  spare: FreePart[];
}

/** What is wrong (or right) with one set of the draft. */
export interface SetCheck {
  spread: number;
  fitsBand: boolean;
  /** Parts that would not match the sets sold before (outside the interchange window). */
  outsideWindow: FreePart[];
  /** Positions (0-based) of other sets in the draft that this set does not match within the band. */
  clashesWith: number[];
  ok: boolean;
}

const byHeight = (a: FreePart, b: FreePart) => a.height - b.height || a.serial.localeCompare(b.serial);

export function draftOf(proposal: Pick<Proposal, 'sets' | 'spare'>): Draft {
  return {
    sets: proposal.sets.map((set, index) => ({ key: index + 1, parts: [...set.parts].sort(byHeight) })),
    spare: [...proposal.spare].sort(byHeight),
  };
}

/** Puts spare `spareId` into set `setKey` in place of `partId`, which goes back to the spares. */
export function swapPart(draft: Draft, setKey: number, partId: string, spareId: string): Draft {
  const incoming = draft.spare.find((p) => p.id === spareId);
  const set = draft.sets.find((s) => s.key === setKey);
  const outgoing = set?.parts.find((p) => p.id === partId);
  if (!incoming || !set || !outgoing) return draft;
  return {
    sets: draft.sets.map((s) =>
      s.key === setKey ? { ...s, parts: s.parts.map((p) => (p.id === partId ? incoming : p)).sort(byHeight) } : s,
    ),
    spare: [...draft.spare.filter((p) => p.id !== spareId), outgoing].sort(byHeight),
  };
}

/** Drops a set from the draft; its parts become spares. */
export function removeSet(draft: Draft, setKey: number): Draft {
  const set = draft.sets.find((s) => s.key === setKey);
  if (!set) return draft;
  return {
    sets: draft.sets.filter((s) => s.key !== setKey),
    spare: [...draft.spare, ...set.parts].sort(byHeight),
  };
}

/** The spread a set would have with `spare` in place of `partId`. */
export function spreadWith(parts: readonly FreePart[], partId: string, spare: FreePart): number {
  return setSpread(parts.map((p) => (p.id === partId ? spare.height : p.height)));
}

// The server's own slack for "inside the window": heights are stored to 1e-7 mm.
const WINDOW_SLACK = 1e-9;

function inWindow(window: HeightWindowView | null, height: number): boolean {
  return !window || (height >= window.low - WINDOW_SLACK && height <= window.high + WINDOW_SLACK);
}

/**
 * Checks each set as the server will on allocation: its spread within the matching band, every
 * part inside the interchange window of the sets sold before, and — since the sets of one order
 * become sold sets too — every two sets together within the band (a part of one must match the
 * other: brief, "Matching": a new height h matches a set when max − band ≤ h ≤ min + band).
 */
export function checkDraft(draft: Draft, band: number, window: HeightWindowView | null): SetCheck[] {
  const ranges = draft.sets.map((s) => {
    const heights = s.parts.map((p) => p.height);
    const low = Math.min(...heights);
    const high = Math.max(...heights);
    return { low, high, fits: heights.length > 0 && fitsBand(low, high, band) };
  });
  return draft.sets.map((set, index) => {
    const { low, high, fits } = ranges[index]!;
    const spread = set.parts.length ? high - low : 0;
    const outsideWindow = set.parts.filter((p) => !inWindow(window, p.height));
    // A set too wide on its own is flagged for that alone, not as clashing with every other.
    const clashesWith = ranges.flatMap((other, j) =>
      j !== index && fits && other.fits && !fitsBand(Math.min(low, other.low), Math.max(high, other.high), band)
        ? [j]
        : [],
    );
    return {
      spread,
      fitsBand: fits,
      outsideWindow,
      clashesWith,
      ok: fits && outsideWindow.length === 0 && clashesWith.length === 0,
    };
  });
}
