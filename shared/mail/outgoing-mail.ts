/** One e-mail in the workshop's outbox, as managers see it on the Team page. */
export interface OutgoingMailView {
  id: string;
  recipients: string;
  subject: string;
  state: 'waiting' | 'sent' | 'failed';
  attempts: number;
  lastError: string | null;
  createdAt: string;
  sentAt: string | null;
  /** When a waiting e-mail is tried next. */
  nextAttemptAt: string | null;
}
