import type { Page } from 'playwright-core';
import { expect } from 'vitest';
import { visible } from './whole-job-deck.js';
import { openVessel, waitForHome } from './whole-job-steps.js';

/*
 * The workshop's people and decisions: the manager's invite read back from the local mailbox,
 * both engines decided on the one page, and the first service recorded on the engine page.
 */

/** The Team page's invite, for a skipper linked to the vessel; returns the link from the e-mail. */
export async function inviteSkipper(page: Page, email: string, vesselName: string) {
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Team' }).click();
  await waitForHome(page, 'Team');
  // The "Invite someone" card is the page's only form.
  const card = page.locator('form');
  const vessel = card.getByRole('checkbox', { name: vesselName, exact: true });
  // The technician added the vessel after the manager signed in: the page reads the list afresh.
  await visible(vessel);
  await card.getByLabel('E-mail').fill(email);
  await card.getByLabel('Role').selectOption('skipper');
  await card.locator('label').filter({ hasText: vesselName }).click();
  expect(await vessel.isChecked()).toBe(true);
  await card.getByRole('button', { name: 'Send invite' }).click();
  await visible(page.getByRole('status').filter({ hasText: `Invite created for ${email}` }));
  const outgoing = page
    .getByRole('region', { name: 'Outgoing e-mail' })
    .getByRole('listitem')
    .filter({ hasText: `To ${email}` });
  await visible(outgoing);
  expect(await outgoing.textContent()).toContain('Sent');

  await page.goto('/dev/mail');
  await waitForHome(page, 'Local mailbox');
  const mail = page.locator('details').filter({ hasText: email }).first();
  await visible(mail);
  const text = (await mail.locator('pre').textContent()) ?? '';
  expect(text).toContain(vesselName);
  const link = /https?:\/\/\S+\/invite\/\S+/.exec(text)?.[0];
  expect(link).toBeTruthy();
  return new URL(link!).pathname;
}

/** The invite link opened on the skipper's phone: name, password, signed in on their vessels. */
export async function acceptInvite(page: Page, path: string, name: string, password: string) {
  await page.goto(path);
  await visible(page.getByText(/invites you as a skipper\. You will sign in with/));
  await page.getByLabel('Your name').fill(name);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Set password and sign in' }).click();
  await waitForHome(page, 'Your vessels');
}

export type Decision =
  { choice: 'return'; phase: string; comments: string } | { choice: 'confirm'; comments: string };

/** The vessel page's "Decide both engines" link. */
export async function openDecide(page: Page, vesselName: string, vesselId: string) {
  await openVessel(page, vesselName);
  const link = page.getByRole('link', { name: 'Decide both engines' });
  // The technician saw this page before the resubmit: it is read afresh on the visit.
  await visible(page.getByText('2 engines of', { exact: false }));
  await link.click();
  await expect.poll(() => new URL(page.url()).pathname).toBe(`/vessels/${vesselId}/decide`);
  await waitForHome(page, 'Decide both engines');
}

/** Fills each engine's region as `decisions` says, saves both at once, and returns the status. */
export async function decideBoth(
  page: Page,
  decisions: Record<'Port' | 'Starboard', Decision>,
  beforeSave: () => Promise<unknown>,
) {
  for (const [position, decision] of Object.entries(decisions)) {
    const region = page.getByRole('region', { name: new RegExp(`^${position} engine`) });
    await visible(region);
    const radio = decision.choice === 'return' ? /^Return to the skipper/ : /^Confirm and sign off/;
    await region.getByRole('radio', { name: radio }).check();
    if (decision.choice === 'return')
      await region
        .getByRole('group', { name: 'Phases to run again' })
        .getByRole('checkbox', { name: decision.phase })
        .check();
    await region.getByRole('textbox', { name: 'Comments' }).fill(decision.comments);
  }
  await beforeSave();
  await page.getByRole('button', { name: 'Save both decisions' }).click();
  const status = page
    .getByRole('status')
    .filter({ hasText: /Port/ })
    .filter({
      hasText: /Starboard/,
    });
  await visible(status, 30_000);
  return (await status.first().textContent()) ?? '';
}

/** The engine page's first-service form, filled and saved; the record then says it was done. */
export async function recordFirstService(page: Page, hourMeter: string, notes: string) {
  const form = page.getByRole('form', { name: 'Record the first service' });
  await visible(form);
  expect(await form.getByLabel('Date').inputValue()).toMatch(/^\d{4}-\d{2}-\d{2}$/);
  await form.getByLabel('Hour meter').fill(hourMeter);
  expect(await form.getByLabel('Done by').inputValue()).toBe('Ivo Brandt');
  await form.getByLabel('Notes').fill(notes);
  await form.getByRole('button', { name: 'Save first service' }).click();
  const done = page.getByText(/^First service done on .+, by Ivo Brandt\.$/).first();
  await visible(done);
  expect(await done.textContent()).toContain(`${hourMeter} h`);
  await visible(page.getByText(notes));
}
