import fs from 'node:fs';
import path from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { CHROMIUM_PATH } from '../../scripts/chromium.js';

/** Debian's chromium, quiet on a machine with no outside network. */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: CHROMIUM_PATH,
    headless: true,
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
}

export const PHONE = {
  viewport: { width: 390, height: 844 },
  deviceScaleFactor: 2,
  isMobile: true,
  hasTouch: true,
};
export const DESKTOP = { viewport: { width: 1366, height: 900 } };

export async function newContext(
  browser: Browser,
  baseURL: string,
  device: object = DESKTOP,
): Promise<BrowserContext> {
  return browser.newContext({ baseURL, ...device });
}

/** Screenshots are kept as test artefacts under test-results/screenshots. */
export async function keepScreenshot(page: Page, name: string): Promise<string> {
  const file = path.join('test-results', 'screenshots', `${name}.png`);
  fs.mkdirSync(path.dirname(file), { recursive: true });
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

export async function signIn(page: Page, email: string, password = 'ringseat-demo') {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}
