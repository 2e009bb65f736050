import type { RequestHandler } from 'express';
import { fileTypeFromBuffer } from 'file-type';
import multer from 'multer';
import {
  ACCEPTED_FILE_TYPES,
  ACCEPTED_TYPE_WORDS,
  MAX_ATTACHMENT_BYTES,
  type AcceptedMimeType,
} from '../../../shared/attachments/attachment.schema.js';
import { HttpError, ValidationError } from '../../lib/errors.js';

const megabytes = (bytes: number) => `${Math.round(bytes / (1024 * 1024))} MB`;

/** Multipart body kept in memory (at most one file of MAX_ATTACHMENT_BYTES), checked before anything touches the disk. */
const upload = multer({
  storage: multer.memoryStorage(),
  // Browsers send file names as raw UTF-8; the latin1 default would garble "Skrue-ø.jpg".
  defParamCharset: 'utf8',
  limits: { fileSize: MAX_ATTACHMENT_BYTES, files: 1, fields: 8, fieldSize: 2048, parts: 10 },
}).single('file');

function fromMulter(error: unknown): HttpError {
  const code = error instanceof multer.MulterError ? error.code : null;
  if (code === 'LIMIT_FILE_SIZE') {
    const message = `The file is larger than ${megabytes(MAX_ATTACHMENT_BYTES)}. Send a smaller photo or a shorter document.`;
    return new HttpError(413, 'file-too-large', 'File too large', message, [
      { field: 'file', message },
    ]);
  }
  if (code === 'LIMIT_FILE_COUNT' || code === 'LIMIT_UNEXPECTED_FILE') {
    return new ValidationError([
      { field: 'file', message: 'Send one file at a time, in the field named file.' },
    ]);
  }
  if (code)
    return new ValidationError([
      { field: '(request)', message: 'The upload has too many or too long fields.' },
    ]);
  return new HttpError(
    400,
    'bad-upload',
    'The upload could not be read',
    'The upload was cut off or is not a multipart form. Try again.',
  );
}

/** Reads the multipart upload into `req.file`, answering size and count limits as problems. */
export const receiveFile: RequestHandler = (req, res, next) => {
  upload(req, res, (error?: unknown) => (error ? next(fromMulter(error)) : next()));
};

/**
 * The file's type from its content (magic numbers), whatever its name or the client's claim say.
 * Anything not on the accepted list is refused with 415 and the field named.
 */
export async function sniffAcceptedType(file: {
  buffer: Buffer;
  originalname: string;
}): Promise<AcceptedMimeType> {
  const found = await fileTypeFromBuffer(file.buffer);
  if (found && found.mime in ACCEPTED_FILE_TYPES) return found.mime as AcceptedMimeType;
  const what = found
    ? `its content is ${found.mime}`
    : 'its content is not a recognised photo or document format';
  const message = `${file.originalname || 'The file'} cannot be attached: ${what}. Send ${ACCEPTED_TYPE_WORDS}, whatever the file name says.`;
  throw new HttpError(415, 'unsupported-file-type', 'Unsupported file type', message, [
    { field: 'file', message },
  ]);
}
