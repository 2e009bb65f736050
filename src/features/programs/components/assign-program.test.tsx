import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { EngineKind } from '../../../../shared/programs/program.schema';
import type { RunView } from '../../../../shared/runs/run-view';
import { problem, stubFetch, type StubbedRequest } from '../../../test/fetch-stub';
import { renderPage } from '../../../test/render';
import { AssignProgram } from './assign-program';

afterEach(() => {
  vi.unstubAllGlobals();
});

const engineId = '1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d';
const summary = (
  id: string,
  name: string,
  engineKind: EngineKind = 'outboard-4-stroke',
  retiredAt: string | null = null,
) => ({
  id,
  name,
  builtInKey: null,
  copiedFromId: null,
  retiredAt,
  suits: { engineKind, label: '' },
  phaseCount: 4,
  totalMinutes: 600,
  firstService: { hours: 20, months: 1 }, // common practice; BoatUS "Long Life – Outboard Maintenance"
  updatedAt: '2026-05-02T08:00:00.000Z',
});
const OURS = 'aaaaaaaa-0000-4000-8000-000000000001';
const TWO_STROKE = 'aaaaaaaa-0000-4000-8000-000000000003';
const programs = {
  programs: [
    summary(TWO_STROKE, 'Two-stroke schedule', 'outboard-2-stroke'),
    summary(OURS, 'Outboard, our way'),
    summary('aaaaaaaa-0000-4000-8000-000000000002', 'Old schedule', 'any', '2026-01-01T00:00:00Z'),
  ],
};
// A petrol four-stroke outboard (the usual outboard today, common practice).
const engine = {
  id: engineId,
  position: 'single',
  installation: 'outboard',
  fuel: 'petrol',
  cycle: 'four-stroke',
  maker: 'Kestrel',
  model: 'K60',
  serialNumber: 'K60-1',
  ratedRpmMin: 5000,
  ratedRpmMax: 6000, // a typical four-stroke outboard range (common practice)
  vessel: { id: 'v1', name: 'Gannet', archivedAt: null },
};
const plannedRun = {
  id: 'bbbbbbbb-0000-4000-8000-000000000009',
  state: 'planned',
  programName: 'Outboard, our way',
  engine: { id: engineId },
  createdAt: '2026-11-30T15:00:00.000Z',
} as RunView;

const base = (runs: (request: StubbedRequest) => RunView[]) => ({
  'GET /api/programs': { status: 200, body: programs },
  [`GET /api/engines/${engineId}`]: { status: 200, body: { engine } },
  'GET /api/runs': (request: StubbedRequest) => ({ status: 200, body: { runs: runs(request) } }),
});

describe('AssignProgram', () => {
  it('offers active programs, those that suit the engine first, and shows the server’s refusal', async () => {
    const { calls } = stubFetch({
      ...base(() => []),
      'POST /api/runs': problem(409, 'Conflict', 'This engine already has an open break-in run.'),
    });
    const user = userEvent.setup();
    renderPage(<AssignProgram engineId={engineId} />);

    expect(await screen.findByRole('option', { name: 'Outboard, our way' })).toBeInTheDocument();
    expect(screen.queryByRole('option', { name: 'Old schedule' })).toBeNull();
    expect(screen.getAllByRole('option').map((o) => o.textContent)).toEqual([
      'Outboard, our way',
      'Two-stroke schedule — does not suit: It is for two-stroke engines; this one is four-stroke.',
    ]);
    await user.click(screen.getByRole('button', { name: 'Assign program' }));

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'This engine already has an open break-in run.',
    );
    expect(calls.find((call) => call.method === 'POST')?.body).toEqual({
      engineId,
      programId: OURS,
    });
  });

  it('asks for a reason before assigning a program that does not suit the engine', async () => {
    const { calls } = stubFetch({
      ...base(() => []),
      'POST /api/runs': { status: 201, body: { run: { id: plannedRun.id } } },
    });
    const user = userEvent.setup();
    renderPage(<AssignProgram engineId={engineId} />);

    await screen.findByRole('option', { name: 'Outboard, our way' });
    await user.selectOptions(screen.getByLabelText('Break-in program'), TWO_STROKE);
    expect(screen.getByText(/This program does not suit this engine/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Assign program' }));
    await user.click(screen.getByRole('button', { name: 'Assign anyway' }));
    expect(
      await screen.findByText(
        'Give the reason (reason) for assigning a program that does not suit this engine.',
      ),
    ).toBeInTheDocument();
    expect(calls.some((call) => call.method === 'POST')).toBe(false);

    const reason = 'The maker’s schedule for this engine is the two-stroke one.';
    await user.type(screen.getByLabelText('Reason for assigning it anyway'), reason);
    await user.click(screen.getByRole('button', { name: 'Assign anyway' }));

    expect(await screen.findByText(/Run created/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Open the run' })).toHaveAttribute(
      'href',
      `/runs/${plannedRun.id}/review`,
    );
    expect(calls.find((call) => call.method === 'POST')?.body).toEqual({
      engineId,
      programId: TWO_STROKE,
      reason,
    });
  });

  it('shows the planned run, cancels it with a reason, then offers the programs again', async () => {
    let cancelled = false;
    const { calls } = stubFetch({
      ...base(() => (cancelled ? [{ ...plannedRun, state: 'cancelled' }] : [plannedRun])),
      [`POST /api/runs/${plannedRun.id}/cancel`]: () => {
        cancelled = true;
        return { status: 200, body: { run: { id: plannedRun.id } } };
      },
    });
    const user = userEvent.setup();
    renderPage(<AssignProgram engineId={engineId} />);

    expect(await screen.findByText(/Planned: “Outboard, our way”/)).toBeInTheDocument();
    expect(screen.queryByLabelText('Break-in program')).toBeNull();
    await user.click(screen.getByRole('button', { name: 'Cancel this run' }));
    await user.click(screen.getByRole('button', { name: 'Cancel the run' }));
    expect(
      await screen.findByText('Give the reason (reason) for cancelling this run.'),
    ).toBeInTheDocument();

    await user.type(screen.getByLabelText('Reason for cancelling'), 'Assigned to the wrong boat.');
    await user.click(screen.getByRole('button', { name: 'Cancel the run' }));

    expect(await screen.findByText(/Run cancelled/)).toBeInTheDocument();
    expect(await screen.findByRole('option', { name: 'Outboard, our way' })).toBeInTheDocument();
    expect(calls.find((call) => call.method === 'POST')?.body).toEqual({
      reason: 'Assigned to the wrong boat.',
    });
  });
});
