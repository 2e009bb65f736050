import fs from 'node:fs';
import type { Browser, BrowserContext, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, inject, it } from 'vitest';
import {
  DESKTOP,
  keepScreenshot,
  launchBrowser,
  newContext,
  PHONE,
  signIn,
} from '../helpers/browser.js';
import {
  acceptInvite,
  decideBoth,
  inviteSkipper,
  openDecide,
  recordFirstService,
} from './whole-job-decide.js';
import {
  allPhasesDone,
  enginePanel,
  endOuting,
  logReading,
  moveOn,
  openDeck,
  openRunPage,
  pillSays,
  runState,
  startOuting,
  submitBoth,
  timeInBand,
  visible,
  voidEntry,
} from './whole-job-deck.js';
import {
  addTwinOutboards,
  addVessel,
  assignProgram,
  BELOW_HALF,
  BELOW_THREE_QUARTER,
  completeChecklist,
  createShortProgram,
  openEngine,
  waitForHome,
} from './whole-job-steps.js';

/*
 * The whole job through the screens, as the people doing it would: the workshop sets up a
 * twin-outboard boat, the skipper runs the break-in on a phone (partly offline), the workshop
 * returns it with a phase to run again, the skipper re-runs and resubmits, the workshop signs
 * both engines off, the skipper downloads the certificate and the workshop records the first
 * service. No call to the API and no prepared state: the shared e2e database only lends the
 * demo workshop and its two staff logins, and everything else is made here under unique names.
 */
const baseURL = inject('baseURL');
const stamp = Date.now().toString(36).toUpperCase();
const job = {
  program: `Short outboard ${stamp}`,
  vessel: `Storm Petrel ${stamp}`,
  vesselId: '',
  serials: { port: `KP-${stamp}`, starboard: `KS-${stamp}` },
  skipper: { email: `petrel-${stamp.toLowerCase()}@skipper.example`, name: 'Ragna Holm' },
  password: 'petrel sails at dawn',
};
const PORT = 'Port · Kestrel K150 4S';
const STARBOARD = 'Starboard · Kestrel K150 4S';
// The demo workshop's certificate numbers: prefix, year, sequence, check digit.
const CERTIFICATE = /TMW-\d{4}-\d{4}-\d/;
const RETURN_PORT =
  'The speed hardly changed below half throttle: run that phase again, varying it.';
const RETURN_STARBOARD = 'Run the three-quarter phase again, changing speed more often.';

let browser: Browser;
let workshop: { tech: Page; manager: Page };
let phone: { context: BrowserContext; page: Page };
const contexts: BrowserContext[] = [];

async function staffPage(email: string, clockBackMinutes = 0) {
  const context = await newContext(browser, baseURL, DESKTOP);
  contexts.push(context);
  if (clockBackMinutes > 0)
    await context.clock.install({ time: Date.now() - clockBackMinutes * 60_000 });
  const page = await context.newPage();
  await signIn(page, email);
  await waitForHome(page, 'Workshop');
  return page;
}

beforeAll(async () => {
  browser = await launchBrowser();
  const context = await newContext(browser, baseURL, PHONE);
  contexts.push(context);
  // The phone's first outings happened half an hour ago: the workshop's return, made later on
  // the server's clock, then sets that time aside, as it would for a boat back from sea.
  await context.clock.install({ time: Date.now() - 30 * 60_000 });
  phone = { context, page: await context.newPage() };
}, 120_000);

// Each step builds on the one before: after a failure the rest are skipped, and every open
// screen is kept as it was for whoever reads the failure.
let failedStep = false;
beforeEach((context) => {
  if (failedStep) context.skip();
  context.onTestFailed(async () => {
    failedStep = true;
    const pages = contexts.flatMap((c) => c.pages());
    for (const [i, page] of pages.entries())
      await keepScreenshot(page, `whole-job-failed-${i}`).catch(() => undefined);
  });
});

afterAll(async () => {
  for (const context of contexts) await context.close();
  await browser?.close();
});

/** Distinct certificate numbers on the page. */
const certificatesOn = async (page: Page) =>
  new Set((await page.locator('main').innerText()).match(new RegExp(CERTIFICATE, 'g')) ?? []);

describe('the whole job, through the screens only', () => {
  it('1. the workshop sets up twin outboards: program, vessel, engines, checklists, runs', async () => {
    // Technician and manager each at their own desk: two browsers' worth of cookies.
    workshop = {
      // The dock run came first, an hour ago, before the skipper's outing (see beforeAll).
      tech: await staffPage('ivo@tidewright.example', 60),
      manager: await staffPage('maren@tidewright.example'),
    };
    await createShortProgram(workshop.manager, job.program);
    const tech = workshop.tech;
    job.vesselId = await addVessel(tech, job.vessel);
    await addTwinOutboards(tech, job.serials);
    for (const engine of [PORT, STARBOARD]) {
      await openEngine(tech, job.vessel, engine);
      await completeChecklist(tech, engine);
      await assignProgram(tech, job.program);
    }
    await keepScreenshot(tech, 'whole-job-engine-assigned-desktop');
  }, 240_000);

  it('2. the technician runs the workshop phase at the dock on deck, for both engines', async () => {
    const tech = workshop.tech;
    await openDeck(tech, job.vessel);
    await startOuting(tech);
    await logReading(tech, 800, 'idle'); // inside the dock run's 0–3000 rpm at idle (built-in program, common practice)
    await tech.clock.fastForward(65_000);
    await moveOn(tech, 'Port', BELOW_HALF);
    await moveOn(tech, 'Starboard', BELOW_HALF);
    await keepScreenshot(tech, 'whole-job-dock-run-desktop');
    await endOuting(tech);
    await pillSays(tech, /All synced/);
  }, 120_000);

  it('3. the manager invites the skipper, who accepts on the phone', async () => {
    const path = await inviteSkipper(workshop.manager, job.skipper.email, job.vessel);
    await acceptInvite(phone.page, path, job.skipper.name, job.password);
    const engines = phone.page.getByRole('list', { name: `Engines of ${job.vessel}` });
    await visible(engines.getByText(job.serials.port));
    await visible(engines.getByText(job.serials.starboard));
  }, 120_000);

  it('4. the skipper runs the remaining phases on deck, offline for part of it, voids a slip, submits', async () => {
    const { page } = phone;
    await openDeck(page, job.vessel);
    await startOuting(page);
    await firstPhaseOutOfSignal();
    await logReading(page, 3500, 'three-quarter throttle'); // inside 0–4500: ¾ of the rated 6000
    await page.clock.fastForward(65_000);
    await allPhasesDone(page);
    await keepScreenshot(page, 'whole-job-deck-running-phone');
    await endOuting(page);
    await submitBoth(
      page,
      (p) => keepScreenshot(p, 'whole-job-submit-summary-phone'),
      async (summary) => {
        const voided = summary.getByRole('region', { name: 'Port: summary' });
        await visible(voided.getByText(/5200 rpm at half throttle/));
      },
    );
    await pillSays(page, /All synced/);
  }, 240_000);

  it('5. the technician returns both engines from one page, each with a phase to run again', async () => {
    const tech = workshop.tech;
    await openDecide(tech, job.vessel, job.vesselId);
    // The same page on a phone at the dock: the engines one above the other.
    await tech.setViewportSize(PHONE.viewport);
    await visible(tech.getByRole('button', { name: 'Save both decisions' }));
    await keepScreenshot(tech, 'whole-job-decide-phone');
    await tech.setViewportSize(DESKTOP.viewport);
    const saved = await decideBoth(
      tech,
      {
        Port: { choice: 'return', phase: BELOW_HALF, comments: RETURN_PORT },
        Starboard: { choice: 'return', phase: BELOW_THREE_QUARTER, comments: RETURN_STARBOARD },
      },
      () => keepScreenshot(tech, 'whole-job-decide-return-form-desktop'),
    );
    expect(saved).toContain('Port engine: returned to the skipper.');
    expect(saved).toContain('Starboard engine: returned to the skipper.');
    expect(saved).toContain(`The skipper was e-mailed (${job.skipper.email}).`);
    await keepScreenshot(tech, 'whole-job-decide-returned-desktop');
  }, 120_000);

  it('6. the skipper reads why on the phone, re-runs the phases sent back and resubmits', async () => {
    const { page } = phone;
    // Back in signal, the phone's clock is right again (the outing is after the return).
    await page.clock.setSystemTime(Date.now());
    await openRunPage(page, job.vessel, job.serials.port);
    await expect.poll(() => runState(page).textContent()).toBe('Returned to skipper');
    const rerun = page.getByRole('region', { name: /Returned: phases to run again/ });
    await visible(rerun.getByText(BELOW_HALF));
    await visible(page.getByText(RETURN_PORT));

    await page.getByRole('link', { name: 'On deck' }).click();
    await checkReturnedNotice(page, 'Port', RETURN_PORT, BELOW_HALF);
    await checkReturnedNotice(page, 'Starboard', RETURN_STARBOARD, BELOW_THREE_QUARTER);
    await keepScreenshot(page, 'whole-job-returned-notice-phone');
    expect(await timeInBand(page, 'Port')).toBe('0:00:00'); // earlier time set aside

    await startOuting(page);
    await logReading(page, 2500, 'half throttle'); // inside both phases' bands and ceilings
    await page.clock.fastForward(65_000);
    await allPhasesDone(page);
    await endOuting(page);
    await submitBoth(
      page,
      (p) => keepScreenshot(p, 'whole-job-resubmit-phone'),
      async (s) => {
        await visible(s.getByText(/logged before the workshop sent it back/));
      },
    );
  }, 180_000);

  it('7. the technician signs off both engines from one page and sees two certificates', async () => {
    const tech = workshop.tech;
    await openDecide(tech, job.vessel, job.vesselId);
    const signOff = { choice: 'confirm', comments: 'Re-run logged cleanly. Signed off.' } as const;
    const saved = await decideBoth(tech, { Port: signOff, Starboard: signOff }, () =>
      keepScreenshot(tech, 'whole-job-decide-sign-off-form-desktop'),
    );
    for (const position of ['Port', 'Starboard'])
      expect(saved).toMatch(
        new RegExp(`${position} engine: signed off, certificate ${CERTIFICATE.source}\\.`),
      );
    await expect.poll(async () => (await certificatesOn(tech)).size, { timeout: 15_000 }).toBe(2);
    expect(await tech.getByRole('link', { name: /certificate \(PDF\)$/ }).count()).toBe(2);
    await keepScreenshot(tech, 'whole-job-decide-signed-off-desktop');
  }, 120_000);

  it('8. the skipper downloads the certificate from the run page', async () => {
    const { page } = phone;
    await openRunPage(page, job.vessel, job.serials.port);
    await expect.poll(() => runState(page).textContent()).toBe('Signed off');
    const certificate = page.getByRole('region', { name: 'Certificate', exact: true });
    await visible(certificate.getByText(CERTIFICATE));
    const number = CERTIFICATE.exec((await certificate.textContent()) ?? '')![0];
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      certificate.getByRole('link', { name: 'Download the certificate' }).click(),
    ]);
    expect(download.suggestedFilename()).toBe(`break-in-certificate-${number}.pdf`);
    expect(
      fs
        .readFileSync(await download.path())
        .subarray(0, 5)
        .toString(),
    ).toBe('%PDF-');
    await keepScreenshot(page, 'whole-job-certificate-phone');
  }, 120_000);

  it('9. the technician records the first service on the engine page', async () => {
    const tech = workshop.tech;
    await openEngine(tech, job.vessel, PORT);
    await visible(tech.getByText('Signed off'));
    // 20 h or 1 month after commissioning at 0.5 h, the program's first service (common
    // practice, BoatUS, as the built-in program says).
    await visible(
      tech.getByText(/^Due at 20\.5 h on the hour meter or on .+, whichever comes first\.$/),
    );
    await recordFirstService(tech, '20.3', 'Oil and filter, gearcase oil, anodes checked.');
    await keepScreenshot(tech, 'whole-job-engine-record-desktop');
  }, 120_000);
});

/**
 * The first phase: a reading, then the signal goes and the app is reloaded mid-outing; logging
 * goes on, a slip of the finger on the port engine is voided, both engines move on, and once the
 * signal is back everything logged meanwhile is sent.
 */
async function firstPhaseOutOfSignal() {
  const { page, context } = phone;
  await logReading(page, 2500, 'half throttle'); // inside 0–3000 rpm: half of the rated 6000
  await page.clock.fastForward(30_000);
  await context.setOffline(true);
  await page.reload();
  await visible(page.getByText('Outing under way'));
  const held = await timeInBand(page, 'Port');
  expect(held).toMatch(/^0:00:[23]\d$/); // the 30 s logged before the reload
  await logReading(page, 2600, 'half throttle');
  await logReading(page, 5200, 'half throttle', 'Port'); // 2500 typed with the digits swapped
  await voidEntry(page, 'Port', '5200 rpm at half throttle', 'Typed 5200, meant 2500');
  await pillSays(page, /waiting/);
  await page.clock.fastForward(40_000);
  await moveOn(page, 'Port', BELOW_THREE_QUARTER);
  await moveOn(page, 'Starboard', BELOW_THREE_QUARTER);
  await context.setOffline(false);
  await pillSays(page, /All synced/);
}

async function checkReturnedNotice(page: Page, position: string, comments: string, phase: string) {
  const notice: Locator = enginePanel(page, position).getByRole('region', {
    name: `${position}: returned by the workshop`,
  });
  await visible(notice, 30_000);
  await visible(notice.getByText(comments));
  await visible(
    notice.getByRole('list', { name: `${position}: phases to run again` }).getByText(phase),
  );
}
