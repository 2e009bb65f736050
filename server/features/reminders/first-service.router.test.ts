import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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
import { ServiceRecord } from './service-record.entity.js';

let server: TestServer;
let otherTechnician: string;
// The demo workshop is in Europe/London: on 1 Dec 2026 at 09:00 UTC its day is 2026-12-01.
const clock = new FakeClock(new Date('2026-12-01T09:00:00Z'));
beforeAll(async () => {
  server = await startTestServer({ clock });
  otherTechnician = (await addOtherWorkshop(server.dataSource)).technicianEmail;
});
afterAll(() => server.close());

const staff = () => signedInAgent(server.app, DEMO.technician);
const engineIdOf = async (serialNumber: string) =>
  (await server.dataSource.getRepository(Engine).findOneByOrFail({ serialNumber })).id;
// Halcyon Drift's inboard: commissioned 2026-11-27 at 2.0 h, break-in signed off (demo data).
const HALCYON = 'B321-D-77841';
// Skua's outboard: commissioned 2026-11-23 at 0.3 h, its run only submitted (demo data).
const SKUA = 'NV40-26-00233';
const done = { date: '2026-12-01', hourMeter: 24.5, doneBy: 'Ivo Brandt', notes: 'Oil, filter.' };
const saved = () => server.dataSource.getRepository(ServiceRecord).count();

describe('recording the first service', () => {
  it('refuses a skipper (403) and another workshop (404), saving nothing', async () => {
    const halcyon = await engineIdOf(HALCYON);
    const tomas = await signedInAgent(server.app, DEMO.skipperB);
    expect((await tomas.post(`/api/engines/${halcyon}/services`).send(done)).status).toBe(403);
    const stranger = await signedInAgent(server.app, otherTechnician);
    expect((await stranger.post(`/api/engines/${halcyon}/services`).send(done)).status).toBe(404);
    expect(await saved()).toBe(0);
  });

  it('refuses an engine whose break-in is not signed off yet', async () => {
    const res = await (
      await staff()
    )
      .post(`/api/engines/${await engineIdOf(SKUA)}/services`)
      .send({ ...done, hourMeter: 12 });
    expect(res.status).toBe(409);
    expect(res.body.detail).toBe(
      'No break-in run of this engine is signed off yet: the first service is recorded after the break-in is signed off.',
    );
    expect(await saved()).toBe(0);
  });

  it('names each field that is missing or not a value', async () => {
    const res = await (
      await staff()
    )
      .post(`/api/engines/${await engineIdOf(HALCYON)}/services`)
      .send({ date: '01/12/2026', hourMeter: 'lots', doneBy: ' ' });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([
      { field: 'date', message: 'Enter the date of the service (date) as YYYY-MM-DD.' },
      {
        field: 'hourMeter',
        message: 'Enter the hour meter reading at the service (hourMeter) in hours.',
      },
      { field: 'doneBy', message: 'Enter who did the service (doneBy).' },
    ]);
    expect(await saved()).toBe(0);
  });

  it('refuses an hour meter below commissioning and a date in the future', async () => {
    const res = await (
      await staff()
    )
      .post(`/api/engines/${await engineIdOf(HALCYON)}/services`)
      .send({ ...done, date: '2026-12-02', hourMeter: 1.5 });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([
      {
        field: 'date',
        message: 'The date of the service (date) cannot be in the future: today is 1 Dec 2026.',
      },
      {
        field: 'hourMeter',
        message:
          'The hour meter reading (hourMeter) cannot be below 2.0 h, its reading at commissioning.',
      },
    ]);
    expect(await saved()).toBe(0);
  });

  it('refuses a date before commissioning', async () => {
    const res = await (
      await staff()
    )
      .post(`/api/engines/${await engineIdOf(HALCYON)}/services`)
      .send({ ...done, date: '2026-11-26' });
    expect(res.body.errors).toEqual([
      {
        field: 'date',
        message: 'The date of the service (date) cannot be before commissioning on 27 Nov 2026.',
      },
    ]);
    expect(await saved()).toBe(0);
  });

  it('saves it once, with the trail entry, and counts the next service from it', async () => {
    const halcyon = await engineIdOf(HALCYON);
    const tech = await staff();
    const res = await tech.post(`/api/engines/${halcyon}/services`).send(done);
    expect(res.status).toBe(201);
    expect(res.body.service).toMatchObject({
      date: '2026-12-01',
      hourMeter: 24.5,
      doneBy: 'Ivo Brandt',
      notes: 'Oil, filter.',
      recordedBy: { name: 'Ivo Brandt' },
      recordedAt: '2026-12-01T09:00:00.000Z',
    });
    const trail = await server.dataSource
      .getRepository(AuditEntry)
      .findBy({ recordId: halcyon, action: 'first-service-recorded' });
    expect(trail.map((t) => [t.actorName, t.detail])).toEqual([
      ['Ivo Brandt', 'First service on 2026-12-01 at 24.5 h by Ivo Brandt'],
    ]);

    const view = (await tech.get(`/api/engines/${halcyon}/service-due`)).body;
    expect(view.firstServiceDone).toMatchObject({ date: '2026-12-01', hourMeter: 24.5 });
    // Then every 100 h or 12 months (common practice; BoatUS "Long Life – Outboard Maintenance").
    expect(view.nextService).toMatchObject({
      interval: { hours: 100, months: 12 },
      dueAtHours: 124.5,
      dueOn: '2027-12-01',
      state: 'not-due',
    });
    expect(view.workings[0]).toBe(
      'First service done on 1 Dec 2026 at 24.5 h on the hour meter, by Ivo Brandt.',
    );
    expect(view.workings[1]).toBe(
      'The next service is counted from it: every 100 h or 12 months, whichever comes first (common practice), so it is due at 124.5 h on the hour meter or on 1 Dec 2027, whichever comes first.',
    );

    const again = await tech.post(`/api/engines/${halcyon}/services`).send(done);
    expect(again.status).toBe(409);
    expect(again.body.detail).toBe(
      'The first service of this engine is already recorded (1 Dec 2026, 24.5 h, by Ivo Brandt).',
    );
    expect(await saved()).toBe(1);
  });
});

describe("the engine's runs", () => {
  it('lists every run with its state, verdict and certificate, for staff only', async () => {
    const halcyon = await engineIdOf(HALCYON);
    const res = await (await staff()).get(`/api/engines/${halcyon}/record`);
    expect(res.status).toBe(200);
    expect(res.body.runs).toEqual([
      expect.objectContaining({
        state: 'signed-off',
        verdict: 'complete',
        programName: expect.any(String),
        certificateNumber: 'TMW-2026-0001-1',
        signedOffAt: '2026-12-01T08:40:00.000Z',
      }),
    ]);
    const skua = (await (await staff()).get(`/api/engines/${await engineIdOf(SKUA)}/record`)).body;
    expect(skua.runs).toEqual([
      expect.objectContaining({ state: 'submitted', certificateNumber: null }),
    ]);
    const tomas = await signedInAgent(server.app, DEMO.skipperB);
    expect((await tomas.get(`/api/engines/${halcyon}/record`)).status).toBe(403);
    const stranger = await signedInAgent(server.app, otherTechnician);
    expect((await stranger.get(`/api/engines/${halcyon}/record`)).status).toBe(404);
  });
});
