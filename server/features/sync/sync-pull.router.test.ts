import { randomUUID } from 'node:crypto';
import { In } from 'typeorm';
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
import { PullResponseSchema } from '../../../shared/sync/sync.schema.js';
import { RunEventRow } from '../runs/run-event.entity.js';
import { Run } from '../runs/run.entity.js';

let server: TestServer;
const clock = new FakeClock(new Date('2026-12-01T09:00:00Z'));
let gannet: RunDetail;
let port: RunDetail;
let starboard: RunDetail;
const T0 = Date.parse('2026-12-01T08:00:00Z');

// Pulls find what a skipper's phone has sent: readings on all three runs, Blue Tern's starboard
// run submitted to the workshop, and Gannet's run since signed off.
beforeAll(async () => {
  server = await startTestServer({ clock });
  gannet = await assignRun(server.app, 'Gannet', 'single');
  port = await assignRun(server.app, 'Blue Tern', 'port');
  starboard = await assignRun(server.app, 'Blue Tern', 'starboard');
  const readings = [
    sessionEventFor(gannet, 'session-start', T0),
    readingFor(gannet, T0 + 1000, 3000),
    ...[port, starboard].flatMap((run) =>
      [0, 1, 2].map((i) => readingFor(run, T0 + i * 1000, 3100)),
    ),
  ];
  const submit = {
    type: 'run-patch',
    id: randomUUID(),
    runId: starboard.id,
    at: T0 + 70_000,
    submit: true,
    submitNote: 'Stopped after three readings to change the propeller.',
  };
  for (const batch of [readings, [submit]]) {
    const results: Array<{ status: string }> = (await push(batch)).body.results;
    if (!results.every((r) => r.status === 'stored')) throw new Error(JSON.stringify(results));
  }
  await server.dataSource
    .getRepository(Run)
    .update(
      { id: gannet.id },
      { state: 'signed-off', signedOffAt: new Date('2026-12-01T08:30:00Z') },
    );
});
afterAll(() => server.close());

const deviceA = randomUUID();
const skipper = () => signedInAgent(server.app, DEMO.skipperA);
const push = async (items: unknown[], deviceId = deviceA, sentAt = clock.now().getTime()) =>
  (await skipper()).post('/api/sync/push').send({ deviceId, sentAt, items });

describe('pull', () => {
  it('returns each change once from a cursor', async () => {
    const tech = await skipper();
    const first = (await tech.get('/api/sync/pull?cursor=0')).body;
    // The answer is what the device checks a page against before storing it.
    expect(PullResponseSchema.safeParse(first).error).toBeUndefined();
    const ids = first.events.map((e: { event: { id: string } }) => e.event.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(first.runs.map((r: { id: string }) => r.id)).toEqual(
      expect.arrayContaining([gannet.id, port.id, starboard.id]),
    );
    const none = (await tech.get(`/api/sync/pull?cursor=${first.cursor}`)).body;
    expect(none.events).toEqual([]);
    expect(none.runs).toEqual([]);
    const fresh = readingFor(port, T0 + 100_000, 3050);
    await push([fresh]);
    const next = (await tech.get(`/api/sync/pull?cursor=${first.cursor}`)).body;
    expect(next.events.map((e: { event: { id: string } }) => e.event.id)).toEqual([fresh.event.id]);
    expect(next.runs.map((r: { id: string }) => r.id)).toEqual([port.id]);
    expect(next.cursor).toBeGreaterThan(first.cursor);
  });

  it('pages through events with a limit without losing or repeating any', async () => {
    const tech = await skipper();
    const seen: string[] = [];
    let cursor = 0;
    for (let page = 0; page < 50; page++) {
      const body = (await tech.get(`/api/sync/pull?cursor=${cursor}&limit=7`)).body;
      seen.push(...body.events.map((e: { event: { id: string } }) => e.event.id));
      cursor = body.cursor;
      if (!body.more) break;
    }
    expect(new Set(seen).size).toBe(seen.length);
    const visible = (await tech.get('/api/sync/pull?cursor=0&limit=1')).body.runIds;
    expect(seen.length).toBe(
      await server.dataSource.getRepository(RunEventRow).countBy({ runId: In(visible) }),
    );
  });

  it('gives a workshop device only the runs still being logged', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const body = (await tech.get('/api/sync/pull?cursor=0')).body;
    expect(body.runIds).toContain(port.id);
    expect(body.runIds).not.toContain(gannet.id); // signed off
    expect(body.runIds).not.toContain(starboard.id); // with the workshop for review
    const runIds = new Set(body.events.map((e: { runId: string }) => e.runId));
    expect(runIds.has(port.id)).toBe(true);
    expect(runIds.has(gannet.id) || runIds.has(starboard.id)).toBe(false);
    const states = (
      await server.dataSource.getRepository(Run).findBy({ id: In([...runIds] as string[]) })
    ).map((r) => r.state);
    expect(states.every((state) => ['planned', 'under-way', 'returned'].includes(state))).toBe(
      true,
    );
  });
});
