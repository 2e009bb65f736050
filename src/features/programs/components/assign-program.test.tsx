import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { problem, stubFetch } from '../../../test/fetch-stub';
import { renderPage } from '../../../test/render';
import { AssignProgram } from './assign-program';

afterEach(() => {
  vi.unstubAllGlobals();
});

const engineId = '1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d';
const summary = (id: string, name: string, retiredAt: string | null = null) => ({
  id,
  name,
  builtInKey: null,
  copiedFromId: null,
  retiredAt,
  suits: { engineKind: 'outboard-4-stroke', label: '' },
  phaseCount: 4,
  totalMinutes: 600,
  firstService: { hours: 20, months: 1 },
  updatedAt: '2026-05-02T08:00:00.000Z', // common practice
});
const programs = {
  programs: [
    summary('aaaaaaaa-0000-4000-8000-000000000001', 'Outboard, our way'),
    summary('aaaaaaaa-0000-4000-8000-000000000002', 'Old schedule', '2026-01-01T00:00:00.000Z'),
  ],
};

describe('AssignProgram', () => {
  it('offers only active programs and shows the server’s refusal', async () => {
    const { calls } = stubFetch({
      'GET /api/programs': { status: 200, body: programs },
      'POST /api/runs': problem(409, 'Conflict', 'This engine already has an open break-in run.'),
    });
    const user = userEvent.setup();
    renderPage(<AssignProgram engineId={engineId} />);

    expect(await screen.findByRole('option', { name: 'Outboard, our way' })).toBeInTheDocument();
    expect(screen.queryByRole('option', { name: 'Old schedule' })).toBeNull();
    await user.click(screen.getByRole('button', { name: 'Assign program' }));

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'This engine already has an open break-in run.',
    );
    expect(calls.find((call) => call.method === 'POST')?.body).toEqual({
      engineId,
      programId: 'aaaaaaaa-0000-4000-8000-000000000001',
    });
  });

  it('links to the new run once it is created', async () => {
    const runId = 'bbbbbbbb-0000-4000-8000-000000000009';
    stubFetch({
      'GET /api/programs': { status: 200, body: programs },
      'POST /api/runs': { status: 201, body: { run: { id: runId } } },
    });
    const user = userEvent.setup();
    renderPage(<AssignProgram engineId={engineId} />);

    await screen.findByRole('option', { name: 'Outboard, our way' });
    await user.click(screen.getByRole('button', { name: 'Assign program' }));

    expect(await screen.findByText(/Run created/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Open the run' })).toHaveAttribute(
      'href',
      `/runs/${runId}`,
    );
  });
});
