import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { Program } from '../../../../shared/programs/program.schema';
import { problem, stubFetch } from '../../../test/fetch-stub';
import { renderPage } from '../../../test/render';
import { ProgramForm } from './program-form';
import { definition, id, program } from './program-test-data';

afterEach(() => {
  vi.unstubAllGlobals();
});

const phaseCount = () => screen.getAllByRole('region', { name: /^Phase \d+$/ }).length;

describe('ProgramForm', () => {
  it('shows the server’s field error beside the named field of the right phase', async () => {
    const message =
      'The highest rpm of the band (rpmMax) is above the engine’s rated full-throttle rpm.';
    const { calls } = stubFetch({
      [`PUT /api/programs/${id}`]: problem(400, 'Invalid program', 'Check the marked fields.', [
        { field: 'phases.2.band.rpmMax', message },
      ]),
    });
    const user = userEvent.setup();
    renderPage(<ProgramForm program={program} />);

    await user.click(screen.getByRole('button', { name: 'Save program' }));

    const third = screen.getByRole('region', { name: 'Phase 3' });
    const rpmMax = within(third).getByLabelText('Highest rpm');
    expect(await within(third).findByText(message)).toBeInTheDocument();
    expect(rpmMax).toHaveAttribute('aria-invalid', 'true');
    expect(rpmMax).toHaveAccessibleDescription(expect.stringContaining(message));
    expect(within(screen.getByRole('region', { name: 'Phase 2' })).queryByText(message)).toBeNull();
    expect(calls[0]?.body).toMatchObject({
      name: definition.name,
      phases: [{ id: 'p1' }, { id: 'p2' }, { id: 'p3' }],
    });
  });

  it('adds and removes phases, and sends the changed list', async () => {
    const { calls } = stubFetch({
      [`PUT /api/programs/${id}`]: ({ body }) => ({
        status: 200,
        body: { program: { ...program, definition: body } },
      }),
    });
    const user = userEvent.setup();
    renderPage(<ProgramForm program={program} />);
    expect(phaseCount()).toBe(3);

    await user.click(screen.getByRole('button', { name: 'Add phase' }));
    expect(phaseCount()).toBe(4);
    await user.type(
      within(screen.getByRole('region', { name: 'Phase 4' })).getByLabelText('Phase name'),
      'Full throttle bursts',
    );
    await user.type(
      within(screen.getByRole('region', { name: 'Phase 4' })).getByLabelText('Instructions'),
      'Short bursts only.',
    );

    await user.click(
      within(screen.getByRole('region', { name: 'Phase 1' })).getByRole('button', {
        name: 'Remove phase',
      }),
    );
    expect(phaseCount()).toBe(3);
    expect(
      within(screen.getByRole('region', { name: 'Phase 1' })).getByLabelText('Phase name'),
    ).toHaveValue('Below half throttle');

    await user.click(screen.getByRole('button', { name: 'Save program' }));
    expect(await screen.findByText('Program saved.')).toBeInTheDocument();
    const sent = calls[0]?.body as Program;
    expect(sent.phases.map((phase) => phase.name)).toEqual([
      'Below half throttle',
      'Up to three-quarter',
      'Full throttle bursts',
    ]);
  });

  it('moves a phase down and keeps an empty rule as no limit', async () => {
    const { calls } = stubFetch({
      [`PUT /api/programs/${id}`]: ({ body }) => ({
        status: 200,
        body: { program: { ...program, definition: body } },
      }),
    });
    const user = userEvent.setup();
    renderPage(<ProgramForm program={program} />);

    const second = screen.getByRole('region', { name: 'Phase 2' });
    await user.clear(within(second).getByLabelText('Change speed at least every (minutes)'));
    await user.click(within(second).getByRole('button', { name: 'Move down' }));
    await user.click(screen.getByRole('button', { name: 'Save program' }));

    await screen.findByText('Program saved.');
    const sent = calls[0]?.body as Program;
    expect(sent.phases.map((phase) => phase.id)).toEqual(['p1', 'p3', 'p2']);
    expect(sent.phases[2]?.rules).toEqual({});
  });
});
