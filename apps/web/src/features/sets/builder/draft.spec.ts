import type { FreePart } from '@evenset/contracts';
import { checkDraft, draftOf, removeSet, spreadWith, swapPart } from './draft';

// Expected values are worked by hand from the brief's definitions ("Matching"): a set's spread is
// highest − lowest height; a height h matches a set when max − band ≤ h ≤ min + band.
const part = (serial: string, height: number): FreePart => ({
  id: `id-${serial}`,
  serial,
  lotNumber: 'L-1',
  revision: 'B',
  height,
});
const BAND = 0.005; // mm

const A = [part('A4', 38.103), part('A1', 38.1), part('A3', 38.102), part('A2', 38.101)];
const B = [part('B1', 38.104), part('B2', 38.105), part('B3', 38.105), part('B4', 38.106)];
const LOW_SPARE = part('S1', 38.097);
const MID_SPARE = part('S2', 38.1015);

const proposal = {
  sets: [
    { parts: A, spread: 0.003 },
    { parts: B, spread: 0.002 },
  ],
  spare: [MID_SPARE, LOW_SPARE],
};

describe('the set builder draft', () => {
  it('lists each set and the spares by ascending height', () => {
    const draft = draftOf(proposal);
    expect(draft.sets.map((s) => s.parts.map((p) => p.serial))).toEqual([
      ['A1', 'A2', 'A3', 'A4'],
      ['B1', 'B2', 'B3', 'B4'],
    ]);
    expect(draft.spare.map((p) => p.serial)).toEqual(['S1', 'S2']);
  });

  it('swaps a part with a spare and the spread follows: 38.103 − 38.097 = 0.006 mm, over a 0.005 mm band', () => {
    const draft = swapPart(draftOf({ sets: [proposal.sets[0]!], spare: proposal.spare }), 1, 'id-A1', 'id-S1');
    expect(draft.sets[0]!.parts.map((p) => p.serial)).toEqual(['S1', 'A2', 'A3', 'A4']);
    expect(draft.spare.map((p) => p.serial)).toEqual(['A1', 'S2']);
    const [check] = checkDraft(draft, BAND, null);
    expect(check!.spread).toBeCloseTo(0.006, 9);
    expect(check!.fitsBand).toBe(false);
    expect(check!.ok).toBe(false);
  });

  it('tells the spread a swap would give before it is made', () => {
    // A without A4 (38.103), with 38.1015: 38.102 − 38.100 = 0.002 mm.
    expect(spreadWith(A, 'id-A4', MID_SPARE)).toBeCloseTo(0.002, 9);
  });

  it('ignores a swap with a part that is not a spare', () => {
    const draft = draftOf(proposal);
    expect(swapPart(draft, 1, 'id-A1', 'id-B1')).toBe(draft);
  });

  it('drops a set back to the spares', () => {
    const draft = removeSet(draftOf(proposal), 2);
    expect(draft.sets.map((s) => s.key)).toEqual([1]);
    expect(draft.spare.map((p) => p.serial)).toEqual(['S1', 'S2', 'B1', 'B2', 'B3', 'B4']);
  });

  it('flags two sets that fit alone but not together: 38.106 − 38.100 = 0.006 mm', () => {
    // B's 38.106 lies above A's window [38.103 − 0.005, 38.100 + 0.005] = [38.098, 38.105].
    const checks = checkDraft(draftOf(proposal), BAND, null);
    expect(checks.map((c) => c.fitsBand)).toEqual([true, true]);
    expect(checks.map((c) => c.clashesWith)).toEqual([[1], [0]]);
    expect(checks.every((c) => !c.ok)).toBe(true);
  });

  it('passes sets that match each other and lie inside the window of the sets sold before', () => {
    const near = [part('C1', 38.101), part('C2', 38.102), part('C3', 38.103), part('C4', 38.104)];
    // Together with A: 38.104 − 38.100 = 0.004 mm ≤ 0.005 mm.
    const checks = checkDraft(draftOf({ sets: [proposal.sets[0]!, { parts: near, spread: 0.003 }], spare: [] }), BAND, {
      low: 38.099,
      high: 38.105,
    });
    expect(checks.map((c) => c.ok)).toEqual([true, true]);
  });

  it('names the parts outside the interchange window of the sets sold before', () => {
    const [check] = checkDraft(draftOf({ sets: [proposal.sets[0]!], spare: [] }), BAND, {
      low: 38.1005,
      high: 38.11,
    });
    expect(check!.outsideWindow.map((p) => p.serial)).toEqual(['A1']);
    expect(check!.ok).toBe(false);
  });
});
