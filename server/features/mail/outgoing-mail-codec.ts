import type { MailMessage } from '../../lib/mailer.js';

/* An e-mail as it waits in the outbox: JSON text, attachment contents in base64. */

type StoredMessage = Omit<MailMessage, 'attachments'> & {
  attachments?: Array<{ filename: string; content: string; contentType: string }>;
};

export function encodeMessage(message: MailMessage): string {
  const stored: StoredMessage = {
    ...message,
    attachments: message.attachments?.map((a) => ({ ...a, content: a.content.toString('base64') })),
  };
  return JSON.stringify(stored);
}

export function decodeMessage(text: string): MailMessage {
  const stored = JSON.parse(text) as StoredMessage;
  return {
    ...stored,
    attachments: stored.attachments?.map((a) => ({
      ...a,
      content: Buffer.from(a.content, 'base64'),
    })),
  };
}
