import { Column, CreateDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';

export type OutgoingMailState = 'waiting' | 'sent' | 'failed';

/**
 * One e-mail in the outbox. It is written in the same transaction as what it tells about (a
 * sign-off, a return, a reminder), so a crash after the commit never loses it; the mail worker
 * sends it and tries again with growing pauses until the mail server takes it.
 */
@Entity('outgoing_mail')
@Index('IDX_outgoing_mail_due', ['state', 'nextAttemptAt'])
export class OutgoingMail {
  @PrimaryColumn('text')
  id: string;

  @Index()
  @Column('text')
  workshopId: string;

  /** The record whose trail gets "sent" or "not sent" (a run), when there is one. */
  @Column('text', { nullable: true })
  recordType: 'run' | 'engine' | 'user' | 'invite' | null;

  @Column('text', { nullable: true })
  recordId: string | null;

  /** What the trail calls it, e.g. "Certificate C-2026-0004 e-mailed". */
  @Column('text', { default: '' })
  what: string;

  /** Recipients, comma-separated, for the list managers see. */
  @Column('text')
  recipients: string;

  @Column('text')
  subject: string;

  /** The whole message as JSON, attachments in base64 (outgoing-mail-codec.ts). */
  @Column('text')
  message: string;

  @Column('text')
  state: OutgoingMailState;

  @Column({ type: 'integer', default: 0 })
  attempts: number;

  /** When the worker may try next (ms since the epoch). */
  @Column({ type: 'integer' })
  nextAttemptAt: number;

  @Column('text', { nullable: true })
  lastError: string | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @Column({ type: 'datetime', nullable: true })
  sentAt: Date | null;
}
