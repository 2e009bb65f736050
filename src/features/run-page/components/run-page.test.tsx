import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import type { RunReviewView } from '../../../../shared/review/views';
import type { RunDetail } from '../../../../shared/runs/run-view';
import { problem, stubFetch } from '../../../test/fetch-stub';
import { renderPage } from '../../../test/render';
import { MIN, RUN_ID, reviewPhase, runDetail, runOverview } from '../test-fixtures';
import { RunPage } from './run-page';

afterEach(() => vi.unstubAllGlobals());

function show(run: RunDetail, overview: RunReviewView, staff = false) {
  stubFetch({
    [`GET /api/runs/${RUN_ID}`]: { status: 200, body: { run } },
    [`GET /api/runs/${RUN_ID}/review`]: { status: 200, body: overview },
  });
  return renderPage(<RunPage runId={RUN_ID} staff={staff} />);
}

const returnedAt = Date.parse('2026-05-20T10:00:00Z');
const decision = (decidedAt: string, comments: string, rerunPhaseNames: string[]) => ({
  decision: 'returned' as const,
  comments,
  rerunPhaseNames,
  verdict: 'incomplete',
  reviewerName: 'Ivo Tidewright',
  decidedAt,
});

describe('the run page', () => {
  it('a returned run: the comments newest first, the phases to run again, and why', async () => {
    const run = runDetail({
      state: 'returned',
      submitNote: 'Ran out of daylight.',
      rerunFrom: { 'below-half': returnedAt },
      lastDecision: {
        decision: 'returned',
        comments: 'Vary the speed on the half-throttle phase.',
        rerunPhaseIds: ['below-half'],
        reviewerName: 'Ivo Tidewright',
        decidedAt: '2026-05-20T10:00:00Z',
      },
    });
    const steady = 'Speed held within 200 rpm for 25 min; change it at least every 15 min.';
    show(
      run,
      runOverview({
        account: { verdict: 'incomplete', overallProgress: 0.8, sessionMs: 0, unassignedMs: 0 },
        phases: [
          reviewPhase(0, 10 * MIN),
          reviewPhase(1, 0, {
            setAsideMs: 110 * MIN,
            countsFromMs: returnedAt,
            reasons: [{ code: 'no-speed-change', message: steady, fromMs: 0, toMs: 1 }],
          }),
          reviewPhase(2, 480 * MIN),
        ],
        reviews: [
          decision('2026-05-12T09:00:00Z', 'First try: too short.', [
            'Below three-quarter throttle, short full-throttle bursts',
          ]),
          decision('2026-05-20T10:00:00Z', 'Vary the speed on the half-throttle phase.', [
            'Below half throttle, changing speed',
          ]),
        ],
      }),
    );
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Little Auk' }),
    ).toBeInTheDocument();
    expect(screen.getByText('Returned to skipper')).toBeInTheDocument();
    expect(screen.getByText('Not complete yet')).toBeInTheDocument();
    const rerun = screen.getByRole('region', { name: /Returned: phases to run again/ });
    expect(within(rerun).getByRole('listitem')).toHaveTextContent(
      'Below half throttle, changing speed',
    );
    const decisions = within(
      screen.getByRole('list', { name: "The workshop's decisions" }),
    ).getAllByRole('listitem');
    expect(decisions[0]).toHaveTextContent('Returned by Ivo Tidewright, 20 May 2026');
    expect(decisions[1]).toHaveTextContent('First try: too short.');
    const phases = [...screen.getByRole('list', { name: 'Phases' }).children];
    expect(phases[1]).toHaveTextContent('to run again');
    expect(phases[1]).toHaveTextContent('1 h 50 min set aside');
    expect(phases[1]).toHaveTextContent(steady);
    expect(phases[0]).toHaveTextContent('stands');
    expect(screen.getByText('Ran out of daylight.')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'On deck' })).toHaveAttribute(
      'href',
      `/deck/${run.vessel.id}`,
    );
    expect(
      screen.queryByRole('link', { name: /Download the certificate/ }),
    ).not.toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Full review' })).not.toBeInTheDocument();
    // Running the engine again: the usual cautions, and the manual and technicians come first.
    expect(
      screen.getByText(/manual, local rules and your licensed technician come first/),
    ).toBeInTheDocument();
  });

  it('a signed-off run: the certificate to download and the first service due, whichever comes first', async () => {
    const run = runDetail({ state: 'signed-off', certificateNumber: 'TST-2026-0001-1' });
    show(
      run,
      runOverview({
        reviews: [
          { ...decision('2026-05-22T09:00:00Z', 'All in order.', []), decision: 'confirmed' },
        ],
        certificate: {
          number: 'TST-2026-0001-1',
          issuedAt: '2026-05-22T09:00:00Z',
          downloadUrl: `/api/runs/${RUN_ID}/certificate`,
        },
        // 20 h or 1 month after commissioning (0.5 h, 1 May 2026), whichever first: common
        // practice (BoatUS "Long Life – Outboard Maintenance").
        firstService: {
          dueAtHours: 20.5,
          dueOn: '2026-06-01',
          state: 'due-soon',
          trigger: 'date',
          hoursLeft: 3.3,
          daysLeft: 5,
          hoursNow: 17.2,
          hoursSource: 'estimated',
        },
      }),
      true,
    );
    expect(await screen.findByText('Signed off', { selector: 'dd' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Download the certificate' })).toHaveAttribute(
      'href',
      `/api/runs/${RUN_ID}/certificate`,
    );
    expect(screen.getByText('Signed off by Ivo Tidewright, 22 May 2026')).toBeInTheDocument();
    expect(
      screen.getByText('Due at 20.5 engine hours or on 1 Jun 2026, whichever comes first.'),
    ).toBeInTheDocument();
    expect(screen.getByText(/Due soon/)).toBeInTheDocument();
    expect(screen.getByText(/an estimate, the hour meter at commissioning/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Full review' })).toHaveAttribute(
      'href',
      `/runs/${RUN_ID}/review`,
    );
    expect(screen.queryByRole('link', { name: 'On deck' })).not.toBeInTheDocument();
  });

  it('says plainly when the run cannot be seen', async () => {
    stubFetch({
      [`GET /api/runs/${RUN_ID}`]: problem(404, 'Not found', 'No run with this id.'),
      [`GET /api/runs/${RUN_ID}/review`]: problem(404, 'Not found', 'No run with this id.'),
    });
    renderPage(<RunPage runId={RUN_ID} staff={false} />);
    expect(await screen.findByRole('alert')).toHaveTextContent('Could not load this run');
    expect(screen.getByRole('alert')).toHaveTextContent('No run with this id.');
  });
});
