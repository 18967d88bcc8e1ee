import type { Locator, Page } from 'playwright-core';
import { baseUrl, openBrowser, OpenBrowser, screenshot, signIn } from './setup/browser';
import { DEMO_PASSWORD } from './setup/bench';

// RB-40 has released parts in no set in the demo data (lots L-2026-041 and L-2026-047); which of
// them the builder proposes is read from the page, not assumed.
const CUSTOMER = { name: 'Harrow Tool & Die (browser test)', email: 'buyer@harrow.example' };
const SECOND_CUSTOMER = { name: 'Wexford Gauge (browser test)', email: 'orders@wexford.example' };
const ORDER = 'PO-E2E-0042';

jest.setTimeout(120_000);

/** The serials of a proposed set's parts, as its table lists them (ascending height). */
async function serialsOf(set: Locator): Promise<string[]> {
  const rows = set.getByRole('table').getByRole('row');
  const count = await rows.count();
  const serials: string[] = [];
  for (let i = 1; i < count; i += 1) serials.push((await rows.nth(i).getByRole('cell').first().innerText()).trim());
  return serials;
}

/** The spread the set's bar reports, e.g. "0.00012 in". */
async function spreadOf(set: Locator): Promise<string> {
  const label = await set.getByRole('img', { name: /^Spread / }).getAttribute('aria-label');
  const spread = /^Spread (.+?) against/.exec(label ?? '')?.[1];
  if (!spread) throw new Error(`The spread bar says "${label}".`);
  return spread;
}

/** Adds a customer from the builder's "New customer" dialog; the builder then has them chosen. */
async function addCustomer(page: Page, customer: { name: string; email: string }): Promise<void> {
  await page.getByRole('button', { name: 'New customer' }).click();
  const dialog = page.getByRole('dialog', { name: 'New customer' });
  await dialog.getByLabel('Customer name').fill(customer.name);
  await dialog.getByLabel('Contact e-mail').fill(customer.email);
  await dialog.getByRole('button', { name: 'Add customer' }).click();
  await dialog.waitFor({ state: 'detached' });
  expect(await page.getByRole('combobox', { name: 'Customer' }).inputValue()).toBe(customer.name);
}

async function proposeOneSet(page: Page): Promise<Locator> {
  await page.goto(`${baseUrl()}/sets/new`);
  await page.getByRole('heading', { name: 'Build sets' }).waitFor();
  await page.getByRole('radio', { name: /^RB-40 rev / }).check();
  await page.getByLabel('How many sets').fill('1');
  await page.getByRole('button', { name: 'Propose sets' }).click();
  const set = page.getByRole('article', { name: 'Set 1' });
  await set.waitFor();
  return set;
}

describe('the set builder (browser)', () => {
  let browser: OpenBrowser;
  beforeEach(async () => {
    browser = await openBrowser({ width: 1440, height: 900 });
  });
  afterEach(() => browser.close());

  it('sales proposes a set of RB-40, swaps a part, and allocates it to a new customer', async () => {
    const { page } = browser;
    await signIn(page, 'sales@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    await page.getByRole('navigation').getByRole('link', { name: 'Sets' }).click();
    await page.getByRole('heading', { name: 'Sets', exact: true }).waitFor();
    await page.getByRole('link', { name: 'Build sets' }).click();
    await page.getByRole('heading', { name: 'Build sets' }).waitFor();
    await page.getByRole('radio', { name: /^RB-40 rev / }).check();
    await page.getByLabel('How many sets').fill('1');
    await screenshot(page, 'set-builder-stock');
    await page.getByRole('button', { name: 'Propose sets' }).click();

    const set = page.getByRole('article', { name: 'Set 1' });
    await set.waitFor();
    let serials = await serialsOf(set);
    expect(serials).toHaveLength(4);
    const spreadBefore = await spreadOf(set);
    expect(spreadBefore).toMatch(/^\d+\.\d+ (in|mm|µm)$/);
    await screenshot(page, 'set-builder-proposal');

    // Swap a part for a spare whose "spread would be" differs and stays within the band.
    const spares = await page.getByRole('table', { name: 'Spare parts' }).getByRole('row').count();
    if (spares > 1) {
      let swapped = false;
      for (const serial of [serials[0]!, serials[3]!]) {
        await set.getByRole('button', { name: `Swap ${serial}` }).click();
        const items = page.getByRole('menuitem');
        await items.first().waitFor();
        const texts = await items.allInnerTexts();
        const pick = texts.findIndex((t) => !t.includes('over the band') && !t.includes(`would be ${spreadBefore}`));
        if (pick < 0) {
          await page.keyboard.press('Escape');
          await page.getByRole('menu').waitFor({ state: 'detached' });
          continue;
        }
        const expected = /would be (.+?)$/m.exec(texts[pick]!)?.[1]?.trim();
        const incoming = texts[pick]!.split(' · ')[0]!.trim();
        await items.nth(pick).click();
        await page.getByRole('menu').waitFor({ state: 'detached' });
        expect(await spreadOf(set)).toBe(expected);
        expect(await spreadOf(set)).not.toBe(spreadBefore);
        serials = await serialsOf(set);
        expect(serials).toContain(incoming);
        expect(serials).not.toContain(serial);
        swapped = true;
        break;
      }
      expect(swapped).toBe(true);
      await screenshot(page, 'set-builder-swapped');
    }

    // A new customer, made from the builder, and a new order reference.
    await addCustomer(page, CUSTOMER);
    await page.getByRole('combobox', { name: 'Order reference' }).fill(ORDER);
    await page.getByText('A new order with this reference is created.').waitFor();
    await screenshot(page, 'set-builder-ready');
    await page.getByRole('button', { name: 'Allocate 1 set' }).click();

    // The customer's page lists the order with the new set and its serials.
    await page.getByRole('heading', { name: CUSTOMER.name }).waitFor();
    const order = page.getByRole('article', { name: `Order ${ORDER}` });
    await order.waitFor();
    const setLink = order.getByRole('link', { name: /^S-\d{4}-\d{4}$/ });
    const setNumber = (await setLink.innerText()).trim();
    for (const serial of serials) await order.getByText(serial).waitFor();
    await screenshot(page, 'set-builder-customer');

    // The set's own page: its parts, spread against the band and certificates.
    await setLink.click();
    await page.getByRole('heading', { name: `Set ${setNumber}` }).waitFor();
    const members = page.getByRole('table', { name: 'Parts of this set' });
    for (const serial of serials) await members.getByText(serial, { exact: true }).waitFor();
    await page.getByRole('region', { name: 'Certificates' }).waitFor();
    await screenshot(page, 'set-detail');

    // And the Sets list shows it under RB-40.
    await page.goto(`${baseUrl()}/sets?partNumber=RB-40`);
    await page.getByRole('grid', { name: 'Sets' }).getByRole('link', { name: setNumber }).waitFor();
    await screenshot(page, 'sets-list');
    // And the customer is on the Customers list, with one order and one set.
    await page.getByRole('navigation').getByRole('link', { name: 'Customers' }).click();
    const row = page.getByRole('grid', { name: 'Customers' }).getByRole('row', { name: new RegExp(CUSTOMER.email) });
    await row.waitFor();
    expect((await row.getByRole('gridcell').allInnerTexts()).map((t) => t.trim())).toEqual([
      CUSTOMER.name,
      CUSTOMER.email,
      '1',
      '1',
    ]);
    await screenshot(page, 'customers-list');
  });

  it('when another allocation took the parts first, says so and proposes again', async () => {
    const { page, context } = browser;
    await signIn(page, 'sales@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    const other = await context.newPage();

    // Both pages get the same proposal; the first allocates it.
    const first = await proposeOneSet(page);
    const second = await proposeOneSet(other);
    expect(await serialsOf(second)).toEqual(await serialsOf(first));
    await addCustomer(page, SECOND_CUSTOMER);
    await page.getByRole('combobox', { name: 'Order reference' }).fill('PO-E2E-FIRST');
    // The other page finds the customer just added by searching for it.
    await other.getByRole('combobox', { name: 'Customer' }).fill('Wexford');
    await other.getByRole('option', { name: /Wexford Gauge/ }).click();
    await other.getByRole('combobox', { name: 'Order reference' }).fill('PO-E2E-SECOND');
    await page.getByRole('button', { name: 'Allocate 1 set' }).click();
    await page.getByRole('heading', { name: SECOND_CUSTOMER.name }).waitFor();

    await other.getByRole('button', { name: 'Allocate 1 set' }).click();
    const refusal = other.getByRole('alert').filter({ hasText: 'Nothing was allocated' });
    await refusal.waitFor();
    await screenshot(other, 'set-builder-refused');
    await refusal.getByRole('button', { name: 'Propose again' }).click();
    await refusal.waitFor({ state: 'detached' });
    await other.getByRole('heading', { name: /^2\. Proposed sets of RB-40/ }).waitFor();
    await other.close();

    // "Build sets" on a customer's page opens the builder with that customer chosen.
    await page.getByRole('link', { name: 'Build sets' }).click();
    await page.getByRole('radio', { name: /^RB-40 rev / }).check();
    await page.getByRole('button', { name: 'Propose sets' }).click();
    const customer = page.getByRole('combobox', { name: 'Customer' });
    await customer.waitFor();
    await page.waitForFunction(
      (name) =>
        (document.querySelector('[role="combobox"][aria-autocomplete]') as HTMLInputElement | null)?.value === name,
      SECOND_CUSTOMER.name,
    );
    expect(await customer.inputValue()).toBe(SECOND_CUSTOMER.name);
  });
});
