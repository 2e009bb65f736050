import fs from 'node:fs';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import {
  DESKTOP,
  keepScreenshot,
  launchBrowser,
  newContext,
  PHONE,
  signIn,
} from '../helpers/browser.js';

const baseURL = inject('baseURL');
let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

const TECHNICIAN = 'ivo@tidewright.example';
const MANAGER = 'maren@tidewright.example';

async function signedIn(email: string, device: object) {
  const context = await newContext(browser, baseURL, device);
  const page = await context.newPage();
  await signIn(page, email);
  await expect
    .poll(() => page.getByRole('button', { name: 'Sign out' }).first().isVisible(), {
      timeout: 15_000,
    })
    .toBe(true);
  return { context, page };
}

/** Text of every script the page loaded, to see which code reached the browser. */
function collectScripts(page: Page): string[] {
  const bodies: string[] = [];
  page.on('response', async (response) => {
    if (response.request().resourceType() !== 'script') return;
    try {
      bodies.push(await response.text());
    } catch {
      // a script cut short by navigation has nothing to read
    }
  });
  return bodies;
}

const shows = (page: Page, text: string | RegExp) =>
  expect.poll(() => page.getByText(text).first().isVisible(), { timeout: 15_000 }).toBe(true);

describe('the workshop reviews and signs off a run', () => {
  it('technician finds the submitted run first, reads chart and reasons, signs off and gets the certificate', async () => {
    const { context, page } = await signedIn(TECHNICIAN, DESKTOP);
    try {
      await page.getByRole('link', { name: 'Runs', exact: true }).first().click();
      await expect
        .poll(() => page.getByRole('heading', { level: 1, name: 'Runs' }).isVisible(), {
          timeout: 15_000,
        })
        .toBe(true);
      const firstRow = page.locator('table tbody tr').first();
      await expect.poll(() => firstRow.textContent(), { timeout: 15_000 }).toContain('Skua');
      expect(await firstRow.textContent()).toContain('Submitted for review');
      await keepScreenshot(page, 'runs-board-desktop');

      await firstRow.getByRole('link', { name: /Skua/ }).click();
      await expect
        .poll(() => page.getByRole('heading', { level: 1 }).textContent(), { timeout: 15_000 })
        .toContain('Skua');
      await shows(
        page,
        'Full throttle was held for 1 min 35 s; this phase allows at most 1 min at a time.',
      );
      const chart = page.getByRole('img', {
        name: /Chart of engine speed for Below three-quarter throttle/,
      });
      await expect
        .poll(() => chart.locator('svg.recharts-surface').count(), { timeout: 15_000 })
        .toBe(1);
      expect(await chart.getByText('▲ rule broken').count()).toBeGreaterThan(0);
      expect(await page.getByText(/stretch that broke a rule is hatched/).count()).toBe(1);
      await keepScreenshot(page, 'run-review-desktop');

      await page
        .getByLabel('Comments', { exact: true })
        .fill(
          'One long burst clearing ferry wash; acceptable. Oil and tell-tale checked at the yard.',
        );
      await page.getByRole('button', { name: 'Sign off the run' }).click();
      await shows(page, /^Signed off\. Certificate TMW-2026-\d{4}-\d issued\.$/);
      await shows(page, 'The skipper was e-mailed (sunniva@skipper.example).');

      const [download] = await Promise.all([
        page.waitForEvent('download'),
        page.getByRole('link', { name: 'Download the certificate (PDF)' }).click(),
      ]);
      expect(download.suggestedFilename()).toMatch(/^break-in-certificate-TMW-2026-\d{4}-\d\.pdf$/);
      const saved = await download.path();
      expect(fs.readFileSync(saved).subarray(0, 5).toString()).toBe('%PDF-');
      await keepScreenshot(page, 'run-review-signed-off-desktop');
    } finally {
      await context.close();
    }
  });

  it('the certificate e-mail shows in the local mailbox for a manager', async () => {
    const { context, page } = await signedIn(MANAGER, DESKTOP);
    try {
      await page.goto('/dev/mail');
      await shows(page, /Break-in signed off: Skua, single engine/);
      expect(
        await page
          .getByRole('link', { name: /^break-in-certificate-TMW-2026-\d{4}-\d\.pdf$/ })
          .count(),
      ).toBeGreaterThan(0);
      await keepScreenshot(page, 'dev-mail-desktop');
    } finally {
      await context.close();
    }
  });

  it('works on a phone, and the chart library loads on the review page only', async () => {
    const { context, page } = await signedIn(TECHNICIAN, PHONE);
    const scripts = collectScripts(page);
    try {
      await page.goto('/deck');
      await page.waitForLoadState('networkidle');
      await page.goto('/runs?show=all');
      await expect
        .poll(() => page.getByRole('link', { name: /Halcyon Drift/ }).isVisible(), {
          timeout: 15_000,
        })
        .toBe(true);
      await page.waitForLoadState('networkidle');
      expect(scripts.some((s) => s.includes('recharts-surface'))).toBe(false);
      await keepScreenshot(page, 'runs-board-phone');

      await page
        .getByRole('link', { name: /Halcyon Drift/ })
        .first()
        .click();
      await shows(page, 'Download the certificate (PDF)');
      await expect
        .poll(() => page.locator('svg.recharts-surface').count(), { timeout: 15_000 })
        .toBeGreaterThan(0);
      expect(scripts.some((s) => s.includes('recharts-surface'))).toBe(true);
      await keepScreenshot(page, 'run-review-phone');
    } finally {
      await context.close();
    }
  });
});
