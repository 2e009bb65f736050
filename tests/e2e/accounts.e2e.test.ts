import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, inject, it } from 'vitest';
import {
  DESKTOP,
  keepScreenshot,
  launchBrowser,
  newContext,
  PHONE,
  signIn,
} from '../helpers/browser.js';
import { expectSignedOut, inviteStaff, linkFromMailbox, managePerson } from './account-steps.js';
import { visible } from './whole-job-deck.js';
import { waitForHome } from './whole-job-steps.js';

/*
 * Accounts through the screens only: a manager invites a new technician, who changes their
 * password, signs out everywhere, forgets it and resets it by e-mail; the manager then changes
 * their role, deactivates them (their open session ends) and lets them back. The person is new,
 * so the demo accounts the other browser tests sign in with stay as they are.
 */

const baseURL = inject('baseURL');
const LENA = { email: 'lena.fairlead@tidewright.example', name: 'Lena Fairlead' };
const FIRST = 'gulls over the slipway at noon';
const SECOND = 'tarred rope and a brass cleat';
const THIRD = 'fog horn beyond the outer mole';
let browser: Browser;
let manager: Page;

const openPage = async (device: object) => (await newContext(browser, baseURL, device)).newPage();

beforeAll(async () => {
  browser = await launchBrowser();
});

/** The manager's desktop, signed in once (inside a test: waiting on screens polls). */
async function managerPage(): Promise<Page> {
  if (manager) return manager;
  manager = await openPage(DESKTOP);
  await signIn(manager, 'maren@tidewright.example');
  await waitForHome(manager, 'Workshop');
  return manager;
}
afterAll(() => browser?.close());

describe('a person’s own account', () => {
  it('is joined by invite, its password changed, every device signed out, and reset by e-mail', async () => {
    await managerPage();
    const path = await inviteStaff(manager, LENA.email);
    const phone = await openPage(PHONE);
    await phone.goto(path);
    await phone.getByLabel('Your name').fill(LENA.name);
    await phone.getByLabel('Password').fill('password12345');
    await phone.getByRole('button', { name: 'Set password and sign in' }).click();
    await visible(phone.getByText(/too easy to guess/));
    await phone.getByLabel('Password').fill(FIRST);
    await phone.getByRole('button', { name: 'Set password and sign in' }).click();
    await waitForHome(phone, 'Workshop');

    await phone.getByRole('link', { name: /Lena Fairlead · Technician/ }).click();
    await waitForHome(phone, 'Your account');
    await phone.getByLabel('Current password').fill('not my password');
    await phone.getByLabel('New password').fill(SECOND);
    await phone.getByRole('button', { name: 'Change password' }).click();
    await visible(phone.getByText('This is not your current password.'));
    await phone.getByLabel('Current password').fill(FIRST);
    await phone.getByRole('button', { name: 'Change password' }).click();
    await visible(phone.getByText(/Password changed\. Every other device was signed out/));
    await keepScreenshot(phone, 'account-phone');

    const laptop = await openPage(DESKTOP);
    await signIn(laptop, LENA.email, SECOND);
    await waitForHome(laptop, 'Workshop');
    await laptop.goto('/account');
    await visible(laptop.getByText('Signed in on this device and 1 other.'));
    await keepScreenshot(laptop, 'account-desktop');
    await laptop.getByRole('button', { name: 'Sign out everywhere' }).click();
    await laptop.getByRole('button', { name: 'Yes, sign out on every device' }).click();
    await visible(laptop.getByRole('heading', { level: 1, name: 'Sign in to Ringseat' }));
    await expectSignedOut(phone);

    await phone.getByRole('link', { name: 'Forgot your password?' }).click();
    await phone.getByLabel('E-mail').fill(LENA.email);
    await phone.getByRole('button', { name: 'E-mail me a link' }).click();
    await visible(phone.getByText(/a link to choose a new password is on its way/));
    await keepScreenshot(phone, 'account-forgot-phone');
    const reset = await linkFromMailbox(manager, LENA.email, /https?:\/\/\S+\/reset-password\/\S+/);
    await phone.goto(reset);
    await visible(phone.getByText(LENA.email));
    await phone.getByLabel('New password').fill(THIRD);
    await phone.getByRole('button', { name: 'Save and sign in' }).click();
    await waitForHome(phone, 'Workshop');
    await phone.goto(reset);
    await visible(phone.getByText(/This reset link has been used/));
  });
});

describe('the manager and the team', () => {
  it('changes a role, deactivates a person whose session then ends, and reactivates them', async () => {
    await managerPage();
    const phone = await openPage(PHONE);
    await signIn(phone, LENA.email, THIRD);
    await waitForHome(phone, 'Workshop');

    let row = await managePerson(manager, LENA.name);
    await row.getByLabel(`Role of ${LENA.name}`).selectOption('manager');
    await row.getByRole('button', { name: 'Save role' }).click();
    await visible(row.getByText('Manager', { exact: true }));
    await phone.goto('/team');
    await waitForHome(phone, 'Team');
    await visible(phone.getByRole('heading', { name: 'Invite someone' }));

    row = await managePerson(manager, LENA.name);
    await row.getByRole('button', { name: 'Deactivate…' }).click();
    await keepScreenshot(manager, 'team-deactivate-desktop');
    await row.getByRole('button', { name: `Deactivate ${LENA.name}` }).click();
    await visible(row.getByText('Deactivated', { exact: true }));
    await expectSignedOut(phone);
    await signIn(phone, LENA.email, THIRD);
    await visible(phone.getByText('The e-mail address or the password is not right.'));

    const history = manager.getByRole('list', { name: 'Account changes' });
    await visible(history.getByText(/Deactivated/));
    await visible(history.getByText(/technician → manager/));
    row = await managePerson(manager, LENA.name);
    await row.getByRole('button', { name: `Reactivate ${LENA.name}` }).click();
    await visible(manager.getByRole('list', { name: 'Account changes' }).getByText('Reactivated'));
    await signIn(phone, LENA.email, THIRD);
    await waitForHome(phone, 'Workshop');
  });

  it('withdraws an invite and sends it again with a new link', async () => {
    await managerPage();
    const email = 'pier.hand@tidewright.example';
    const first = await inviteStaff(manager, email);
    const invite = manager
      .getByRole('list', { name: 'Pending invites' })
      .getByRole('listitem')
      .filter({ hasText: email });
    await invite.getByRole('button', { name: 'Withdraw invite' }).click();
    await visible(invite.getByText('Withdrawn', { exact: true }));
    const phone = await openPage(PHONE);
    await phone.goto(first);
    await visible(phone.getByText(/withdrawn by the workshop/));

    await invite.getByRole('button', { name: 'Send again' }).click();
    const link = invite.getByLabel('Invite link');
    await visible(link);
    const second = new URL(await link.inputValue()).pathname;
    await phone.goto(second);
    await visible(phone.getByText(/invites you as a technician/));
    await keepScreenshot(phone, 'team-invite-again-phone');
  });
});
