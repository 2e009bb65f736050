import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  DEMO,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import { Attachment } from './attachment.entity.js';
import {
  attachmentRows,
  engineId,
  upload,
  uploadsDir as uploadsIn,
} from './attachment-test-client.js';
import { makePdf, makePng } from './test-files.js';

let server: TestServer;
let gannetEngine: string;
let halcyonEngine: string;
beforeAll(async () => {
  server = await startTestServer();
  gannetEngine = await engineId(server, 'NV60-26-00418');
  halcyonEngine = await engineId(server, 'B321-D-77841');
});
afterAll(() => server.close());

const uploadsDir = () => uploadsIn(server);
const rows = () => attachmentRows(server);
const onEngine = (recordId = gannetEngine) => ({ recordType: 'engine', recordId });

describe('uploading', () => {
  it('stores a photo under the data folder and serves it with the type read from its content', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const png = makePng();
    const res = await upload(
      tech,
      { ...onEngine(), caption: 'Hour meter at handover' },
      { content: png, name: 'hour-meter.jpg', type: 'image/jpeg' },
    );
    expect(res.status).toBe(201);
    expect(res.body.attachment).toMatchObject({
      mimeType: 'image/png',
      originalName: 'hour-meter.jpg',
      caption: 'Hour meter at handover',
      sizeBytes: png.length,
      uploadedBy: { name: 'Ivo Brandt' },
    });
    const row = await server.dataSource
      .getRepository(Attachment)
      .findOneByOrFail({ id: res.body.attachment.id });
    expect(fs.readFileSync(path.join(uploadsDir(), row.storedName)).equals(png)).toBe(true);
    expect(row.storedName).toMatch(/\.png$/);

    const file = await tech.get(res.body.attachment.url).buffer(true);
    expect(file.status).toBe(200);
    expect(file.headers['content-type']).toBe('image/png');
    expect(file.headers['x-content-type-options']).toBe('nosniff');
    expect(file.headers['content-disposition']).toBe(
      `inline; filename="hour-meter.jpg"; filename*=UTF-8''hour-meter.jpg`,
    );
    expect(Buffer.compare(file.body, png)).toBe(0);
  });

  it('takes a PDF document and offers it as a download', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const res = await upload(tech, onEngine(), {
      content: await makePdf('Maker break-in schedule'),
      name: 'schedule.pdf',
    });
    expect(res.status).toBe(201);
    expect(res.body.attachment.mimeType).toBe('application/pdf');
    const file = await tech.get(res.body.attachment.url);
    expect(file.headers['content-disposition']).toMatch(/^attachment; filename="schedule.pdf"/);
  });

  it('returns the stored attachment when the same client-made id is sent again', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const id = '0f8fad5b-d9cb-469f-a165-70867728950e';
    const first = await upload(
      tech,
      { ...onEngine(), id },
      { content: makePng(), name: 'tach.png' },
    );
    const beforeRows = await rows();
    const again = await upload(
      tech,
      { ...onEngine(), id, caption: 'Tachometer at 3000' },
      { content: makePng(), name: 'tach.png' },
    );
    expect([first.status, again.status]).toEqual([201, 200]);
    expect(again.body.attachment).toMatchObject({ id, caption: 'Tachometer at 3000' });
    expect(await rows()).toBe(beforeRows);
    const elsewhere = await upload(
      tech,
      { ...onEngine(halcyonEngine), id },
      { content: makePng(), name: 'tach.png' },
    );
    expect(elsewhere.status).toBe(409);
  });
});
