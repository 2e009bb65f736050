import type { Page } from 'playwright-core';
import { expect } from 'vitest';
import { visible } from './whole-job-deck.js';
import { answer, CHECKS } from '../helpers/checklist-screen.js';

/*
 * The workshop's side of the whole job, at a desk: a short program, a vessel with twin
 * outboards, the commissioning checklists, the assignments, the invite, the decisions and the
 * first service. Screens only: every step is a click, a typed value or a read of the page.
 */

export const BUILT_IN = 'Four-stroke outboard, about 10 hours';
export const DOCK_RUN = 'First run at the dock';
export const BELOW_HALF = 'Below half throttle, changing speed';
export const BELOW_THREE_QUARTER = 'Below three-quarter throttle, short full-throttle bursts';

/** The workshop's day as the date field takes it (the e2e machine runs on UTC). */
export const today = () => new Date().toISOString().slice(0, 10);

const mainNav = (page: Page) => page.getByRole('navigation', { name: 'Main' });

export async function waitForHome(page: Page, heading: string) {
  await visible(page.getByRole('heading', { level: 1, name: heading }));
}

/**
 * A manager copies the built-in outboard program and gives each of its three phases (the
 * workshop's dock run, then the skipper's two) a minute, so the whole job runs in minutes of
 * simulated time.
 */
export async function createShortProgram(page: Page, name: string) {
  await mainNav(page).getByRole('link', { name: 'Programs', exact: true }).click();
  await waitForHome(page, 'Break-in programs');
  await page.getByRole('button', { name: `Copy ${BUILT_IN}`, exact: true }).click();
  await visible(page.getByRole('button', { name: 'Save program' }));
  await page.getByLabel('Program name').fill(name);
  for (const [phase, phaseName] of [
    ['Phase 1', DOCK_RUN],
    ['Phase 2', BELOW_HALF],
    ['Phase 3', BELOW_THREE_QUARTER],
  ]) {
    const card = page.getByRole('region', { name: phase, exact: true });
    expect(await card.getByLabel('Phase name').inputValue()).toBe(phaseName);
    await card.getByLabel('Required minutes in band').fill('1');
  }
  expect(await page.getByRole('region', { name: 'Phase 4', exact: true }).count()).toBe(0);
  await page.getByRole('button', { name: 'Save program' }).click();
  await visible(page.getByRole('status').filter({ hasText: 'Program saved.' }));
}

/** The vessel, with its id read from the address bar the page moved to. */
export async function addVessel(page: Page, vesselName: string): Promise<string> {
  await mainNav(page).getByRole('link', { name: 'Vessels', exact: true }).click();
  await waitForHome(page, 'Vessels and engines');
  await page.getByRole('button', { name: 'Add a vessel' }).click();
  await page.getByLabel('Vessel name').fill(vesselName);
  await page.getByLabel('Type').first().selectOption('rib');
  await page.getByLabel('Length (m)').fill('7,4');
  await page.getByRole('button', { name: 'Add vessel' }).click();
  await waitForHome(page, vesselName);
  await expect.poll(() => new URL(page.url()).pathname).toMatch(/^\/vessels\/[0-9a-f-]{36}$/);
  return new URL(page.url()).pathname.split('/')[2];
}

/** The port engine in full, then the starboard one copied from it (position and serial only). */
export async function addTwinOutboards(page: Page, serials: { port: string; starboard: string }) {
  await page.getByRole('button', { name: 'Add an engine' }).click();
  const form = page.getByRole('form', { name: 'New engine' });
  await form.getByLabel('Position').selectOption('port');
  await form.getByLabel('Maker').fill('Kestrel');
  await form.getByLabel('Model').fill('K150 4S');
  await form.getByLabel('Serial number').fill(serials.port);
  // A rated range of 5000–6000 rpm as makers print it for four-stroke outboards (common practice).
  await form.getByLabel('Rated full-throttle RPM, low end').fill('5000');
  await form.getByLabel('Rated full-throttle RPM, high end').fill('6000');
  await form.getByLabel('Gear ratio (x:1)').fill('2');
  await form.getByLabel('Propeller pitch (in)').fill('19');
  await form.getByLabel('Signal source').selectOption('charging-coil');
  await form.getByLabel('Poles of the coil or alternator').fill('12');
  await form.getByLabel('Hour meter at commissioning (h)').fill('0.5');
  await form.getByRole('button', { name: 'Add engine' }).click();
  await waitForHome(page, 'Port · Kestrel K150 4S');

  await page.getByRole('link', { name: /^← / }).click();
  await page
    .getByRole('button', { name: 'Copy Port · Kestrel K150 4S to add the second engine' })
    .click();
  const twin = page.getByRole('form', { name: 'New engine' });
  expect(await twin.getByLabel('Model').inputValue()).toBe('K150 4S');
  await twin.getByLabel('Position').selectOption('starboard');
  await twin.getByLabel('Serial number').fill(serials.starboard);
  await twin.getByRole('button', { name: 'Add engine' }).click();
  await waitForHome(page, 'Starboard · Kestrel K150 4S');
}

/** The engine page's checklist, every item measured or passed, then completed. */
export async function completeChecklist(page: Page, engineName: string) {
  await page.getByRole('link', { name: 'Start the checklist' }).click();
  await waitForHome(page, 'Commissioning checklist');
  // 12-pole coil: rpm = 10 × Hz, so 300 Hz is 3000 rpm (common practice); 3040 is inside ±3 %.
  await page.getByLabel('Measured frequency (Hz)').fill('300');
  await page.getByLabel('Helm tachometer showed (RPM)').fill('3040');
  // AGM absorption 14.4–14.7 V at 25 °C (Battery University BU-403): 14.5 V passes.
  await page.getByLabel('Battery chemistry').selectOption('agm');
  await page.getByLabel('Voltage at the battery (V)').fill('14,5');
  await page.getByLabel('Engine RPM during the check').fill('3500');
  // The idle range is the technician's typed maker figure, not a trade value.
  await page.getByLabel("Maker's idle in gear, low (RPM)").fill('650');
  await page.getByLabel("Maker's idle in gear, high (RPM)").fill('750');
  await page.getByLabel('Measured idle in gear (RPM)').fill('700');
  // The middle of the rated 5000–6000 rpm typed on the engine record.
  await page.getByRole('textbox', { name: 'Full-throttle RPM', exact: true }).fill('5600');
  for (const item of CHECKS) await answer(page, item, 'Pass');
  await page.getByRole('button', { name: 'Complete checklist' }).click();
  await visible(page.getByText(/^Completed by Ivo Brandt on/));
  await page.getByRole('link', { name: new RegExp(`^← ${engineName}`) }).click();
  await waitForHome(page, engineName);
  await visible(page.getByText('Checklist done'));
}

/** The assign card on the engine page: the short program, assigned, the run created. */
export async function assignProgram(page: Page, programName: string) {
  const card = page.getByRole('region', { name: 'Assign break-in program' });
  const option = card.getByRole('option', { name: programName });
  await expect.poll(() => option.count(), { timeout: 15_000 }).toBe(1);
  await card.getByLabel('Break-in program').selectOption({ label: programName });
  await card.getByRole('button', { name: 'Assign program' }).click();
  await visible(card.getByText('Run created.'));
  await visible(card.getByRole('link', { name: 'Open the run' }));
  await expect
    .poll(() => card.getByRole('button', { name: 'Assign program' }).count(), { timeout: 15_000 })
    .toBe(0);
  await visible(card.getByText('Run created.'));
}

/** From the main navigation through the vessel list and the vessel page to one of its engines. */
export async function openEngine(page: Page, vesselName: string, engineName: string) {
  await openVessel(page, vesselName);
  await page.getByRole('link', { name: engineName, exact: true }).first().click();
  await waitForHome(page, engineName);
}

export async function openVessel(page: Page, vesselName: string) {
  await mainNav(page).getByRole('link', { name: 'Vessels', exact: true }).click();
  await waitForHome(page, 'Vessels and engines');
  await page.getByLabel('Search', { exact: true }).fill(vesselName);
  await page.getByRole('link', { name: vesselName, exact: true }).first().click();
  await waitForHome(page, vesselName);
}
