import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { trendPointList, type Trend, type TrendLimits } from '../../../packages/contracts/src';
import { formatLength, individuals, xbarR, type LengthUnit } from '../../../packages/metrology/src';
import { baseUrl, openBrowser, OpenBrowser, screenshot, signIn } from './setup/browser';
import { choose, DEMO_PASSWORD, menuClosed } from './setup/bench';
import { apiGet } from './setup/lot-review';

// The demo's RB-40 lots (apps/api/src/database/seeders/demo-lots.ts).
const RB40_LOTS = ['L-2025-118', 'L-2026-041', 'L-2026-047', 'L-2026-052'];

jest.setTimeout(120_000);

/** LCL, CL and UCL as the "Control limits" table shows them for one chart. */
async function limitsRow(page: Page, chart: string): Promise<string[]> {
  const row = page.getByRole('table', { name: 'Control limits' }).getByRole('row', { name: new RegExp(`^${chart} `) });
  return (await row.getByRole('cell').allInnerTexts()).map((text) => text.trim());
}

describe('trends (browser)', () => {
  let browser: OpenBrowser;
  beforeEach(async () => {
    browser = await openBrowser({ width: 1440, height: 1000 });
  });
  afterEach(() => browser.close());

  it('shows RB-40 control limits equal to the API answer, which equals the metrology package on its heights', async () => {
    const { page } = browser;
    await signIn(page, 'engineer@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('navigation').getByRole('link', { name: 'Trends' }).click();
    await choose(page, 'Part number', /^RB-40/);
    await page.getByRole('table', { name: 'Control limits' }).waitFor();
    await page.getByRole('figure', { name: 'X-bar chart' }).locator('svg.recharts-surface').waitFor();

    const { user } = await apiGet<{ user: { displayUnit: LengthUnit } }>(page, '/auth/me');
    const trend = await apiGet<Trend>(page, '/trends/RB-40?subgroup=lot');
    const points = trendPointList(trend);
    for (const lot of RB40_LOTS) expect(points.map((p) => p.lotNumber)).toContain(lot);

    // The API's limits are xbarR/individuals of @evenset/metrology on the heights it lists
    // (apps/api/test/trends.e2e-spec.ts checks the same on a fixture of its own).
    const height = new Map(points.map((p) => [p.serial, p.height]));
    const reference = xbarR(trend.subgroups.subgroups.map((g) => g.serials.map((s) => height.get(s)!)));
    expect(trend.subgroups.xbar).toEqual(reference.xbar);
    expect(trend.subgroups.range).toEqual(reference.range);
    const single = individuals(trend.points.height);
    expect(trend.individuals?.individuals).toEqual(single.individuals);

    const shown = (limits: TrendLimits) =>
      [limits.lower, limits.centre, limits.upper].map((mm) =>
        formatLength(mm, user.displayUnit, { level: 'fine', withSymbol: false }),
      );
    expect(await limitsRow(page, 'X-bar')).toEqual(shown(trend.subgroups.xbar!));
    expect(await limitsRow(page, 'R')).toEqual(shown(trend.subgroups.range!));
    expect(await limitsRow(page, 'Individuals')).toEqual(shown(trend.individuals!.individuals));
    expect(await limitsRow(page, 'Moving range')).toEqual(shown(trend.individuals!.movingRange));
    // The same figures label the lines of the X-bar chart.
    const xbarFigure = page.getByRole('figure', { name: 'X-bar chart' });
    await xbarFigure.getByText(`UCL ${shown(trend.subgroups.xbar!)[2]}`).waitFor();
    await xbarFigure.getByText(`LCL ${shown(trend.subgroups.xbar!)[0]}`).waitFor();
    // Fewer than 30 heights (the demo alone has 26; other browser tests may add RB-40 parts to the
    // shared server): the capability card says so, and only then.
    const warning = page.getByText(/common practice wants about 30 or more/);
    if (trend.capability!.count < 30) await warning.waitFor();
    else expect(await warning.count()).toBe(0);
    await screenshot(page, 'trends-rb40');

    // Exports: the data as CSV (one row a point) and the X-bar chart as SVG.
    const [csv] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export data (CSV)' }).click(),
    ]);
    const rows = readFileSync((await csv.path())!, 'utf8')
      .trim()
      .split('\r\n');
    expect(rows[0]).toMatch(/^Serial,Lot,Set,Inspector,Master,Inspected at,Height \(/);
    expect(rows).toHaveLength(points.length + 1);
    const [svg] = await Promise.all([
      page.waitForEvent('download'),
      xbarFigure.getByRole('button', { name: 'Save SVG' }).click(),
    ]);
    expect(svg.suggestedFilename()).toBe('RB-40-xbar.svg');
    const svgText = readFileSync((await svg.path())!, 'utf8');
    expect(svgText).toMatch(/^<svg [^>]*xmlns="http:\/\/www.w3.org\/2000\/svg"/);
    expect(svgText).toContain(`UCL ${shown(trend.subgroups.xbar!)[2]}`);
    const [png] = await Promise.all([
      page.waitForEvent('download'),
      xbarFigure.getByRole('button', { name: 'Save PNG' }).click(),
    ]);
    expect(
      readFileSync((await png.path())!)
        .subarray(1, 4)
        .toString('ascii'),
    ).toBe('PNG');
  });

  it('narrows RB-40 to one lot and says why no X-bar chart can be drawn from it', async () => {
    const { page } = browser;
    await signIn(page, 'engineer@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    await page.goto(`${baseUrl()}/trends?partNumber=RB-40`);
    await page.getByRole('table', { name: 'Control limits' }).waitFor();
    // A multiple choice: the menu stays open until Escape.
    await page.getByLabel('Lots', { exact: true }).click();
    await page.getByRole('option', { name: 'L-2026-052' }).click();
    await page.keyboard.press('Escape');
    await menuClosed(page);
    await page.getByText(/needs at least 2 lots/).waitFor();
    const trend = await apiGet<Trend>(page, '/trends/RB-40');
    const lot = await apiGet<{ items: { id: string; lotNumber: string }[] }>(page, '/lots?q=L-2026-052');
    const oneLot = await apiGet<Trend>(page, `/trends/RB-40?lotIds=${lot.items[0]!.id}`);
    expect(trendPointList(oneLot).every((p) => p.lotNumber === 'L-2026-052')).toBe(true);
    expect(oneLot.points.serial.length).toBeLessThan(trend.points.serial.length);
    await page.getByText(`${oneLot.points.serial.length} heights of RB-40 from 1 lot,`).waitFor();
    await screenshot(page, 'trends-rb40-one-lot');
  });
});
