import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  DESKTOP,
  keepScreenshot,
  launchBrowser,
  newContext,
  PHONE,
  signIn,
} from '../helpers/browser.js';
import { runDatabaseCommand, startRealServer, type RealServer } from '../helpers/real-server.js';

/* An operator sets up a real workshop for production; its first manager takes over in the browser. */

const PRODUCTION = { NODE_ENV: 'production', LOG_LEVEL: 'warn' };
const MANAGER = { email: 'hedda@skerry.example', password: 'north wind at the slipway' };
let browser: Browser;
let server: RealServer;
let link: string;

beforeAll(async () => {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ringseat-first-run-'));
  const made = runDatabaseCommand(
    'server/cli/create-workshop.ts',
    ['--workshop', 'Skerry Marine Works', '--email', MANAGER.email, '--timezone', 'Europe/Oslo'],
    dir,
    PRODUCTION,
  );
  expect(made.status, made.stderr).toBe(0);
  server = await startRealServer(PRODUCTION, [], dir);
  link = made.stdout.match(/https?:\/\/\S+\/invite\/(\S+)/)![0];
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

describe('the first manager of a new workshop', () => {
  it('opens the link from the command on a phone, sets a password and lands on the workshop', async () => {
    const context = await newContext(browser, server.baseURL, PHONE);
    const page = await context.newPage();
    try {
      await page.goto(new URL(link).pathname);
      await expect
        .poll(() => page.getByText('Skerry Marine Works invites you as a manager').isVisible())
        .toBe(true);
      await keepScreenshot(page, 'first-run-invite-phone');
      await page.getByLabel('Your name').fill('Hedda Lunde');
      await page.getByLabel('Password').fill(MANAGER.password);
      await page.getByRole('button', { name: 'Set password and sign in' }).click();
      await expect
        .poll(() => page.getByRole('heading', { level: 1, name: 'Workshop' }).isVisible(), {
          timeout: 15_000,
        })
        .toBe(true);
      await keepScreenshot(page, 'first-run-home-phone');
    } finally {
      await context.close();
    }
  });

  it('signs in on a desktop and finds themself alone on the team, with no demo people', async () => {
    const context = await newContext(browser, server.baseURL, DESKTOP);
    const page = await context.newPage();
    try {
      await signIn(page, MANAGER.email, MANAGER.password);
      await page.getByRole('link', { name: 'Team', exact: true }).first().click();
      await expect.poll(() => page.getByText(MANAGER.email).first().isVisible()).toBe(true);
      expect(await page.getByText('maren@tidewright.example').count()).toBe(0);
      await keepScreenshot(page, 'first-run-team-desktop');
    } finally {
      await context.close();
    }
  });
});
