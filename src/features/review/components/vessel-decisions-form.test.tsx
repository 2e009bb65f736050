import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { problem, stubFetch } from '../../../test/fetch-stub';
import { renderPage } from '../../../test/render';
import { VesselDecisionsForm } from './vessel-decisions-form';

afterEach(() => {
  vi.unstubAllGlobals();
});

const vesselId = '5b0c6f1e-2d3a-4b4c-9d5e-6f7a8b9c0d1e';
const portRun = '7c1d2e3f-4a5b-4c6d-8e7f-0a1b2c3d4e5f';
const starboardRun = '8d2e3f4a-5b6c-4d7e-9f80-1b2c3d4e5f6a';
const engine = (position: string) => ({ position, maker: 'Norrvik', model: 'NV-150 4S' });
const items = [
  { runId: portRun, engine: engine('port') },
  { runId: starboardRun, engine: engine('starboard') },
];

/** The part of a run's review this page reads: verdict, program, note and phases. */
const review = (id: string, note: string | null) => ({
  status: 200,
  body: {
    run: { id, programName: 'Outboard break-in', submittedAt: null, submitNote: note },
    account: { verdict: 'incomplete' },
    voidedCount: id === portRun ? 1 : 0,
    phases: [
      { id: 'dock', name: 'Dock run', timeInBandMs: 240_000, requiredMs: 600_000 },
      { id: 'first-hour', name: 'First hour', timeInBandMs: 0, requiredMs: 3_600_000 },
    ].map((p) => ({ ...p, verdict: 'incomplete', reasons: [] })),
  },
});

const reviews = {
  [`GET /api/runs/${portRun}/review`]: review(portRun, 'Fog came in.'),
  [`GET /api/runs/${starboardRun}/review`]: review(starboardRun, null),
};

const region = (name: RegExp) => screen.getByRole('region', { name });

describe('VesselDecisionsForm', () => {
  it('shows each engine with its note and phases, and refuses a return with no phase chosen', async () => {
    const { calls } = stubFetch(reviews);
    const user = userEvent.setup();
    renderPage(<VesselDecisionsForm vesselId={vesselId} items={items} onSaved={() => {}} />);
    const port = region(/^Port engine/);
    expect(await within(port).findByText('Fog came in.')).toBeInTheDocument();
    expect(within(port).getByText(/1 entry voided/)).toBeInTheDocument();
    const starboard = region(/^Starboard engine/);
    await user.click(within(starboard).getByRole('radio', { name: /Return to the skipper/ }));
    await user.type(within(starboard).getByLabelText('Comments'), 'Run the dock phase again.');
    await user.click(screen.getByRole('button', { name: 'Save both decisions' }));
    expect(
      await within(starboard).findByText(
        'Choose at least one phase to run again (rerunPhaseIds) when you return a run.',
      ),
    ).toBeInTheDocument();
    expect(calls.filter((c) => c.method === 'POST')).toEqual([]);
  });

  it("puts the server's refusal on the engine it names and saves nothing", async () => {
    const onSaved = vi.fn();
    stubFetch({
      ...reviews,
      [`POST /api/vessels/${vesselId}/decisions`]: problem(400, 'Invalid', 'Some fields.', [
        { field: 'decisions.0.comments', message: 'Port engine: say why you confirm it.' },
      ]),
    });
    const user = userEvent.setup();
    renderPage(<VesselDecisionsForm vesselId={vesselId} items={items} onSaved={onSaved} />);
    await user.click(screen.getByRole('button', { name: 'Save both decisions' }));
    const port = region(/^Port engine/);
    expect(await within(port).findByText('Port engine: say why you confirm it.')).toBeVisible();
    expect(within(port).getByLabelText('Comments')).toHaveAttribute('aria-invalid', 'true');
    expect(onSaved).not.toHaveBeenCalled();
  });

  it('sends both decisions in one request and hands back what was saved', async () => {
    const onSaved = vi.fn();
    const answer = [
      {
        runId: portRun,
        state: 'signed-off',
        certificate: { number: 'TW-2026-0007', downloadUrl: '/x' },
        mail: { sent: true, to: ['a@b.example'] },
      },
      {
        runId: starboardRun,
        state: 'returned',
        certificate: null,
        mail: { sent: true, to: ['a@b.example'] },
      },
    ];
    const { calls } = stubFetch({
      ...reviews,
      [`POST /api/vessels/${vesselId}/decisions`]: { status: 200, body: { decisions: answer } },
    });
    const user = userEvent.setup();
    renderPage(<VesselDecisionsForm vesselId={vesselId} items={items} onSaved={onSaved} />);
    const port = region(/^Port engine/);
    await user.type(within(port).getByLabelText('Comments'), 'Checked at the pontoon.');
    const starboard = region(/^Starboard engine/);
    await user.click(within(starboard).getByRole('radio', { name: /Return to the skipper/ }));
    await user.click(await within(starboard).findByRole('checkbox', { name: 'Dock run' }));
    await user.type(within(starboard).getByLabelText('Comments'), 'Again, please.');
    await user.click(screen.getByRole('button', { name: 'Save both decisions' }));
    await vi.waitFor(() => expect(onSaved).toHaveBeenCalledWith(answer));
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({
      decisions: [
        {
          runId: portRun,
          decision: 'confirm',
          comments: 'Checked at the pontoon.',
          rerunPhaseIds: [],
        },
        {
          runId: starboardRun,
          decision: 'return',
          comments: 'Again, please.',
          rerunPhaseIds: ['dock'],
        },
      ],
    });
  });
});
