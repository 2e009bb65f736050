import { beforeEach, describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { db } from '../../../lib/db';
import { MIN, testRun, testVessel } from '../test-fixtures';
import { clearDevice, outingDone, showDeck, store, wholeProgram } from './deck-test-db';

/*
 * Finishing on deck, on the built-in four-stroke program with demo engines (dock run 10 min,
 * below half 110 min, below three-quarter 480 min: the program's own figures, common practice).
 */
const port = testRun('port');
const starboard = testRun('starboard');

beforeEach(clearDevice);

async function twinAfterAnHour() {
  const startedAt = Date.now() - 2 * 60 * MIN;
  await db.runs.bulkPut([port, starboard]);
  await db.vessels.put(testVessel([port, starboard]));
  await store(port, outingDone(startedAt, 60));
  await store(starboard, outingDone(startedAt, 60));
}

const patches = async () => (await db.runPatches.toArray()).map((p) => p.item);

// Typing and live queries on a busy machine: more time than the default five seconds.
const SLOW = 20_000;

describe('finishing and submitting from the deck', () => {
  it(
    'shows every engine summed up first, and asks for a note while a phase is not complete',
    async () => {
      await twinAfterAnHour();
      const user = userEvent.setup();
      showDeck();
      await user.click(await screen.findByRole('button', { name: 'Finish and submit' }));
      const summary = screen.getByRole('region', { name: 'Port: summary' });
      expect(screen.getByRole('region', { name: 'Starboard: summary' })).toBeInTheDocument();
      const phases = [...within(summary).getByRole('list', { name: 'Port: phases' }).children];
      expect(phases[1]).toHaveTextContent(
        'Below half throttle, changing speed · … Not complete yet',
      );
      expect(phases[1]).toHaveTextContent('In band 1 h 00 min of 1 h 50 min required');
      expect(phases[1]).toHaveTextContent(
        'In band for 1 h 00 min of the 1 h 50 min required; 50 min to go.',
      );
      expect(phases[2]).toHaveTextContent('Not run yet: 8 h 00 min in band is required.');
      expect(within(summary).getByText('Nothing voided.')).toBeInTheDocument();

      const submit = screen.getByRole('button', { name: 'Submit both engines' });
      expect(submit).toBeDisabled();
      expect(submit).toHaveAccessibleDescription(/Note to the workshop/);
      await user.type(
        screen.getByRole('textbox', { name: 'Note to the workshop' }),
        'Weather closed in; the rest next weekend.',
      );
      expect(submit).toBeEnabled();
      await user.click(submit);

      await waitFor(async () => expect(await patches()).toHaveLength(2));
      expect(await patches()).toEqual(
        expect.arrayContaining([
          expect.objectContaining({
            runId: port.id,
            submit: true,
            submitNote: 'Weather closed in; the rest next weekend.',
          }),
          expect.objectContaining({ runId: starboard.id, submit: true }),
        ]),
      );
      const notices = await screen.findByRole('list', { name: 'Submissions' }, { timeout: 5000 });
      expect(
        within(notices).getAllByText(
          'Submitted on this phone — waiting for a connection to send it.',
        ),
      ).toHaveLength(2);
      // Nothing more to log: the engines no longer go out.
      expect(screen.getByRole('button', { name: 'Start outing' })).toBeDisabled();
      expect(screen.queryByRole('button', { name: 'Finish and submit' })).not.toBeInTheDocument();
    },
    SLOW,
  );

  it(
    'says when the workshop has it, and shows the reason when the server refused it',
    async () => {
      await twinAfterAnHour();
      const user = userEvent.setup();
      showDeck();
      await user.click(await screen.findByRole('button', { name: 'Finish and submit' }));
      await user.type(
        screen.getByRole('textbox', { name: 'Note to the workshop' }),
        'Out of time.',
      );
      await user.click(screen.getByRole('button', { name: 'Submit both engines' }));
      await screen.findAllByText(/waiting for a connection/, {}, { timeout: 5000 });
      // What the sync engine writes from the server's answer (features/sync/outbox.ts).
      const [first, second] = await db.runPatches.toArray();
      await db.runPatches.update(first.id, { sync: 'synced' });
      await db.runPatches.update(second.id, {
        sync: 'rejected',
        rejectReason:
          'This run was cancelled by the workshop (submit); there is nothing to submit.',
      });
      expect(await screen.findByText('Sent to the workshop.')).toBeInTheDocument();
      expect(screen.getByRole('alert')).toHaveTextContent(
        'The workshop server did not take the submission: This run was cancelled by the workshop',
      );
      // The refused engine can be run and submitted again.
      expect(screen.getByRole('button', { name: 'Finish and submit' })).toBeInTheDocument();
    },
    SLOW,
  );

  it(
    'submits a complete single engine with no note asked for',
    async () => {
      await db.runs.put(port);
      await db.vessels.put(testVessel([port]));
      await store(port, wholeProgram(Date.now() - 11 * 60 * MIN));
      const user = userEvent.setup();
      showDeck('technician');
      expect(
        await screen.findByText(/Every phase has its time in band. Check the summary/),
      ).toBeInTheDocument();
      await user.click(screen.getByRole('button', { name: 'Finish and submit' }));
      expect(screen.getByText('Run: Complete')).toBeInTheDocument();
      expect(
        screen.queryByRole('textbox', { name: 'Note to the workshop' }),
      ).not.toBeInTheDocument();
      await user.click(screen.getByRole('button', { name: 'Submit the run' }));
      await waitFor(async () =>
        expect(await patches()).toEqual([
          expect.objectContaining({ runId: port.id, submit: true }),
        ]),
      );
      expect((await patches())[0].submitNote).toBeUndefined();
    },
    SLOW,
  );

  it(
    'lists what was voided in the summary',
    async () => {
      const startedAt = Date.now() - 2 * 60 * MIN;
      await db.runs.put(port);
      await db.vessels.put(testVessel([port]));
      await store(port, outingDone(startedAt, 30));
      const slip = (await db.events.toArray()).find((e) => e.kind === 'reading')!;
      await store(port, [
        {
          kind: 'void',
          at: startedAt + 31 * MIN,
          targetId: slip.id,
          reason: 'Wrong engine.',
        } as never,
      ]);
      const user = userEvent.setup();
      showDeck();
      await user.click(await screen.findByRole('button', { name: 'Finish and submit' }));
      const summary = screen.getByRole('region', { name: 'Port: summary' });
      expect(within(summary).getByText('Voided: 1 entry')).toBeInTheDocument();
      expect(within(summary).getByText(/2000 rpm at half throttle/).tagName).toBe('DEL');
      expect(within(summary).getByText(/Wrong engine\./)).toBeInTheDocument();
    },
    SLOW,
  );
});
