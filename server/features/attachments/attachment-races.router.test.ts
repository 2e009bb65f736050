import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_ATTACHMENTS_PER_RECORD } from '../../../shared/attachments/attachment.schema.js';
import {
  DEMO,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import { assignRun } from '../../../tests/helpers/runs.js';
import {
  attachmentRows,
  filesOnDisk,
  upload,
  uploadsDir,
  type Agent,
} from './attachment-test-client.js';
import { Attachment } from './attachment.entity.js';
import { makePng } from './test-files.js';

/* Uploads that arrive together: a device retrying while its first try is still on the wire, and a
   whole camera roll at once. */

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());

async function newEngine(tech: Agent, serialNumber: string): Promise<string> {
  const vessel = await tech
    .post('/api/vessels')
    .send({ name: `Boat ${serialNumber}`, type: 'rib' });
  const engine = await tech.post('/api/engines').send({
    vesselId: vessel.body.vessel.id,
    position: 'single',
    installation: 'outboard',
    maker: 'Kestrel',
    model: 'K9',
    serialNumber,
    fuel: 'petrol',
    cycle: 'four-stroke',
    ratedRpmMin: 5000,
    ratedRpmMax: 6000, // typical outboard range (common practice)
  });
  return engine.body.engine.id as string;
}

describe('uploads at the same time', () => {
  it('stores one copy when the same client-made id arrives twice at once, and keeps its file', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const recordId = await newEngine(tech, 'RACE-1');
    const id = randomUUID();
    const [files, rows] = [filesOnDisk(server), await attachmentRows(server)];
    const content = makePng(3, 3);
    const fields = { recordType: 'engine', recordId, id, caption: 'Prop nut' };
    const answers = await Promise.all(
      [1, 2].map(() => upload(tech, fields, { content, name: 'prop.png' })),
    );
    expect(answers.map((a) => a.status).sort()).toEqual([200, 201]);
    expect(answers.map((a) => a.body.attachment.id)).toEqual([id, id]);
    expect(await attachmentRows(server)).toBe(rows + 1);
    expect(filesOnDisk(server)).toBe(files + 1);
    const row = await server.dataSource.getRepository(Attachment).findOneByOrFail({ id });
    expect(fs.readFileSync(path.join(uploadsDir(server), row.storedName))).toEqual(content);
    expect((await tech.get(`/api/attachments/${id}/file`)).status).toBe(200);
  });

  it(`never holds more than ${MAX_ATTACHMENTS_PER_RECORD} files on a record, however many arrive at once`, async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const recordId = await newEngine(tech, 'RACE-2');
    const files = filesOnDisk(server);
    const answers = await Promise.all(
      Array.from({ length: MAX_ATTACHMENTS_PER_RECORD + 10 }, (_, i) =>
        upload(
          tech,
          { recordType: 'engine', recordId },
          { content: makePng(2, 2), name: `${i}.png` },
        ),
      ),
    );
    const statuses = answers.map((a) => a.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(MAX_ATTACHMENTS_PER_RECORD);
    expect(statuses.filter((s) => s === 409)).toHaveLength(10);
    const stored = await server.dataSource.getRepository(Attachment).countBy({ recordId });
    expect(stored).toBe(MAX_ATTACHMENTS_PER_RECORD);
    expect(filesOnDisk(server)).toBe(files + MAX_ATTACHMENTS_PER_RECORD);
  });
});

describe('repeating an upload', () => {
  it('lets only the person who added a file change its caption by sending its id again', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const tomas = await signedInAgent(server.app, DEMO.skipperB);
    const runs = (await tomas.get('/api/runs')).body.runs as Array<{ id: string; state: string }>;
    const runId =
      runs.find((r) => r.state !== 'signed-off')?.id ??
      (await assignRun(server.app, 'Halcyon Drift', 'inboard', 'small-inboard-diesel')).id;
    const onRun = { recordType: 'run', recordId: runId };
    const staff = await upload(
      tech,
      { ...onRun, caption: 'Exhaust elbow at 1.5 h' },
      {
        content: makePng(),
        name: 'elbow.png',
      },
    );
    expect(staff.status).toBe(201);
    const id = staff.body.attachment.id as string;

    const retaken = await upload(tomas, { ...onRun, id, caption: 'my photo now' });
    expect(retaken.status).toBe(403);
    expect(retaken.body.errors).toEqual([
      { field: 'caption', message: 'Only the person who added this file can change its caption.' },
    ]);
    const row = await server.dataSource.getRepository(Attachment).findOneByOrFail({ id });
    expect(row.caption).toBe('Exhaust elbow at 1.5 h');

    const own = await upload(tech, { ...onRun, id, caption: 'Exhaust elbow at 1.6 h' });
    expect([own.status, own.body.attachment.caption]).toEqual([200, 'Exhaust elbow at 1.6 h']);
  });
});
