import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MAX_ATTACHMENT_BYTES } from '../../../../shared/attachments/attachment.schema';
import { renderPage } from '../../../test/render';
import { AttachmentPanel } from './attachment-panel';

afterEach(() => {
  vi.unstubAllGlobals();
});

const engineId = '3f2b8c1e-2d4a-4c6b-9e8f-1a2b3c4d5e6f';
const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), {
    status,
    headers: { 'Content-Type': status >= 400 ? 'application/problem+json' : 'application/json' },
  });

/** The network boundary: lists answer empty; uploads answer what the test says and are recorded. */
function stubNetwork(uploadAnswer: () => Response) {
  const uploads: FormData[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (_input: RequestInfo | URL, init: RequestInit = {}) => {
      if ((init.method ?? 'GET') === 'GET') return json(200, { attachments: [] });
      uploads.push(init.body as FormData);
      return uploadAnswer();
    }),
  );
  return uploads;
}

describe('AttachmentPanel', () => {
  it('refuses a file over the limit before sending it, naming the file', async () => {
    const uploads = stubNetwork(() => json(201, {}));
    const user = userEvent.setup();
    renderPage(<AttachmentPanel recordType="engine" recordId={engineId} canAdd />);

    const big = new File([new Uint8Array(MAX_ATTACHMENT_BYTES + 1)], 'whole-manual.pdf', {
      type: 'application/pdf',
    });
    await user.upload(await screen.findByLabelText('Photo or document'), big);
    await user.click(screen.getByRole('button', { name: 'Attach file' }));

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'whole-manual.pdf is larger than 10 MB.',
    );
    expect(uploads).toHaveLength(0);
  });

  it('sends the file with a client-made id and shows the server’s content-type refusal', async () => {
    const detail =
      'photo.jpg cannot be attached: its content is not a recognised photo or document format.';
    const uploads = stubNetwork(() =>
      json(415, {
        type: '/problems/unsupported-file-type',
        title: 'Unsupported file type',
        status: 415,
        detail,
        errors: [{ field: 'file', message: detail }],
      }),
    );
    const user = userEvent.setup();
    renderPage(<AttachmentPanel recordType="engine" recordId={engineId} canAdd />);

    await user.upload(
      await screen.findByLabelText('Photo or document'),
      new File(['just some notes'], 'photo.jpg', { type: 'image/jpeg' }),
    );
    await user.type(screen.getByLabelText('Caption (optional)'), 'Hour meter');
    await user.click(screen.getByRole('button', { name: 'Attach file' }));

    expect(await screen.findByRole('alert')).toHaveTextContent(detail);
    const sent = uploads[0];
    expect(sent.get('recordType')).toBe('engine');
    expect(sent.get('recordId')).toBe(engineId);
    expect(sent.get('caption')).toBe('Hour meter');
    expect(String(sent.get('id'))).toMatch(/^[0-9a-f-]{36}$/);
    expect((sent.get('file') as File).name).toBe('photo.jpg');
  });

  it('asks for a file when none is chosen', async () => {
    stubNetwork(() => json(201, {}));
    const user = userEvent.setup();
    renderPage(<AttachmentPanel recordType="engine" recordId={engineId} canAdd />);
    await user.click(await screen.findByRole('button', { name: 'Attach file' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Choose a photo or document first.');
  });
});
