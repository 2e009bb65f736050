import { useId, useState } from 'react';
import type { Role } from '../../../../shared/auth/auth.schema';
import { MAX_VOID_REASON } from '../../../../shared/runs/run-event.schema';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { entryText, mayVoid, type DeckEntry } from '../deck-entries';
import { DeckInputError, type RunRef } from '../device-events';
import { useVoidEntry } from '../device-records';

/** How many entries the list shows: the ones a slip of the finger is still fresh for. */
const SHOWN = 10;

/** The newest readings and notes, one tap away; each of the user's own can be voided with a reason. */
export function RecentEntries({
  entries,
  run,
  role,
  label,
  phaseName,
}: {
  entries: DeckEntry[];
  run: RunRef;
  role: Role;
  label: string;
  phaseName: (id: string) => string;
}) {
  const [open, setOpen] = useState(false);
  const [voiding, setVoiding] = useState<string | null>(null);
  const listId = useId();
  const shown = entries.slice(0, SHOWN);
  // A button rather than <details>: it is named and announced as one on every browser.
  return (
    <div className="flex flex-col gap-1 text-sm">
      <Button
        variant="quiet"
        className="justify-start px-0"
        aria-expanded={open}
        aria-controls={listId}
        onClick={() => setOpen(!open)}
      >
        Recent entries
      </Button>
      {open && (
        <div id={listId}>
          {shown.length === 0 && <p>Nothing logged yet.</p>}
          <ol aria-label={`${label}: recent entries`} className="flex flex-col gap-2">
            {shown.map((entry) => (
              <EntryRow
                key={entry.event.id}
                entry={entry}
                words={entryText(entry.event, phaseName)}
                canVoid={mayVoid(entry, role)}
                open={voiding === entry.event.id}
                onOpen={(on) => setVoiding(on ? entry.event.id : null)}
                run={run}
              />
            ))}
          </ol>
        </div>
      )}
    </div>
  );
}

function EntryRow({
  entry,
  words,
  canVoid,
  open,
  onOpen,
  run,
}: {
  entry: DeckEntry;
  words: string;
  canVoid: boolean;
  open: boolean;
  onOpen: (open: boolean) => void;
  run: RunRef;
}) {
  const wordsId = useId();
  return (
    <li className="flex flex-col gap-1 border-b border-line pb-2">
      <div className="flex items-center justify-between gap-2">
        {entry.voided ? (
          <p id={wordsId}>
            <del>{words}</del>
            <span className="block font-semibold">Voided: {entry.voided.reason}</span>
          </p>
        ) : (
          <p id={wordsId}>{words}</p>
        )}
        {canVoid && !open && (
          <Button variant="secondary" aria-describedby={wordsId} onClick={() => onOpen(true)}>
            Void
          </Button>
        )}
      </div>
      {entry.refusedVoid && !entry.voided && (
        <p className="font-semibold text-danger">
          <span aria-hidden="true">⚠ </span>
          The server did not take the void: {entry.refusedVoid}
        </p>
      )}
      {open && <VoidForm run={run} targetId={entry.event.id} onDone={() => onOpen(false)} />}
    </li>
  );
}

/** The reason typed, and the write: the reason is asked for before anything is stored. */
function useVoidForm(run: RunRef, targetId: string, onDone: () => void) {
  const write = useVoidEntry();
  const [reason, setReason] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const submit = async () => {
    if (reason.trim() === '') return setProblem('Say why the entry is voided (Reason).');
    try {
      await write.mutateAsync({ run, targetId, reason });
      onDone();
    } catch (error) {
      setProblem(error instanceof DeckInputError ? error.message : 'The void could not be saved.');
    }
  };
  return { reason, setReason, problem, submit, pending: write.isPending };
}

/** Why the entry is taken back: required, short; the entry itself stays in the log, struck through. */
function VoidForm({
  run,
  targetId,
  onDone,
}: {
  run: RunRef;
  targetId: string;
  onDone: () => void;
}) {
  const form = useVoidForm(run, targetId, onDone);
  return (
    <form
      noValidate
      className="flex flex-col gap-2 rounded-md border-2 border-ink p-2"
      onSubmit={(event) => {
        event.preventDefault();
        void form.submit();
      }}
    >
      <TextField
        label="Reason"
        value={form.reason}
        maxLength={MAX_VOID_REASON}
        autoComplete="off"
        error={form.problem ?? undefined}
        onChange={(e) => form.setReason(e.target.value)}
      />
      <div className="flex gap-2">
        <Button type="submit" pending={form.pending} pendingLabel="Voiding…">
          Void entry
        </Button>
        <Button variant="secondary" onClick={onDone}>
          Keep it
        </Button>
      </div>
    </form>
  );
}
