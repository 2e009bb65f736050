import { describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { BoardRow, BoardView } from '../../../../shared/review/views';
import { renderPage } from '../../../test/render';
import { RunsBoard } from './runs-board';

// Invented rows for the component; the order and flags come from the server.
const row = (over: Partial<BoardRow> & Pick<BoardRow, 'id' | 'state' | 'group'>): BoardRow => ({
  vessel: { id: 'v1', name: 'Petrel' },
  engine: {
    id: 'e1',
    position: 'single',
    maker: 'Norrvik',
    model: 'NV-40 4S',
    serialNumber: 'NV40-00001',
  },
  programName: 'Four-stroke outboard, about 10 hours',
  progress: 0.5,
  verdict: 'incomplete',
  breachCount: 0,
  currentPhaseName: 'Below half throttle, changing speed',
  lastActivityAt: '2026-11-29T10:00:00.000Z',
  flags: [],
  firstService: {
    state: 'not-due',
    dueAtHours: 20.3,
    dueOn: '2026-12-23',
    hoursNow: 4.2,
    hoursSource: 'estimated',
  },
  ...over,
});

const board: BoardView = {
  today: '2026-12-01',
  counts: { planned: 0, 'under-way': 1, submitted: 1, 'signed-off': 0, returned: 0, cancelled: 0 },
  actionCount: 1,
  total: 2,
  matching: 150,
  runs: [
    row({
      id: 'r1',
      state: 'submitted',
      group: 'review',
      verdict: 'breached',
      breachCount: 1,
      flags: ['breach'],
      progress: 1,
    }),
    row({
      id: 'r2',
      state: 'under-way',
      group: 'check',
      flags: ['clock-skew'],
      vessel: { id: 'v2', name: 'Shag' },
    }),
  ],
};

describe('RunsBoard', () => {
  it('shows each run with its state, verdict and flags in words, linked to its review', () => {
    renderPage(
      <RunsBoard
        board={board}
        show="action"
        q=""
        onShow={() => {}}
        onSearch={() => {}}
        onMore={() => {}}
      />,
    );
    const table = screen.getByRole('table');
    const [, first, second] = within(table).getAllByRole('row');
    expect(within(first).getByRole('link', { name: /Petrel/ })).toHaveAttribute(
      'href',
      '/runs/r1/review',
    );
    expect(first).toHaveTextContent('Submitted for review');
    expect(first).toHaveTextContent('Rule broken');
    expect(within(first).getByRole('progressbar')).toHaveAttribute('aria-valuenow', '100');
    expect(second).toHaveTextContent('Device clock off');
    expect(screen.getByRole('status')).toHaveTextContent('Showing 2 of 150 runs that need action.');
  });

  it('changes the choice and asks for more rows', async () => {
    const onShow = vi.fn();
    const onMore = vi.fn();
    const user = userEvent.setup();
    renderPage(
      <RunsBoard
        board={board}
        show="action"
        q=""
        onShow={onShow}
        onSearch={() => {}}
        onMore={onMore}
      />,
    );
    await user.click(
      within(screen.getByRole('group', { name: 'Show runs' })).getByRole('button', {
        name: /Under way/,
      }),
    );
    expect(onShow).toHaveBeenCalledWith('under-way');
    await user.click(screen.getByRole('button', { name: 'Show 100 more' }));
    expect(onMore).toHaveBeenCalled();
  });
});
