import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { errorMessage } from '../../../lib/api-client';

interface ArchiveControlProps {
  what: string;
  archived: boolean;
  pending: boolean;
  error: unknown;
  onChange: (archived: boolean) => void;
}

/** Archive asks once more before it acts; nothing is ever deleted, so restoring is one tap. */
export function ArchiveControl({ what, archived, pending, error, onChange }: ArchiveControlProps) {
  const [confirming, setConfirming] = useState(false);
  return (
    <div className="flex flex-col gap-2">
      {Boolean(error) && <Alert title="Not changed">{errorMessage(error)}</Alert>}
      {archived ? (
        <Button
          variant="secondary"
          className="self-start"
          pending={pending}
          pendingLabel="Restoring…"
          onClick={() => onChange(false)}
        >
          Restore {what}
        </Button>
      ) : confirming ? (
        <div
          role="group"
          aria-label={`Archive ${what}?`}
          className="flex flex-wrap items-center gap-3 rounded-md border-2 border-ink p-3"
        >
          <p className="flex-1">
            Archive {what}? It leaves the everyday lists; nothing is deleted and it can be restored.
          </p>
          <Button pending={pending} pendingLabel="Archiving…" onClick={() => onChange(true)}>
            Archive
          </Button>
          <Button variant="secondary" onClick={() => setConfirming(false)}>
            Keep it
          </Button>
        </div>
      ) : (
        <Button variant="secondary" className="self-start" onClick={() => setConfirming(true)}>
          Archive {what}
        </Button>
      )}
    </div>
  );
}
