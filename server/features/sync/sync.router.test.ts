import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  assignRun,
  readingFor,
  sessionEventFor,
  type RunDetail,
} from '../../../tests/helpers/runs.js';
import {
  addOtherWorkshop,
  DEMO,
  FakeClock,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import { RunEventRow } from '../runs/run-event.entity.js';
import { Run } from '../runs/run.entity.js';

let server: TestServer;
const clock = new FakeClock(new Date('2026-12-01T09:00:00Z'));
let gannet: RunDetail;
let port: RunDetail;
let starboard: RunDetail;
const T0 = Date.parse('2026-12-01T08:00:00Z');

beforeAll(async () => {
  server = await startTestServer({ clock });
  gannet = await assignRun(server.app, 'Gannet', 'single');
  port = await assignRun(server.app, 'Blue Tern', 'port');
  starboard = await assignRun(server.app, 'Blue Tern', 'starboard');
});
afterAll(() => server.close());

const deviceA = randomUUID();
const deviceB = randomUUID();
const eventCount = (runId: string) =>
  server.dataSource.getRepository(RunEventRow).countBy({ runId });
const skipper = () => signedInAgent(server.app, DEMO.skipperA);
const push = async (items: unknown[], deviceId = deviceA, sentAt = clock.now().getTime()) =>
  (await skipper()).post('/api/sync/push').send({ deviceId, sentAt, items });

describe('push', () => {
  it('stores the valid items of a batch and rejects the invalid ones with a reason naming the field', async () => {
    const good = [
      sessionEventFor(gannet, 'session-start', T0),
      readingFor(gannet, T0 + 1000, 3000),
    ];
    const badRpm = readingFor(gannet, T0 + 2000, -50);
    const badPhase = {
      ...readingFor(gannet, T0 + 3000, 3000),
      event: { ...readingFor(gannet, T0 + 3000, 3000).event, phaseId: 'no-such-phase' },
    };
    const res = await push([...good, badRpm, badPhase]);
    expect(res.status).toBe(200);
    expect(res.body.results.map((r: { status: string }) => r.status)).toEqual([
      'stored',
      'stored',
      'rejected',
      'rejected',
    ]);
    expect(res.body.results[2]).toMatchObject({
      id: badRpm.event.id,
      field: 'event.rpm',
      reason: 'The engine speed (rpm) cannot be negative.',
    });
    expect(res.body.results[3]).toMatchObject({ field: 'event.phaseId' });
    expect(await eventCount(gannet.id)).toBe(2);
    const run = await server.dataSource.getRepository(Run).findOneByOrFail({ id: gannet.id });
    expect(run.state).toBe('under-way');
  });

  it('changes nothing when the same batch arrives three times', async () => {
    const batch = Array.from({ length: 20 }, (_, i) =>
      readingFor(gannet, T0 + 60_000 + i * 5000, 2800 + i * 10),
    );
    const before = await eventCount(gannet.id);
    const first = await push(batch);
    const rowsAfterFirst = await server.dataSource
      .getRepository(RunEventRow)
      .find({ where: { runId: gannet.id }, order: { id: 'ASC' } });
    const second = await push(batch);
    const third = await push(batch);
    expect(first.body.results.every((r: { status: string }) => r.status === 'stored')).toBe(true);
    for (const again of [second, third])
      expect(again.body.results.every((r: { status: string }) => r.status === 'duplicate')).toBe(
        true,
      );
    const rowsAfterThird = await server.dataSource
      .getRepository(RunEventRow)
      .find({ where: { runId: gannet.id }, order: { id: 'ASC' } });
    expect(rowsAfterThird).toEqual(rowsAfterFirst);
    expect(rowsAfterThird).toHaveLength(before + 20);
  });

  it('keeps interleaved batches from two devices on a twin installation apart and complete', async () => {
    const twinBatch = (offset: number) =>
      [port, starboard].flatMap((run) =>
        [0, 1, 2].map((i) => readingFor(run, T0 + offset + i * 1000, 3100)),
      );
    const results = await Promise.all([
      push(twinBatch(0), deviceA),
      push(twinBatch(10_000), deviceB),
      push(twinBatch(20_000), deviceA),
      push(twinBatch(30_000), deviceB),
    ]);
    for (const res of results)
      expect(res.body.results.every((r: { status: string }) => r.status === 'stored')).toBe(true);
    expect(await eventCount(port.id)).toBe(12);
    expect(await eventCount(starboard.id)).toBe(12);
    const wrongEngine = readingFor(port, T0 + 40_000, 3000);
    wrongEngine.event.engineId = starboard.engine.id;
    const res = await push([wrongEngine]);
    expect(res.body.results[0]).toMatchObject({ status: 'rejected', field: 'event.engineId' });
  });

  it('records the server time of arrival beside the device time and flags a device clock a day off', async () => {
    const reading = readingFor(port, T0 + 50_000, 3000);
    await push([reading], deviceA, clock.now().getTime() + 3 * 86_400_000);
    const row = await server.dataSource
      .getRepository(RunEventRow)
      .findOneByOrFail({ id: reading.event.id });
    expect(row.at).toBe(T0 + 50_000);
    expect(row.receivedAt).toBe(clock.now().getTime());
    const run = await server.dataSource.getRepository(Run).findOneByOrFail({ id: port.id });
    expect(run.clockSkewMs).toBe(3 * 86_400_000);
  });

  it('submits a run once, refuses new readings while it is with the workshop, and still confirms copies it has', async () => {
    const earlier = readingFor(starboard, T0 + 60_000, 3000);
    expect((await push([earlier])).body.results[0].status).toBe('stored');
    const submit = {
      type: 'run-patch',
      id: randomUUID(),
      runId: starboard.id,
      at: T0 + 70_000,
      submit: true,
      submitNote: 'Stopped early: weather.',
      notes: 'Ran both engines together.',
    };
    expect((await push([submit])).body.results[0].status).toBe('stored');
    expect((await push([submit])).body.results[0].status).toBe('duplicate');
    const run = await server.dataSource.getRepository(Run).findOneByOrFail({ id: starboard.id });
    expect(run).toMatchObject({ state: 'submitted', notes: 'Ran both engines together.' });
    const late = await push([earlier, readingFor(starboard, T0 + 80_000, 3000)]);
    expect(late.body.results[0].status).toBe('duplicate');
    expect(late.body.results[1]).toMatchObject({
      status: 'rejected',
      reason: expect.stringContaining('with the workshop for review'),
    });
  });

  it('rejects pushes to a signed-off run with a clear reason and alters nothing stored', async () => {
    await server.dataSource
      .getRepository(Run)
      .update(
        { id: gannet.id },
        { state: 'signed-off', signedOffAt: new Date('2026-12-01T08:30:00Z') },
      );
    const before = await server.dataSource
      .getRepository(RunEventRow)
      .find({ where: { runId: gannet.id }, order: { id: 'ASC' } });
    const res = await push([
      readingFor(gannet, T0 + 90_000, 3000),
      { type: 'run-patch', id: randomUUID(), runId: gannet.id, at: T0, notes: 'late note' },
    ]);
    expect(res.body.results[0]).toMatchObject({
      status: 'rejected',
      reason:
        'This run was signed off by the workshop on 2026-12-01; nothing more can be added to it.',
    });
    expect(res.body.results[1]).toMatchObject({
      status: 'rejected',
      reason: 'This run was signed off by the workshop; it can no longer be changed.',
    });
    expect(
      await server.dataSource
        .getRepository(RunEventRow)
        .find({ where: { runId: gannet.id }, order: { id: 'ASC' } }),
    ).toEqual(before);
    expect(
      (await server.dataSource.getRepository(Run).findOneByOrFail({ id: gannet.id })).notes,
    ).toBe('');
  });

  it('names the envelope field of a malformed batch', async () => {
    const res = await (
      await skipper()
    )
      .post('/api/sync/push')
      .send({ deviceId: 'phone', sentAt: -1, items: [] });
    expect(res.status).toBe(400);
    expect(res.body.errors.map((e: { field: string }) => e.field).sort()).toEqual([
      'deviceId',
      'items',
      'sentAt',
    ]);
  });
});

describe('tenancy', () => {
  it("refuses by name an item for another skipper's run and stores the rest of the batch", async () => {
    const tomas = await signedInAgent(server.app, DEMO.skipperB);
    const before = await eventCount(port.id);
    const res = await tomas.post('/api/sync/push').send({
      deviceId: deviceB,
      sentAt: clock.now().getTime(),
      items: [readingFor(port, T0 + 200_000, 3000)],
    });
    expect(res.status).toBe(200);
    expect(res.body.results).toEqual([
      {
        id: expect.any(String),
        status: 'rejected',
        field: 'runId',
        reason: expect.stringContaining('This run is not shared with you, or no longer exists'),
      },
    ]);
    expect(await eventCount(port.id)).toBe(before);

    // Sunniva's phone still holds an entry for Halcyon Drift's run (say, from before she was
    // unlinked) in the same batch as her own Blue Tern readings.
    const [halcyonRunId] = (await tomas.get('/api/sync/pull?cursor=0')).body.runIds as string[];
    const sunniva = await skipper();
    const cormorant = (
      (await sunniva.get('/api/sync/pull?cursor=0')).body.runs as RunDetail[]
    ).find((r) => r.state === 'under-way')!;
    const now = clock.now().getTime();
    const own = [
      readingFor(cormorant, now - 60_000, 3100),
      readingFor(cormorant, now - 30_000, 3150),
    ];
    const foreign = { ...readingFor(cormorant, now - 20_000, 3000), runId: halcyonRunId };
    const [mine, theirs] = [await eventCount(cormorant.id), await eventCount(halcyonRunId)];
    const mixed = await sunniva.post('/api/sync/push').send({
      deviceId: deviceA,
      sentAt: clock.now().getTime(),
      items: [...own, foreign],
    });
    expect(
      mixed.body.results.map((r: { status: string; field?: string }) => r.field ?? r.status),
    ).toEqual(['stored', 'stored', 'runId']);
    expect([await eventCount(cormorant.id), await eventCount(halcyonRunId)]).toEqual([
      mine + 2,
      theirs,
    ]);
    const pulled = (await tomas.get('/api/sync/pull?cursor=0')).body;
    expect(pulled.runIds).not.toContain(port.id);
    expect(pulled.events.filter((e: { runId: string }) => e.runId === port.id)).toEqual([]);
  });

  it('refuses another workshop in the same words as a run that does not exist, and shows it nothing', async () => {
    const other = await addOtherWorkshop(server.dataSource);
    const stranger = await signedInAgent(server.app, other.technicianEmail);
    const before = await eventCount(port.id);
    const res = await stranger.post('/api/sync/push').send({
      deviceId: deviceB,
      sentAt: clock.now().getTime(),
      items: [readingFor(port, T0 + 300_000, 3000)],
    });
    expect(res.status).toBe(200);
    expect(res.body.results[0]).toMatchObject({ status: 'rejected', field: 'runId' });
    expect(res.body.results[0].reason).toContain('not shared with you, or no longer exists');
    expect(await eventCount(port.id)).toBe(before);
    const pulled = (await stranger.get('/api/sync/pull?cursor=0')).body;
    expect(pulled).toMatchObject({ runs: [], events: [], runIds: [] });
  });
});
