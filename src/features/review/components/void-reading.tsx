import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { controlClass } from '../../../components/ui/field';
import { serverErrorMessages } from '../../../lib/form-errors';
import { useVoidEntry } from '../api';

/** "Void" on one reading: asks the reason, then takes the reading back (it stays, struck through). */
export function VoidReading({ runId, readingId }: { runId: string; readingId: string }) {
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState('');
  const [error, setError] = useState<string | null>(null);
  const voidEntry = useVoidEntry(runId);
  if (!open)
    return (
      <Button variant="secondary" onClick={() => setOpen(true)}>
        Void
      </Button>
    );
  const send = () => {
    setError(null);
    voidEntry.mutate(
      { targetId: readingId, reason },
      { onError: (e) => setError(serverErrorMessages(e, () => undefined, []).join(' ')) },
    );
  };
  const id = `void-${readingId}`;
  return (
    <div className="flex min-w-48 flex-col gap-1">
      <label htmlFor={id} className="text-sm font-semibold">
        Reason
      </label>
      <input
        id={id}
        className={controlClass}
        value={reason}
        maxLength={200}
        aria-invalid={error ? true : undefined}
        onChange={(e) => setReason(e.target.value)}
      />
      {error && (
        <p role="alert" className="text-sm font-semibold text-danger">
          {error}
        </p>
      )}
      <Button onClick={send} pending={voidEntry.isPending} pendingLabel="Voiding…">
        Void entry
      </Button>
    </div>
  );
}
