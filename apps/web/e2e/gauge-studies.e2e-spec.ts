import type { Page } from 'playwright-core';
import { baseUrl, openBrowser, OpenBrowser, screenshot, signIn } from './setup/browser';
import { choose, DEMO_PASSWORD } from './setup/bench';

const STUDY = 'Probe check, two inspectors';

/** An inspector measures every part the Bench gives them, from the keyboard alone. */
async function measureAll(page: Page, email: string, shot?: string): Promise<void> {
  await signIn(page, email, DEMO_PASSWORD);
  await page.getByRole('navigation').getByRole('link', { name: 'Bench' }).click();
  await page.getByRole('link', { name: STUDY }).click();
  for (let k = 0; k < 4; k++) {
    const input = page.getByLabel(/^Reading of RB40-GS0/);
    await input.waitFor();
    const serial = (await page.locator('label', { hasText: /^Reading of/ }).innerText()).replace(/^Reading of /, '');
    // Part 01 reads near −0.00020 in, part 02 near −0.00012 in; a tenth of a tenth apart per try.
    const reading = (serial.endsWith('01') ? -0.0002 : -0.00012) + (k % 2) * 0.00001;
    if (shot && k === 1) await screenshot(page, shot);
    // Never a result on screen: no height and no earlier reading.
    expect(await page.locator('main').innerText()).not.toMatch(/1\.49|-0\.000/);
    await input.fill(reading.toFixed(5));
    await input.press('Enter');
    await page.getByText(`${k + 1} of 4 measured`).waitFor();
  }
  await page.getByText('All your measurements for this study are in.').waitFor();
}

jest.setTimeout(120_000);

describe('gauge studies (browser)', () => {
  let browser: OpenBrowser;
  beforeEach(async () => {
    browser = await openBrowser({ width: 1440, height: 1000 });
  });
  afterEach(() => browser.close());

  // The demo study holds Houf & Berman's published data scaled to RB-40's band (demo-gauge-study.ts):
  // P/T = 6σ/tolerance = 0.20 as published, which reads "may be acceptable" (10–30 %, common practice).
  it('shows the demo study with its ANOVA table, the published P/T and the charts', async () => {
    const { page } = browser;
    await signIn(page, 'engineer@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('navigation').getByRole('link', { name: 'Gauge studies' }).click();
    await page.getByRole('link', { name: 'RB-40 height, three inspectors' }).click();
    const anova = page.getByRole('table', { name: 'Analysis of variance' });
    await anova.waitFor();
    const sources = await anova.locator('tbody tr td:first-child').allInnerTexts();
    expect(sources).toEqual(['Parts', 'Inspectors', 'Parts × inspectors', 'Repeatability (error)', 'Total']);
    const df = await anova.locator('tbody tr td:nth-child(2)').allInnerTexts();
    expect(df.map((d) => d.trim())).toEqual(['9', '2', '18', '60', '89']);
    await page.getByText(/%GR&R of the tolerance 20\.\d %:/).waitFor();
    await page
      .getByText(/May be acceptable, depending on the application/)
      .first()
      .waitFor();
    await page.locator('section[aria-label="Range of the trials"] svg.recharts-surface[role="application"]').waitFor();
    await screenshot(page, 'gauge-study');
    expect(page.url()).toContain(`${baseUrl()}/gauge-studies/`);
  });

  it('lets the engineer set up a study that inspectors measure blind at the Bench, and shows its result', async () => {
    const { page } = browser;
    await signIn(page, 'engineer@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('navigation').getByRole('link', { name: 'Gauge studies' }).click();
    await page.getByRole('button', { name: 'New study' }).click();
    await page.getByLabel('Name').fill(STUDY);
    await choose(page, 'Spec revision', /^RB-40 rev B/);
    await choose(page, 'Parts from lot', /^L-2026-GS1/);
    await page.getByRole('checkbox', { name: 'RB40-GS01' }).check();
    await page.getByRole('checkbox', { name: 'RB40-GS02' }).check();
    await page.getByRole('checkbox', { name: 'Ivo Brannigan' }).check();
    await page.getByRole('checkbox', { name: 'Lena Marsh' }).check();
    await page.getByLabel('Trials').fill('2');
    await choose(page, 'Instrument', /^EP-01/);
    await choose(page, 'Master gauge', /^MG-1\.500-A/);
    await page.getByRole('button', { name: 'Set up study' }).click();
    await page.getByRole('heading', { name: `Gauge study — ${STUDY}` }).waitFor();
    await page.getByText('The analysis appears when every measurement is in (0 of 8 so far).').waitFor();

    const second = await openBrowser();
    try {
      await measureAll(second.page, 'inspector3@kestrel.example', 'gauge-study-bench');
    } finally {
      await second.close();
    }
    const third = await openBrowser();
    try {
      await measureAll(third.page, 'inspector2@kestrel.example');
    } finally {
      await third.close();
    }
    await page.reload();
    await page.getByRole('table', { name: 'Analysis of variance' }).waitFor();
    await page
      .getByText(/distinct categories/)
      .first()
      .waitFor();
  });
});
