import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { problem, stubFetch } from '../../../test/fetch-stub';
import { renderPage } from '../../../test/render';
import { VoidReading } from './void-reading';

afterEach(() => {
  vi.unstubAllGlobals();
});

const runId = '7c1d2e3f-4a5b-4c6d-8e7f-0a1b2c3d4e5f';
const readingId = '0b1c2d3e-4f50-4617-8293-a4b5c6d7e8f9';

describe('VoidReading', () => {
  it('asks the reason, sends the void and shows a refusal naming the field', async () => {
    const { calls } = stubFetch({
      [`POST /api/runs/${runId}/voids`]: problem(400, 'Invalid', 'Fix the reason.', [
        { field: 'reason', message: 'Say why the entry is voided (reason).' },
      ]),
    });
    const user = userEvent.setup();
    renderPage(<VoidReading runId={runId} readingId={readingId} />);
    await user.click(screen.getByRole('button', { name: 'Void' }));
    await user.type(screen.getByLabelText('Reason'), 'Tachometer read twice.');
    await user.click(screen.getByRole('button', { name: 'Void entry' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'Say why the entry is voided (reason).',
    );
    expect(calls[0]).toMatchObject({
      method: 'POST',
      body: { targetId: readingId, reason: 'Tachometer read twice.' },
    });
  });
});
