import fs from 'node:fs';
import path from 'node:path';
import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  addOtherWorkshop,
  DEMO,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import { Run } from '../runs/run.entity.js';
import { Attachment } from './attachment.entity.js';
import {
  attachmentRows,
  engineId,
  upload,
  uploadsDir as uploadsIn,
} from './attachment-test-client.js';
import { makePng } from './test-files.js';

let server: TestServer;
let otherTechnician: string;
let gannetEngine: string;
let halcyonEngine: string;
beforeAll(async () => {
  server = await startTestServer();
  otherTechnician = (await addOtherWorkshop(server.dataSource)).technicianEmail;
  gannetEngine = await engineId(server, 'NV60-26-00418');
  halcyonEngine = await engineId(server, 'B321-D-77841');
});
afterAll(() => server.close());

const uploadsDir = () => uploadsIn(server);
const rows = () => attachmentRows(server);
const onEngine = (recordId = gannetEngine) => ({ recordType: 'engine', recordId });

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
