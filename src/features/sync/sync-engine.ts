import { liveQuery } from 'dexie';
import { MAX_PUSH_ITEMS, type PushItem, type PushResponse } from '../../../shared/sync/sync.schema';
import { api, isApiError } from '../../lib/api-client';
import { db } from '../../lib/db';
import { nextPushBatch, outboxCounts, recordResults, rejectOnly } from './outbox';
import { uploadPendingPhotos, isFinalRefusal } from './photos';
import { pullAll } from './pull';
import { setSyncStatus } from './sync-status';

const ONLINE_INTERVAL_MS = 60_000;
const BACKOFF_BASE_MS = 2_000;
/** A new entry goes out this soon when the network is there (entries typed together go together). */
const AFTER_WRITE_MS = 2_000;
const BACKOFF_MAX_MS = 5 * 60_000;

async function deviceId(): Promise<string> {
  const saved = (await db.meta.get('deviceId'))?.value as string | undefined;
  if (saved) return saved;
  const id = crypto.randomUUID();
  await db.meta.put({ key: 'deviceId', value: id });
  return id;
}

/**
 * Sends every pending event and run change, one batch at a time, until the outbox is empty.
 * Batches are bounded by bytes (outbox.ts). A batch the server refuses whole (too large, or
 * one bad item the server could not answer item by item) is halved until the refusal names a
 * single item; nothing is marked refused that the server did not refuse by name.
 */
async function pushAll(): Promise<void> {
  const device = await deviceId();
  let limit = MAX_PUSH_ITEMS;
  for (let round = 0; round < 1000; round++) {
    const items = await nextPushBatch(limit);
    if (items.length === 0) return;
    const split = await pushBatch(device, items);
    limit = split ? Math.max(1, Math.ceil(items.length / 2)) : Math.min(MAX_PUSH_ITEMS, limit * 2);
  }
}

/** One batch; true when it was refused whole and should go again in halves. */
async function pushBatch(device: string, items: PushItem[]): Promise<boolean> {
  try {
    const answer = await api.post<PushResponse>('/api/sync/push', {
      deviceId: device,
      sentAt: Date.now(),
      items,
    });
    await recordResults(items, answer.results);
    return false;
  } catch (error) {
    if (!isApiError(error) || !isFinalRefusal(error.status)) throw error;
    if (items.length > 1) return true;
    await rejectOnly(items[0], error.message);
    return false;
  }
}

let running: Promise<void> | null = null;
let failures = 0;
let retryTimer: ReturnType<typeof setTimeout> | undefined;

/** One sync: push, photos, pull. Concurrent calls share the one in flight. */
export function syncNow(): Promise<void> {
  running ??= (async () => {
    setSyncStatus({ syncing: true });
    try {
      await pushAll();
      await uploadPendingPhotos();
      await pullAll();
      failures = 0;
      setSyncStatus({ syncing: false, lastSyncAt: Date.now(), lastError: null, nextRetryAt: null });
    } catch (error) {
      failures++;
      const delay = backoffDelay(failures);
      setSyncStatus({
        syncing: false,
        lastError: describe(error),
        nextRetryAt: Date.now() + delay,
      });
      clearTimeout(retryTimer);
      retryTimer = setTimeout(() => void syncNow(), delay);
    } finally {
      running = null;
    }
  })();
  return running;
}

/** Exponential backoff with full jitter between half and all of the step, capped at 5 minutes. */
export function backoffDelay(failureCount: number, random = Math.random): number {
  const step = Math.min(BACKOFF_MAX_MS, BACKOFF_BASE_MS * 2 ** Math.max(0, failureCount - 1));
  return Math.round(step * (0.5 + random() * 0.5));
}

function describe(error: unknown): string {
  if (isApiError(error)) {
    if (error.isNetworkError) return 'No connection to the workshop server.';
    if (error.status === 401) return 'Signed out: sign in again to send what is waiting.';
    return error.message;
  }
  return 'Sync failed unexpectedly.';
}

let started = false;

/** Syncs at start, when the network returns, when the app is shown again, and every minute while online. */
export function startSync(): () => void {
  if (started) return () => undefined;
  started = true;
  const kick = () => {
    if (navigator.onLine) void syncNow();
  };
  const onVisible = () => document.visibilityState === 'visible' && kick();
  window.addEventListener('online', kick);
  document.addEventListener('visibilitychange', onVisible);
  const timer = setInterval(kick, ONLINE_INTERVAL_MS);
  const afterWrites = watchNewEntries(kick);
  kick();
  return () => {
    started = false;
    afterWrites.unsubscribe();
    window.removeEventListener('online', kick);
    document.removeEventListener('visibilitychange', onVisible);
    clearInterval(timer);
    clearTimeout(retryTimer);
  };
}

/** Calls `kick` shortly after more entries wait to go out (written on this device while online). */
function watchNewEntries(kick: () => void) {
  let waiting = 0;
  let soon: ReturnType<typeof setTimeout> | undefined;
  const subscription = liveQuery(outboxCounts).subscribe({
    next: (counts) => {
      if (counts.waiting > waiting) {
        clearTimeout(soon);
        soon = setTimeout(kick, AFTER_WRITE_MS);
      }
      waiting = counts.waiting;
    },
    error: () => undefined,
  });
  return {
    unsubscribe: () => {
      clearTimeout(soon);
      subscription.unsubscribe();
    },
  };
}
