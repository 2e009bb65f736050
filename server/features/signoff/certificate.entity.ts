import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, Unique } from 'typeorm';
import { Run } from '../runs/run.entity.js';
import type { CertificateContent } from '../../../shared/review/certificate-content.js';

/**
 * The break-in certificate of a signed-off run. `content` is everything printed on it, frozen at
 * sign-off, so the PDF can be checked against (or rebuilt from) what was decided. The PDF itself
 * lives under the data folder at `filePath` (relative to it).
 */
@Entity('certificate')
@Unique('UQ_certificate_workshop_number', ['workshopId', 'number'])
export class Certificate {
  @PrimaryColumn('text')
  id: string;

  @Index('IDX_certificate_run', { unique: true })
  @Column('text')
  runId: string;

  @ManyToOne(() => Run, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'runId' })
  run?: Run;

  @Column('text')
  workshopId: string;

  @Column('text')
  number: string;

  @Column({ type: 'datetime' })
  issuedAt: Date;

  @Column('text')
  issuedById: string;

  @Column('simple-json')
  content: CertificateContent;

  @Column('text')
  filePath: string;

  /** When the PDF was written; null until then (demo certificates are written at first start). */
  @Column({ type: 'datetime', nullable: true })
  storedAt: Date | null;

  @Column({ type: 'integer', nullable: true })
  byteSize: number | null;
}
