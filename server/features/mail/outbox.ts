import { randomUUID } from 'node:crypto';
import { In, LessThanOrEqual, type DataSource, type EntityManager } from 'typeorm';
import type { Clock } from '../../lib/clock.js';
import type { Logger } from '../../lib/logger.js';
import { WORKSHOP_HEADER, type Mailer, type MailMessage } from '../../lib/mailer.js';
import { recordAudit } from '../audit/audit.service.js';
import { decodeMessage, encodeMessage } from './outgoing-mail-codec.js';
import { OutgoingMail } from './outgoing-mail.entity.js';

/** What became of an e-mail's first try: callers report it to the person. */
export type MailOutcome =
  { sent: true; to: string[] } | { sent: false; to: string[]; problem: string };

/** The record an e-mail is about, whose trail says whether it went. */
export type MailAbout = {
  recordType: 'run' | 'engine' | 'user' | 'invite';
  recordId: string;
  what: string;
};

/** Tries before the outbox gives up on an e-mail: about a day with the pauses below. */
export const MAX_ATTEMPTS = 10;

/** Pause after the n-th failed try: 1, 2, 4 … minutes, at most two hours. */
export const retryPauseMs = (attempts: number) =>
  Math.min(2 * 60 * 60_000, 60_000 * 2 ** Math.max(0, attempts - 1));

const NO_SERVER = 'No mail server is set up (SMTP_HOST), so e-mail waits in the outbox.';
const REFUSED = 'The mail server did not take the e-mail';
const ON_ITS_WAY = 'The e-mail is being sent from the outbox.';
/** How long one try holds an e-mail before another may take it. */
const CLAIM_MS = 5 * 60_000;

/**
 * The app's e-mails, through a table. `enqueue` writes one inside the caller's transaction, so
 * it commits with what it is about; `deliver` tries it at once after the commit; the worker
 * (mail-worker.ts) sends what is due, again after a restart, with growing pauses between tries.
 * A failed send never undoes what the e-mail is about.
 */
export class Outbox {
  constructor(
    private readonly dataSource: DataSource,
    private readonly mailer: Mailer | null,
    private readonly logger: Logger,
    private readonly clock: Clock,
  ) {}

  async enqueue(
    manager: EntityManager,
    workshopId: string,
    message: MailMessage,
    about?: MailAbout,
  ): Promise<string> {
    const id = randomUUID();
    const to = message.to.filter(Boolean);
    await manager.getRepository(OutgoingMail).insert({
      id,
      workshopId,
      recordType: about?.recordType ?? null,
      recordId: about?.recordId ?? null,
      what: about?.what ?? '',
      recipients: to.join(', '),
      subject: message.subject,
      message: encodeMessage({ ...message, to }),
      state: to.length === 0 ? 'failed' : 'waiting',
      attempts: 0,
      nextAttemptAt: this.clock.now().getTime(),
      lastError: to.length === 0 ? 'There is no e-mail address to send to.' : null,
      sentAt: null,
    });
    return id;
  }

  /** Writes an e-mail in a transaction of its own and tries it at once. */
  async send(workshopId: string, message: MailMessage, about?: MailAbout): Promise<MailOutcome> {
    const id = await this.dataSource.transaction((m) =>
      this.enqueue(m, workshopId, message, about),
    );
    return (await this.deliver([id]))[0];
  }

  /** Tries the given e-mails now (after their commit); what became of each. */
  async deliver(ids: string[]): Promise<MailOutcome[]> {
    const rows = await this.dataSource.getRepository(OutgoingMail).findBy({ id: In(ids) });
    const byId = new Map(rows.map((r) => [r.id, r]));
    const outcomes: MailOutcome[] = [];
    for (const id of ids) outcomes.push(await this.attempt(byId.get(id)!));
    return outcomes;
  }

  /** Sends every e-mail whose next try is due; the number sent. */
  async deliverDue(): Promise<number> {
    if (!this.mailer) return 0;
    const due = await this.dataSource.getRepository(OutgoingMail).find({
      where: { state: 'waiting', nextAttemptAt: LessThanOrEqual(this.clock.now().getTime()) },
      order: { nextAttemptAt: 'ASC' },
      take: 50,
    });
    let sent = 0;
    for (const row of due) if ((await this.attempt(row)).sent) sent++;
    return sent;
  }

  private async attempt(row: OutgoingMail): Promise<MailOutcome> {
    const to = row.recipients ? row.recipients.split(', ') : [];
    if (row.state === 'sent') return { sent: true, to };
    if (row.state === 'failed') return { sent: false, to, problem: row.lastError ?? REFUSED };
    if (!this.mailer) {
      if (row.lastError !== NO_SERVER)
        await this.note(row, { lastError: NO_SERVER }, 'mail-failed', `${row.what}: ${NO_SERVER}`);
      return { sent: false, to, problem: NO_SERVER };
    }
    if (!(await this.claim(row))) return { sent: false, to, problem: ON_ITS_WAY };
    const message = decodeMessage(row.message);
    try {
      await this.mailer.send({
        ...message,
        headers: { ...message.headers, [WORKSHOP_HEADER]: row.workshopId },
      });
    } catch (error) {
      return { sent: false, to, problem: await this.noteFailure(row, error) };
    }
    const change = { state: 'sent' as const, sentAt: this.clock.now(), lastError: null };
    await this.note(row, change, 'mail-sent', `${row.what} to ${row.recipients}`);
    return { sent: true, to };
  }

  /**
   * Takes the e-mail for this try, so the worker and a request never both send it; a process
   * that dies mid-send leaves it to be tried again once the claim runs out.
   */
  private async claim(row: OutgoingMail): Promise<boolean> {
    const now = this.clock.now().getTime();
    const { affected } = await this.dataSource
      .getRepository(OutgoingMail)
      .update(
        { id: row.id, state: 'waiting', nextAttemptAt: LessThanOrEqual(now) },
        { nextAttemptAt: now + CLAIM_MS },
      );
    return affected === 1;
  }

  private async noteFailure(row: OutgoingMail, error: unknown): Promise<string> {
    this.logger.warn(
      { err: error, subject: row.subject, via: this.mailer?.describe },
      'e-mail not sent',
    );
    const attempts = row.attempts + 1;
    const reason = `${REFUSED} (${(error as Error).message ?? 'no answer'})`;
    const givingUp = attempts >= MAX_ATTEMPTS;
    const problem = givingUp
      ? `${reason}; gave up after ${attempts} tries.`
      : `${reason}; it waits in the outbox and is tried again automatically.`;
    const change = givingUp
      ? { state: 'failed' as const, attempts, lastError: problem }
      : {
          attempts,
          lastError: problem,
          nextAttemptAt: this.clock.now().getTime() + retryPauseMs(attempts),
        };
    // The trail notes the first failure and the last; the tries between are on the outbox list.
    const trail = attempts === 1 || givingUp ? `${row.what}: ${problem}` : null;
    await this.note(row, change, 'mail-failed', trail);
    return problem;
  }

  private async note(
    row: OutgoingMail,
    change: Partial<OutgoingMail>,
    action: 'mail-sent' | 'mail-failed',
    trail: string | null,
  ) {
    await this.dataSource.transaction(async (manager) => {
      await manager.getRepository(OutgoingMail).update({ id: row.id }, change);
      if (trail && row.recordType && row.recordId)
        await recordAudit(manager, {
          workshopId: row.workshopId,
          recordType: row.recordType,
          recordId: row.recordId,
          action,
          actor: null,
          at: this.clock.now(),
          detail: trail,
        });
    });
    Object.assign(row, change);
  }
}
