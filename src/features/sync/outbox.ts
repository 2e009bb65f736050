import { MAX_PUSH_ITEMS, type PushItem, type PushResult } from '../../../shared/sync/sync.schema';
import { db, type EventRecord, type RunPatchRecord } from '../../lib/db';

/**
 * Most a batch carries as JSON: a quarter of the server's 4 MB body limit, so long notes or a
 * slow link never make one batch too large or too slow to get through.
 */
export const PUSH_BATCH_BYTES = 1_000_000;

const encoder = new TextEncoder();

/**
 * What waits to be sent, oldest device time first, run changes after the events they follow:
 * at most `maxItems`, and no more than `maxBytes` of JSON (always at least one item).
 */
export async function nextPushBatch(
  maxItems = MAX_PUSH_ITEMS,
  maxBytes = PUSH_BATCH_BYTES,
): Promise<PushItem[]> {
  const events = await db.events.where('sync').equals('pending').sortBy('at');
  const patches = await db.runPatches.where('sync').equals('pending').sortBy('createdAt');
  const items: PushItem[] = [
    ...events.map((e: EventRecord): PushItem => ({
      type: 'event',
      runId: e.runId,
      event: e.event,
    })),
    ...patches.map((p: RunPatchRecord): PushItem => p.item),
  ];
  const batch: PushItem[] = [];
  let bytes = 0;
  for (const item of items.slice(0, maxItems)) {
    bytes += encoder.encode(JSON.stringify(item)).length + 1;
    if (batch.length > 0 && bytes > maxBytes) break;
    batch.push(item);
  }
  return batch;
}

const itemId = (item: PushItem) => (item.type === 'event' ? item.event.id : item.id);

/**
 * Applies the server's answer: stored or already had → synced (leaves the outbox);
 * rejected → kept with its reason for the person to see, never sent again.
 */
export async function recordResults(items: PushItem[], results: PushResult[]): Promise<void> {
  const byId = new Map(results.map((r) => [r.id, r]));
  await db.transaction('rw', db.events, db.runPatches, async () => {
    for (const item of items) {
      const result = byId.get(itemId(item));
      if (!result) continue;
      const change =
        result.status === 'rejected'
          ? { sync: 'rejected' as const, rejectReason: result.reason ?? 'Refused by the server.' }
          : { sync: 'synced' as const };
      if (item.type === 'event') await db.events.update(item.event.id, change);
      else await db.runPatches.update(item.id, change);
    }
  });
}

/**
 * A batch of this one item was refused whole: that refusal names it, so it is kept with the
 * reason and not sent again. A larger batch refused whole is split instead (sync-engine.ts).
 */
export async function rejectOnly(item: PushItem, reason: string): Promise<void> {
  await recordResults([item], [{ id: itemId(item), status: 'rejected', reason }]);
}

export type OutboxCounts = { waiting: number; rejected: number };

export async function outboxCounts(): Promise<OutboxCounts> {
  const [events, patches, photos, badEvents, badPatches, badPhotos] = await Promise.all([
    db.events.where('sync').equals('pending').count(),
    db.runPatches.where('sync').equals('pending').count(),
    db.photos.where('sync').equals('pending').count(),
    db.events.where('sync').equals('rejected').count(),
    db.runPatches.where('sync').equals('rejected').count(),
    db.photos.where('sync').equals('rejected').count(),
  ]);
  return { waiting: events + patches + photos, rejected: badEvents + badPatches + badPhotos };
}
