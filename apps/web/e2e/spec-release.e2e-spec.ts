import type { Page } from 'playwright-core';
import { baseUrl, openBrowser, OpenBrowser, screenshot, signIn } from './setup/browser';
import { choose, DEMO_PASSWORD } from './setup/bench';

// An invented part number and plan: a 2.5 in tool block with five top-face stations (in).
const PART_NUMBER = 'TB-25';
const STATIONS = [
  { name: 'P1', x: '-0.9', y: '0.9' },
  { name: 'P2', x: '0.9', y: '0.9' },
  { name: 'P3', x: '0.9', y: '-0.9' },
  { name: 'P4', x: '-0.9', y: '-0.9' },
  { name: 'P5', x: '0', y: '0' },
];
const PLAN_SUMMARY = 'Measurement plan: 5 top-face stations, 0 datum stations, 0 runout circles.';

jest.setTimeout(120_000);

/** The value shown beside `label` in a spec's summary. */
function summaryValue(page: Page, label: string) {
  return page.locator(`xpath=//dt[normalize-space()="${label}"]/following-sibling::dd`);
}

/** The names of the top-face stations the plan drawing marks. */
async function drawnStations(page: Page): Promise<string[]> {
  const drawing = page.getByRole('img', { name: PLAN_SUMMARY });
  await drawing.waitFor();
  return (await drawing.locator('[data-kind="station"]').allTextContents()).map((name) => name.trim());
}

describe('a new spec, from draft to released (browser)', () => {
  let browser: OpenBrowser;
  beforeEach(async () => {
    browser = await openBrowser({ width: 1440, height: 900 });
  });
  afterEach(() => browser.close());

  it('an engineer types a spec and its plan, saves it as a draft and releases it', async () => {
    const { page } = browser;
    await signIn(page, 'engineer@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    await page.goto(`${baseUrl()}/specs`);
    await page.getByRole('link', { name: 'New spec' }).click();
    await page.getByRole('heading', { name: 'New spec' }).waitFor();

    await page.getByLabel('Part number').fill(PART_NUMBER);
    await page.getByLabel('Title').fill('Tool block');
    await choose(page, 'Unit', /^Inch$/);
    await choose(page, 'Material', /Hardened steel/);
    await page.getByRole('textbox', { name: 'Nominal height', exact: true }).fill('2.5');
    await page.getByRole('textbox', { name: 'Lower deviation', exact: true }).fill('-0.0004');
    await page.getByRole('textbox', { name: 'Upper deviation', exact: true }).fill('0');
    await page.getByRole('textbox', { name: 'Matching band', exact: true }).fill('0.0002');
    await page.getByRole('textbox', { name: 'Set size', exact: true }).fill('4');
    await page.getByRole('textbox', { name: 'Flatness', exact: true }).fill('0.0001');

    // The drawing is empty until a station is typed, then follows every row.
    await page.getByText('Add stations to see them here').waitFor();
    for (const [index, station] of STATIONS.entries()) {
      await page.getByRole('button', { name: 'Add station', exact: true }).click();
      await page.getByRole('textbox', { name: `station ${index + 1} name`, exact: true }).fill(station.name);
      await page.getByRole('textbox', { name: `station ${index + 1} x`, exact: true }).fill(station.x);
      await page.getByRole('textbox', { name: `station ${index + 1} y`, exact: true }).fill(station.y);
    }
    expect(await drawnStations(page)).toEqual(STATIONS.map((s) => s.name));
    expect(await page.getByText('Add stations to see them here').count()).toBe(0);
    await screenshot(page, 'spec-new-plan-typed');

    await page.getByRole('button', { name: 'Create draft' }).click();
    await page.getByRole('heading', { name: `${PART_NUMBER} rev. A` }).waitFor();
    expect((await summaryValue(page, 'Status').innerText()).trim()).toBe('Draft');
    expect((await summaryValue(page, 'Nominal height').innerText()).trim()).toBe('2.5000 in');
    expect((await summaryValue(page, 'Set size').innerText()).trim()).toBe('4');
    expect((await summaryValue(page, 'Released').innerText()).trim()).toBe('Not yet');
    // The saved plan is drawn from what the server stored.
    expect(await drawnStations(page)).toEqual(STATIONS.map((s) => s.name));
    await screenshot(page, 'spec-draft-saved');

    await page.getByRole('button', { name: 'Release', exact: true }).click();
    const dialog = page.getByRole('dialog', { name: `Release ${PART_NUMBER} rev. A?` });
    await dialog.waitFor();
    await screenshot(page, 'spec-release-confirm');
    await dialog.getByRole('button', { name: 'Release', exact: true }).click();
    await dialog.waitFor({ state: 'detached' });
    await page.getByRole('button', { name: 'New revision' }).waitFor();
    await summaryValue(page, 'Status').getByText('Released', { exact: true }).waitFor();
    expect((await summaryValue(page, 'Released').innerText()).trim()).not.toBe('Not yet');
    expect(await page.getByRole('button', { name: 'Edit draft' }).count()).toBe(0);
    await screenshot(page, 'spec-released');

    // The Specs list says so too, and the revision survives a fresh load from the server.
    await page.goto(`${baseUrl()}/specs`);
    const row = page.getByRole('grid').getByRole('row').filter({ hasText: PART_NUMBER });
    await row.getByText('Released', { exact: true }).waitFor();
    await screenshot(page, 'spec-list-released');
  });
});
