import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { problem, stubFetch } from '../../../test/fetch-stub';
import { renderPage } from '../../../test/render';
import { FirstServiceForm } from './first-service-form';

afterEach(() => {
  vi.unstubAllGlobals();
});

const engineId = '7c1e2d3a-4b5c-4d6e-8f90-a1b2c3d4e5f6';
const path = `POST /api/engines/${engineId}/services`;
const form = () => (
  <FirstServiceForm engineId={engineId} defaultDoneBy="Ada Harbour" today="2026-12-01" />
);

describe('FirstServiceForm', () => {
  it('names the hour meter and who did it when they are missing, sending nothing', async () => {
    const { fetchMock } = stubFetch({});
    const user = userEvent.setup();
    renderPage(form());

    expect(screen.getByLabelText('Date')).toHaveValue('2026-12-01');
    expect(screen.getByLabelText('Done by')).toHaveValue('Ada Harbour');
    await user.clear(screen.getByLabelText('Done by'));
    await user.click(screen.getByRole('button', { name: 'Save first service' }));

    expect(screen.getByLabelText('Hour meter')).toHaveAccessibleDescription(
      expect.stringContaining('Enter the hour meter reading at the service (hourMeter) in hours.'),
    );
    expect(screen.getByLabelText('Done by')).toHaveAccessibleDescription(
      'Enter who did the service (doneBy).',
    );
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it("puts the server's refusals on the date and hour meter fields", async () => {
    stubFetch({
      [path]: problem(400, 'The request has invalid fields', 'Some fields need attention.', [
        {
          field: 'date',
          message: 'The date of the service (date) cannot be before commissioning on 27 Nov 2026.',
        },
        {
          field: 'hourMeter',
          message:
            'The hour meter reading (hourMeter) cannot be below 2.0 h, its reading at commissioning.',
        },
      ]),
    });
    const user = userEvent.setup();
    renderPage(form());

    await user.clear(screen.getByLabelText('Date'));
    await user.type(screen.getByLabelText('Date'), '2026-11-20');
    await user.type(screen.getByLabelText('Hour meter'), '1,5');
    await user.click(screen.getByRole('button', { name: 'Save first service' }));

    expect(await screen.findByLabelText('Date')).toHaveAccessibleDescription(
      'The date of the service (date) cannot be before commissioning on 27 Nov 2026.',
    );
    expect(screen.getByLabelText('Hour meter')).toHaveAccessibleDescription(
      expect.stringContaining('cannot be below 2.0 h, its reading at commissioning.'),
    );
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('sends the checked values and tells the page it was saved', async () => {
    const { calls } = stubFetch({
      [path]: {
        status: 201,
        body: {
          service: {
            id: 's-1',
            date: '2026-12-01',
            hourMeter: 24.5,
            doneBy: 'Ada Harbour',
            notes: 'Oil and filter.',
            recordedAt: '2026-12-01T09:00:00.000Z',
            recordedBy: { id: 'user-technician', name: 'Ada Harbour' },
          },
        },
      },
    });
    const onSaved = vi.fn();
    const user = userEvent.setup();
    renderPage(
      <FirstServiceForm
        engineId={engineId}
        defaultDoneBy="Ada Harbour"
        today="2026-12-01"
        onSaved={onSaved}
      />,
    );

    await user.type(screen.getByLabelText('Hour meter'), '24.5');
    await user.type(screen.getByLabelText('Notes'), 'Oil and filter.');
    await user.click(screen.getByRole('button', { name: 'Save first service' }));

    await vi.waitFor(() => expect(onSaved).toHaveBeenCalled());
    expect(calls[0].body).toEqual({
      date: '2026-12-01',
      hourMeter: 24.5,
      doneBy: 'Ada Harbour',
      notes: 'Oil and filter.',
    });
    expect(onSaved.mock.calls[0][0]).toMatchObject({ attachmentProblem: null });
  });
});
