import { baseUrl, navigationLinks, openBrowser, OpenBrowser, screenshot, signIn } from './setup/browser';

// Demo accounts from the seed (apps/api/src/database/seeders/demo-people.ts).
const DEMO_PASSWORD = 'evenset-demo-1';
const INSPECTOR_MENU = [
  'Home',
  'Bench',
  'Lots',
  'Specs',
  'Masters',
  'Instruments',
  'Materials',
  'Trends',
  'Grind requests',
];
const ENGINEER_MENU = [
  'Home',
  'Lots',
  'Specs',
  'Masters',
  'Instruments',
  'Materials',
  'Customers',
  'Sets',
  'Certificates',
  'Replacements',
  'Trends',
  'Gauge studies',
  'Grind requests',
  'Audit log',
];
const CUSTOMER_MENU = ['Home', 'Customers', 'Sets', 'Certificates', 'Replacements', 'Grind requests'];
const NEW_INSPECTOR = {
  email: 'quinn.inspector@kestrel.example',
  name: 'Quinn Ferrand',
  password: 'plate-and-gauge-7',
};

jest.setTimeout(60_000);

describe('sign-in, roles and people (browser)', () => {
  let browser: OpenBrowser;
  beforeEach(async () => {
    browser = await openBrowser();
  });
  afterEach(() => browser.close());

  it('admin creates an inspector, who then sees only the inspector navigation', async () => {
    const { page } = browser;
    await signIn(page, 'admin@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('navigation').getByRole('link', { name: 'People' }).click();
    await page.getByRole('button', { name: 'Add person' }).click();
    await page.getByLabel('E-mail').fill(NEW_INSPECTOR.email);
    await page.getByLabel('Name').fill(NEW_INSPECTOR.name);
    await page.getByLabel('Password').fill(NEW_INSPECTOR.password);
    await page.getByRole('checkbox', { name: 'Inspector' }).check();
    await page.getByRole('button', { name: 'Create' }).click();
    await page.getByRole('grid').getByText(NEW_INSPECTOR.email).waitFor();
    await screenshot(page, 'people-after-create');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('button', { name: 'Sign in' }).waitFor();

    await signIn(page, NEW_INSPECTOR.email, NEW_INSPECTOR.password);
    await page.getByText(NEW_INSPECTOR.name).first().waitFor();
    expect(await navigationLinks(page)).toEqual(INSPECTOR_MENU);
    await screenshot(page, 'inspector-home');
    // A page outside the role is refused, not shown.
    await page.goto(`${baseUrl()}/people`);
    await page.getByText("You don't have access to this page").waitFor();
  });

  it.each([
    [
      'admin@kestrel.example',
      [
        'Home',
        'Customers',
        'Sets',
        'Certificates',
        'Replacements',
        'Trends',
        'Grind requests',
        'People',
        'Outbox',
        'Audit log',
      ],
    ],
    ['engineer@kestrel.example', ENGINEER_MENU],
    ['inspector@kestrel.example', INSPECTOR_MENU],
    ['sales@kestrel.example', CUSTOMER_MENU],
    ['service@kestrel.example', CUSTOMER_MENU],
  ])('%s sees only their own navigation', async (email, expected) => {
    const { page } = browser;
    await signIn(page, email, DEMO_PASSWORD);
    expect(await navigationLinks(page)).toEqual(expected);
  });

  it('says plainly when the password is wrong, and when attempts are throttled', async () => {
    const { page } = browser;
    // An address no other browser test signs in with: throttling lasts a minute on the shared
    // server, and a demo account throttled here would lock out the next file that uses it.
    // Unknown addresses and wrong passwords get the same answer (auth.service.ts).
    await signIn(page, 'no-such-person@kestrel.example', 'not-the-password');
    await page.getByText('Wrong e-mail or password.').waitFor();
    await screenshot(page, 'sign-in-wrong-password');
    // The browser-test server allows 4 attempts a minute per address and e-mail.
    for (let attempt = 0; attempt < 4; attempt += 1) await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText(/Too many attempts/).waitFor();
    await screenshot(page, 'sign-in-throttled');
  });
});
