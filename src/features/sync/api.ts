import { useLiveQuery } from 'dexie-react-hooks';
import { db, type SyncState } from '../../lib/db';
import { outboxCounts, type OutboxCounts } from './outbox';
import { syncNow } from './sync-engine';

export { useSyncStatus } from './sync-status';

/** How much waits to be sent, and how much the server refused; live from the device database. */
export const useOutboxCounts = (): OutboxCounts | undefined => useLiveQuery(outboxCounts, []);

export type OutboxLine = {
  id: string;
  what: string;
  at: number;
  runId: string;
  sync: SyncState;
  reason?: string;
};

const kindWords: Record<string, string> = {
  reading: 'Reading',
  'session-start': 'Outing started',
  'session-stop': 'Outing ended',
  'phase-advance': 'Next phase',
  alert: 'Alert',
  note: 'Note',
  void: 'Entry voided',
};

/** Everything not yet confirmed by the server (waiting or refused), newest first. */
export function useOutboxLines(): OutboxLine[] | undefined {
  return useLiveQuery(async () => {
    const states: SyncState[] = ['pending', 'rejected'];
    const events = await db.events.where('sync').anyOf(states).toArray();
    const patches = await db.runPatches.where('sync').anyOf(states).toArray();
    const photos = await db.photos.where('sync').anyOf(states).toArray();
    const lines: OutboxLine[] = [
      ...events.map((e) => ({
        id: e.id,
        what: kindWords[e.kind] ?? e.kind,
        at: e.at,
        runId: e.runId,
        sync: e.sync,
        reason: e.rejectReason,
      })),
      ...patches.map((p) => ({
        id: p.id,
        what: p.item.submit ? 'Submitted for review' : 'Run change',
        at: p.item.at,
        runId: p.runId,
        sync: p.sync,
        reason: p.rejectReason,
      })),
      ...photos.map((p) => ({
        id: p.id,
        what: 'Photo',
        at: p.createdAt,
        runId: p.runId,
        sync: p.sync,
        reason: p.rejectReason,
      })),
    ];
    return lines.sort((a, b) => b.at - a.at);
  }, []);
}

export const requestSync = () => syncNow();
