import type { Locator, Page } from 'playwright-core';
import { expect } from 'vitest';

/*
 * The skipper's side of the whole job, on a phone: the deck (outings, readings, a void, the
 * submit) and the run page reached from the Vessels screen. Screens only.
 */

export const visible = (locator: Locator, timeout = 15_000) =>
  expect.poll(() => locator.first().isVisible(), { timeout }).toBe(true);

/** One engine's panel on the deck, named by its position word ("Port", "Starboard"). */
export const enginePanel = (page: Page, position: string) =>
  page.getByRole('region', { name: position, exact: true });

const syncPill = (page: Page) => page.getByRole('button', { name: /^Sync:/ }).first();

export async function pillSays(page: Page, words: RegExp, timeout = 30_000) {
  await expect
    .poll(
      async () =>
        (await syncPill(page)
          .getAttribute('aria-label')
          .catch(() => '')) ?? '',
      {
        timeout,
      },
    )
    .toMatch(words);
}

/** From the main navigation to the vessel's deck, once the app runs from its service worker. */
export async function openDeck(page: Page, vesselName: string) {
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Deck' }).click();
  await page.waitForFunction(() => navigator.serviceWorker?.controller !== null, undefined, {
    timeout: 30_000,
  });
  const go = page.getByRole('link', { name: `Go on deck with ${vesselName}` });
  await visible(go, 30_000);
  await go.click();
  await visible(page.getByRole('heading', { level: 1, name: new RegExp(vesselName) }));
}

export async function startOuting(page: Page) {
  const start = page.getByRole('button', { name: 'Start outing' });
  await expect.poll(() => start.isEnabled().catch(() => false), { timeout: 30_000 }).toBe(true);
  await page.getByText('I have read the cautions').click();
  await start.click();
  await visible(page.getByText('Outing under way'));
}

/** Types a speed, picks the throttle, logs it; `forEngine` is a position word, else both engines. */
export async function logReading(page: Page, rpm: number, throttle: string, forEngine?: string) {
  const target = page.getByRole('radiogroup', { name: 'Reading for' });
  await target
    .getByRole('radio', { name: forEngine ?? 'Both engines', exact: true })
    .click({ timeout: 15_000 });
  await page.getByRole('textbox', { name: 'Engine speed (RPM)' }).fill(String(rpm));
  await page.getByRole('radio', { name: throttle, exact: true }).click();
  await page.getByRole('button', { name: 'Log reading' }).click();
  const words = forEngine
    ? `Logged ${rpm} rpm at ${throttle} for ${forEngine}.`
    : `Logged ${rpm} and ${rpm} rpm at ${throttle} for Port and Starboard.`;
  await visible(page.getByRole('status').filter({ hasText: words }));
}

/** "Recent entries" → the entry → "Void" → "Reason" → "Void entry"; the entry stays, struck through. */
export async function voidEntry(page: Page, position: string, entryWords: string, reason: string) {
  const panel = enginePanel(page, position);
  await panel.getByRole('button', { name: 'Recent entries' }).click();
  const entry = panel
    .getByRole('list', { name: `${position}: recent entries` })
    .getByRole('listitem')
    .filter({ hasText: entryWords });
  await entry.getByRole('button', { name: 'Void' }).click();
  await entry.getByLabel('Reason').fill(reason);
  await entry.getByRole('button', { name: 'Void entry' }).click();
  await visible(entry.getByText(`Voided: ${reason}`));
  expect(await entry.locator('del').textContent()).toContain(entryWords);
}

export async function moveOn(page: Page, position: string, nextPhase: string) {
  const panel = enginePanel(page, position);
  await visible(panel.getByText(`Phase done. Move on to “${nextPhase}”?`));
  await panel.getByRole('button', { name: 'Move on' }).click();
  await visible(panel.getByText(nextPhase, { exact: true }));
}

export const timeInBand = (page: Page, position: string) =>
  enginePanel(page, position).getByTestId('time-in-band').textContent();

export async function allPhasesDone(page: Page) {
  for (const position of ['Port', 'Starboard'])
    await visible(
      enginePanel(page, position).getByText(
        'Every phase has its time in band. End the outing, then finish and submit the run.',
      ),
    );
}

export async function endOuting(page: Page) {
  await page.getByRole('button', { name: 'End outing' }).click();
  await page.getByRole('button', { name: 'Yes, end it' }).click();
  await visible(page.getByRole('button', { name: 'Finish and submit' }));
}

/** "Finish and submit" → the summary (checked by `checkSummary`) → "Submit both engines" → sent. */
export async function submitBoth(
  page: Page,
  screenshot: (page: Page) => Promise<unknown>,
  checkSummary: (summary: Locator) => Promise<void>,
) {
  await page.getByRole('button', { name: 'Finish and submit' }).click();
  const summary = page.getByRole('region', { name: 'Before you submit' });
  await visible(summary);
  for (const position of ['Port', 'Starboard'])
    await visible(
      summary.getByRole('region', { name: `${position}: summary` }).getByText('Run: Complete'),
    );
  await checkSummary(summary);
  const note = summary.getByLabel('Note to the workshop');
  if (await note.count()) await note.fill('Both engines ran together, as the program says.');
  await screenshot(page);
  await summary.getByRole('button', { name: 'Submit both engines' }).click();
  const notices = page.getByRole('list', { name: 'Submissions' }).getByRole('listitem');
  await expect
    .poll(() => notices.filter({ hasText: 'Sent to the workshop.' }).count(), { timeout: 30_000 })
    .toBe(2);
  expect(await page.getByRole('button', { name: 'Log reading' }).count()).toBe(0);
}

/** From the Vessels screen, the run page of the engine with this serial number. */
export async function openRunPage(page: Page, vesselName: string, serial: string) {
  await page
    .getByRole('navigation', { name: 'Main' })
    .getByRole('link', { name: 'Vessels' })
    .click();
  await visible(page.getByRole('heading', { level: 1, name: 'Your vessels' }));
  const engine = page
    .getByRole('list', { name: `Engines of ${vesselName}` })
    .getByRole('listitem')
    .filter({ hasText: serial });
  await engine.getByRole('link', { name: 'Run page' }).click();
  await visible(page.getByRole('heading', { level: 1, name: vesselName }));
  await visible(page.getByText(serial));
}

/** The run page's "State" line. */
export const runState = (page: Page) =>
  page.locator('dt', { hasText: /^State$/ }).locator('xpath=following-sibling::dd[1]');
