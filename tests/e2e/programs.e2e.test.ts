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

const BUILT_IN = 'Four-stroke outboard, about 10 hours';
// Unique per run: the e2e server's database is shared by every file and survives reruns of this one.
const copyName = `Tidewright outboard ${Date.now().toString(36)}`;

const visible = (page: Page, text: string) =>
  page.getByText(text, { exact: true }).first().isVisible();

async function openPrograms(page: Page) {
  await page.getByRole('link', { name: 'Programs', exact: true }).first().click();
  await expect
    .poll(() => page.getByRole('heading', { level: 1, name: 'Break-in programs' }).isVisible(), {
      timeout: 15_000,
    })
    .toBe(true);
}

describe('break-in programs', () => {
  it('a manager copies the built-in outboard program, edits and saves it; a technician assigns it', async () => {
    const desk = await newContext(browser, baseURL, DESKTOP);
    const page = await desk.newPage();
    try {
      await signIn(page, 'maren@tidewright.example');
      await expect
        .poll(() => page.getByRole('heading', { level: 1, name: 'Workshop' }).isVisible(), {
          timeout: 15_000,
        })
        .toBe(true);
      await openPrograms(page);
      await keepScreenshot(page, 'programs-list-desktop');

      await page.getByRole('button', { name: `Copy ${BUILT_IN}`, exact: true }).click();
      await expect
        .poll(() => page.getByRole('button', { name: 'Save program' }).isVisible(), {
          timeout: 15_000,
        })
        .toBe(true);
      await page.getByLabel('Program name').fill(copyName);
      const second = page.getByRole('region', { name: 'Phase 2', exact: true });
      const minutes = second.getByLabel('Required minutes in band');
      const newMinutes = String(Number(await minutes.inputValue()) + 30);
      await minutes.fill(newMinutes);
      await page.getByRole('button', { name: 'Save program' }).click();
      await expect.poll(() => visible(page, 'Program saved.'), { timeout: 15_000 }).toBe(true);

      await page.reload();
      await expect
        .poll(() => page.getByRole('heading', { level: 1, name: copyName }).isVisible(), {
          timeout: 15_000,
        })
        .toBe(true);
      expect(
        await page
          .getByRole('region', { name: 'Phase 2', exact: true })
          .getByLabel('Required minutes in band')
          .inputValue(),
      ).toBe(newMinutes);
      await keepScreenshot(page, 'program-edit-desktop');
    } finally {
      await desk.close();
    }

    const phone = await newContext(browser, baseURL, PHONE);
    const tech = await phone.newPage();
    try {
      await signIn(tech, 'ivo@tidewright.example');
      await expect
        .poll(() => tech.getByRole('heading', { level: 1, name: 'Workshop' }).isVisible(), {
          timeout: 15_000,
        })
        .toBe(true);
      await openPrograms(tech);
      await expect
        .poll(() => tech.getByRole('link', { name: copyName }).count(), { timeout: 15_000 })
        .toBe(1);
      expect(await tech.getByRole('button', { name: `Copy ${BUILT_IN}` }).count()).toBe(0);
      await keepScreenshot(tech, 'programs-list-phone');

      await tech.goto('/vessels');
      await tech.getByRole('link', { name: 'Gannet', exact: true }).first().click();
      await tech.getByRole('link', { name: 'Single · Norrvik NV-60 4S' }).first().click();
      const card = tech.getByRole('region', { name: 'Assign break-in program' });
      // The database outlives a rerun, and another e2e file may have assigned Gannet: a planned
      // run is cancelled through the card (with a reason); a run already under way stays.
      const option = card.getByRole('option', { name: copyName });
      const cancel = card.getByRole('button', { name: 'Cancel this run' });
      const underWay = card.getByText(/This engine\u2019s break-in on/);
      await expect
        .poll(
          async () =>
            (await option.count()) + (await cancel.count()) + (await underWay.count()) > 0,
          { timeout: 15_000 },
        )
        .toBe(true);
      if (await cancel.count()) {
        await cancel.click();
        await card.getByLabel('Reason for cancelling').fill('Assigned again by the program test.');
        await card.getByRole('button', { name: 'Cancel the run' }).click();
        await expect.poll(() => option.count(), { timeout: 15_000 }).toBe(1);
      }
      if (await option.count()) {
        await card.getByLabel('Break-in program').selectOption({ label: copyName });
        await card.getByRole('button', { name: 'Assign program' }).click();
        await expect
          .poll(() => card.getByText('Run created.').count(), { timeout: 15_000 })
          .toBe(1);
        expect(await card.getByRole('link', { name: 'Open the run' }).getAttribute('href')).toMatch(
          /^\/runs\/[0-9a-f-]{36}\/review$/,
        );
      }
      await keepScreenshot(tech, 'engine-assign-program-phone');
    } finally {
      await phone.close();
    }
  });
});
