import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  addOtherWorkshop,
  DEMO,
  FakeClock,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import { runOnBoard } from './review-test-client.js';

let server: TestServer;
const clock = new FakeClock(new Date('2026-12-01T09:00:00Z'));
beforeAll(async () => {
  server = await startTestServer({ clock });
});
afterAll(() => server.close());

const staff = () => signedInAgent(server.app, DEMO.technician);
const runOn = (vessel: string, position?: string) => runOnBoard(server.app, vessel, position);

describe('the review of a run', () => {
  it('gives the chart per phase with its band and the breach marked, and every reason in words', async () => {
    const skua = await runOn('Skua');
    const res = await (await staff()).get(`/api/runs/${skua.id}/review`);
    expect(res.status).toBe(200);
    const review = res.body;
    expect(review.engine.serialNumber).toBe('NV40-26-00233');
    expect(review.account.verdict).toBe('breached');
    expect(review.charts.map((c: { phaseId: string }) => c.phaseId)).toEqual([
      'dock-run',
      'below-half',
      'below-three-quarter',
    ]);
    const last = review.charts[2];
    // Share bands of the built-in program against the engine's rated 6000 rpm: ¾ → 4500 rpm.
    expect(last.band).toEqual({ rpmMin: 0, rpmMax: 4500 });
    expect(last.breaches).toHaveLength(1);
    expect(last.breaches[0]).toMatchObject({ code: 'full-throttle-too-long' });
    expect(last.breaches[0].toX - last.breaches[0].fromX).toBeCloseTo(95 / 60, 2);
    expect(last.points.some((p: { state: string }) => p.state === 'over')).toBe(true);
    const reasons = review.phases.flatMap((p: { reasons: Array<{ message: string }> }) =>
      p.reasons.map((r) => r.message),
    );
    expect(reasons).toEqual([
      'Full throttle was held for 1 min 35 s; this phase allows at most 1 min at a time.',
    ]);
    expect(review.canDecide).toBe(true);
  });

  it('lists notes, alerts and sessions, and the trail of who did what', async () => {
    const skua = await runOn('Skua');
    const review = (await (await staff()).get(`/api/runs/${skua.id}/review`)).body;
    const kinds = new Set(review.events.map((e: { kind: string }) => e.kind));
    expect([...kinds].sort()).toEqual([
      'alert',
      'note',
      'phase-advance',
      'session-start',
      'session-stop',
    ]);
    expect(review.events.find((e: { kind: string }) => e.kind === 'alert').message).toContain(
      'Full throttle',
    );
    expect(review.run.notes).toContain('Oil checked');
    expect(
      review.trail.map((t: { action: string; actorName: string }) => `${t.action} ${t.actorName}`),
    ).toEqual(['run-assigned Ivo Brandt', 'run-submitted Sunniva Okafor']);
  });

  it('flags a device clock more than a day off', async () => {
    const cormorant = await runOn('Cormorant', 'starboard');
    const review = (await (await staff()).get(`/api/runs/${cormorant.id}/review`)).body;
    expect(review.run).toMatchObject({ clockSkewFlag: true, clockSkewMs: 27 * 3_600_000 });
  });

  it("shows a skipper their own run without the workshop trail, and nobody else's", async () => {
    const skua = await runOn('Skua');
    const own = (
      await (await signedInAgent(server.app, DEMO.skipperA)).get(`/api/runs/${skua.id}/review`)
    ).body;
    expect(own).toMatchObject({ canDecide: false, trail: [] });
    expect(
      (await (await signedInAgent(server.app, DEMO.skipperB)).get(`/api/runs/${skua.id}/review`))
        .status,
    ).toBe(404);
    const other = await addOtherWorkshop(server.dataSource);
    expect(
      (
        await (
          await signedInAgent(server.app, other.technicianEmail)
        ).get(`/api/runs/${skua.id}/review`)
      ).status,
    ).toBe(404);
    const bad = await (await staff()).get('/api/runs/not-a-run/review');
    expect(bad.status).toBe(400);
    expect(bad.body.errors[0].field).toBe('params.id');
  });
});

describe('readings', () => {
  it('pages through the readings in time order', async () => {
    const skua = await runOn('Skua');
    const tech = await staff();
    const first = (await tech.get(`/api/runs/${skua.id}/readings?offset=0&limit=10`)).body;
    const second = (await tech.get(`/api/runs/${skua.id}/readings?offset=10&limit=10`)).body;
    expect(first.total).toBeGreaterThan(60);
    expect(first.readings).toHaveLength(10);
    const times = [...first.readings, ...second.readings].map((r: { at: number }) => r.at);
    expect(times).toEqual([...times].sort((a, b) => a - b));
    expect(first.readings[0]).toMatchObject({
      phaseName: 'First run at the dock',
      throttle: 'idle',
      band: 'in-band',
      rpmSource: 'tachometer',
    });
    const bad = await tech.get(`/api/runs/${skua.id}/readings?limit=0`);
    expect(bad.status).toBe(400);
    expect(bad.body.errors).toEqual([
      { field: 'query.limit', message: 'The page size (limit) must be at least 1.' },
    ]);
  });

  it('exports every reading as CSV, one line each under a header', async () => {
    const skua = await runOn('Skua');
    const tech = await staff();
    const total = (await tech.get(`/api/runs/${skua.id}/readings?limit=1`)).body.total;
    const res = await tech.get(`/api/runs/${skua.id}/readings.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="?skua-single-nv40-26-00233-readings\.csv"?$/,
    );
    const lines = res.text.split('\r\n').filter(Boolean);
    expect(lines[0]).toBe(
      'device time (UTC),received (UTC),phase,rpm,throttle,band,rpm source,frequency (Hz),speed (kn),speed source,fuel (L/h),hour meter (h),cooling water ok,latitude,longitude,note,reading id,"voided (reason, by)"',
    );
    expect(lines).toHaveLength(total + 1);
    expect(lines.filter((l) => l.includes(',full,over,'))).not.toHaveLength(0);
    expect(
      (
        await (
          await signedInAgent(server.app, DEMO.skipperB)
        ).get(`/api/runs/${skua.id}/readings.csv`)
      ).status,
    ).toBe(404);
  });
});
