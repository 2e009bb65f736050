import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  addOtherWorkshop,
  DEMO,
  FakeClock,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import { boardAnswer, runOnBoard } from './review-test-client.js';

let server: TestServer;
const clock = new FakeClock(new Date('2026-12-01T09:00:00Z'));
beforeAll(async () => {
  server = await startTestServer({ clock });
});
afterAll(() => server.close());

const staff = () => signedInAgent(server.app, DEMO.technician);
const board = (query?: string) => boardAnswer(server.app, query);
const runOn = (vessel: string, position?: string) => runOnBoard(server.app, vessel, position);

describe('the runs board', () => {
  it('shows every run of the workshop, what needs action first', async () => {
    const { runs, counts, total } = await board();
    expect(counts).toEqual({
      planned: 1,
      'under-way': 2,
      submitted: 1,
      'signed-off': 1,
      returned: 0,
      cancelled: 0,
    });
    expect(total).toBe(5);
    expect(runs.map((r) => `${r.vessel.name}/${r.group}`)).toEqual([
      'Skua/review',
      'Cormorant/check',
      'Cormorant/check',
      'Halcyon Drift/book-service',
      'Kittiwake/planned',
    ]);
  });

  it('lists only what needs action by default, and filters by state and search', async () => {
    const action = await board('');
    expect(action.actionCount).toBe(4);
    expect(action.runs.map((r) => r.vessel.name)).toEqual([
      'Skua',
      'Cormorant',
      'Cormorant',
      'Halcyon Drift',
    ]);
    expect((await board('show=planned')).runs.map((r) => r.vessel.name)).toEqual(['Kittiwake']);
    const search = await board('show=all&q=nv115%20starboard');
    expect(search.runs.map((r) => `${r.vessel.name} ${r.engine.position}`)).toEqual([
      'Cormorant starboard',
    ]);
    const page = await board('show=all&limit=2');
    expect(page).toMatchObject({ matching: 5 });
    expect(page.runs).toHaveLength(2);
    const bad = await (await staff()).get('/api/board?show=sunk&limit=0');
    expect(bad.status).toBe(400);
    expect(bad.body.errors.map((e: { field: string }) => e.field)).toEqual([
      'query.show',
      'query.limit',
    ]);
  });

  it('flags the broken rule, the device clock and the overdue first service', async () => {
    const skua = await runOn('Skua');
    expect(skua).toMatchObject({
      state: 'submitted',
      verdict: 'breached',
      breachCount: 1,
      flags: ['breach'],
    });
    expect(skua.progress).toBe(1);
    const cormorant = await runOn('Cormorant', 'port');
    expect(cormorant.flags).toEqual(['clock-skew']);
    expect(cormorant.progress).toBeGreaterThan(0.3);
    expect(cormorant.progress).toBeLessThan(0.5);
    // First service at 20 h after commissioning at 2.0 h (common practice; BoatUS "Long Life – Outboard Maintenance"),
    // and the demo diesel's logged hour meter is past 22.0 h at the end of its break-in.
    const halcyon = await runOn('Halcyon Drift');
    expect(halcyon.flags).toEqual(['service-overdue']);
    expect(halcyon.firstService).toMatchObject({
      state: 'overdue',
      dueAtHours: 22,
      hoursSource: 'logged',
    });
  });

  it('keeps progress current as new readings arrive from a device', async () => {
    const before = await runOn('Cormorant', 'port');
    const review = (await (await staff()).get(`/api/runs/${before.id}/review`)).body;
    const phaseId = 'below-three-quarter';
    const engineId = review.engine.id;
    const t0 = Date.parse('2026-12-01T08:00:00Z') + 27 * 3_600_000; // this phone runs a day ahead
    const events = [
      { kind: 'session-start', id: randomUUID(), at: t0, engineId },
      ...[0, 1, 2, 3].map((i) => ({
        kind: 'reading',
        id: randomUUID(),
        at: t0 + i * 540_000,
        engineId,
        phaseId,
        rpm: 3000 + (i % 2) * 600,
        throttle: 'three-quarter',
      })),
      { kind: 'session-stop', id: randomUUID(), at: t0 + 36 * 60_000, engineId },
    ];
    const sunniva = await signedInAgent(server.app, DEMO.skipperA);
    const push = await sunniva.post('/api/sync/push').send({
      deviceId: randomUUID(),
      sentAt: clock.now().getTime(),
      items: events.map((event) => ({ type: 'event', runId: before.id, event })),
    });
    expect(push.status).toBe(200);
    const after = await runOn('Cormorant', 'port');
    // 36 minutes more in band, on a program of 600 minutes in all (10 + 110 + 480, the built-in four-stroke program).
    expect(after.progress - before.progress).toBeCloseTo(36 / 600, 3);
  });

  it('is for staff only and shows another workshop nothing of ours', async () => {
    expect((await (await signedInAgent(server.app, DEMO.skipperA)).get('/api/board')).status).toBe(
      403,
    );
    const other = await addOtherWorkshop(server.dataSource);
    const stranger = await signedInAgent(server.app, other.technicianEmail);
    const theirs = (await stranger.get('/api/board')).body;
    expect(theirs.runs).toEqual([]);
    expect(theirs.counts['submitted']).toBe(0);
  });
});
