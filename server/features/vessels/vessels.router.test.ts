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
import { User } from '../users/user.entity.js';
import { Vessel } from './vessel.entity.js';

let server: TestServer;
let otherTechnician: string;
beforeAll(async () => {
  server = await startTestServer();
  otherTechnician = (await addOtherWorkshop(server.dataSource)).technicianEmail;
});
afterAll(() => server.close());

const vesselId = async (name: string) =>
  (await server.dataSource.getRepository(Vessel).findOneByOrFail({ name })).id;
const userId = async (email: string) =>
  (await server.dataSource.getRepository(User).findOneByOrFail({ email })).id;
const names = (body: { vessels: Array<{ name: string }> }) => body.vessels.map((v) => v.name);

const newVessel = {
  name: 'Storm Petrel',
  hin: 'spx12345d626',
  type: 'rib',
  lengthM: 6.5,
  homePort: 'Kestrel Harbour',
};

describe('GET /api/vessels', () => {
  it('keeps the shape the homes and the on-deck screen read, engines port to starboard', async () => {
    const skipper = await signedInAgent(server.app, DEMO.skipperA);
    const res = await skipper.get('/api/vessels');
    expect(res.status).toBe(200);
    // The demo data may grow; Sunniva's boats include these two and never Tomas's.
    expect(names(res.body)).toEqual(expect.arrayContaining(['Blue Tern', 'Gannet']));
    expect(names(res.body)).not.toContain('Halcyon Drift');
    const blueTern = res.body.vessels.find((v: { name: string }) => v.name === 'Blue Tern');
    expect(Object.keys(blueTern)).toEqual(
      expect.arrayContaining([
        'id',
        'name',
        'hin',
        'type',
        'lengthM',
        'homePort',
        'skippers',
        'engines',
      ]),
    );
    expect(blueTern.skippers).toEqual([
      { id: await userId(DEMO.skipperA), name: 'Sunniva Okafor' },
    ]);
    expect(blueTern.engines.map((e: { position: string }) => e.position)).toEqual([
      'port',
      'starboard',
    ]);
    expect(blueTern.engines[0]).toMatchObject({
      serialNumber: 'NV150-26-01127',
      ratedRpmMin: 5000,
      ratedRpmMax: 6000,
      tachSource: 'charging-coil',
      poles: 12,
    });
  });

  it('searches by name, home port, skipper and engine serial', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    expect(names((await tech.get('/api/vessels?q=marrow')).body)).toEqual(['Halcyon Drift']);
    const sunnivas = names((await tech.get('/api/vessels?q=okafor')).body);
    expect(sunnivas).toEqual(expect.arrayContaining(['Blue Tern', 'Gannet']));
    expect(sunnivas).not.toContain('Halcyon Drift');
    expect(names((await tech.get('/api/vessels?q=nv60-26')).body)).toEqual(['Gannet']);
  });

  it('names a bad filter', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const res = await tech.get('/api/vessels?status=sunk');
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([
      {
        field: 'query.status',
        message: 'The status filter (status) must be active, archived or all.',
      },
    ]);
  });

  it('answers 401 to a visitor', async () => {
    expect((await supertest(server.app).get('/api/vessels')).status).toBe(401);
  });
});

describe('creating, editing and archiving vessels', () => {
  it('lets a technician create a vessel, normalising the HIN, and read it back', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const created = await tech.post('/api/vessels').send(newVessel);
    expect(created.status).toBe(201);
    expect(created.body.vessel).toMatchObject({
      name: 'Storm Petrel',
      hin: 'SPX12345D626',
      engines: [],
      skippers: [],
      archivedAt: null,
    });
    const read = await tech.get(`/api/vessels/${created.body.vessel.id}`);
    expect(read.body.vessel.name).toBe('Storm Petrel');
  });

  it('refuses bad input naming each field, and stores nothing', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const res = await tech.post('/api/vessels').send({ name: ' ', type: 'submarine', lengthM: -2 });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([
      { field: 'name', message: 'Enter the vessel name.' },
      { field: 'type', message: 'Choose the vessel type from the list.' },
      { field: 'lengthM', message: 'Length must be above 0 m.' },
    ]);
    expect(
      await server.dataSource.getRepository(Vessel).countBy({ type: 'submarine' as never }),
    ).toBe(0);
  });

  it('lets a manager edit a vessel', async () => {
    const manager = await signedInAgent(server.app, DEMO.manager);
    const id = await vesselId('Gannet');
    const res = await manager.put(`/api/vessels/${id}`).send({
      name: 'Gannet',
      hin: 'TDW40217K526',
      type: 'workboat',
      lengthM: 5.9,
      homePort: 'Slipway 4',
    });
    expect(res.status).toBe(200);
    expect(res.body.vessel).toMatchObject({ lengthM: 5.9, homePort: 'Slipway 4' });
    expect(res.body.vessel.engines).toHaveLength(1);
  });

  it('archives instead of deleting, hides the vessel from the everyday list, and restores it', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const { body } = await tech
      .post('/api/vessels')
      .send({ ...newVessel, name: 'Old Cormorant', hin: '' });
    const archived = await tech.post(`/api/vessels/${body.vessel.id}/archive`);
    expect(archived.status).toBe(200);
    expect(archived.body.vessel.archivedAt).not.toBeNull();
    expect(names((await tech.get('/api/vessels')).body)).not.toContain('Old Cormorant');
    expect(names((await tech.get('/api/vessels?status=archived')).body)).toEqual(['Old Cormorant']);
    const edit = await tech
      .put(`/api/vessels/${body.vessel.id}`)
      .send({ ...newVessel, name: 'Renamed' });
    expect(edit.status).toBe(409);
    expect(edit.body.detail).toBe('Old Cormorant is archived. Restore it before changing it.');
    expect(
      (await tech.post(`/api/vessels/${body.vessel.id}/restore`)).body.vessel.archivedAt,
    ).toBeNull();
    expect(await server.dataSource.getRepository(Vessel).existsBy({ id: body.vessel.id })).toBe(
      true,
    );
  });

  it('refuses to archive a vessel whose engine has a break-in open', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const { body } = await tech
      .post('/api/vessels')
      .send({ ...newVessel, name: 'Guillemot', hin: '' });
    const engine = await tech.post('/api/engines').send({
      vesselId: body.vessel.id,
      position: 'single',
      installation: 'outboard',
      maker: 'Kestrel',
      model: 'K40',
      serialNumber: 'GUI-1',
      fuel: 'petrol',
      cycle: 'four-stroke',
      ratedRpmMin: 5000,
      ratedRpmMax: 6000, // typical four-stroke outboard range (common practice)
    });
    const programs = (await tech.get('/api/programs')).body.programs as Array<{
      id: string;
      builtInKey: string | null;
    }>;
    const fourStroke = programs.find((p) => p.builtInKey === 'four-stroke-outboard')!;
    const assigned = await tech
      .post('/api/runs')
      .send({ engineId: engine.body.engine.id, programId: fourStroke.id });
    expect(assigned.status).toBe(201);
    const res = await tech.post(`/api/vessels/${body.vessel.id}/archive`);
    expect(res.status).toBe(409);
    expect(res.body.detail).toBe(
      'Guillemot has an engine with a break-in run that is not signed off. Finish or sign off that run first.',
    );
    const engineArchive = await tech.post(`/api/engines/${engine.body.engine.id}/archive`);
    expect(engineArchive.status).toBe(409);
    await server.dataSource.getRepository(Run).delete({ id: assigned.body.run.id });
    expect((await tech.post(`/api/vessels/${body.vessel.id}/archive`)).status).toBe(200);
  });
});

describe('roles and tenancy', () => {
  it('lets a skipper read only their own vessels and change none', async () => {
    const skipper = await signedInAgent(server.app, DEMO.skipperB);
    expect((await skipper.get(`/api/vessels/${await vesselId('Halcyon Drift')}`)).status).toBe(200);
    expect((await skipper.get(`/api/vessels/${await vesselId('Gannet')}`)).status).toBe(404);
    const edit = await skipper
      .put(`/api/vessels/${await vesselId('Halcyon Drift')}`)
      .send({ ...newVessel, name: 'Mine now' });
    expect(edit.status).toBe(403);
    expect((await skipper.post('/api/vessels').send(newVessel)).status).toBe(403);
    expect((await skipper.get('/api/skippers')).status).toBe(403);
  });

  it("answers 404 to another workshop's technician for every vessel route", async () => {
    const other = await signedInAgent(server.app, otherTechnician);
    const id = await vesselId('Gannet');
    expect((await other.get('/api/vessels')).body.vessels).toEqual([]);
    expect((await other.get(`/api/vessels/${id}`)).status).toBe(404);
    expect((await other.put(`/api/vessels/${id}`).send(newVessel)).status).toBe(404);
    expect((await other.post(`/api/vessels/${id}/archive`)).status).toBe(404);
    expect(
      (await other.put(`/api/vessels/${id}/skippers/${await userId(DEMO.skipperA)}`)).status,
    ).toBe(404);
  });
});
