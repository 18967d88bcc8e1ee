import { Client } from 'pg';
import type { Page } from 'playwright-core';
import { DEMO_PASSWORD } from './setup/bench';
import { openBrowser, type OpenBrowser, screenshot, signIn } from './setup/browser';
import { databaseUrlOf, startOwnServer, type OwnServer } from './setup/server';

// This test sells sets and tampers with a certificate row, so it runs on a server and database
// of its own rather than the one the other browser tests share.
jest.setTimeout(180_000);

const CUSTOMER = 'Alder Valley Machining'; // demo customer with no sets yet
const CUSTOMER_EMAIL = 'orders@aldervalley.example';
const ORDER = 'AV-2026-07';

async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.getByRole('button', { name: 'Sign in' }).waitFor();
}

describe('a certificate from set building to verification (browser)', () => {
  let server: OwnServer;
  let browser: OpenBrowser;

  beforeAll(async () => {
    server = await startOwnServer();
    browser = await openBrowser({ width: 1440, height: 900 });
  }, 120_000);
  afterAll(async () => {
    await browser.close();
    await server.close();
  });

  it('sales builds two sets, issues and e-mails a certificate; the Outbox holds it; the verification page tells genuine from altered', async () => {
    const { page } = browser;
    const base = server.baseUrl;

    // Sales: two RB-40 sets for a customer's order, from the builder's own proposal.
    await signIn(page, 'sales@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    await page.goto(`${base}/sets/new`);
    await page.getByRole('radio', { name: /^RB-40 rev / }).check();
    await page.getByLabel('How many sets').fill('2');
    await page.getByRole('button', { name: 'Propose sets' }).click();
    await page.getByRole('article', { name: 'Set 2' }).waitFor();
    await page.getByRole('combobox', { name: 'Customer' }).fill('Alder');
    await page.getByRole('option', { name: new RegExp(CUSTOMER) }).click();
    await page.getByRole('combobox', { name: 'Order reference' }).fill(ORDER);
    await screenshot(page, 'certificate-flow-1-two-sets');
    await page.getByRole('button', { name: 'Allocate 2 sets' }).click();

    const order = page.getByRole('article', { name: `Order ${ORDER}` });
    await order.waitFor();
    const setLinks = order.getByRole('link', { name: /^S-\d{4}-\d{4}$/ });
    await expect(setLinks.count()).resolves.toBe(2);
    await setLinks.first().click();

    // The certificate of the first set, issued and sent to the customer's contact.
    await page.getByRole('button', { name: 'Issue certificate' }).click();
    const certificates = page.getByRole('table', { name: 'Certificates of this set' });
    const numberCell = certificates.getByText(/^EC-\d{4}-\d{4}$/);
    await numberCell.waitFor();
    const certificateNumber = (await numberCell.innerText()).trim();
    const code = (await certificates.getByRole('link').first().innerText()).trim();
    await page.getByRole('button', { name: `Send ${certificateNumber} by e-mail` }).click();
    const dialog = page.getByRole('dialog', { name: `Send ${certificateNumber} by e-mail` });
    expect(await dialog.getByLabel('Recipient e-mail').inputValue()).toBe(CUSTOMER_EMAIL);
    await dialog.getByRole('button', { name: 'Send' }).click();
    await page.getByText(`Certificate ${certificateNumber} sent to ${CUSTOMER_EMAIL}.`).waitFor();
    await screenshot(page, 'certificate-flow-2-issued-and-sent');
    await signOut(page);

    // Admin: the Outbox shows the message sent, and the mail catcher holds it with the PDF.
    await signIn(page, 'admin@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('navigation').getByRole('link', { name: 'Outbox' }).click();
    const sent = page.getByRole('grid', { name: 'Sent by Evenset' });
    const sentRow = sent.getByRole('row', { name: new RegExp(certificateNumber) });
    await sentRow.waitFor();
    await sentRow.getByText('Sent', { exact: true }).waitFor();
    await page.getByRole('tab', { name: 'Received by the local mail catcher' }).click();
    const received = page.getByRole('grid', { name: 'Received by the local mail catcher' });
    const receivedRow = received.getByRole('row', { name: new RegExp(certificateNumber) });
    await receivedRow.waitFor();
    await receivedRow.getByText(`${certificateNumber}.pdf`).waitFor();
    await receivedRow.click();
    const message = page.getByRole('dialog');
    const attachment = message.getByRole('link', { name: `${certificateNumber}.pdf` });
    await attachment.waitFor();
    await expect(message.getByLabel('Message text').innerText()).resolves.toContain(`/verify/${code}`);
    await screenshot(page, 'certificate-flow-3-outbox');
    await page.keyboard.press('Escape');
    await signOut(page);

    // Anyone: the public verification page, without signing in.
    await page.goto(`${base}/verify/${code}`);
    await page.getByRole('heading', { name: 'Genuine certificate' }).waitFor();
    await page.getByText(certificateNumber).first().waitFor();
    await screenshot(page, 'certificate-flow-4-genuine');

    // Someone with database access edits the stored facts behind the product's back.
    const db = new Client({ connectionString: databaseUrlOf(server) });
    await db.connect();
    try {
      await db.query('alter table certificate disable trigger user');
      const changed = await db.query(
        `update certificate set payload = replace(payload, $2, $3) where verification_code = $1`,
        [code, CUSTOMER, 'Someone Else Ltd'],
      );
      expect(changed.rowCount).toBe(1);
      await db.query('alter table certificate enable trigger user');
    } finally {
      await db.end();
    }
    await page.reload();
    await page.getByRole('heading', { name: 'Altered record — do not rely on this certificate' }).waitFor();
    await screenshot(page, 'certificate-flow-5-altered');
  });
});
