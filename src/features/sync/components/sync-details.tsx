import { format } from 'date-fns';
import { useEffect, useRef } from 'react';
import { Button } from '../../../components/ui/button';
import { requestSync, useOutboxLines, useSyncStatus, type OutboxLine } from '../api';
import { isDateTime } from '../../../../shared/runs/event-time';

const when = (ms: number) => (isDateTime(ms) ? format(ms, 'd MMM HH:mm:ss') : 'unknown time');

function Line({ line }: { line: OutboxLine }) {
  return (
    <li className="border-b border-line py-2">
      <div className="flex justify-between gap-3">
        <span className="font-semibold">{line.what}</span>
        <span className="font-mono text-sm tabular-nums">{when(line.at)}</span>
      </div>
      {line.sync === 'rejected' && (
        <p className="text-sm font-semibold text-danger">Refused: {line.reason}</p>
      )}
    </li>
  );
}

/** What the server refused stays on the device, with its reason, for the workshop to see. */
function RefusedLines({ lines }: { lines: OutboxLine[] }) {
  return (
    <section className="mt-4">
      <h3 className="font-bold">Refused by the server ({lines.length})</h3>
      <p className="text-sm">These stay on this device; show them to your workshop.</p>
      <ul>
        {lines.map((l) => (
          <Line key={l.id} line={l} />
        ))}
      </ul>
    </section>
  );
}

function WaitingLines({ lines }: { lines: OutboxLine[] }) {
  return (
    <section className="mt-4">
      <h3 className="font-bold">Waiting to send ({lines.length})</h3>
      {lines.length === 0 ? (
        <p className="text-sm">Nothing is waiting.</p>
      ) : (
        <ul className="max-h-72 overflow-y-auto">
          {lines.map((l) => (
            <Line key={l.id} line={l} />
          ))}
        </ul>
      )}
    </section>
  );
}

/** The outbox in full: what waits, what the server refused and why, and when sync last worked. */
export function SyncDetails({ onClose }: { onClose: () => void }) {
  const lines = useOutboxLines() ?? [];
  const status = useSyncStatus();
  const dialog = useRef<HTMLDialogElement>(null);
  // No close in a cleanup: React's strict mode runs effects twice, and closing would fire onClose.
  useEffect(() => {
    const element = dialog.current;
    if (element && !element.open) element.showModal?.();
  }, []);
  const refused = lines.filter((l) => l.sync === 'rejected');
  const waiting = lines.filter((l) => l.sync === 'pending');
  return (
    <dialog
      ref={dialog}
      onClose={onClose}
      aria-labelledby="sync-title"
      className="m-auto w-[min(34rem,94vw)] rounded-lg border-2 border-ink bg-paper p-4 text-ink backdrop:bg-ink/60"
    >
      <h2 id="sync-title" className="text-xl font-bold">
        Sync with the workshop
      </h2>
      <p className="mt-1 text-sm">
        {status.lastSyncAt
          ? `Last synced ${when(status.lastSyncAt)}.`
          : 'Not synced yet on this device.'}{' '}
        {status.lastError && <strong>{status.lastError}</strong>}
      </p>
      <div className="mt-3 flex gap-2">
        <Button pending={status.syncing} onClick={() => void requestSync()}>
          Sync now
        </Button>
        <Button variant="secondary" onClick={onClose}>
          Close
        </Button>
      </div>
      {refused.length > 0 && <RefusedLines lines={refused} />}
      <WaitingLines lines={waiting} />
    </dialog>
  );
}
