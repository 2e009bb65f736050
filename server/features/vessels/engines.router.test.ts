import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  addOtherWorkshop,
  DEMO,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import { Engine } from './engine.entity.js';
import { Vessel } from './vessel.entity.js';

let server: TestServer;
let otherTechnician: string;
let halcyon: string;
beforeAll(async () => {
  server = await startTestServer();
  otherTechnician = (await addOtherWorkshop(server.dataSource)).technicianEmail;
  halcyon = (
    await server.dataSource.getRepository(Vessel).findOneByOrFail({ name: 'Halcyon Drift' })
  ).id;
});
afterAll(() => server.close());

const engineId = async (serialNumber: string) =>
  (await server.dataSource.getRepository(Engine).findOneByOrFail({ serialNumber })).id;

/** Every field of the engine form. The rated range and propeller figures are a maker's typical
 * published values for a small four-stroke outboard (common practice); the rest is our demo's. */
const outboard = (vesselId: string, serialNumber = 'KT-25-000871') => ({
  vesselId,
  position: 'port',
  installation: 'outboard',
  maker: 'Kestrel',
  model: 'K25 4S',
  serialNumber,
  ratedPowerKw: 18.4,
  fuel: 'petrol',
  cycle: 'four-stroke',
  ratedRpmMin: 5000,
  ratedRpmMax: 6000,
  gearRatio: 2.08,
  propBlades: 3,
  propDiameterIn: 9.9,
  propPitchIn: 11,
  tachSource: 'charging-coil',
  poles: 12,
  pulleyRatio: null,
  hourMeterAtCommissioning: 0.3,
  commissionedOn: '2026-11-30',
});

async function newVessel(name: string) {
  const tech = await signedInAgent(server.app, DEMO.technician);
  return (await tech.post('/api/vessels').send({ name, type: 'rib' })).body.vessel.id as string;
}

describe('creating and editing engines', () => {
  it('stores every field of the form and shows the engine on its vessel', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const vesselId = await newVessel('Little Auk');
    const res = await tech
      .post('/api/engines')
      .send({ ...outboard(vesselId), serialNumber: ' kt-25-000871 ' });
    expect(res.status).toBe(201);
    expect(res.body.engine).toMatchObject({
      ...outboard(vesselId),
      vessel: { id: vesselId, name: 'Little Auk', archivedAt: null },
      checklist: null,
      archivedAt: null,
    });
    const vessel = (await tech.get(`/api/vessels/${vesselId}`)).body.vessel;
    expect(vessel.engines.map((e: { serialNumber: string }) => e.serialNumber)).toEqual([
      'KT-25-000871',
    ]);
  });

  it('refuses a serial number already in the workshop with 409 naming serialNumber', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const res = await tech
      .post('/api/engines')
      .send(outboard(await newVessel('Razorbill'), 'nv60-26-00418'));
    expect(res.status).toBe(409);
    expect(res.body.errors).toEqual([
      {
        field: 'serialNumber',
        message: 'Serial number NV60-26-00418 is already recorded on the single engine of Gannet.',
      },
    ]);
  });

  it('lets another workshop record the same serial number', async () => {
    const other = await signedInAgent(server.app, otherTechnician);
    const vesselId = (
      await other.post('/api/vessels').send({ name: 'Yard Tender', type: 'workboat' })
    ).body.vessel.id;
    expect(
      (await other.post('/api/engines').send(outboard(vesselId, 'NV60-26-00418'))).status,
    ).toBe(201);
  });

  it('checks the rated RPM range and the poles, naming each field, and stores nothing', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const vesselId = await newVessel('Shearwater');
    const backwards = await tech
      .post('/api/engines')
      .send({ ...outboard(vesselId, 'BAD-1'), ratedRpmMin: 6000, ratedRpmMax: 5000, poles: 7 });
    expect(backwards.status).toBe(400);
    expect(backwards.body.errors).toEqual([
      { field: 'ratedRpmMax', message: 'Rated RPM high end must be above the low end.' },
      { field: 'poles', message: 'Poles come in pairs: enter an even number.' },
    ]);
    // Makers' full-throttle ranges are a few hundred to about 1000 rpm wide (common practice).
    const tooWide = await tech
      .post('/api/engines')
      .send({ ...outboard(vesselId, 'BAD-2'), ratedRpmMin: 1000, ratedRpmMax: 6000 });
    expect(tooWide.body.errors[0].field).toBe('ratedRpmMax');
    expect(tooWide.body.errors[0].message).toContain('5000 rpm wide');
    const belt = await tech
      .post('/api/engines')
      .send({ ...outboard(vesselId, 'BAD-3'), tachSource: 'belt-alternator', pulleyRatio: null });
    expect(belt.body.errors).toEqual([
      { field: 'pulleyRatio', message: 'A belt-driven alternator needs its pulley ratio.' },
    ]);
    expect(await server.dataSource.getRepository(Engine).countBy({ vesselId })).toBe(0);
  });

  it('refuses a second engine in the same position on a vessel, naming position', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const res = await tech
      .post('/api/engines')
      .send({ ...outboard(halcyon, 'B321-D-99999'), position: 'inboard', installation: 'inboard' });
    expect(res.status).toBe(409);
    expect(res.body.errors[0]).toEqual({
      field: 'position',
      message: 'This vessel already has an inboard engine (Brennholt B3-21 Marine, B321-D-77841).',
    });
  });

  it('updates an engine, keeping its own serial number', async () => {
    const manager = await signedInAgent(server.app, DEMO.manager);
    const vesselId = await newVessel('Fulmar');
    const { body } = await manager.post('/api/engines').send(outboard(vesselId, 'FUL-001'));
    const res = await manager
      .put(`/api/engines/${body.engine.id}`)
      .send({ ...outboard(vesselId, 'FUL-001'), propPitchIn: 12, hourMeterAtCommissioning: 0.5 });
    expect(res.status).toBe(200);
    expect(res.body.engine).toMatchObject({
      propPitchIn: 12,
      hourMeterAtCommissioning: 0.5,
      serialNumber: 'FUL-001',
    });
  });

  it('puts an engine on a vessel of the workshop only', async () => {
    const other = await signedInAgent(server.app, otherTechnician);
    const res = await other.post('/api/engines').send(outboard(halcyon, 'SNEAK-1'));
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([
      { field: 'vesselId', message: 'Choose a vessel of your workshop.' },
    ]);
  });
});

describe('listing, archiving and restoring engines', () => {
  it('lists engines with their vessel, filtered and searched', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const all = (await tech.get('/api/engines')).body.engines as Array<{
      serialNumber: string;
      vessel: { name: string };
    }>;
    expect(all.filter((e) => e.vessel.name === 'Blue Tern').map((e) => e.serialNumber)).toEqual([
      'NV150-26-01127',
      'NV150-26-01131',
    ]);
    const found = (await tech.get('/api/engines?q=brennholt')).body.engines;
    expect(found.map((e: { serialNumber: string }) => e.serialNumber)).toEqual(['B321-D-77841']);
    expect((await tech.get(`/api/engines?vesselId=${halcyon}`)).body.engines).toHaveLength(1);
  });

  it('archives an engine, lists it under archived, and restores it', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const vesselId = await newVessel('Kittiwake');
    const { body } = await tech.post('/api/engines').send(outboard(vesselId, 'KIT-1'));
    const archived = await tech.post(`/api/engines/${body.engine.id}/archive`);
    expect(archived.body.engine.archivedAt).not.toBeNull();
    expect((await tech.get(`/api/vessels/${vesselId}`)).body.vessel.engines).toEqual([]);
    expect((await tech.get('/api/engines?status=archived&q=KIT-1')).body.engines).toHaveLength(1);
    expect(
      (await tech.put(`/api/engines/${body.engine.id}`).send(outboard(vesselId, 'KIT-1'))).status,
    ).toBe(409);
    const restored = await tech.post(`/api/engines/${body.engine.id}/restore`);
    expect(restored.body.engine.archivedAt).toBeNull();
  });
});

describe('roles and tenancy', () => {
  it('lets a skipper read the engines of their own vessels only, and change none', async () => {
    const skipper = await signedInAgent(server.app, DEMO.skipperB);
    const own = await engineId('B321-D-77841');
    const notOwn = await engineId('NV60-26-00418');
    expect(
      (await skipper.get('/api/engines')).body.engines.map(
        (e: { serialNumber: string }) => e.serialNumber,
      ),
    ).toEqual(['B321-D-77841']);
    expect((await skipper.get(`/api/engines/${own}`)).status).toBe(200);
    expect((await skipper.get(`/api/engines/${notOwn}`)).status).toBe(404);
    expect((await skipper.put(`/api/engines/${own}`).send(outboard(halcyon))).status).toBe(403);
    expect((await skipper.post(`/api/engines/${own}/archive`)).status).toBe(403);
    expect((await skipper.post('/api/engines').send(outboard(halcyon))).status).toBe(403);
  });

  it("answers 404 to another workshop's technician", async () => {
    const other = await signedInAgent(server.app, otherTechnician);
    const id = await engineId('B321-D-77841');
    expect((await other.get(`/api/engines/${id}`)).status).toBe(404);
    expect((await other.put(`/api/engines/${id}`).send(outboard(halcyon))).status).toBe(404);
    expect((await other.post(`/api/engines/${id}/archive`)).status).toBe(404);
    expect((await other.get('/api/engines?q=B321')).body.engines).toEqual([]);
  });
});
