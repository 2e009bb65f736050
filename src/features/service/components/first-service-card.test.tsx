import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import type { EngineServiceView } from '../../../../shared/service/service-views';
import { stubFetch } from '../../../test/fetch-stub';
import { renderPage } from '../../../test/render';
import { FirstServiceCard } from './first-service-card';

afterEach(() => {
  vi.unstubAllGlobals();
});

const engineId = '7c1e2d3a-4b5c-4d6e-8f90-a1b2c3d4e5f6';
// Figures as the server works them out: 20 h or 1 month after 2.0 h on 2026-11-27
// (common practice; BoatUS "Long Life – Outboard Maintenance").
const due: EngineServiceView = {
  engine: {
    id: engineId,
    vesselId: 'v-1',
    vesselName: 'Petrel',
    position: 'inboard',
    maker: 'Maker',
    model: 'M-1',
    serialNumber: 'SN-1',
  },
  commissioning: { hourMeter: 2, date: '2026-11-27' },
  interval: { hours: 20, months: 1 },
  intervalFrom: { programName: 'Small inboard diesel' },
  firstService: {
    dueAtHours: 22,
    dueOn: '2026-12-27',
    state: 'overdue',
    trigger: 'hours',
    hoursLeft: -1.5,
    daysLeft: 26,
    hoursNow: 23.5,
    hoursSource: 'logged',
  },
  firstServiceDone: null,
  nextService: null,
  workings: [
    'Commissioned on 27 Nov 2026 with 2.0 h on the hour meter.',
    'Overdue: the engine hours have reached the limit.',
  ],
  reason: null,
  reminder: null,
};
const run = (state: string) => ({
  id: 'r-1',
  state,
  programName: 'Small inboard diesel',
  verdict: 'complete',
  progress: 1,
  createdAt: '2026-11-27T08:45:00.000Z',
  submittedAt: null,
  signedOffAt: null,
  certificateNumber: null,
});

function stub(state: string) {
  stubFetch({
    [`GET /api/engines/${engineId}/service-due`]: { status: 200, body: due },
    [`GET /api/engines/${engineId}/record`]: { status: 200, body: { runs: [run(state)] } },
  });
}

describe('FirstServiceCard', () => {
  it('shows the due service with its working, the calendar file and the form once signed off', async () => {
    stub('signed-off');
    renderPage(<FirstServiceCard engineId={engineId} userName="Ada Harbour" />);

    const dueLine = await screen.findByText(
      'Due at 22.0 h on the hour meter or on 27 Dec 2026, whichever comes first.',
    );
    // The state as a shape and a word beside the figures, never colour alone.
    expect(dueLine.parentElement).toHaveTextContent('▲Overdue');
    expect(
      screen.getByText('Commissioned on 27 Nov 2026 with 2.0 h on the hour meter.'),
    ).toBeInTheDocument();
    expect(
      screen.getByRole('link', { name: 'Add the first service to a calendar (.ics file)' }),
    ).toHaveAttribute('href', `/api/engines/${engineId}/first-service.ics`);
    expect(
      await screen.findByRole('form', { name: 'Record the first service' }),
    ).toBeInTheDocument();
    expect(screen.getByText(/licensed technicians come first/)).toBeInTheDocument();
  });

  it('says the form comes after the sign-off while the break-in is open', async () => {
    stub('submitted');
    renderPage(<FirstServiceCard engineId={engineId} userName="Ada Harbour" />);

    expect(
      await screen.findByText(
        'The first service can be recorded here once a break-in run of this engine is signed off.',
      ),
    ).toBeInTheDocument();
    expect(
      screen.queryByRole('form', { name: 'Record the first service' }),
    ).not.toBeInTheDocument();
  });
});
