import { useSyncExternalStore } from 'react';

export type SyncStatus = {
  syncing: boolean;
  lastSyncAt: number | null;
  lastError: string | null;
  nextRetryAt: number | null;
};

let status: SyncStatus = { syncing: false, lastSyncAt: null, lastError: null, nextRetryAt: null };
const listeners = new Set<() => void>();

export const getSyncStatus = () => status;

export function setSyncStatus(change: Partial<SyncStatus>): void {
  status = { ...status, ...change };
  for (const listener of listeners) listener();
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** The engine's state (syncing, last success, last error) for the pill. */
export const useSyncStatus = () => useSyncExternalStore(subscribe, getSyncStatus, getSyncStatus);
