import { Column, CreateDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';
import type { AttachmentRecordType } from '../../../shared/attachments/attachment.schema.js';

/** A photo or document on an engine, a checklist or a run; the file itself lives under data/uploads. */
@Entity('attachment')
@Index('IDX_attachment_record', ['recordType', 'recordId'])
export class Attachment {
  /** Made by the client when it can be (the on-deck sync retries with the same id). */
  @PrimaryColumn('text')
  id: string;

  @Index()
  @Column('text')
  workshopId: string;

  @Column('text')
  recordType: AttachmentRecordType;

  @Column('text')
  recordId: string;

  @Column('text', { default: '' })
  caption: string;

  /** The name the file had on the uploader's device; shown, never used as a path. */
  @Column('text')
  originalName: string;

  /** The type found by reading the file's content, not the one the client claimed. */
  @Column('text')
  mimeType: string;

  @Column({ type: 'integer' })
  sizeBytes: number;

  /** Path under the uploads folder: `<workshopId>/<a name made for each upload>.<ext>`. */
  @Column('text')
  storedName: string;

  @Column('text')
  uploadedById: string;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
