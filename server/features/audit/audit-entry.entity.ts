import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/**
 * Who did what to a record, and when: assignment, submission, return, sign-off, certificate
 * issue and download, e-mails sent. Append-only; the actor's name is copied in so the trail
 * still reads right after a person leaves the workshop.
 */
@Entity('audit_entry')
@Index('IDX_audit_entry_record', ['recordType', 'recordId', 'at'])
export class AuditEntry {
  @PrimaryColumn('text')
  id: string;

  @Index()
  @Column('text')
  workshopId: string;

  /** 'run', 'engine', 'user' (an account) or 'invite'. */
  @Column('text')
  recordType: string;

  @Column('text')
  recordId: string;

  @Column('text')
  action: string;

  /** Null when the system did it (a scheduled reminder). */
  @Column({ type: 'text', nullable: true })
  actorId: string | null;

  @Column('text')
  actorName: string;

  @Column({ type: 'datetime' })
  at: Date;

  /** Plain words for the trail: the comments, the certificate number, who was e-mailed. */
  @Column('text', { default: '' })
  detail: string;
}
