import type { Page } from 'playwright-core';
import { openBrowser, OpenBrowser, screenshot, signIn } from './setup/browser';
import { choose, DEMO_PASSWORD } from './setup/bench';
import { apiGet } from './setup/lot-review';

jest.setTimeout(120_000);

/** Each demo person's role, the section heading (the role's label) and the tiles it must show. */
const HOMES = [
  ['inspector', 'Inspector', ['Lots waiting for inspection', 'Your recent runs']],
  [
    'engineer',
    'Engineer',
    ['Parts waiting for a decision', 'Masters due or overdue', 'Run-rule signals', 'Open grind requests'],
  ],
  ['sales', 'Sales', ['Sets free stock can make', 'Recent certificates']],
  ['service', 'Customer service', ['Open replacement cases', 'Recent replacements']],
  ['admin', 'Admin', ['People', 'Outbox failures', 'Latest changes']],
] as const;

/** The headline number of the tile titled `title`, as shown. */
async function tileCount(page: Page, title: string): Promise<number> {
  const tile = page.getByRole('region', { name: title, exact: true });
  return Number(await tile.locator('[data-tile-count]').innerText());
}

interface HomeAnswer {
  inspector?: { lotsWaiting: { notInspected: number }[] };
  engineer?: { mastersDue: unknown[] };
  sales?: { stock: { sets: number }[] };
  service?: { openCases: unknown[] };
  admin?: { people: { active: number }; outboxFailures: number };
}

describe('home page per role (browser)', () => {
  let browser: OpenBrowser;
  beforeEach(async () => {
    browser = await openBrowser({ width: 1366, height: 900 });
  });
  afterEach(() => browser.close());

  it.each(HOMES)('%s sees their own tiles, each opening the work', async (role, heading, tiles) => {
    const { page } = browser;
    await signIn(page, `${role}@kestrel.example`, DEMO_PASSWORD);
    const section = page.getByRole('region', { name: heading, exact: true });
    await section.waitFor();
    const titles = (await section.getByRole('heading', { level: 3 }).allInnerTexts()).map((t) => t.trim());
    expect(titles).toEqual([...tiles]);
    // Only the person's own role has a section.
    for (const [other, otherHeading] of HOMES)
      if (other !== role) expect(await page.getByRole('region', { name: otherHeading, exact: true }).count()).toBe(0);
    // Every tile has a link to the page where the work is done.
    for (const title of tiles) {
      const tile = page.getByRole('region', { name: title, exact: true });
      expect(await tile.getByRole('link').count()).toBeGreaterThan(0);
    }

    // The headline numbers are the server's, summed as the tiles say.
    const home = await apiGet<HomeAnswer>(page, '/home');
    const sum = (values: number[]) => values.reduce((a, b) => a + b, 0);
    if (role === 'inspector')
      expect(await tileCount(page, tiles[0])).toBe(sum(home.inspector!.lotsWaiting.map((l) => l.notInspected)));
    if (role === 'engineer')
      expect(await tileCount(page, 'Masters due or overdue')).toBe(home.engineer!.mastersDue.length);
    if (role === 'sales') expect(await tileCount(page, tiles[0])).toBe(sum(home.sales!.stock.map((s) => s.sets)));
    if (role === 'service') expect(await tileCount(page, tiles[0])).toBe(home.service!.openCases.length);
    if (role === 'admin') {
      expect(await tileCount(page, 'People')).toBe(home.admin!.people.active);
      expect(await tileCount(page, 'Outbox failures')).toBe(home.admin!.outboxFailures);
    }
    await screenshot(page, `home-${role}`);
  });

  it('the engineer’s masters tile lists the demo’s due and overdue masters and opens one', async () => {
    const { page } = browser;
    await signIn(page, 'engineer@kestrel.example', DEMO_PASSWORD);
    const tile = page.getByRole('region', { name: 'Masters due or overdue', exact: true });
    await tile.waitFor();
    // demo-gauges.ts: MG-12-A is 5 days overdue, MG-1.000-A due in 12 days.
    await tile.getByText(/overdue since/).waitFor();
    await tile.getByRole('link', { name: 'MG-12-A' }).click();
    await page
      .getByRole('heading', { name: /MG-12-A/ })
      .first()
      .waitFor();
  });

  it('the admin opens the audit log from home, filters it by action and reads an entry field by field', async () => {
    const { page } = browser;
    await signIn(page, 'admin@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('link', { name: 'Open the audit log' }).click();
    await page.getByRole('heading', { name: 'Audit log', level: 1 }).waitFor();
    const grid = page.getByRole('grid', { name: 'Audit log' });
    await grid.locator('[role="row"][data-id]').first().waitFor();

    // The demo's records were made through the services, each with its entry; one with values after.
    const all = await apiGet<{ items: { action: string; after: object | null }[]; total: number }>(
      page,
      '/audit?pageSize=100',
    );
    const action = all.items.find((e) => e.after && Object.keys(e.after).length)!.action;
    const expected = (await apiGet<{ total: number }>(page, `/audit?action=${encodeURIComponent(action)}`)).total;
    await choose(page, 'Action', new RegExp(`^${action.replace(/\./g, '\\.')}$`));
    await page.getByText(new RegExp(`^\\d+–\\d+ of ${expected}$`)).waitFor();
    const shown = await grid.locator('[role="gridcell"][data-field="action"]').allInnerTexts();
    expect(shown.length).toBe(Math.min(expected, 25));
    for (const text of shown) expect(text.trim()).toBe(action);
    await screenshot(page, 'audit-log');

    await grid.locator('[role="row"][data-id]').first().click();
    const dialog = page.getByRole('dialog', { name: action });
    const table = dialog.getByRole('table', { name: 'Before and after' });
    await table.waitFor();
    expect(await table.getByRole('row').count()).toBeGreaterThan(1);
    await screenshot(page, 'audit-entry');
    await dialog.getByRole('button', { name: 'Close' }).click();
  });
});
