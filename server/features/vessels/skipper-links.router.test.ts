import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  DEMO,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import { User } from '../users/user.entity.js';
import { Vessel } from './vessel.entity.js';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());

const vesselId = async (name: string) =>
  (await server.dataSource.getRepository(Vessel).findOneByOrFail({ name })).id;
const userId = async (email: string) =>
  (await server.dataSource.getRepository(User).findOneByOrFail({ email })).id;
const names = (body: { vessels: Array<{ name: string }> }) => body.vessels.map((v) => v.name);

describe('linking skippers', () => {
  it('lists the skippers with their vessels, links and unlinks, and the skipper sees the change', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const tomas = await userId(DEMO.skipperB);
    const gannet = await vesselId('Gannet');
    const skippers = (await tech.get('/api/skippers')).body.skippers;
    expect(skippers.map((s: { name: string }) => s.name)).toEqual(
      expect.arrayContaining(['Sunniva Okafor', 'Tomas Reyes']),
    );
    const tomasRow = skippers.find((s: { id: string }) => s.id === tomas);
    expect(tomasRow.vesselIds).toContain(await vesselId('Halcyon Drift'));
    expect(tomasRow.vesselIds).not.toContain(gannet);

    const linked = await tech.put(`/api/vessels/${gannet}/skippers/${tomas}`);
    expect(linked.status).toBe(200);
    expect(linked.body.vessel.skippers.map((s: { name: string }) => s.name)).toEqual([
      'Sunniva Okafor',
      'Tomas Reyes',
    ]);
    expect((await tech.put(`/api/vessels/${gannet}/skippers/${tomas}`)).status).toBe(200);
    const skipper = await signedInAgent(server.app, DEMO.skipperB);
    expect(names((await skipper.get('/api/vessels')).body)).toEqual(
      expect.arrayContaining(['Gannet', 'Halcyon Drift']),
    );

    const unlinked = await tech.delete(`/api/vessels/${gannet}/skippers/${tomas}`);
    expect(unlinked.body.vessel.skippers.map((s: { name: string }) => s.name)).toEqual([
      'Sunniva Okafor',
    ]);
    expect(names((await skipper.get('/api/vessels')).body)).not.toContain('Gannet');
  });

  it('links only skippers of the same workshop, naming the field', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const res = await tech.put(
      `/api/vessels/${await vesselId('Gannet')}/skippers/${await userId(DEMO.manager)}`,
    );
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([
      { field: 'userId', message: 'Choose a skipper of your workshop.' },
    ]);
  });
});
