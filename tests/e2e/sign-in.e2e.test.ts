import type { Browser } from 'playwright-core';
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

const roles = [
  {
    role: 'manager',
    email: 'maren@tidewright.example',
    heading: 'Workshop',
    nav: ['Workshop', 'Team'],
  },
  { role: 'technician', email: 'ivo@tidewright.example', heading: 'Workshop', nav: ['Workshop'] },
  { role: 'skipper', email: 'sunniva@skipper.example', heading: 'Your vessels', nav: ['Vessels'] },
] as const;

describe('signing in as each demo role', () => {
  for (const { role, email, heading, nav } of roles) {
    for (const [size, device] of [
      ['desktop', DESKTOP],
      ['phone', PHONE],
    ] as const) {
      it(`${role} on ${size} lands on the ${heading} home, and can sign out`, async () => {
        const context = await newContext(browser, baseURL, device);
        const page = await context.newPage();
        try {
          await signIn(page, email);
          await expect
            .poll(() => page.getByRole('heading', { level: 1, name: heading }).isVisible(), {
              timeout: 15_000,
            })
            .toBe(true);
          for (const label of nav)
            expect(
              await page.getByRole('link', { name: label, exact: true }).count(),
            ).toBeGreaterThan(0);
          if (role !== 'manager')
            expect(await page.getByRole('link', { name: 'Team', exact: true }).count()).toBe(0);
          await keepScreenshot(page, `home-${role}-${size}`);
          await page.getByRole('button', { name: 'Sign out' }).first().click();
          await expect
            .poll(() => page.getByRole('heading', { name: 'Sign in to Ringseat' }).isVisible(), {
              timeout: 10_000,
            })
            .toBe(true);
        } finally {
          await context.close();
        }
      });
    }
  }

  it('shows the skipper their own boats with engine details', async () => {
    const context = await newContext(browser, baseURL, PHONE);
    const page = await context.newPage();
    try {
      await signIn(page, 'tomas@skipper.example');
      await expect
        .poll(() => page.getByText('Halcyon Drift').first().isVisible(), { timeout: 15_000 })
        .toBe(true);
      expect(await page.getByText('B321-D-77841').count()).toBeGreaterThan(0);
      expect(await page.getByText('Blue Tern').count()).toBe(0);
    } finally {
      await context.close();
    }
  });

  it('says so plainly when the password is wrong', async () => {
    const context = await newContext(browser, baseURL, PHONE);
    const page = await context.newPage();
    try {
      await signIn(page, 'ivo@tidewright.example', 'wrong-password');
      await expect
        .poll(() => page.getByRole('alert').filter({ hasText: 'not right' }).isVisible(), {
          timeout: 10_000,
        })
        .toBe(true);
    } finally {
      await context.close();
    }
  });

  it('sends a visitor who is not signed in to the sign-in page', async () => {
    const context = await newContext(browser, baseURL);
    const page = await context.newPage();
    try {
      await page.goto('/team');
      await expect
        .poll(() => page.getByRole('heading', { name: 'Sign in to Ringseat' }).isVisible(), {
          timeout: 10_000,
        })
        .toBe(true);
    } finally {
      await context.close();
    }
  });
});
