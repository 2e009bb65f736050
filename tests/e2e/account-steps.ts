import type { Page } from 'playwright-core';
import { expect } from 'vitest';
import { visible } from './whole-job-deck.js';
import { waitForHome } from './whole-job-steps.js';

/* Steps of the account tests: the Team page's invite, the local mailbox, the people list. */

/** The manager invites a member of staff from the Team page; returns the link shown on screen. */
export async function inviteStaff(page: Page, email: string): Promise<string> {
  await page.goto('/team');
  await waitForHome(page, 'Team');
  const form = page.locator('form');
  await form.getByLabel('E-mail').fill(email);
  await form.getByLabel('Role').selectOption('technician');
  await form.getByRole('button', { name: 'Send invite' }).click();
  const shown = page.getByRole('status').filter({ hasText: `Invite created for ${email}` });
  await visible(shown);
  return new URL(await shown.getByLabel('Invite link').inputValue()).pathname;
}

/** The newest e-mail to `to` in the local mailbox, read by a manager; the first link in it. */
export async function linkFromMailbox(page: Page, to: string, pattern: RegExp): Promise<string> {
  await page.goto('/dev/mail');
  await waitForHome(page, 'Local mailbox');
  const mail = page.locator('details').filter({ hasText: to }).first();
  await visible(mail);
  const text = (await mail.locator('pre').textContent()) ?? '';
  const link = pattern.exec(text)?.[0];
  expect(link, text).toBeTruthy();
  return new URL(link!).pathname;
}

/** One person's row of the People list, opened at "Manage". */
export async function managePerson(page: Page, name: string) {
  await page.goto('/team');
  await waitForHome(page, 'Team');
  const row = page
    .getByRole('list', { name: 'People of the workshop' })
    .getByRole('listitem')
    .filter({ hasText: name });
  await visible(row);
  await row.getByText(`Manage ${name}`).click();
  return row;
}

/** A page that must have been sent to sign-in (its session ended elsewhere). */
export async function expectSignedOut(page: Page) {
  await page.goto('/');
  await visible(page.getByRole('heading', { level: 1, name: 'Sign in to Ringseat' }));
}
