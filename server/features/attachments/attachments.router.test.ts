import fs from 'node:fs';
import path from 'node:path';
import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  MAX_ATTACHMENT_BYTES,
  MAX_ATTACHMENTS_PER_RECORD,
} from '../../../shared/attachments/attachment.schema.js';
import {
  addOtherWorkshop,
  DEMO,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import { Run } from '../runs/run.entity.js';
import { Engine } from '../vessels/engine.entity.js';
import { Attachment } from './attachment.entity.js';
import { makePdf, makePng } from './test-files.js';

let server: TestServer;
let otherTechnician: string;
let gannetEngine: string;
let halcyonEngine: string;
beforeAll(async () => {
  server = await startTestServer();
  otherTechnician = (await addOtherWorkshop(server.dataSource)).technicianEmail;
  gannetEngine = (
    await server.dataSource.getRepository(Engine).findOneByOrFail({ serialNumber: 'NV60-26-00418' })
  ).id;
  halcyonEngine = (
    await server.dataSource.getRepository(Engine).findOneByOrFail({ serialNumber: 'B321-D-77841' })
  ).id;
});
afterAll(() => server.close());

const uploadsDir = () => path.join(server.dir, 'uploads');
const filesOnDisk = () =>
  fs.existsSync(uploadsDir())
    ? fs
        .readdirSync(uploadsDir(), { recursive: true, withFileTypes: true })
        .filter((d) => d.isFile()).length
    : 0;
const rows = () => server.dataSource.getRepository(Attachment).count();

type Agent = Awaited<ReturnType<typeof signedInAgent>>;
function upload(
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

describe('who may see and add files', () => {
  it('lists and serves an engine’s files to its skipper only', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const { body } = await upload(tech, onEngine(halcyonEngine), {
      content: makePng(),
      name: 'install.png',
    });
    const tomas = await signedInAgent(server.app, DEMO.skipperB);
    const list = await tomas.get(`/api/attachments?recordType=engine&recordId=${halcyonEngine}`);
    expect(list.body.attachments.map((a: { id: string }) => a.id)).toEqual([body.attachment.id]);
    expect((await tomas.get(body.attachment.url)).status).toBe(200);
    const sunniva = await signedInAgent(server.app, DEMO.skipperA);
    expect((await sunniva.get(body.attachment.url)).status).toBe(404);
    expect(
      (await sunniva.get(`/api/attachments?recordType=engine&recordId=${halcyonEngine}`)).status,
    ).toBe(404);
    expect((await supertest(server.app).get(body.attachment.url)).status).toBe(401);
  });

  it('keeps engines and checklists to the workshop, but lets a skipper add photos to their own run until it is signed off', async () => {
    const tomas = await signedInAgent(server.app, DEMO.skipperB);
    const refused = await upload(tomas, onEngine(halcyonEngine), {
      content: makePng(),
      name: 'mine.png',
    });
    expect(refused.status).toBe(403);

    const tech = await signedInAgent(server.app, DEMO.technician);
    // Halcyon Drift's run: the open one the demo may already hold, or a new one.
    const runs = (await tech.get('/api/runs')).body.runs as Array<{
      id: string;
      state: string;
      engine: { id: string };
    }>;
    let runId = runs.find((r) => r.engine.id === halcyonEngine && r.state !== 'signed-off')?.id;
    if (!runId) {
      const programs = (await tech.get('/api/programs')).body.programs as Array<{
        id: string;
        builtInKey: string | null;
      }>;
      const diesel = programs.find((p) => p.builtInKey === 'small-inboard-diesel')!;
      runId = (await tech.post('/api/runs').send({ engineId: halcyonEngine, programId: diesel.id }))
        .body.run.id as string;
    }
    const onRun = { recordType: 'run', recordId: runId };
    expect(
      (await upload(tomas, onRun, { content: makePng(), name: 'tach-at-2400.png' })).status,
    ).toBe(201);
    await server.dataSource.getRepository(Run).update({ id: runId }, { state: 'signed-off' });
    const frozen = await upload(tomas, onRun, { content: makePng(), name: 'late.png' });
    expect(frozen.status).toBe(409);
    expect(frozen.body.detail).toContain('signed off and frozen');
  });

  it("answers 404 to another workshop's technician for uploads, lists and files", async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const { body } = await upload(tech, onEngine(), { content: makePng(), name: 'prop-nut.png' });
    const other = await signedInAgent(server.app, otherTechnician);
    const beforeRows = await rows();
    expect((await upload(other, onEngine(), { content: makePng(), name: 'x.png' })).status).toBe(
      404,
    );
    expect(
      (await other.get(`/api/attachments?recordType=engine&recordId=${gannetEngine}`)).status,
    ).toBe(404);
    expect((await other.get(body.attachment.url)).status).toBe(404);
    expect((await other.delete(`/api/attachments/${body.attachment.id}`)).status).toBe(404);
    expect(await rows()).toBe(beforeRows);
  });

  it('lets staff remove a file, from the table and from disk', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const { body } = await upload(tech, onEngine(), { content: makePng(), name: 'blurred.png' });
    const row = await server.dataSource
      .getRepository(Attachment)
      .findOneByOrFail({ id: body.attachment.id });
    const skipper = await signedInAgent(server.app, DEMO.skipperA);
    expect((await skipper.delete(`/api/attachments/${body.attachment.id}`)).status).toBe(403);
    expect((await tech.delete(`/api/attachments/${body.attachment.id}`)).status).toBe(204);
    expect(fs.existsSync(path.join(uploadsDir(), row.storedName))).toBe(false);
    expect((await tech.get(body.attachment.url)).status).toBe(404);
  });

  it('attaches to a saved checklist, visible with its engine', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const checklist = (await tech.put(`/api/engines/${halcyonEngine}/checklist`).send({})).body
      .checklist;
    const res = await upload(
      tech,
      { recordType: 'checklist', recordId: checklist.id },
      { content: makePng(), name: 'tell-tale.png' },
    );
    expect(res.status).toBe(201);
    const tomas = await signedInAgent(server.app, DEMO.skipperB);
    expect(
      (await tomas.get(`/api/attachments?recordType=checklist&recordId=${checklist.id}`)).body
        .attachments,
    ).toHaveLength(1);
  });
});
