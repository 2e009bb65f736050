import type { Page } from 'playwright-core';

/** The checklist's pass / fail items, by the names the screen gives their radio groups. */
export const CHECKS = [
  'Steering',
  'Throttle cable adjustment',
  'Shift cable adjustment',
  'Starts in neutral only',
  'Kill switch and lanyard',
  'Cooling-water tell-tale',
  'No fuel, oil or water leaks',
  'Propeller and nut',
];

/** Answers one checklist item by clicking its label, as a person does. */
export async function answer(page: Page, item: string, choice: 'Pass' | 'Fail' | 'N/A') {
  await page
    .getByRole('radiogroup', { name: item })
    .locator('label')
    .filter({ hasText: choice })
    .click();
}
