import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CHECK_ITEM_IDS } from '../../../shared/checklists/checklist-items.js';
import {
  addOtherWorkshop,
  DEMO,
  FakeClock,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import { AuditEntry } from '../audit/audit-entry.entity.js';
import { Engine } from '../vessels/engine.entity.js';
import { CommissioningChecklist } from './checklist.entity.js';

let server: TestServer;
let otherTechnician: string;
const clock = new FakeClock(new Date('2026-11-20T14:30:00Z'));
beforeAll(async () => {
  server = await startTestServer({ clock });
  otherTechnician = (await addOtherWorkshop(server.dataSource)).technicianEmail;
  // Gannet's checklist, completed at handover by the manager.
  const manager = await signedInAgent(server.app, DEMO.manager);
  const done = await manager
    .post(`/api/engines/${await engineId('NV60-26-00418')}/checklist/complete`)
    .send(finished);
  if (done.status !== 200) throw new Error(`completing failed: ${JSON.stringify(done.body)}`);
});
afterAll(() => server.close());

const engineId = async (serialNumber: string) =>
  (await server.dataSource.getRepository(Engine).findOneByOrFail({ serialNumber })).id;
const allChecks = Object.fromEntries(CHECK_ITEM_IDS.map((id) => [id, { result: 'pass' }]));

// Gannet's outboard: 12-pole charging coil, rated 5000–6000 rpm (demo data).
const finished = {
  tachometer: { measuredHz: 300, tachReadingRpm: 3040 }, // 12-pole coil: 300 Hz = 3000 rpm (common practice)
  charging: { chemistry: 'agm', measuredV: 14.4, batteryTemperatureC: 20, atRpm: 3500 }, // inside AGM 14.4–14.7 V (BU-403)
  idleInGear: { specMinRpm: 650, specMaxRpm: 750, idleRpm: 700 }, // the technician's typed maker figure, not a trade value
  fullThrottle: { rpm: 5600, speedKn: 30 }, // inside the rated 5000–6000 rpm
  checks: allChecks,
};

describe('reopening a completed checklist', () => {
  const reopen = (agent: Awaited<ReturnType<typeof signedInAgent>>, id: string, body: object) =>
    agent.post(`/api/engines/${id}/checklist/reopen`).send(body);

  it('needs a completed checklist, a reason and a member of staff', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const open = await engineId('NV150-26-01127');
    const notDone = await reopen(tech, open, { reason: 'Nothing to reopen' });
    expect(notDone.status).toBe(409);
    expect(notDone.body.detail).toBe(
      'This checklist is not completed, so there is nothing to reopen.',
    );
    const id = await engineId('NV60-26-00418'); // completed before the tests
    const missing = await reopen(tech, id, {});
    expect(missing.status).toBe(400);
    expect(missing.body.errors).toEqual([
      { field: 'reason', message: 'Give the reason (reason) for reopening the checklist.' },
    ]);
    const skipper = await signedInAgent(server.app, DEMO.skipperA);
    expect((await reopen(skipper, id, { reason: 'Mine' })).status).toBe(403);
    const other = await signedInAgent(server.app, otherTechnician);
    expect((await reopen(other, id, { reason: 'Not ours' })).status).toBe(404);
    const row = await server.dataSource
      .getRepository(CommissioningChecklist)
      .findOneByOrFail({ engineId: id });
    expect(row.completedAt).not.toBeNull();
  });

  it('reopens with the reason in the engine’s trail, then is edited and completed again', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const id = await engineId('NV60-26-00418');
    clock.advance(2 * 24 * 3600_000);
    const reason = 'Regulator replaced under warranty: the charging check is measured again.';
    const res = await reopen(tech, id, { reason });
    expect(res.status).toBe(200);
    expect(res.body.checklist).toMatchObject({
      completedAt: null,
      completedBy: null,
      reopened: { at: '2026-11-22T14:30:00.000Z', byName: 'Ivo Brandt', reason },
    });
    const trail = await server.dataSource
      .getRepository(AuditEntry)
      .find({ where: { recordType: 'engine', recordId: id }, order: { at: 'ASC' } });
    expect(trail.map((e) => [e.action, e.actorName, e.detail])).toEqual([
      ['checklist-completed', 'Maren Holt', ''],
      ['checklist-reopened', 'Ivo Brandt', reason],
    ]);

    const charging = { chemistry: 'agm', measuredV: 14.5, batteryTemperatureC: 20, atRpm: 3500 }; // inside AGM 14.4–14.7 V (BU-403)
    const saved = await tech.put(`/api/engines/${id}/checklist`).send({ ...finished, charging });
    expect(saved.status).toBe(200);
    const done = await tech
      .post(`/api/engines/${id}/checklist/complete`)
      .send({ ...finished, charging });
    expect(done.status).toBe(200);
    expect(done.body.checklist).toMatchObject({
      completedAt: '2026-11-22T14:30:00.000Z',
      completedBy: { name: 'Ivo Brandt' },
      entries: { charging: { measuredV: 14.5 } },
      reopened: { reason },
    });
  });
});
