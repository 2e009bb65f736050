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
import { Engine } from '../vessels/engine.entity.js';
import { CommissioningChecklist } from './checklist.entity.js';

let server: TestServer;
let otherTechnician: string;
const clock = new FakeClock(new Date('2026-11-20T14:30:00Z'));
beforeAll(async () => {
  server = await startTestServer({ clock });
  otherTechnician = (await addOtherWorkshop(server.dataSource)).technicianEmail;
});
afterAll(() => server.close());

const engineId = async (serialNumber: string) =>
  (await server.dataSource.getRepository(Engine).findOneByOrFail({ serialNumber })).id;
const allChecks = Object.fromEntries(CHECK_ITEM_IDS.map((id) => [id, { result: 'pass' }]));

// Gannet's outboard: 12-pole charging coil, rated 5000–6000 rpm, pitch 15 in (demo data).
const partDone = {
  tachometer: { measuredHz: 300, tachReadingRpm: 3040 }, // 12-pole coil: 300 Hz = 3000 rpm (common practice); +1.3 %
  checks: {
    steering: { result: 'pass' },
    killSwitch: { result: 'fail', note: 'Lanyard clip missing' },
  },
};
const finished = {
  tachometer: { measuredHz: 300, tachReadingRpm: 3040 },
  charging: { chemistry: 'agm', measuredV: 14.4, batteryTemperatureC: 20, atRpm: 3500 }, // inside AGM 14.4–14.7 V (BU-403)
  idleInGear: { specMinRpm: 650, specMaxRpm: 750, idleRpm: 700 }, // the technician's typed maker figure, not a trade value
  fullThrottle: { rpm: 5600, speedKn: 30 }, // inside the rated 5000–6000 rpm
  checks: allChecks,
};

describe('commissioning checklist', () => {
  it('starts empty and unsaved, every item open', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const res = await tech.get(`/api/engines/${await engineId('NV150-26-01127')}/checklist`);
    expect(res.status).toBe(200);
    expect(res.body.checklist).toMatchObject({ id: null, completedAt: null, updatedBy: null });
    expect(res.body.checklist.evaluation.summary).toMatchObject({
      total: 12,
      open: 12,
      readyToComplete: false,
    });
  });

  it('saves part-done with the evaluation, and keeps it for later', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const id = await engineId('NV60-26-00418');
    const saved = await tech.put(`/api/engines/${id}/checklist`).send(partDone);
    expect(saved.status).toBe(200);
    const { checklist } = saved.body;
    expect(checklist.id).toMatch(/^[0-9a-f-]{36}$/);
    expect(checklist.updatedBy.name).toBe('Ivo Brandt');
    expect(checklist.evaluation.summary).toMatchObject({ passed: 2, failed: 1, open: 9 });
    const tach = checklist.evaluation.items.find((i: { id: string }) => i.id === 'tachometer');
    expect(tach.figures[0]).toEqual({
      label: 'True engine speed (from 300 Hz)',
      value: '3000 rpm',
    });

    const again = await tech.get(`/api/engines/${id}/checklist`);
    expect(again.body.checklist.entries.checks.killSwitch).toEqual({
      result: 'fail',
      note: 'Lanyard clip missing',
    });
    expect(again.body.checklist.entries.charging.chemistry).toBeNull();
  });

  it('refuses to complete with every unfinished item named, keeping what was entered as the draft', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const id = await engineId('NV60-26-00418');
    const res = await tech.post(`/api/engines/${id}/checklist/complete`).send({
      ...finished,
      checks: { ...allChecks, leaks: { result: 'fail', note: 'Weep at the fuel filter' } },
      charging: {},
    });
    expect(res.status).toBe(400);
    expect(res.body.detail).toBe(
      'The checklist cannot be completed yet: 2 items need attention. What you entered is saved as a draft.',
    );
    expect(res.body.errors.map((e: { field: string }) => e.field)).toEqual([
      'charging',
      'checks.leaks',
    ]);
    expect(res.body.errors[0].message).toBe(
      'Charging voltage at cruising RPM: not finished. Choose the battery chemistry.',
    );
    const row = await server.dataSource
      .getRepository(CommissioningChecklist)
      .findOneByOrFail({ engineId: id });
    expect(row.completedAt).toBeNull();
    expect(row.entries.checks.leaks).toEqual({ result: 'fail', note: 'Weep at the fuel filter' });
    const reloaded = (await tech.get(`/api/engines/${id}/checklist`)).body.checklist;
    expect(reloaded).toMatchObject({ completedAt: null, updatedBy: { name: 'Ivo Brandt' } });
    expect(reloaded.entries.fullThrottle).toMatchObject({ rpm: 5600, speedKn: 30 });
    expect(reloaded.entries.checks.leaks.note).toBe('Weep at the fuel filter');
  });

  it('completes, recording who and when, and is then kept as the handover record', async () => {
    const manager = await signedInAgent(server.app, DEMO.manager);
    const id = await engineId('NV60-26-00418');
    const res = await manager.post(`/api/engines/${id}/checklist/complete`).send(finished);
    expect(res.status).toBe(200);
    expect(res.body.checklist).toMatchObject({
      completedAt: '2026-11-20T14:30:00.000Z',
      completedBy: { name: 'Maren Holt' },
    });
    expect(res.body.checklist.evaluation.summary.readyToComplete).toBe(true);

    const change = await manager.put(`/api/engines/${id}/checklist`).send(partDone);
    expect(change.status).toBe(409);
    expect(change.body.detail).toContain('completed at handover');
    expect(change.body.detail).toContain('Reopen it, giving the reason');
    const engine = await manager.get(`/api/engines/${id}`);
    expect(engine.body.engine.checklist).toEqual({ completedAt: '2026-11-20T14:30:00.000Z' });
  });

  it('makes the day of completion the commissioning date when the engine has none, and keeps one entered', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const gannet = (await tech.get(`/api/engines/${await engineId('NV60-26-00418')}`)).body.engine;
    const { id: _id, vessel: _v, checklist: _c, createdAt: _a, updatedAt: _u, ...facts } = gannet;
    const completedWith = async (
      position: string,
      serialNumber: string,
      commissionedOn: string | null,
    ) => {
      const added = await tech
        .post('/api/engines')
        .send({ ...facts, archivedAt: undefined, position, serialNumber, commissionedOn });
      expect(added.status).toBe(201);
      const id = added.body.engine.id;
      const done = await tech.post(`/api/engines/${id}/checklist/complete`).send(finished);
      expect(done.status).toBe(200);
      const trail = await server.dataSource.query(
        'SELECT "detail" FROM "audit_entry" WHERE "recordId" = ? AND "action" = ?',
        [id, 'checklist-completed'],
      );
      return { engine: (await tech.get(`/api/engines/${id}`)).body.engine, trail };
    };
    const undated = await completedWith('port', 'NV60-26-00998', null);
    // 14:30 UTC on 20 Nov is the same day in the demo workshop's zone.
    expect(undated.engine.commissionedOn).toBe('2026-11-20');
    expect(undated.trail).toEqual([
      { detail: 'Commissioning date set to 2026-11-20, the day of completion.' },
    ]);
    const dated = await completedWith('starboard', 'NV60-26-00999', '2026-11-12');
    expect(dated.engine.commissionedOn).toBe('2026-11-12');
    expect(dated.trail).toEqual([{ detail: '' }]);
  });

  it('names a bad measured value by its field', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const res = await tech
      .put(`/api/engines/${await engineId('NV150-26-01131')}/checklist`)
      .send({ charging: { measuredV: 'high' }, tachometer: { tachReadingRpm: 3000.5 } });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([
      { field: 'tachometer.tachReadingRpm', message: 'Tachometer reading must be a whole number.' },
      { field: 'charging.measuredV', message: 'Charging voltage must be a number.' },
    ]);
  });

  it('lets the skipper read their engine’s checklist but not fill it in', async () => {
    const skipper = await signedInAgent(server.app, DEMO.skipperA);
    const id = await engineId('NV60-26-00418');
    expect((await skipper.get(`/api/engines/${id}/checklist`)).status).toBe(200);
    expect((await skipper.put(`/api/engines/${id}/checklist`).send(partDone)).status).toBe(403);
    expect(
      (await skipper.post(`/api/engines/${id}/checklist/complete`).send(finished)).status,
    ).toBe(403);
    const notOwn = await signedInAgent(server.app, DEMO.skipperB);
    expect((await notOwn.get(`/api/engines/${id}/checklist`)).status).toBe(404);
  });

  it("answers 404 to another workshop's technician", async () => {
    const other = await signedInAgent(server.app, otherTechnician);
    const id = await engineId('B321-D-77841');
    expect((await other.get(`/api/engines/${id}/checklist`)).status).toBe(404);
    expect((await other.put(`/api/engines/${id}/checklist`).send(partDone)).status).toBe(404);
    expect(
      await server.dataSource.getRepository(CommissioningChecklist).countBy({ engineId: id }),
    ).toBe(0);
  });
});
