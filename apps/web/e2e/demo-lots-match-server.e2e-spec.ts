import { formatLength, type LengthUnit } from '../../../packages/metrology/src';
import { openBrowser, OpenBrowser, screenshot, signIn } from './setup/browser';
import { DEMO_PASSWORD } from './setup/bench';
import { apiGet, reviewGridCells, serverParts, type ServerPartRow } from './setup/lot-review';

// The demo lots of the seed (apps/api/src/database/seeders/demo-lots.ts) and their part counts.
const DEMO_LOTS: [string, number][] = [
  ['L-2026-041', 6],
  ['L-2026-047', 4],
  ['L-2026-044', 4],
];
/** The words the Lot review grid shows for each verdict (verdictText without a side). */
const VERDICT_WORDS: Record<NonNullable<ServerPartRow['verdict']>, string> = {
  conforms: 'Conforms',
  'does-not-conform': 'Does not conform',
  'guard-band': 'In guard band',
};

jest.setTimeout(120_000);

/** A stored length as the grid shows it: the trade's fine resolution in the person's unit, no symbol. */
function shown(mm: number | null, unit: LengthUnit): string {
  return mm === null ? '—' : formatLength(mm, unit, { level: 'fine', withSymbol: false });
}

describe('demo lots in the Lot review (browser)', () => {
  let browser: OpenBrowser;
  beforeEach(async () => {
    // Tall and wide enough that the grid draws every row and column of the largest demo lot.
    browser = await openBrowser({ width: 1600, height: 2000 });
  });
  afterEach(() => browser.close());

  it("shows each demo part's height, flatness and verdict exactly as the server stored them", async () => {
    const { page } = browser;
    await signIn(page, 'engineer@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    const { user } = await apiGet<{ user: { displayUnit: LengthUnit } }>(page, '/auth/me');
    const lots = await apiGet<{ items: { id: string; lotNumber: string }[] }>(page, '/lots?page=0&pageSize=500');

    let compared = 0;
    for (const [lotNumber, partCount] of DEMO_LOTS) {
      const lot = lots.items.find((item) => item.lotNumber === lotNumber);
      if (!lot) throw new Error(`The seed has no lot ${lotNumber}.`);
      const parts = await serverParts(page, lot.id);
      expect(parts).toHaveLength(partCount);
      const grid = await reviewGridCells(
        page,
        lot.id,
        lotNumber,
        parts.map((part) => part.id),
      );
      await screenshot(page, `demo-lot-review-${lotNumber}`);
      for (const part of parts) {
        // Every demo part was measured: a missing result would make the comparison hollow.
        expect(part.height).not.toBeNull();
        expect(part.verdict).not.toBeNull();
        expect({ serial: part.serial, ...grid.get(part.id) }).toMatchObject({
          serial: part.serial,
          height: shown(part.height, user.displayUnit),
          flatness: shown(part.flatness, user.displayUnit),
          verdict: VERDICT_WORDS[part.verdict!],
        });
        compared += 1;
      }
    }
    expect(compared).toBe(14);
  });
});
