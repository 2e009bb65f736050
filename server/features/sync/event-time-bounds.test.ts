import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  assignRun,
  readingFor,
  sessionEventFor,
  type RunDetail,
} from '../../../tests/helpers/runs.js';
import {
  DEMO,
  FakeClock,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';

/** One past the last moment a JavaScript date can hold (ECMA-262, Time Values and Time Range). */
const BEYOND_DATES = 8_640_000_000_000_001;
const DAY = 24 * 60 * 60 * 1000;

let server: TestServer;
const clock = new FakeClock(new Date('2026-12-01T09:00:00Z'));
const NOW = clock.now().getTime();
let run: RunDetail;

beforeAll(async () => {
  server = await startTestServer({ clock });
  run = await assignRun(server.app, 'Gannet', 'single');
});
afterAll(() => server.close());

const skipper = () => signedInAgent(server.app, DEMO.skipperA);
const push = async (items: unknown[]) =>
  (await skipper())
    .post('/api/sync/push')
    .send({ deviceId: randomUUID(), sentAt: clock.now().getTime(), items });

describe('event times', () => {
  it('refuses a time outside the window around the server clock, naming the field, and keeps the rest', async () => {
    const res = await push([
      sessionEventFor(run, 'session-start', NOW - 60_000),
      readingFor(run, BEYOND_DATES, 3000),
      readingFor(run, NOW + 3 * DAY, 3000),
      readingFor(run, NOW - 400 * DAY, 3000),
      readingFor(run, NOW - 30_000, 3000),
    ]);
    expect(res.status).toBe(200);
    const results = res.body.results as Array<{ status: string; field?: string; reason?: string }>;
    expect(results.map((r) => r.status)).toEqual([
      'stored',
      'rejected',
      'rejected',
      'rejected',
      'stored',
    ]);
    for (const refused of results.slice(1, 4)) expect(refused.field).toBe('event.at');
    expect(results[2].reason).toContain("ahead of the server's clock");
    expect(results[3].reason).toContain("behind the server's clock");
  });

  it('keeps every view of a run working when a stored time is beyond any date', async () => {
    const other = await assignRun(server.app, 'Blue Tern', 'port');
    const start = sessionEventFor(other, 'session-start', NOW - 120_000);
    const bad = readingFor(other, NOW - 90_000, 3100);
    const fine = readingFor(other, NOW - 60_000, 3200);
    expect((await push([start, bad, fine])).status).toBe(200);
    // Written before the bound existed: the stored row is as the old server kept it.
    await server.dataSource.query(
      `UPDATE "run_event" SET "at" = ?, "body" = json_set("body", '$.at', ?) WHERE "id" = ?`,
      [BEYOND_DATES, BEYOND_DATES, bad.event.id],
    );
    const tech = await signedInAgent(server.app, DEMO.technician);
    const board = await tech.get('/api/board');
    expect(board.status).toBe(200);
    expect(JSON.stringify(board.body)).toContain(other.id);
    expect((await tech.get(`/api/runs/${other.id}/review`)).status).toBe(200);
    expect((await tech.get(`/api/runs/${other.id}/readings?offset=0&limit=50`)).status).toBe(200);
    expect((await tech.get('/api/runs')).status).toBe(200);
    const csv = await tech.get(`/api/runs/${other.id}/readings.csv`);
    expect(csv.status).toBe(200);
    expect(csv.text).toContain('3200');
    expect(csv.text).toContain('3100');
    const pull = await (await skipper()).get('/api/sync/pull?cursor=0');
    expect(pull.status).toBe(200);
  });
});
