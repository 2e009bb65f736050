import { pipeline } from 'node:stream/promises';
import { Router, type Response } from 'express';
import { z } from 'zod';
import {
  AttachmentListQuerySchema,
  AttachmentUploadFieldsSchema,
  isImage,
  type AttachmentListQuery,
} from '../../../shared/attachments/attachment.schema.js';
import { HttpError } from '../../lib/errors.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import type { AttachmentStorage } from './attachment-storage.js';
import type { Attachment } from './attachment.entity.js';
import type { AttachmentsService } from './attachments.service.js';
import { receiveFile } from './receive-file.js';

const IdParamsSchema = z.object({
  id: z.uuid({ error: 'The attachment id in the address is not valid.' }),
});

/** RFC 6266: an ASCII fallback name plus the exact UTF-8 one. */
function contentDisposition(kind: 'inline' | 'attachment', name: string) {
  const ascii = name.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
  return `${kind}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(name)}`;
}

async function sendFile(res: Response, row: Attachment, storage: AttachmentStorage) {
  const size = await storage.sizeOf(row.storedName);
  if (size === null)
    throw new HttpError(
      404,
      'file-missing',
      'File missing',
      'The file of this attachment is missing from storage. Upload it again.',
    );
  res.status(200);
  res.setHeader('Content-Type', row.mimeType);
  res.setHeader('Content-Length', String(size));
  // Photos show in the page; documents download, so a PDF never runs inside the app's origin.
  res.setHeader(
    'Content-Disposition',
    contentDisposition(isImage(row.mimeType) ? 'inline' : 'attachment', row.originalName),
  );
  res.setHeader('X-Content-Type-Options', 'nosniff');
  res.setHeader('Cache-Control', 'private, max-age=86400');
  await pipeline(storage.open(row.storedName), res);
}

export function attachmentsRouter(service: AttachmentsService, storage: AttachmentStorage): Router {
  const router = Router();

  // The role check comes before the body is read: nobody signed out gets to send 10 MB.
  router.post(
    '/attachments',
    requireRole(),
    receiveFile,
    validate({ body: AttachmentUploadFieldsSchema }),
    async (req, res) => {
      const { attachment, created } = await service.upload(currentUser(res), req.body, req.file);
      res.status(created ? 201 : 200).json({ attachment });
    },
  );

  router.get(
    '/attachments',
    requireRole(),
    validate({ query: AttachmentListQuerySchema }),
    async (_req, res) => {
      res.json({
        attachments: await service.list(currentUser(res), res.locals.query as AttachmentListQuery),
      });
    },
  );

  router.get(
    '/attachments/:id/file',
    requireRole(),
    validate({ params: IdParamsSchema }),
    async (req, res) => {
      await sendFile(res, await service.find(currentUser(res), String(req.params.id)), storage);
    },
  );

  router.delete(
    '/attachments/:id',
    requireRole('technician', 'manager'),
    validate({ params: IdParamsSchema }),
    async (req, res) => {
      await service.remove(currentUser(res), String(req.params.id));
      res.status(204).end();
    },
  );

  return router;
}
