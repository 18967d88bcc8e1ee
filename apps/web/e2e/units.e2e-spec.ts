import type { Page } from 'playwright-core';
import { baseUrl, openBrowser, OpenBrowser, screenshot, signIn } from './setup/browser';
import { choose, DEMO_PASSWORD } from './setup/bench';
import { apiGet } from './setup/lot-review';

jest.setTimeout(180_000);

/** 1 in = 25.4 mm exactly (NIST SP 811, App. B). */
const MM_PER_IN = 25.4;
// A demo inspector's lot (apps/api/src/database/seeders/demo-lots.ts); every part inspected.
const PERSON = 'inspector2@kestrel.example';
const LOT = 'L-2026-047';

/** A shown figure as a number (the app writes minus as U+2212), and how many decimals it shows. */
function figure(text: string): { value: number; decimals: number } {
  const clean = text.replace('\u2212', '-').replace(/[^\d.-]/g, '');
  return { value: Number(clean), decimals: clean.split('.')[1]?.length ?? 0 };
}

async function switchUnit(page: Page, from: 'in' | 'mm', to: 'in' | 'mm') {
  await page.getByRole('button', { name: new RegExp(`^Units: ${from}\\b`) }).click();
  await page.getByRole('menuitemradio', { name: to === 'mm' ? 'Millimetres (mm)' : 'Inches (in)' }).click();
  await page.getByRole('button', { name: new RegExp(`^Units: ${to}\\b`) }).waitFor();
}

/** The Height column's header and each part's shown height, by serial, on the open Lot review. */
async function heights(page: Page, unit: 'in' | 'mm'): Promise<Map<string, string>> {
  const grid = page.getByRole('grid', { name: 'Parts' });
  await grid.getByRole('columnheader', { name: `Height (${unit})` }).waitFor();
  const shown = new Map<string, string>();
  for (const row of await grid.locator('[role="row"][data-id]').all()) {
    const serial = (await row.locator('[role="gridcell"][data-field="serial"]').innerText()).trim();
    shown.set(serial, (await row.locator('[role="gridcell"][data-field="height"]').innerText()).trim());
  }
  return shown;
}

/** Restores the person's unit through the API, whatever state a failed test left. */
async function restoreInches(page: Page) {
  const session = await apiGet<{ csrfToken: string; user: { displayUnit: string } }>(page, '/auth/me');
  if (session.user.displayUnit === 'in') return;
  await page.request.patch(`${baseUrl()}/api/me/preferences`, {
    data: { displayUnit: 'in' },
    headers: { 'x-csrf-token': session.csrfToken },
  });
}

describe('display unit (browser)', () => {
  let browser: OpenBrowser;
  beforeAll(async () => {
    browser = await openBrowser({ width: 1440, height: 960 });
  });
  afterAll(async () => {
    await restoreInches(browser.page).catch(() => undefined);
    await browser.close();
  });

  it('switching to millimetres changes the lengths on the lot review, the Bench and trends, and back', async () => {
    const { page } = browser;
    await signIn(page, PERSON, DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    await restoreInches(page);
    await page.reload();

    // Lot review in inches, then switched in place: the page redraws in millimetres.
    const lots = await apiGet<{ items: { id: string; lotNumber: string }[] }>(page, `/lots?q=${LOT}`);
    const lot = lots.items.find((l) => l.lotNumber === LOT)!;
    await page.goto(`${baseUrl()}/lots/${lot.id}`);
    await page.getByRole('heading', { name: `Lot review — ${LOT}` }).waitFor();
    const inches = await heights(page, 'in');
    expect(inches.size).toBe(4);
    await switchUnit(page, 'in', 'mm');
    const millimetres = await heights(page, 'mm');
    expect([...millimetres.keys()].sort()).toEqual([...inches.keys()].sort());
    for (const [serial, inText] of inches) {
      const i = figure(inText);
      const m = figure(millimetres.get(serial)!);
      // Each is rounded to its shown decimals, so they agree within both roundings.
      const tolerance = 0.5 * 10 ** -i.decimals * MM_PER_IN + 0.5 * 10 ** -m.decimals;
      expect(Math.abs(m.value - i.value * MM_PER_IN)).toBeLessThanOrEqual(tolerance + 1e-9);
    }
    // The lot summary's band is in millimetres too: RB-40 rev B, 1.5 in −0.0004/0 → 38.08984 to 38.1 mm.
    await page
      .getByText(/38\.0898\d* mm to 38\.1000* mm/)
      .first()
      .waitFor();
    await screenshot(page, 'units-lot-review-mm');

    // The Bench: the zero step and the chosen lot's nominal and band.
    await page.goto(`${baseUrl()}/bench`);
    await page.getByRole('button', { name: 'Next: zero on the master (mm)' }).waitFor();
    await choose(page, 'Lot', new RegExp(LOT));
    const spec = page.getByTestId('bench-lot-spec');
    await spec.getByText(/^RB-40 rev B: nominal 38\.1000* mm, band 38\.0898\d* mm to 38\.1000* mm$/).waitFor();
    await screenshot(page, 'units-bench-mm');

    // Trends: the limits table's columns and values in millimetres.
    await page.goto(`${baseUrl()}/trends?partNumber=RB-40`);
    const limits = page.getByRole('table', { name: 'Control limits' });
    await limits.getByRole('columnheader', { name: 'LCL (mm)' }).waitFor();
    const trend = await apiGet<{ individuals: { individuals: { centre: number } } | null }>(
      page,
      '/trends/RB-40?subgroup=lot',
    );
    const centre = figure(
      await limits
        .getByRole('row', { name: /^Individuals / })
        .getByRole('cell')
        .nth(1)
        .innerText(),
    );
    expect(Math.abs(centre.value - trend.individuals!.individuals.centre)).toBeLessThanOrEqual(
      0.5 * 10 ** -centre.decimals + 1e-9,
    );

    // And back to inches: the same pages follow.
    await switchUnit(page, 'mm', 'in');
    await limits.getByRole('columnheader', { name: 'LCL (in)' }).waitFor();
    await page.goto(`${baseUrl()}/bench`);
    await choose(page, 'Lot', new RegExp(LOT));
    await spec.getByText(/nominal 1\.5000* in/).waitFor();
    const me = await apiGet<{ user: { displayUnit: string } }>(page, '/auth/me');
    expect(me.user.displayUnit).toBe('in');
  });
});
