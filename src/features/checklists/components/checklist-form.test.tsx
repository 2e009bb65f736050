import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { emptyChecklist } from '../../../../shared/checklists/checklist.schema';
import type { ChecklistView } from '../../../../shared/checklists/checklist-view';
import { evaluateChecklist } from '../../../../shared/checklists/evaluate-checklist';
import type { ChecklistEngine } from '../../../../shared/checklists/evaluation';
import { problem, stubFetch } from '../../../test/fetch-stub';
import { renderPage } from '../../../test/render';
import { useChecklist } from '../api';
import { ChecklistForm } from './checklist-form';

afterEach(() => {
  vi.unstubAllGlobals();
});

// Rated 5000–6000 rpm as makers print it for four-stroke outboards; 12-pole coil (common practice).
const engine: ChecklistEngine = {
  installation: 'outboard',
  ratedRpmMin: 5000,
  ratedRpmMax: 6000,
  gearRatio: 2,
  propPitchIn: 19,
  tachSource: 'charging-coil',
  poles: 12,
  pulleyRatio: null,
};
const engineId = '3f2b8c1e-2d4a-4c6b-9e8f-1a2b3c4d5e6f';
const unsaved: ChecklistView = {
  id: null,
  engineId,
  entries: emptyChecklist(),
  evaluation: evaluateChecklist(emptyChecklist(), engine),
  updatedAt: null,
  updatedBy: null,
  completedAt: null,
  completedBy: null,
  reopened: null,
};
const verdictOf = (region: string) =>
  within(screen.getByRole('region', { name: region }))
    .getAllByText(/^(Pass|Fail|Open|Not applicable)$/)[0]
    .closest('[data-verdict]')!
    .getAttribute('data-verdict');

describe('ChecklistForm', () => {
  it('judges the tachometer as the figures are typed', async () => {
    stubFetch({});
    const user = userEvent.setup();
    renderPage(<ChecklistForm checklist={unsaved} engine={engine} />);

    expect(verdictOf('Tachometer calibration')).toBe('open');
    // 12-pole coil: 300 Hz is 3000 rpm (common practice); 3150 is 5 % over, outside ±3 %.
    await user.type(screen.getByLabelText('Measured frequency (Hz)'), '300');
    await user.type(screen.getByLabelText('Helm tachometer showed (RPM)'), '3150');
    expect(verdictOf('Tachometer calibration')).toBe('fail');
    expect(
      screen.getByText('The tachometer reads +5.0 % off the true speed; it should be within ±3 %.'),
    ).toBeInTheDocument();
  });

  it('sends numbers and lists what stops completion, item by item', async () => {
    const completionProblems = [
      {
        field: 'charging',
        message: 'Charging voltage at cruising RPM: not finished. Choose the battery chemistry.',
      },
      {
        field: 'checks.killSwitch',
        message: 'Kill switch and lanyard: not finished. Not checked yet.',
      },
    ];
    const { calls } = stubFetch({
      [`POST /api/engines/${engineId}/checklist/complete`]: problem(
        400,
        'The request has invalid fields',
        'The checklist cannot be completed yet: 2 items need attention. What you entered is saved as a draft.',
        completionProblems,
      ),
    });
    const user = userEvent.setup();
    renderPage(<ChecklistForm checklist={unsaved} engine={engine} />);

    await user.type(screen.getByLabelText('Voltage at the battery (V)'), '14,4');
    await user.click(
      within(screen.getByRole('radiogroup', { name: 'Steering' })).getByText('Pass'),
    );
    await user.click(screen.getByRole('button', { name: 'Complete checklist' }));

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Not completed yet');
    expect(alert).toHaveTextContent(
      'Charging voltage at cruising RPM: not finished. Choose the battery chemistry.',
    );
    expect(alert).toHaveTextContent('Kill switch and lanyard: not finished.');
    expect(alert).toHaveTextContent('What you entered is saved as a draft.');
    // Nothing typed is lost: the form still holds it.
    expect(screen.getByLabelText('Voltage at the battery (V)')).toHaveValue('14,4');
    expect(calls[0].body).toMatchObject({
      charging: { measuredV: 14.4, chemistry: null },
      checks: { steering: { result: 'pass' }, leaks: { result: null } },
    });
  });

  it('names a measured value that is not a number', async () => {
    const { fetchMock } = stubFetch({});
    const user = userEvent.setup();
    renderPage(<ChecklistForm checklist={unsaved} engine={engine} />);
    await user.type(screen.getByLabelText('Full-throttle RPM', { selector: 'input' }), 'flat out');
    await user.click(screen.getByRole('button', { name: 'Save for later' }));
    expect(await screen.findByText('Full-throttle RPM must be a number.')).toBeInTheDocument();
    expect(fetchMock).not.toHaveBeenCalled();
  });
});

/** The checklist as the page shows it: read from the query cache, so a reopen shows at once. */
function ChecklistFromCache() {
  const checklist = useChecklist(engineId);
  return checklist.data ? <ChecklistForm checklist={checklist.data} engine={engine} /> : null;
}

describe('reopening a completed checklist', () => {
  const completed: ChecklistView = {
    ...unsaved,
    id: 'a9b8c7d6-0000-4000-8000-000000000001',
    updatedAt: '2026-11-20T14:30:00.000Z',
    updatedBy: { id: 'u1', name: 'Maren Holt' },
    completedAt: '2026-11-20T14:30:00.000Z',
    completedBy: { id: 'u1', name: 'Maren Holt' },
  };
  const reason = 'Regulator replaced: the charging check is measured again.';

  it('asks for the reason, then lets the checklist be edited and completed again', async () => {
    const { calls } = stubFetch({
      [`GET /api/engines/${engineId}/checklist`]: { status: 200, body: { checklist: completed } },
      [`POST /api/engines/${engineId}/checklist/reopen`]: {
        status: 200,
        body: {
          checklist: {
            ...completed,
            completedAt: null,
            completedBy: null,
            reopened: { at: '2026-11-22T09:00:00.000Z', byName: 'Ivo Brandt', reason },
          },
        },
      },
    });
    const user = userEvent.setup();
    renderPage(<ChecklistFromCache />);

    await user.click(await screen.findByRole('button', { name: 'Reopen the checklist' }));
    expect(screen.queryByRole('button', { name: 'Complete checklist' })).toBeNull();
    await user.click(screen.getByRole('button', { name: 'Reopen checklist' }));
    expect(
      await screen.findByText('Give the reason (reason) for reopening the checklist.'),
    ).toBeInTheDocument();
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);

    await user.type(screen.getByLabelText('Reason for reopening'), reason);
    await user.click(screen.getByRole('button', { name: 'Reopen checklist' }));

    expect(await screen.findByRole('button', { name: 'Complete checklist' })).toBeInTheDocument();
    expect(
      screen.getByText(`Reopened by Ivo Brandt on 22 Nov 2026: ${reason}`),
    ).toBeInTheDocument();
    expect(screen.getByLabelText('Voltage at the battery (V)')).toBeEnabled();
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ reason });
  });
});
