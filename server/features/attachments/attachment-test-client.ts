import fs from 'node:fs';
import path from 'node:path';
import type { signedInAgent, TestServer } from '../../../tests/helpers/test-server.js';
import { Engine } from '../vessels/engine.entity.js';
import { Attachment } from './attachment.entity.js';

/* What the attachment tests share: sending an upload as the app does, and looking at what is stored. */

export type Agent = Awaited<ReturnType<typeof signedInAgent>>;

export function upload(
  agent: Agent,
  fields: Record<string, string>,
  file?: { content: Buffer; name: string; type?: string },
) {
  let req = agent.post('/api/attachments');
  for (const [key, value] of Object.entries(fields)) req = req.field(key, value);
  return file
    ? req.attach('file', file.content, {
        filename: file.name,
        contentType: file.type ?? 'application/octet-stream',
      })
    : req;
}

export const uploadsDir = (server: TestServer) => path.join(server.dir, 'uploads');

/** Files under the uploads folder, in every workshop's subfolder. */
export const filesOnDisk = (server: TestServer) =>
  fs.existsSync(uploadsDir(server))
    ? fs
        .readdirSync(uploadsDir(server), { recursive: true, withFileTypes: true })
        .filter((d) => d.isFile()).length
    : 0;

export const attachmentRows = (server: TestServer) =>
  server.dataSource.getRepository(Attachment).count();

/** A demo engine's id by its serial number. */
export const engineId = async (server: TestServer, serialNumber: string) =>
  (await server.dataSource.getRepository(Engine).findOneByOrFail({ serialNumber })).id;
