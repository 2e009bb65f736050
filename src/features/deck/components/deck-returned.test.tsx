import { beforeEach, describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { db } from '../../../lib/db';
import { MIN, testRun, testVessel } from '../test-fixtures';
import { clearDevice, outingDone, showDeck, store } from './deck-test-db';

// A run the workshop sent back, on the built-in four-stroke program (demo engine and people).
const returnedAt = Date.now() - 60 * MIN;
const port = testRun('port', {
  state: 'returned',
  rerunFrom: { 'below-half': returnedAt },
  lastDecision: {
    decision: 'returned',
    comments: 'Speed held steady too long. Run the half-throttle phase again, varying speed.',
    rerunPhaseIds: ['below-half'],
    reviewerName: 'Ivo Tidewright',
    decidedAt: new Date(returnedAt).toISOString(),
  },
});

beforeEach(clearDevice);

describe('a returned run on deck', () => {
  it("shows the workshop's comments and the phases to run again, and starts on the first of them", async () => {
    await db.runs.put(port);
    await db.vessels.put(testVessel([port]));
    // Before the return the skipper had gone on to the last phase.
    const before = Date.now() - 5 * 60 * MIN;
    await store(port, [
      ...outingDone(before, 60),
      ...outingDone(before + 90 * MIN, 30, 'below-three-quarter'),
    ]);
    const user = userEvent.setup();
    showDeck();
    const notice = await screen.findByRole('region', { name: 'Port: returned by the workshop' });
    expect(notice).toHaveTextContent('Ivo Tidewright');
    expect(notice).toHaveTextContent('Speed held steady too long.');
    const again = within(notice).getByRole('list', { name: 'Port: phases to run again' });
    expect(
      within(again)
        .getAllByRole('listitem')
        .map((li) => li.textContent),
    ).toEqual(['Below half throttle, changing speed']);

    const panel = screen.getByRole('region', { name: 'Port' });
    expect(within(panel).getByText('Phase 2 of 3')).toBeInTheDocument();
    expect(
      within(panel).getByText('Below half throttle, changing speed', { selector: 'p' }),
    ).toBeInTheDocument();
    expect(within(panel).getByTestId('time-in-band')).toHaveTextContent('0:00:00');
    expect(within(panel).getByRole('link', { name: 'Run page' })).toHaveAttribute(
      'href',
      `/runs/${port.id}`,
    );
    await user.click(within(panel).getByText('All phases (3)'));
    const phases = within(within(panel).getByRole('list', { name: 'Port: phases' }))
      .getAllByRole('listitem')
      .map((li) => li.textContent);
    expect(phases[0]).toMatch(/First run at the dock · workshop · .* · stands$/);
    expect(phases[1]).toMatch(
      /Below half throttle, changing speed · skipper · now 0 % · to run again$/,
    );
    expect(phases[2]).toMatch(/ · stands$/);
    expect(screen.getByRole('button', { name: 'Start outing' })).toBeEnabled();
  });
});
