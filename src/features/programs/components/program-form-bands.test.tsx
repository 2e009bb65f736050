import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { Program } from '../../../../shared/programs/program.schema';
import { problem, stubFetch } from '../../../test/fetch-stub';
import { renderPage } from '../../../test/render';
import { ProgramForm } from './program-form';
import { id, program } from './program-test-data';

afterEach(() => {
  vi.unstubAllGlobals();
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
