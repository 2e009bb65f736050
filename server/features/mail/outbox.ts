import type { Logger } from '../../lib/logger.js';
import { WORKSHOP_HEADER, type Mailer, type MailMessage } from '../../lib/mailer.js';

/** What became of an e-mail: callers report it to the person and keep it in the audit trail. */
export type MailOutcome =
  { sent: true; to: string[] } | { sent: false; to: string[]; problem: string };

/**
 * Sends the app's e-mails. A failed send never undoes what the e-mail is about (a sign-off stays
 * signed off, an invite stays valid): the outcome goes back to the caller to show and record.
 */
export class Outbox {
  constructor(
    private readonly mailer: Mailer | null,
    private readonly logger: Logger,
  ) {}

  /** Sends an e-mail on behalf of one workshop (its id travels in a header; see WORKSHOP_HEADER). */
  async send(workshopId: string, message: MailMessage): Promise<MailOutcome> {
    const to = message.to.filter(Boolean);
    if (to.length === 0)
      return { sent: false, to, problem: 'There is no e-mail address to send to.' };
    if (!this.mailer)
      return {
        sent: false,
        to,
        problem: 'No mail server is set up (SMTP_HOST), so the e-mail was not sent.',
      };
    try {
      await this.mailer.send({
        ...message,
        to,
        headers: { ...message.headers, [WORKSHOP_HEADER]: workshopId },
      });
      return { sent: true, to };
    } catch (error) {
      this.logger.warn(
        { err: error, subject: message.subject, via: this.mailer.describe },
        'e-mail not sent',
      );
      return {
        sent: false,
        to,
        problem: 'The mail server did not accept the e-mail; try again later.',
      };
    }
  }
}

/** One line for the audit trail. */
export const outcomeWords = (what: string, outcome: MailOutcome): string =>
  outcome.sent ? `${what} to ${outcome.to.join(', ')}` : `${what}: ${outcome.problem}`;
