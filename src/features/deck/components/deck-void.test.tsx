import { beforeEach, describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { db } from '../../../lib/db';
import { MIN, testRun } from '../test-fixtures';
import { clearDevice, outingOn, readingAt, showDeck, store } from './deck-test-db';

// Voiding on deck, on the built-in four-stroke program's below-half band (0–3000 rpm, demo engine).
const port = testRun('port');
const SLOW = 20_000;

beforeEach(clearDevice);

const entriesOf = async () => {
  const user = userEvent.setup();
  showDeck();
  await user.click(await screen.findByRole('button', { name: 'Recent entries' }));
  return { user, list: screen.getByRole('list', { name: 'Port: recent entries' }) };
};

describe('voiding an entry on deck', () => {
  it(
    'asks for a reason, writes a void naming the entry, strikes it through, and the timer drops it',
    async () => {
      const startedAt = await outingOn([port]);
      await store(port, [readingAt(startedAt + MIN, 2400), readingAt(startedAt + 3 * MIN, 3600)]);
      const { user, list } = await entriesOf();
      expect(await screen.findByRole('status', { name: /Port: Over/ })).toBeInTheDocument();
      const [newest] = within(list).getAllByRole('listitem');
      expect(newest).toHaveTextContent('3600 rpm at half throttle');
      await user.click(within(newest).getByRole('button', { name: 'Void' }));
      await user.click(within(newest).getByRole('button', { name: 'Void entry' }));
      expect(within(newest).getByRole('textbox', { name: 'Reason' })).toHaveAccessibleDescription(
        'Say why the entry is voided (Reason).',
      );
      expect((await db.events.toArray()).some((e) => e.kind === 'void')).toBe(false);
      await user.type(
        within(newest).getByRole('textbox', { name: 'Reason' }),
        'Typed 3600 for 2600.',
      );
      await user.click(within(newest).getByRole('button', { name: 'Void entry' }));

      const target = (await db.events.toArray()).find(
        (e) => e.kind === 'reading' && e.event.kind === 'reading' && e.event.rpm === 3600,
      )!;
      await waitFor(async () => {
        const [entry] = (await db.events.toArray()).filter((e) => e.kind === 'void');
        expect(entry?.event).toMatchObject({ targetId: target.id, reason: 'Typed 3600 for 2600.' });
        expect(entry?.sync).toBe('pending');
      });
      expect(await within(list).findByText(/3600 rpm/, { selector: 'del' })).toBeInTheDocument();
      expect(within(list).getByText('Voided: Typed 3600 for 2600.')).toBeInTheDocument();
      // The 2400 reading holds again (in band) once the slip is taken out of the count.
      expect(await screen.findByRole('status', { name: /Port: In band/ })).toBeInTheDocument();
      expect(screen.getByText('2400 rpm', { selector: 'span' }).parentElement).toHaveTextContent(
        /^Last 2400 rpm/,
      );
    },
    SLOW,
  );

  it("offers a skipper no void on an entry made elsewhere (another device's, the workshop's)", async () => {
    const startedAt = await outingOn([port]);
    await store(port, [readingAt(startedAt + MIN, 2400)]);
    const [mine] = (await db.events.toArray()).filter((e) => e.kind === 'reading');
    await db.events.put({
      ...mine,
      id: '00000000-0000-4000-8000-0000000000ff',
      event: { ...mine.event, id: '00000000-0000-4000-8000-0000000000ff', at: startedAt + 2 * MIN },
      at: startedAt + 2 * MIN,
      origin: 'server',
      sync: 'synced',
    });
    const { list } = await entriesOf();
    const [theirs, own] = within(list).getAllByRole('listitem');
    expect(within(theirs).queryByRole('button', { name: 'Void' })).not.toBeInTheDocument();
    expect(within(own).getByRole('button', { name: 'Void' })).toBeInTheDocument();
  });

  it('shows the reason when the server refused a void, and the entry counts again', async () => {
    const startedAt = await outingOn([port]);
    await store(port, [readingAt(startedAt + MIN, 2400)]);
    const [reading] = (await db.events.toArray()).filter((e) => e.kind === 'reading');
    await store(port, [
      { kind: 'void', at: startedAt + 2 * MIN, targetId: reading.id, reason: 'Slip.' } as never,
    ]);
    const [entry] = (await db.events.toArray()).filter((e) => e.kind === 'void');
    await db.events.update(entry.id, {
      sync: 'rejected',
      rejectReason: 'A skipper can void only their own entries (targetId).',
    });
    const { list } = await entriesOf();
    expect(
      within(list).getByText(/The server did not take the void: A skipper can void only/),
    ).toBeInTheDocument();
    expect(within(list).queryByText(/2400 rpm/, { selector: 'del' })).not.toBeInTheDocument();
  });
});
