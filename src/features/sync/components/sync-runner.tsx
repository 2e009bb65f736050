import { useEffect } from 'react';
import { startSync } from '../sync-engine';

/** Mounted while someone is signed in: keeps the device in step with the server. */
export function SyncRunner() {
  useEffect(() => startSync(), []);
  return null;
}
