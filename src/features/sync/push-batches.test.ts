import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { db } from '../../lib/db';
import { problem, stubFetch } from '../../test/fetch-stub';
import { nextPushBatch, outboxCounts } from './outbox';
import { syncNow } from './sync-engine';
import { reading, uuid } from './test-records';

/* How the deck cuts its outbox into batches, and what it does when a batch is refused whole. */

type Sent = { items: Array<{ event: { id: string } }> };
/** The server's answer when it stored every item of the batch. */
const allStored = (items: Sent['items']) => ({
  status: 200,
  body: { results: items.map((i) => ({ id: i.event.id, status: 'stored' })), serverTime: 0 },
});
const empty = { cursor: 0, more: false, runIds: [], runs: [], events: [], vessels: [] };

beforeEach(async () => {
  await db.delete();
  await db.open();
  vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout'] });
});
afterEach(() => {
  vi.clearAllTimers();
  vi.useRealTimers();
  vi.unstubAllGlobals();
});

describe('batches', () => {
  it('stops a batch at its byte budget, but always sends at least one item', async () => {
    await db.events.bulkAdd(Array.from({ length: 10 }, (_, i) => reading(uuid(i + 1), 1000 + i)));
    const one = JSON.stringify((await nextPushBatch(1))[0]).length + 1;
    expect(await nextPushBatch(2000, one * 3)).toHaveLength(3);
    expect(await nextPushBatch(2000, 10)).toHaveLength(1);
  });

  it('halves a batch the server finds too large until each part gets through', async () => {
    await db.events.bulkAdd(Array.from({ length: 40 }, (_, i) => reading(uuid(i + 1), 1000 + i)));
    const sizes: number[] = [];
    stubFetch({
      'POST /api/sync/push': (request) => {
        const { items } = request.body as Sent;
        sizes.push(items.length);
        if (items.length > 10) return problem(413, 'Too large', 'The batch is too large.');
        return allStored(items);
      },
      'GET /api/sync/pull': { status: 200, body: empty },
    });
    await syncNow();
    expect(sizes.slice(0, 3)).toEqual([40, 20, 10]);
    expect(await outboxCounts()).toEqual({ waiting: 0, rejected: 0 });
  });

  it('marks refused only the one item a whole-batch refusal comes down to, and sends the rest', async () => {
    await db.events.bulkAdd(Array.from({ length: 8 }, (_, i) => reading(uuid(i + 1), 1000 + i)));
    const bad = uuid(6);
    stubFetch({
      'POST /api/sync/push': (request) => {
        const { items } = request.body as Sent;
        if (items.some((i) => i.event.id === bad))
          return problem(404, 'Not found', 'No run with id 11111111.');
        return allStored(items);
      },
      'GET /api/sync/pull': { status: 200, body: empty },
    });
    await syncNow();
    expect(await outboxCounts()).toEqual({ waiting: 0, rejected: 1 });
    expect(await db.events.get(bad)).toMatchObject({
      sync: 'rejected',
      rejectReason: 'No run with id 11111111.',
    });
    expect(await db.events.where('sync').equals('synced').count()).toBe(7);
  });
});
