import { randomUUID } from 'node:crypto';
import { In, type DataSource } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import {
  ACCEPTED_FILE_TYPES,
  type AcceptedMimeType,
  MAX_ATTACHMENTS_PER_RECORD,
  type AttachmentListQuery,
  type AttachmentUploadFields,
  type AttachmentView,
} from '../../../shared/attachments/attachment.schema.js';
import { ConflictError, HttpError, NotFoundError, ValidationError } from '../../lib/errors.js';
import { User } from '../users/user.entity.js';
import { findAttachableRecord, findVisibleRecord } from './attachment-records.js';
import {
  fullRecordError,
  insertWithinLimit,
  isRepeatedId,
  type NewAttachment,
} from './attachment-insert.js';
import type { AttachmentStorage } from './attachment-storage.js';
import { Attachment } from './attachment.entity.js';
import { sniffAcceptedType } from './receive-file.js';

export interface UploadedFile {
  buffer: Buffer;
  originalname: string;
  size: number;
}

/** Keeps a device's file name readable but harmless: no control characters or path separators. */
const cleanName = (name: string) =>
  Array.from(name, (ch) =>
    ch.charCodeAt(0) < 0x20 || ch.charCodeAt(0) === 0x7f || ch === '/' || ch === '\\' ? '_' : ch,
  )
    .join('')
    .slice(-120) || 'file';

export class AttachmentsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly storage: AttachmentStorage,
  ) {}

  /**
   * Stores one file on a record. A repeated client-made id returns what is stored (created:
   * false) instead of a second copy, so the on-deck sync may retry freely, even while its first
   * try is still arriving. The file is on disk before its row commits; a refused row takes its
   * file away again, and every try writes under a name of its own, so no try removes another's.
   */
  async upload(
    user: SessionUser,
    fields: AttachmentUploadFields,
    file: UploadedFile | undefined,
  ): Promise<{ attachment: AttachmentView; created: boolean }> {
    const record = await findAttachableRecord(
      this.dataSource.manager,
      user,
      fields.recordType,
      fields.recordId,
    );
    const repeat = await this.repeated(fields, user);
    if (repeat) return { attachment: await this.view(repeat), created: false };
    if (!file) throw new ValidationError([{ field: 'file', message: 'Choose a file to attach.' }]);
    await this.refuseWhenFull(fields);
    const row = this.newRow(user, record.workshopId, fields, file, await sniffAcceptedType(file));
    await this.storage.write(row.storedName, file.buffer);
    let stored: boolean;
    try {
      stored = await this.dataSource.transaction(async (manager) =>
        insertWithinLimit(manager, row),
      );
    } catch (error) {
      await this.storage.remove(row.storedName);
      const first = isRepeatedId(error) ? await this.repeated(fields, user) : null;
      if (first) return { attachment: await this.view(first), created: false };
      throw error;
    }
    if (!stored) {
      await this.storage.remove(row.storedName);
      throw fullRecordError(fields.recordType);
    }
    const saved = await this.dataSource.getRepository(Attachment).findOneByOrFail({ id: row.id });
    return { attachment: await this.view(saved), created: true };
  }

  private newRow(
    user: SessionUser,
    workshopId: string,
    fields: AttachmentUploadFields,
    file: UploadedFile,
    mimeType: AcceptedMimeType,
  ): NewAttachment {
    return {
      id: fields.id ?? randomUUID(),
      workshopId,
      recordType: fields.recordType,
      recordId: fields.recordId,
      caption: fields.caption,
      originalName: cleanName(file.originalname),
      mimeType,
      sizeBytes: file.size,
      storedName: `${workshopId}/${randomUUID()}.${ACCEPTED_FILE_TYPES[mimeType]}`,
      uploadedById: user.id,
    };
  }

  /** A quick refusal before the file is written; the insert itself holds the limit. */
  private async refuseWhenFull(fields: AttachmentUploadFields) {
    const count = await this.dataSource
      .getRepository(Attachment)
      .count({ where: { recordType: fields.recordType, recordId: fields.recordId } });
    if (count >= MAX_ATTACHMENTS_PER_RECORD) throw fullRecordError(fields.recordType);
  }

  /**
   * What is stored under the upload's client-made id, or null. Only the person who added a file
   * may change its caption this way: a skipper may not relabel a technician's photo.
   */
  private async repeated(
    fields: AttachmentUploadFields,
    user: SessionUser,
  ): Promise<Attachment | null> {
    if (!fields.id) return null;
    const repository = this.dataSource.getRepository(Attachment);
    const existing = await repository.findOne({ where: { id: fields.id } });
    if (!existing) return null;
    if (
      existing.workshopId !== user.workshopId ||
      existing.recordType !== fields.recordType ||
      existing.recordId !== fields.recordId
    ) {
      throw new ConflictError('This attachment id is already used for another record.', [
        { field: 'id', message: 'This attachment id is already in use.' },
      ]);
    }
    if (!fields.caption || fields.caption === existing.caption) return existing;
    if (existing.uploadedById !== user.id) {
      const message = 'Only the person who added this file can change its caption.';
      throw new HttpError(403, 'forbidden', 'Not allowed', message, [
        { field: 'caption', message },
      ]);
    }
    await repository.update({ id: existing.id }, { caption: fields.caption });
    return repository.findOneByOrFail({ id: existing.id });
  }

  async list(user: SessionUser, query: AttachmentListQuery): Promise<AttachmentView[]> {
    await findVisibleRecord(this.dataSource.manager, user, query.recordType, query.recordId);
    const rows = await this.dataSource.getRepository(Attachment).find({
      where: {
        workshopId: user.workshopId,
        recordType: query.recordType,
        recordId: query.recordId,
      },
      order: { createdAt: 'ASC', id: 'ASC' },
    });
    return this.views(rows);
  }

  /** The stored attachment, if the user may see the record it is on. */
  async find(user: SessionUser, id: string): Promise<Attachment> {
    const row = await this.dataSource
      .getRepository(Attachment)
      .findOne({ where: { id, workshopId: user.workshopId } });
    if (!row) throw new NotFoundError('attachment', id);
    await findVisibleRecord(this.dataSource.manager, user, row.recordType, row.recordId).catch(
      () => {
        throw new NotFoundError('attachment', id);
      },
    );
    return row;
  }

  async remove(user: SessionUser, id: string): Promise<void> {
    const row = await this.find(user, id);
    await findAttachableRecord(this.dataSource.manager, user, row.recordType, row.recordId);
    await this.dataSource.getRepository(Attachment).delete({ id });
    await this.storage.remove(row.storedName);
  }

  private async view(row: Attachment): Promise<AttachmentView> {
    return (await this.views([row]))[0];
  }

  private async views(rows: Attachment[]): Promise<AttachmentView[]> {
    const ids = [...new Set(rows.map((r) => r.uploadedById))];
    const users = ids.length
      ? await this.dataSource
          .getRepository(User)
          .find({ select: { id: true, name: true }, where: { id: In(ids) } })
      : [];
    const nameOf = new Map(users.map((u) => [u.id, u.name]));
    return rows.map((row) => ({
      id: row.id,
      recordType: row.recordType,
      recordId: row.recordId,
      caption: row.caption,
      originalName: row.originalName,
      mimeType: row.mimeType as AttachmentView['mimeType'],
      sizeBytes: row.sizeBytes,
      uploadedBy: { id: row.uploadedById, name: nameOf.get(row.uploadedById) ?? '' },
      createdAt: row.createdAt.toISOString(),
      url: `/api/attachments/${row.id}/file`,
    }));
  }
}
