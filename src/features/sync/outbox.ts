import { MAX_PUSH_ITEMS, type PushItem, type PushResult } from '../../../shared/sync/sync.schema';
import { db, type EventRecord, type RunPatchRecord } from '../../lib/db';

/** What waits to be sent, oldest device time first; run changes after the events they follow. */
export async function nextPushBatch(max = MAX_PUSH_ITEMS): Promise<PushItem[]> {
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
  return items.slice(0, max);
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

/** The whole batch was refused (e.g. the run is no longer shared with this user). */
export async function rejectAll(items: PushItem[], reason: string): Promise<void> {
  await recordResults(
    items,
    items.map((item) => ({ id: itemId(item), status: 'rejected', reason })),
  );
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
