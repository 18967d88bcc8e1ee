import type { Page } from 'playwright-core';
import { baseUrl, screenshot } from './browser';

/** Password of every demo account from the seed (apps/api/src/database/seeders/demo-people.ts). */
export const DEMO_PASSWORD = 'evenset-demo-1';

/** Picks `option` in the select field labelled `label`. */
export async function choose(page: Page, label: string, option: RegExp): Promise<void> {
  await page.getByLabel(label, { exact: true }).click();
  await page.getByRole('option', { name: option }).click();
  await menuClosed(page);
}

/**
 * Waits until an open select menu has gone: while it closes, MUI hides the rest of the page from
 * the accessibility tree, so a role query made meanwhile finds nothing.
 */
export async function menuClosed(page: Page): Promise<void> {
  await page.getByRole('listbox').waitFor({ state: 'detached' });
}

/** The serials a lot created with `prefix` and `quantity` gets: E2E-001, E2E-002, … */
export function serials(prefix: string, quantity: number): string[] {
  return Array.from({ length: quantity }, (_, index) => `${prefix}${String(index + 1).padStart(3, '0')}`);
}

/**
 * As a signed-in engineer: creates a lot of `quantity` parts of the spec revision matching `spec`
 * from the Lots page, and answers its id (read from the Lot review's address).
 */
export async function createLot(
  page: Page,
  lot: { spec: RegExp; lotNumber: string; quantity: number; prefix: string },
): Promise<string> {
  await page.goto(`${baseUrl()}/lots`);
  await page.getByRole('button', { name: 'New lot' }).click();
  await choose(page, 'Spec revision', lot.spec);
  await page.getByLabel('Lot number').fill(lot.lotNumber);
  await page.getByLabel('Quantity').fill(String(lot.quantity));
  await page.getByLabel('Serial prefix').fill(lot.prefix);
  await page.getByText(`Serials: ${serials(lot.prefix, lot.quantity).join(', ')}`).waitFor();
  await page.getByRole('button', { name: 'Create lot' }).click();
  await page.getByRole('heading', { name: `Lot review — ${lot.lotNumber}` }).waitFor();
  const id = /\/lots\/([^/?#]+)/.exec(page.url())?.[1];
  if (!id) throw new Error(`The Lot review of ${lot.lotNumber} has no lot id in its address: ${page.url()}`);
  return decodeURIComponent(id);
}

/**
 * As a signed-in inspector: sets up a Bench run on `lotNumber` with the master matching `master`,
 * the first instrument and the default temperatures, then keys the zero on the master.
 */
export async function startBenchRun(
  page: Page,
  run: { lotNumber: string; master: RegExp; zero: string },
): Promise<void> {
  await page.goto(`${baseUrl()}/bench`);
  await choose(page, 'Lot', new RegExp(run.lotNumber));
  await choose(page, 'Master gauge', run.master);
  await page.getByLabel('Instrument', { exact: true }).click();
  await page.getByRole('option').first().click();
  await menuClosed(page);
  await page.getByRole('button', { name: /Next: zero on the master/ }).click();
  await page.getByRole('textbox', { name: /Reading (at|on)/ }).waitFor();
  await page.keyboard.type(run.zero);
  await page.keyboard.press('Enter');
}

/**
 * Records one part after another from the keyboard alone: `readings[i]` are the top-face readings
 * of `partSerials[i]`, in plan order. Answers the verdict the Bench showed for each part.
 */
export async function recordPartsFromKeyboard(
  page: Page,
  partSerials: readonly string[],
  readings: readonly (readonly string[])[],
  screenshotPrefix?: string,
): Promise<string[]> {
  const reading = page.getByRole('textbox', { name: /Reading (at|on)/ });
  const verdicts: string[] = [];
  for (const [index, values] of readings.entries()) {
    const serial = partSerials[index];
    await page.getByText(`Next part: ${serial}`).waitFor();
    await page.keyboard.press('Enter');
    for (const value of values) {
      await reading.waitFor();
      await page.keyboard.type(value);
      await page.keyboard.press('Enter');
    }
    await page.getByText(`All ${values.length} readings taken`).waitFor();
    if (index === 0 && screenshotPrefix) await screenshot(page, `${screenshotPrefix}-readings-taken`);
    await page.keyboard.press('Enter');
    await page.getByText(`${serial} saved`).waitFor();
    const verdict = page.getByText(/^(Conforms|Does not conform|In guard band — (high|low))$/).first();
    await verdict.waitFor();
    verdicts.push(await verdict.innerText());
    if (screenshotPrefix) await screenshot(page, `${screenshotPrefix}-saved-${serial}`);
    // "Next part" has the focus: Enter moves on.
    await page.keyboard.press('Enter');
  }
  return verdicts;
}

/** Ends the run once every part is measured, with the master check `reading`; waits for the summary. */
export async function endBenchRun(page: Page, lotNumber: string, reading: string): Promise<void> {
  await page.getByText(`Every part of lot ${lotNumber} is measured.`).waitFor();
  await page.keyboard.press('Enter');
  await page.getByText('Master check at the end').first().waitFor();
  await page.keyboard.type(reading);
  await page.keyboard.press('Enter');
  await page.getByText(/^Run ended — /).waitFor();
}
