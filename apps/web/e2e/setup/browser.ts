import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

const ROOT = join(__dirname, '../../../..');
export const SCREENSHOTS = join(ROOT, 'test-output', 'screenshots');

export function baseUrl(): string {
  const url = process.env.EVENSET_BASE_URL;
  if (!url)
    throw new Error('EVENSET_BASE_URL is not set: run the browser tests through jest --selectProjects browser.');
  return url;
}

export interface OpenBrowser {
  context: BrowserContext;
  page: Page;
  close(): Promise<void>;
}

/** Debian's chromium, headless, with a fresh profile and no calls out of this machine. */
export async function openBrowser(viewport = { width: 1366, height: 860 }): Promise<OpenBrowser> {
  const profile = mkdtempSync(join(tmpdir(), 'evenset-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    viewport,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

export async function screenshot(page: Page, name: string, dir = SCREENSHOTS): Promise<string> {
  mkdirSync(dir, { recursive: true });
  const path = join(dir, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}

/** Where the user guide's pictures live: the guide's browser test takes them from the real app. */
export const GUIDE_IMAGES = join(ROOT, 'docs', 'images');

export async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto(`${baseUrl()}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

export async function navigationLinks(page: Page): Promise<string[]> {
  const nav = page.getByRole('navigation');
  await nav.getByRole('link').first().waitFor();
  return (await nav.getByRole('link').allInnerTexts()).map((text) => text.trim());
}
