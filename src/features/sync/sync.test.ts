import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { PullResponse } from '../../../shared/sync/sync.schema';
import { db, type RunRecord } from '../../lib/db';
import { stubFetch } from '../../test/fetch-stub';
import { nextPushBatch, outboxCounts, recordResults } from './outbox';
import { applyPull } from './pull';
import { backoffDelay, startSync, syncNow } from './sync-engine';
import { getSyncStatus } from './sync-status';
import { reading, RUN, uuid } from './test-records';

beforeEach(async () => {
  await db.delete();
  await db.open();
});

describe('outbox', () => {
  it('sends pending events oldest first, run changes after them, and nothing already synced', async () => {
    await db.events.bulkAdd([
      reading(uuid(3), 3000),
      reading(uuid(1), 1000),
      reading(uuid(2), 2000, 'synced'),
    ]);
    await db.runPatches.add({
      id: uuid(9),
      runId: RUN,
      item: { type: 'run-patch', id: uuid(9), runId: RUN, at: 500, submit: true },
      sync: 'pending',
      createdAt: 500,
    });
    const batch = await nextPushBatch();
    expect(batch.map((i) => (i.type === 'event' ? i.event.id : i.id))).toEqual([
      uuid(1),
      uuid(3),
      uuid(9),
    ]);
    expect(await nextPushBatch(1)).toHaveLength(1);
  });

  it('clears stored and already-had items, keeps refused ones with their reason', async () => {
    await db.events.bulkAdd([
      reading(uuid(1), 1000),
      reading(uuid(2), 2000),
      reading(uuid(3), 3000),
    ]);
    const items = await nextPushBatch();
    await recordResults(items, [
      { id: uuid(1), status: 'stored' },
      { id: uuid(2), status: 'duplicate' },
      { id: uuid(3), status: 'rejected', reason: 'The engine speed (rpm) cannot be negative.' },
    ]);
    expect(await outboxCounts()).toEqual({ waiting: 0, rejected: 1 });
    expect((await db.events.get(uuid(3)))?.rejectReason).toBe(
      'The engine speed (rpm) cannot be negative.',
    );
    expect(await nextPushBatch()).toEqual([]);
  });

  it('leaves items waiting when the server gave no answer for them', async () => {
    await db.events.bulkAdd([reading(uuid(1), 1000), reading(uuid(2), 2000)]);
    await recordResults(await nextPushBatch(), [{ id: uuid(1), status: 'stored' }]);
    expect(await outboxCounts()).toEqual({ waiting: 1, rejected: 0 });
  });
});

describe('pull', () => {
  const run = { id: RUN, state: 'under-way' } as RunRecord;
  const page = (events: PullResponse['events'], runIds = [RUN]): PullResponse => ({
    cursor: 42,
    more: false,
    runIds,
    runs: [run],
    events,
    vessels: [],
  });

  it("adds events made elsewhere, confirms this device's own, and moves the cursor", async () => {
    await db.events.add(reading(uuid(1), 1000));
    const mine = (await db.events.get(uuid(1)))!.event;
    const theirs = { ...mine, id: uuid(2), at: 2000 };
    await applyPull(
      page([
        { runId: RUN, receivedAt: 5000, event: mine },
        { runId: RUN, receivedAt: 5000, event: theirs },
      ]),
    );
    expect(await db.events.get(uuid(1))).toMatchObject({ origin: 'device', sync: 'synced' });
    expect(await db.events.get(uuid(2))).toMatchObject({ origin: 'server', sync: 'synced' });
    expect((await db.meta.get('pullCursor'))?.value).toBe(42);
  });

  it('drops runs no longer shared with this user and asks for a full pull when one is missing', async () => {
    await db.runs.put({ ...run, id: uuid(7) });
    const { needsFullPull } = await applyPull({ ...page([], [RUN, uuid(8)]), runs: [run] });
    expect(await db.runs.get(uuid(7))).toBeUndefined();
    expect(needsFullPull).toBe(true);
  });
});

describe('a malformed pull page', () => {
  // The failed sync schedules a retry; fake timers keep it from firing after the test.
  beforeEach(() => vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout'] }));
  afterEach(() => {
    vi.clearAllTimers();
    vi.useRealTimers();
    vi.unstubAllGlobals();
  });

  it('stores nothing from the page and reports the sync as failed', async () => {
    const run = { id: RUN, state: 'under-way' } as RunRecord;
    await db.runs.put(run);
    await db.vessels.put({
      id: 'vessel-1',
      name: 'Skua',
      hin: '',
      type: 'workboat',
      lengthM: null,
      homePort: '',
      skippers: [],
      engines: [],
      archivedAt: null,
      updatedAt: '2026-05-12T09:00:00Z',
    });
    await db.meta.put({ key: 'pullCursor', value: 7 });
    // Would clear the vessels, drop the run and move the cursor, but its event has no time.
    const malformed = {
      cursor: 42,
      more: false,
      runIds: [],
      runs: [],
      vessels: [],
      events: [{ runId: RUN, receivedAt: 5000, event: { kind: 'reading', id: uuid(5) } }],
    };
    const { calls } = stubFetch({ 'GET /api/sync/pull': { status: 200, body: malformed } });

    await syncNow();

    expect(calls.map((c) => `${c.method} ${c.path}`)).toEqual(['GET /api/sync/pull']);
    expect(await db.runs.get(RUN)).toEqual(run);
    expect(await db.vessels.count()).toBe(1);
    expect(await db.events.get(uuid(5))).toBeUndefined();
    expect((await db.meta.get('pullCursor'))?.value).toBe(7);
    expect(getSyncStatus()).toMatchObject({
      syncing: false,
      lastError: 'Sync failed unexpectedly.',
      nextRetryAt: expect.any(Number),
    });
  });
});

describe('retry timing', () => {
  it('backs off exponentially with jitter and stops growing at five minutes', () => {
    expect(backoffDelay(1, () => 0)).toBe(1000);
    expect(backoffDelay(1, () => 1)).toBe(2000);
    expect(backoffDelay(4, () => 1)).toBe(16_000);
    expect(backoffDelay(30, () => 1)).toBe(300_000);
    expect(backoffDelay(30, () => 0)).toBe(150_000);
  });
});

describe('sending soon after a write', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('pushes a reading written while online within seconds, not at the next minute', async () => {
    const pushed: string[] = [];
    const empty = { cursor: 0, more: false, runIds: [], runs: [], vessels: [], events: [] };
    stubFetch({
      'POST /api/sync/push': (request) => {
        const items = (request.body as { items: Array<{ event: { id: string } }> }).items;
        pushed.push(...items.map((i) => i.event.id));
        return {
          status: 200,
          body: { results: items.map((i) => ({ id: i.event.id, status: 'stored' })) },
        };
      },
      'GET /api/sync/pull': { status: 200, body: empty },
    });
    const stop = startSync();
    try {
      await vi.waitFor(() => expect(getSyncStatus().lastSyncAt).not.toBeNull());
      await db.events.add(reading(uuid(21), 21_000));
      // The minute's timer is far off: only the write itself can have sent it.
      await vi.waitFor(() => expect(pushed).toEqual([uuid(21)]), { timeout: 5_000 });
      await vi.waitFor(async () => expect((await outboxCounts()).waiting).toBe(0));
    } finally {
      stop();
    }
  });
});
