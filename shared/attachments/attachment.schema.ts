import { z } from 'zod';

export const ATTACHMENT_RECORD_TYPES = ['engine', 'checklist', 'run', 'service'] as const;
export const AttachmentRecordTypeSchema = z.enum(ATTACHMENT_RECORD_TYPES, {
  error: 'The record type (recordType) must be engine, checklist, run or service.',
});
export type AttachmentRecordType = z.infer<typeof AttachmentRecordTypeSchema>;

/**
 * File types accepted, by the type read from the file's content, with the extension it is stored
 * under. Photos a phone camera makes, and PDFs for the maker's schedule and invoices. No SVG or
 * HTML: those can carry scripts.
 */
export const ACCEPTED_FILE_TYPES = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
  'application/pdf': 'pdf',
} as const;
export type AcceptedMimeType = keyof typeof ACCEPTED_FILE_TYPES;
export const ACCEPTED_TYPE_WORDS = 'a JPEG, PNG or WebP photo, or a PDF document';

/** 10 MB: a full-size phone photo or a scanned manual fits; a video does not. */
export const MAX_ATTACHMENT_BYTES = 10 * 1024 * 1024;
/** Per engine, checklist or run: enough for a handover, few enough to page through on a phone. */
export const MAX_ATTACHMENTS_PER_RECORD = 30;

const RecordFields = {
  recordType: AttachmentRecordTypeSchema,
  recordId: z.uuid({
    error: 'The record (recordId) must be the id of an engine, checklist, run or service.',
  }),
};

/** The text fields of the multipart upload (the file travels in the `file` field). */
export const AttachmentUploadFieldsSchema = z.object({
  /** Made on the device; sending the same id again returns the stored attachment instead of a copy. */
  id: z.uuid({ error: 'The attachment id (id) must be a UUID.' }).optional(),
  ...RecordFields,
  caption: z
    .string({ error: 'The caption must be text.' })
    .trim()
    .max(200, { error: 'The caption can have at most 200 characters.' })
    .default(''),
});
export type AttachmentUploadFields = z.infer<typeof AttachmentUploadFieldsSchema>;

export const AttachmentListQuerySchema = z.object(RecordFields);
export type AttachmentListQuery = z.infer<typeof AttachmentListQuerySchema>;

export interface AttachmentView {
  id: string;
  recordType: AttachmentRecordType;
  recordId: string;
  caption: string;
  originalName: string;
  mimeType: AcceptedMimeType;
  sizeBytes: number;
  uploadedBy: { id: string; name: string };
  createdAt: string;
  /** Where the file is served, to signed-in users allowed to see the record. */
  url: string;
}

export const isImage = (mimeType: string) => mimeType.startsWith('image/');
