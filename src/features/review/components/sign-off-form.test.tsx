import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { problem, stubFetch } from '../../../test/fetch-stub';
import { renderPage } from '../../../test/render';
import { SignOffForm } from './sign-off-form';

afterEach(() => {
  vi.unstubAllGlobals();
});

const runId = '7c1d2e3f-4a5b-4c6d-8e7f-0a1b2c3d4e5f';
const phases = [
  { id: 'p1', name: 'First hour' },
  { id: 'p2', name: 'Second hour' },
];
const decided = {
  state: 'returned',
  certificate: null,
  mail: { sent: true, to: ['crew@example.com'] },
};

describe('SignOffForm', () => {
  it('asks for comments before returning a run, naming the field, and sends nothing', async () => {
    const { calls } = stubFetch({});
    const user = userEvent.setup();
    renderPage(<SignOffForm runId={runId} verdict="incomplete" phases={phases} />);
    await user.click(screen.getByRole('radio', { name: /Return to the skipper/ }));
    await user.click(screen.getByRole('button', { name: 'Return the run' }));
    expect(
      await screen.findByText('Write what the skipper should do (comments) when you return a run.'),
    ).toBeInTheDocument();
    expect(screen.getByLabelText('Comments', { exact: true })).toHaveAttribute(
      'aria-invalid',
      'true',
    );
    expect(calls).toEqual([]);
  });

  it("puts the server's reason on the comments field when a run with a broken rule is confirmed without one", async () => {
    stubFetch({
      [`POST /api/runs/${runId}/sign-off`]: problem(
        400,
        'The request has invalid fields',
        'Some fields need attention.',
        [
          {
            field: 'comments',
            message:
              'This run is not judged complete by the computation: say why you confirm it anyway (comments).',
          },
        ],
      ),
    });
    const user = userEvent.setup();
    renderPage(<SignOffForm runId={runId} verdict="breached" phases={phases} />);
    expect(
      screen.getByText(/does not judge this run complete: say why you confirm it/),
    ).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Sign off the run' }));
    expect(
      await screen.findByText(
        'This run is not judged complete by the computation: say why you confirm it anyway (comments).',
      ),
    ).toBeInTheDocument();
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('sends the decision and hands the answer on', async () => {
    const { calls } = stubFetch({
      [`POST /api/runs/${runId}/sign-off`]: { status: 200, body: decided },
    });
    const onDecided = vi.fn();
    const user = userEvent.setup();
    renderPage(
      <SignOffForm runId={runId} verdict="incomplete" phases={phases} onDecided={onDecided} />,
    );
    await user.click(screen.getByRole('radio', { name: /Return to the skipper/ }));
    await user.type(
      screen.getByLabelText('Comments', { exact: true }),
      '  Finish the dock run first.  ',
    );
    await user.click(screen.getByRole('checkbox', { name: 'Second hour' }));
    await user.click(screen.getByRole('button', { name: 'Return the run' }));
    await vi.waitFor(() => expect(onDecided).toHaveBeenCalledWith(decided));
    expect(calls[0]).toMatchObject({
      method: 'POST',
      body: { decision: 'return', comments: 'Finish the dock run first.', rerunPhaseIds: ['p2'] },
    });
  });

  it('asks which phases to run again before returning a run, and sends nothing', async () => {
    const { calls } = stubFetch({});
    const user = userEvent.setup();
    renderPage(<SignOffForm runId={runId} verdict="incomplete" phases={phases} />);
    await user.click(screen.getByRole('radio', { name: /Return to the skipper/ }));
    await user.type(screen.getByLabelText('Comments', { exact: true }), 'Run it again.');
    await user.click(screen.getByRole('button', { name: 'Return the run' }));
    expect(
      await screen.findByText(
        'Choose at least one phase to run again (rerunPhaseIds) when you return a run.',
      ),
    ).toBeInTheDocument();
    expect(calls).toEqual([]);
  });

  it('says plainly when the run was decided elsewhere in the meantime', async () => {
    stubFetch({
      [`POST /api/runs/${runId}/sign-off`]: problem(
        409,
        'Conflict',
        'This run is already signed off; a signed-off run cannot be changed.',
        [{ field: 'decision', message: 'This run is already signed off.' }],
      ),
    });
    const user = userEvent.setup();
    renderPage(<SignOffForm runId={runId} verdict="complete" phases={phases} />);
    await user.click(screen.getByRole('button', { name: 'Sign off the run' }));
    expect(await screen.findByText('This run is already signed off.')).toBeInTheDocument();
  });
});
