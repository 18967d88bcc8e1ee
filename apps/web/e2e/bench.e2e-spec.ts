import { openBrowser, OpenBrowser, screenshot, signIn } from './setup/browser';
import { createLot, DEMO_PASSWORD, endBenchRun, recordPartsFromKeyboard, serials, startBenchRun } from './setup/bench';

// Demo accounts and the released RB-40 rev B spec with its 1.5000 in master come from the seed.
const LOT = 'L-E2E-BENCH';
/** Top-face readings (in) per part, P1…P5: invented demo values around the middle of the band. */
const READINGS = [
  ['-0.0002', '-0.0002', '-0.0002', '-0.0002', '-0.0002'],
  ['-0.0001', '-0.0002', '-0.0001', '-0.0002', '-0.0001'],
  ['0.0003', '0.0003', '0.0003', '0.0003', '0.0003'],
  ['-0.0003', '-0.0002', '-0.0003', '-0.0002', '-0.0003'],
];

jest.setTimeout(120_000);

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
    await createLot(page, { spec: /RB-40 rev B/, lotNumber: LOT, quantity: 4, prefix: 'E2E-' });
    await page.getByRole('button', { name: 'Sign out' }).click();

    await signIn(page, 'inspector@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    await startBenchRun(page, { lotNumber: LOT, master: /MG-1\.500/, zero: '0' });
    const verdicts = await recordPartsFromKeyboard(page, serials('E2E-', 4), READINGS, 'bench');
    expect(verdicts).toHaveLength(READINGS.length);
    for (const verdict of verdicts) expect(verdict).toMatch(/Conforms|Does not conform|In guard band/);

    await endBenchRun(page, LOT, '0.0001');
    await page.getByText('Run ended — 4 parts saved').waitFor();
    await screenshot(page, 'bench-run-ended');
  });
});
