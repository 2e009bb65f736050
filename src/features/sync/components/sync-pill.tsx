import { lazy, Suspense, useState } from 'react';
import { useOutboxCounts, useSyncStatus } from '../api';

// The details (and the date formatting they need) load only when someone opens them.
const SyncDetails = lazy(() => import('./sync-details').then((m) => ({ default: m.SyncDetails })));

/** Pill words; the shape (filled, outlined, dashed) says the same thing without colour. */
function pillFace(waiting: number, rejected: number, syncing: boolean, failed: boolean) {
  if (syncing)
    return {
      text: waiting > 0 ? `Syncing ${waiting}…` : 'Syncing…',
      style: 'border-dashed border-ink',
    };
  if (rejected > 0)
    return { text: `${rejected} refused`, style: 'border-danger text-danger bg-surface' };
  if (waiting > 0)
    return {
      text: `${waiting} waiting${failed ? ' · offline' : ''}`,
      style: 'border-ink bg-surface',
    };
  if (failed) return { text: 'Not synced', style: 'border-dashed border-ink' };
  return { text: 'All synced', style: 'border-line text-muted' };
}

/** Says what waits to go to the workshop; tap for the list and a "Sync now" button. */
export function SyncPill() {
  const counts = useOutboxCounts();
  const status = useSyncStatus();
  const [open, setOpen] = useState(false);
  const face = pillFace(
    counts?.waiting ?? 0,
    counts?.rejected ?? 0,
    status.syncing,
    status.lastError !== null,
  );
  return (
    <>
      <button
        type="button"
        onClick={() => setOpen(true)}
        aria-haspopup="dialog"
        aria-label={`Sync: ${face.text}`}
        className={`min-h-touch rounded-full border-2 px-3 text-sm font-semibold whitespace-nowrap ${face.style}`}
      >
        {face.text}
      </button>
      {open && (
        <Suspense fallback={null}>
          <SyncDetails onClose={() => setOpen(false)} />
        </Suspense>
      )}
    </>
  );
}
