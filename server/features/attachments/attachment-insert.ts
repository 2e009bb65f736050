import type { EntityManager } from 'typeorm';
import { MAX_ATTACHMENTS_PER_RECORD } from '../../../shared/attachments/attachment.schema.js';
import { ConflictError } from '../../lib/errors.js';
import { nativeStatement } from '../../lib/native-sql.js';
import type { Attachment } from './attachment.entity.js';

/*
 * The attachment row goes in with one statement that also counts the record's files, so the
 * limit holds however many uploads arrive together: SQLite runs a statement whole, and no other
 * request can add a row between the count and the insert (a count first and an insert after
 * let 40 uploads at once store 36).
 */

const INSERT_WITHIN_LIMIT = `INSERT INTO "attachment" ("id", "workshopId", "recordType", "recordId", "caption", "originalName", "mimeType", "sizeBytes", "storedName", "uploadedById")
  SELECT ?, ?, ?, ?, ?, ?, ?, ?, ?, ?
  WHERE (SELECT count(*) FROM "attachment" WHERE "recordType" = ? AND "recordId" = ?) < ?`;

export type NewAttachment = Omit<Attachment, 'createdAt'>;

/**
 * Inserts the row unless the record is full; false when it is. Throws on a repeated id. Run it
 * inside a transaction, so it waits for any other one instead of joining it.
 */
export function insertWithinLimit(manager: EntityManager, row: NewAttachment): boolean {
  const { changes } = nativeStatement(manager, INSERT_WITHIN_LIMIT).run(
    row.id,
    row.workshopId,
    row.recordType,
    row.recordId,
    row.caption,
    row.originalName,
    row.mimeType,
    row.sizeBytes,
    row.storedName,
    row.uploadedById,
    row.recordType,
    row.recordId,
    MAX_ATTACHMENTS_PER_RECORD,
  );
  return changes === 1;
}

/** Whether an insert failed because another upload took the same id first. */
export const isRepeatedId = (error: unknown): boolean =>
  (error as { code?: unknown } | null)?.code === 'SQLITE_CONSTRAINT_PRIMARYKEY';

export function fullRecordError(recordType: string): ConflictError {
  const message = `This ${recordType} already has ${MAX_ATTACHMENTS_PER_RECORD} files, the most it can hold. Remove one first.`;
  return new ConflictError(message, [{ field: 'file', message }]);
}
