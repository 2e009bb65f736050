import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  MAX_ATTACHMENT_BYTES,
  MAX_ATTACHMENTS_PER_RECORD,
} from '../../../shared/attachments/attachment.schema.js';
import {
  DEMO,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import {
  attachmentRows,
  engineId,
  filesOnDisk as filesIn,
  upload,
} from './attachment-test-client.js';
import { makePng } from './test-files.js';

let server: TestServer;
let gannetEngine: string;
beforeAll(async () => {
  server = await startTestServer();
  gannetEngine = await engineId(server, 'NV60-26-00418');
});
afterAll(() => server.close());

const filesOnDisk = () => filesIn(server);
const rows = () => attachmentRows(server);
const onEngine = (recordId = gannetEngine) => ({ recordType: 'engine', recordId });

describe('uploading', () => {
  it('refuses a text file renamed photo.jpg with 415, storing nothing on disk or in the table', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const [before, beforeRows] = [filesOnDisk(), await rows()];
    const text = Buffer.from('Hour meter 1.2 h, tach fine, see you Tuesday.\n'.repeat(20), 'utf8');
    const res = await upload(tech, onEngine(), {
      content: text,
      name: 'photo.jpg',
      type: 'image/jpeg',
    });
    expect(res.status).toBe(415);
    expect(res.body.errors).toEqual([
      { field: 'file', message: expect.stringContaining('photo.jpg cannot be attached') },
    ]);
    expect(res.body.detail).toContain(
      'JPEG, PNG or WebP photo, or a PDF document, whatever the file name says',
    );
    expect([filesOnDisk(), await rows()]).toEqual([before, beforeRows]);
  });

  it('refuses a file of a recognised but unaccepted type, saying what it is', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const zip = Buffer.concat([Buffer.from([0x50, 0x4b, 0x03, 0x04]), Buffer.alloc(60)]);
    const res = await upload(tech, onEngine(), {
      content: zip,
      name: 'invoice.pdf',
      type: 'application/pdf',
    });
    expect(res.status).toBe(415);
    expect(res.body.detail).toContain('its content is application/zip');
  });

  it('refuses a file over the size limit with 413, storing nothing', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const [before, beforeRows] = [filesOnDisk(), await rows()];
    const big = Buffer.concat([makePng(), Buffer.alloc(MAX_ATTACHMENT_BYTES)]);
    const res = await upload(tech, onEngine(), {
      content: big,
      name: 'huge.png',
      type: 'image/png',
    });
    expect(res.status).toBe(413);
    expect(res.body.errors).toEqual([
      {
        field: 'file',
        message: 'The file is larger than 10 MB. Send a smaller photo or a shorter document.',
      },
    ]);
    expect([filesOnDisk(), await rows()]).toEqual([before, beforeRows]);
  });

  it('takes one file per request and asks for a missing one by name', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const two = await tech
      .post('/api/attachments')
      .field('recordType', 'engine')
      .field('recordId', gannetEngine)
      .attach('file', makePng(), 'a.png')
      .attach('file', makePng(), 'b.png');
    expect(two.status).toBe(400);
    expect(two.body.errors).toEqual([
      { field: 'file', message: 'Send one file at a time, in the field named file.' },
    ]);
    const none = await upload(tech, onEngine());
    expect(none.body.errors).toEqual([{ field: 'file', message: 'Choose a file to attach.' }]);
    const badFields = await upload(
      tech,
      { recordType: 'boat', recordId: 'x' },
      { content: makePng(), name: 'a.png' },
    );
    expect(badFields.body.errors.map((e: { field: string }) => e.field)).toEqual([
      'recordType',
      'recordId',
    ]);
  });

  it(`holds at most ${MAX_ATTACHMENTS_PER_RECORD} files per record`, async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const vesselId = (await tech.post('/api/vessels').send({ name: 'Full Locker', type: 'rib' }))
      .body.vessel.id;
    const engine = await tech.post('/api/engines').send({
      vesselId,
      position: 'single',
      installation: 'outboard',
      maker: 'Kestrel',
      model: 'K9',
      serialNumber: 'FULL-1',
      fuel: 'petrol',
      cycle: 'four-stroke',
      ratedRpmMin: 5000,
      ratedRpmMax: 6000, // typical outboard range (common practice)
    });
    for (let i = 0; i < MAX_ATTACHMENTS_PER_RECORD; i++) {
      expect(
        (
          await upload(tech, onEngine(engine.body.engine.id), {
            content: makePng(2, 2),
            name: `p${i}.png`,
          })
        ).status,
      ).toBe(201);
    }
    const over = await upload(tech, onEngine(engine.body.engine.id), {
      content: makePng(2, 2),
      name: 'one-more.png',
    });
    expect(over.status).toBe(409);
    expect(over.body.errors[0]).toEqual({
      field: 'file',
      message: `This engine already has ${MAX_ATTACHMENTS_PER_RECORD} files, the most it can hold. Remove one first.`,
    });
  });
});
