import type { Page } from 'playwright-core';
import {
  choose,
  createLot,
  DEMO_PASSWORD,
  endBenchRun,
  recordPartsFromKeyboard,
  serials,
  startBenchRun,
} from './setup/bench';
import { GUIDE_IMAGES, openBrowser, type OpenBrowser, screenshot, signIn } from './setup/browser';
import { startOwnServer, type OwnServer } from './setup/server';

// Walks docs/user-guide.md on the demo data, step by step, and takes the guide's pictures
// (docs/images/guide-*.png) from the real app. Its own server: the walk sells stock and raises
// requests that other browser tests must not see.
jest.setTimeout(240_000);

const LOT = 'L-2026-060';
/** Top-face readings (in), P1…P5, of the four parts the guide's inspector records. */
const READINGS = [
  ['-0.0002', '-0.0002', '-0.0002', '-0.0002', '-0.0002'],
  ['-0.00019', '-0.0002', '-0.00019', '-0.0002', '-0.00019'],
  ['-0.00021', '-0.00021', '-0.0002', '-0.00021', '-0.00021'],
  ['0.0003', '0.0003', '0.0003', '0.0003', '0.0003'],
];

async function as(page: Page, email: string): Promise<void> {
  await page.goto(`${process.env.EVENSET_BASE_URL}/`);
  const signOut = page.getByRole('button', { name: 'Sign out' });
  const signInButton = page.getByRole('button', { name: 'Sign in' });
  await signOut.or(signInButton).waitFor();
  if (await signOut.isVisible()) {
    await signOut.click();
    await signInButton.waitFor();
  }
  await signIn(page, email, DEMO_PASSWORD);
  await signOut.waitFor();
}

const picture = (page: Page, name: string) => screenshot(page, `guide-${name}`, GUIDE_IMAGES);

describe('the user guide, walked on the demo data (browser)', () => {
  let server: OwnServer;
  let browser: OpenBrowser;

  beforeAll(async () => {
    server = await startOwnServer();
    browser = await openBrowser({ width: 1280, height: 800 });
  }, 120_000);
  afterAll(async () => {
    await browser.close();
    await server.close();
  });

  it('1. signs in', async () => {
    const { page } = browser;
    await page.goto(`${server.baseUrl}/sign-in`);
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await picture(page, '01-sign-in');
    await as(page, 'engineer@kestrel.example');
    await page.getByRole('region', { name: 'Masters due or overdue', exact: true }).waitFor();
    await picture(page, '02-home-engineer');
  });

  it('2. an engineer opens a lot; an inspector records it at the Bench', async () => {
    const { page } = browser;
    await createLot(page, { spec: /RB-40 rev B/, lotNumber: LOT, quantity: 4, prefix: 'RB40-6' });
    await as(page, 'inspector@kestrel.example');
    await startBenchRun(page, { lotNumber: LOT, master: /MG-1\.500/, zero: '0' });
    await picture(page, '03-bench-first-part');
    const verdicts = await recordPartsFromKeyboard(page, serials('RB40-6', 4), READINGS);
    expect(verdicts.slice(0, 3)).toEqual(['Conforms', 'Conforms', 'Conforms']);
    expect(verdicts[3]).toBe('Does not conform');
    await endBenchRun(page, LOT, '0.00001');
    await picture(page, '04-bench-run-ended');
  });

  it("3. the engineer reviews the lot and releases the good parts; a lot that won't match sets sold before", async () => {
    const { page } = browser;
    await as(page, 'engineer@kestrel.example');
    await page.getByRole('navigation').getByRole('link', { name: 'Lots' }).click();
    await page.getByRole('link', { name: LOT }).click();
    await page.getByRole('heading', { name: `Lot review — ${LOT}` }).waitFor();
    await page.getByRole('grid', { name: 'Parts' }).getByText('RB40-6004').waitFor();
    await picture(page, '05-lot-review');
    for (const serial of ['RB40-6001', 'RB40-6002', 'RB40-6003']) {
      await page.getByRole('link', { name: serial, exact: true }).click();
      await page.getByRole('button', { name: 'Release' }).click();
      const dialog = page.getByRole('dialog');
      await dialog.getByRole('button', { name: 'Release', exact: true }).click();
      await dialog.waitFor({ state: 'detached' });
      await page.getByText('Released', { exact: true }).first().waitFor();
      await page.goBack();
      await page.getByRole('heading', { name: `Lot review — ${LOT}` }).waitFor();
    }
    // Last year's PP-6 pair no longer matches this year's lot: Lot review says so.
    await page.getByRole('navigation').getByRole('link', { name: 'Lots' }).click();
    await page.getByRole('link', { name: 'L-2026-044' }).click();
    await page.getByText(/would not match PP-6 sets sold before/).waitFor();
    await picture(page, '06-lot-review-outside-window');
  });

  it('4. sales builds a set, issues its certificate and e-mails it; anyone can verify it', async () => {
    const { page } = browser;
    await as(page, 'sales@kestrel.example');
    await page.getByRole('navigation').getByRole('link', { name: 'Sets' }).click();
    await page.getByRole('link', { name: 'Build sets' }).click();
    await page.getByRole('radio', { name: /^RB-40 rev / }).check();
    await page.getByLabel('How many sets').fill('1');
    await page.getByRole('button', { name: 'Propose sets' }).click();
    await page.getByRole('article', { name: 'Set 1' }).waitFor();
    await page.getByRole('combobox', { name: 'Customer' }).fill('Alder');
    await page.getByRole('option', { name: /Alder Valley Machining/ }).click();
    await page.getByRole('combobox', { name: 'Order reference' }).fill('AV-2026-11');
    await picture(page, '07-set-builder');
    await page.getByRole('button', { name: 'Allocate 1 set' }).click();
    const order = page.getByRole('article', { name: 'Order AV-2026-11' });
    await order.getByRole('link', { name: /^S-\d{4}-\d{4}$/ }).click();
    await page.getByRole('button', { name: 'Issue certificate' }).click();
    const certificates = page.getByRole('table', { name: 'Certificates of this set' });
    const numberCell = certificates.getByText(/^EC-\d{4}-\d{4}$/);
    await numberCell.waitFor();
    const number = (await numberCell.innerText()).trim();
    const code = (await certificates.getByRole('link').first().innerText()).trim();
    await page.getByRole('button', { name: `Send ${number} by e-mail` }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Send' }).click();
    await page.getByText(`Certificate ${number} sent to orders@aldervalley.example.`).waitFor();
    await picture(page, '08-set-certificate');
    await page.goto(`${server.baseUrl}/verify/${code}`);
    await page.getByRole('heading', { name: 'Genuine certificate' }).waitFor();
    await picture(page, '09-verify');
  });

  it('5. customer service checks replacements: one that fits, one that needs grinding', async () => {
    const { page } = browser;
    await as(page, 'service@kestrel.example');
    await page.getByRole('navigation').getByRole('link', { name: 'Replacements' }).click();
    await page.getByLabel('Certificate number or serial').fill('RB40-1182');
    await page.getByRole('button', { name: 'Check' }).click();
    await page.getByRole('table', { name: 'Parts that fit' }).waitFor();
    await picture(page, '10-replacement-fits');
    await page.getByLabel('Certificate number or serial').fill('PP6-1311');
    await page.getByRole('button', { name: 'Check' }).click();
    const grind = page.getByRole('table', { name: 'Parts to grind' });
    await grind.waitFor();
    await grind.getByRole('button', { name: 'Ask the shop floor to grind this part' }).first().click();
    await page.getByRole('dialog').getByRole('button', { name: 'Raise grind request' }).click();
    await page.getByRole('heading', { name: /^Grind request GR-\d{4}-\d{4}$/ }).waitFor();
    await page.getByText('Wear eye and face protection.').waitFor();
    await picture(page, '11-grind-request');
  });

  it('6. the engineer reads the trend of a part number and a gauge study', async () => {
    const { page } = browser;
    await as(page, 'engineer@kestrel.example');
    await page.getByRole('navigation').getByRole('link', { name: 'Trends' }).click();
    await choose(page, 'Part number', /^RB-40/);
    await page.getByRole('table', { name: 'Control limits' }).waitFor();
    await page.getByRole('figure', { name: 'X-bar chart' }).locator('svg.recharts-surface').waitFor();
    await picture(page, '12-trends');
    await page.getByRole('navigation').getByRole('link', { name: 'Gauge studies' }).click();
    await page.getByRole('link', { name: 'RB-40 height, three inspectors' }).click();
    await page.getByRole('table', { name: 'Analysis of variance' }).waitFor();
    await picture(page, '13-gauge-study');
  });

  it('7. the admin sees what the app sent', async () => {
    const { page } = browser;
    await as(page, 'admin@kestrel.example');
    await page.getByRole('navigation').getByRole('link', { name: 'Outbox' }).click();
    await page.getByRole('grid', { name: 'Sent by Evenset' }).getByText('Sent', { exact: true }).first().waitFor();
    await picture(page, '14-outbox');
  });
});
