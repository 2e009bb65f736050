import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { Program } from '../../../../shared/programs/program.schema';
import { problem, stubFetch } from '../../../test/fetch-stub';
import { renderPage } from '../../../test/render';
import type { ProgramDetail } from '../api';
import { ProgramForm } from './program-form';

afterEach(() => {
  vi.unstubAllGlobals();
});

const id = '6c1d2e3f-4a5b-4c6d-8e7f-9a0b1c2d3e4f';

// Figures below are common practice for a small outboard, not one maker's schedule.
const definition: Program = {
  name: 'Workshop outboard break-in',
  suits: { engineKind: 'outboard-4-stroke', label: '' },
  firstService: { hours: 20, months: 1 }, // common practice; BoatUS "Long Life – Outboard Maintenance"
  notes: '',
  source: 'Common practice; the engine maker’s manual comes first.',
  phases: [
    {
      id: 'p1',
      name: 'Dock run at idle',
      performedBy: 'workshop',
      requiredMinutes: 15,
      throttleCeiling: 'idle', // common practice
      band: { kind: 'share-of-rated', shareMin: 0, shareMax: 0.2 },
      rules: {},
      instructions: 'Check the tell-tale stream.',
    },
    {
      id: 'p2',
      name: 'Below half throttle',
      performedBy: 'skipper',
      requiredMinutes: 60,
      throttleCeiling: 'half', // common practice
      band: { kind: 'share-of-rated', shareMin: 0, shareMax: 0.5 },
      rules: { changeSpeedEveryMinutes: 15 },
      instructions: 'Vary speed.',
    },
    {
      id: 'p3',
      name: 'Up to three-quarter',
      performedBy: 'skipper',
      requiredMinutes: 60,
      throttleCeiling: 'three-quarter', // common practice
      band: { kind: 'absolute', rpmMin: 2000, rpmMax: 4500 },
      rules: {},
      instructions: 'Vary speed.',
    },
  ],
};

const program: ProgramDetail = {
  id,
  name: definition.name,
  builtInKey: null,
  copiedFromId: null,
  retiredAt: null,
  suits: definition.suits,
  phaseCount: 3,
  totalMinutes: 135,
  firstService: definition.firstService,
  updatedAt: '2026-05-02T08:00:00.000Z',
  definition,
};

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

describe('ProgramForm band units', () => {
  const echo = () =>
    stubFetch({
      [`PUT /api/programs/${id}`]: ({ body }) => ({
        status: 200,
        body: { program: { ...program, definition: body } },
      }),
    });

  it('shows a share band in percent and stores what is typed as a share', async () => {
    const { calls } = echo();
    const user = userEvent.setup();
    renderPage(<ProgramForm program={program} />);

    const first = screen.getByRole('region', { name: 'Phase 1' });
    expect(within(first).getByLabelText('Band given in')).toHaveValue('percent-of-rated');
    expect(within(first).getByLabelText('Highest % of rated rpm')).toHaveValue('20');
    await user.clear(within(first).getByLabelText('Highest % of rated rpm'));
    await user.type(within(first).getByLabelText('Highest % of rated rpm'), '33,33');

    const third = screen.getByRole('region', { name: 'Phase 3' });
    expect(within(third).getByLabelText('Highest rpm')).toHaveValue('4500');
    await user.selectOptions(within(third).getByLabelText('Band given in'), 'percent-of-rated');
    await user.type(within(third).getByLabelText('Lowest % of rated rpm'), '30');
    await user.type(within(third).getByLabelText('Highest % of rated rpm'), '75'); // three-quarter (common practice)
    await user.click(screen.getByRole('button', { name: 'Save program' }));

    await screen.findByText('Program saved.');
    const sent = calls[0]?.body as Program;
    expect(sent.phases.map((phase) => phase.band)).toEqual([
      { kind: 'share-of-rated', shareMin: 0, shareMax: 0.333 },
      { kind: 'share-of-rated', shareMin: 0, shareMax: 0.5 },
      { kind: 'share-of-rated', shareMin: 0.3, shareMax: 0.75 },
    ]);
    // After the save the form shows the stored program in percent again.
    expect(
      within(screen.getByRole('region', { name: 'Phase 1' })).getByLabelText(
        'Highest % of rated rpm',
      ),
    ).toHaveValue('33.3');
  });

  it('switches a band to engine rpm and names a percent out of range by its field', async () => {
    const { calls, fetchMock } = echo();
    const user = userEvent.setup();
    renderPage(<ProgramForm program={program} />);

    const second = screen.getByRole('region', { name: 'Phase 2' });
    await user.clear(within(second).getByLabelText('Highest % of rated rpm'));
    await user.type(within(second).getByLabelText('Highest % of rated rpm'), '120');
    await user.click(screen.getByRole('button', { name: 'Save program' }));
    expect(
      await within(second).findByText(
        'The highest percent of the band (percentMax) cannot be above 100 %.',
      ),
    ).toBeInTheDocument();
    expect(fetchMock).not.toHaveBeenCalled();

    await user.selectOptions(within(second).getByLabelText('Band given in'), 'absolute');
    await user.type(within(second).getByLabelText('Lowest rpm'), '1500');
    await user.type(within(second).getByLabelText('Highest rpm'), '3000');
    await user.click(screen.getByRole('button', { name: 'Save program' }));
    await screen.findByText('Program saved.');
    expect((calls[0]?.body as Program).phases[1]?.band).toEqual({
      kind: 'absolute',
      rpmMin: 1500,
      rpmMax: 3000,
    });
  });

  it('puts the server’s share-field error on the percent field it came from', async () => {
    const message = 'The highest share of the band (shareMax) must be above its lowest share.';
    stubFetch({
      [`PUT /api/programs/${id}`]: problem(400, 'Invalid program', 'Check the marked fields.', [
        { field: 'phases.0.band.shareMax', message },
      ]),
    });
    const user = userEvent.setup();
    renderPage(<ProgramForm program={program} />);
    await user.click(screen.getByRole('button', { name: 'Save program' }));
    const first = screen.getByRole('region', { name: 'Phase 1' });
    expect(await within(first).findByText(message)).toBeInTheDocument();
    expect(within(first).getByLabelText('Highest % of rated rpm')).toHaveAttribute(
      'aria-invalid',
      'true',
    );
  });
});
