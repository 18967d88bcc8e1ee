import type { Page } from 'playwright-core';
import { baseUrl, openBrowser, OpenBrowser, screenshot, signIn } from './setup/browser';

// Demo accounts and the released RB-40 rev B spec with its 1.5000 in master come from the seed.
const DEMO_PASSWORD = 'evenset-demo-1';
const LOT = 'L-E2E-BENCH';
/** Top-face readings (in) per part, P1…P5: invented demo values around the middle of the band. */
const READINGS = [
  ['-0.0002', '-0.0002', '-0.0002', '-0.0002', '-0.0002'],
  ['-0.0001', '-0.0002', '-0.0001', '-0.0002', '-0.0001'],
  ['0.0003', '0.0003', '0.0003', '0.0003', '0.0003'],
  ['-0.0003', '-0.0002', '-0.0003', '-0.0002', '-0.0003'],
];

jest.setTimeout(120_000);

async function choose(page: Page, label: string, option: RegExp): Promise<void> {
  await page.getByLabel(label, { exact: true }).click();
  await page.getByRole('option', { name: option }).click();
}

describe('the Bench (browser)', () => {
  let browser: OpenBrowser;
  beforeEach(async () => {
    browser = await openBrowser({ width: 1180, height: 820 });
  });
  afterEach(() => browser.close());

  it('an engineer creates a 4-part lot; an inspector records it from the keyboard and sees each verdict', async () => {
    const { page } = browser;
    await signIn(page, 'engineer@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    await page.goto(`${baseUrl()}/lots`);
    await page.getByRole('button', { name: 'New lot' }).click();
    await choose(page, 'Spec revision', /RB-40 rev B/);
    await page.getByLabel('Lot number').fill(LOT);
    await page.getByLabel('Quantity').fill('4');
    await page.getByLabel('Serial prefix').fill('E2E-');
    await page.getByText('Serials: E2E-001, E2E-002, E2E-003, E2E-004').waitFor();
    await page.getByRole('button', { name: 'Create lot' }).click();
    await page.getByRole('heading', { name: `Lot review — ${LOT}` }).waitFor();
    await page.getByRole('button', { name: 'Sign out' }).click();

    await signIn(page, 'inspector@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    await page.goto(`${baseUrl()}/bench`);
    await choose(page, 'Lot', new RegExp(LOT));
    await choose(page, 'Master gauge', /MG-1\.500/);
    await page.getByLabel('Instrument', { exact: true }).click();
    await page.getByRole('option').first().click();
    await page.getByRole('button', { name: /Next: zero on the master/ }).click();

    const reading = page.getByRole('textbox', { name: /Reading (at|on)/ });
    await reading.waitFor();
    await page.keyboard.type('0');
    await page.keyboard.press('Enter');

    for (const [index, values] of READINGS.entries()) {
      const serial = `E2E-00${index + 1}`;
      await page.getByText(`Next part: ${serial}`).waitFor();
      await page.keyboard.press('Enter');
      for (const value of values) {
        await reading.waitFor();
        await page.keyboard.type(value);
        await page.keyboard.press('Enter');
      }
      await page.getByText(`All ${values.length} readings taken`).waitFor();
      if (index === 0) await screenshot(page, 'bench-readings-taken');
      await page.keyboard.press('Enter');
      await page.getByText(`${serial} saved`).waitFor();
      const verdict = page.getByText(/^(Conforms|Does not conform|In guard band — (high|low))$/).first();
      await verdict.waitFor();
      expect(await verdict.innerText()).toMatch(/Conforms|Does not conform|In guard band/);
      await screenshot(page, `bench-saved-${serial}`);
      // "Next part" has the focus: Enter moves on.
      await page.keyboard.press('Enter');
    }

    await page.getByText(`Every part of lot ${LOT} is measured.`).waitFor();
    await page.keyboard.press('Enter');
    await page.getByText('Master check at the end').first().waitFor();
    await page.keyboard.type('0.0001');
    await page.keyboard.press('Enter');
    await page.getByText('Run ended — 4 parts saved').waitFor();
    await screenshot(page, 'bench-run-ended');
  });
});
