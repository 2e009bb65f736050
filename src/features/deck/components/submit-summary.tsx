import { useId, useState } from 'react';
import { MAX_SUBMIT_NOTE } from '../../../../shared/sync/sync.schema';
import { Button } from '../../../components/ui/button';
import { controlClass, Field } from '../../../components/ui/field';
import type { DeckEntry } from '../deck-entries';
import { useSubmitRuns } from '../device-records';
import type { EngineSnapshot } from '../engine-snapshot';
import { engineLabel } from '../use-deck-state';
import { EngineSummary } from './engine-summary';

const NOTE_HINT =
  'A phase is not complete or broke a rule. Say why the run goes to the workshop as it is.';

export const submitLabel = (count: number) =>
  count === 1
    ? 'Submit the run'
    : count === 2
      ? 'Submit both engines'
      : `Submit all ${count} engines`;

interface SubmitSummaryProps {
  engines: EngineSnapshot[];
  voidedOf: (snapshot: EngineSnapshot) => DeckEntry[];
  onClose: () => void;
  onSubmitted?: () => void;
}

/** Every engine's phases as the workshop will see them, then one submit for all of them. */
export function SubmitSummary({ engines, voidedOf, onClose, onSubmitted }: SubmitSummaryProps) {
  const [note, setNote] = useState('');
  const needsNote = engines.some((s) => s.account.verdict !== 'complete');
  return (
    <section
      aria-labelledby="submit-summary"
      className="flex flex-col gap-3 rounded-lg border-2 border-ink bg-surface p-3"
    >
      <h2 id="submit-summary" className="text-xl font-bold">
        Before you submit
      </h2>
      {engines.map((s) => (
        <EngineSummary
          key={s.run.id}
          snapshot={s}
          label={engineLabel(s.run)}
          voided={voidedOf(s)}
        />
      ))}
      {needsNote && <NoteField note={note} onChange={setNote} />}
      <p className="text-sm">
        Once submitted, nothing more can be logged on{' '}
        {engines.length === 1 ? 'this run' : 'these runs'} unless the workshop sends it back.
      </p>
      <SubmitActions
        runIds={engines.map((s) => s.run.id)}
        note={note}
        missing={needsNote && note.trim() === ''}
        onClose={onClose}
        onSubmitted={onSubmitted}
      />
    </section>
  );
}

/** The one submit (held back, with the field named, while the note is missing) and "Not yet". */
function SubmitActions({
  runIds,
  note,
  missing,
  onClose,
  onSubmitted,
}: {
  runIds: string[];
  note: string;
  missing: boolean;
  onClose: () => void;
  onSubmitted?: () => void;
}) {
  const submit = useSubmitRuns();
  const missingId = useId();
  const send = async () => {
    await submit.mutateAsync({ runIds, submitNote: note });
    onSubmitted?.();
  };
  return (
    <>
      {missing && (
        <p id={missingId} className="font-semibold">
          <span aria-hidden="true">⚠ </span>Write the note to the workshop first (Note to the
          workshop).
        </p>
      )}
      {submit.error && (
        <p role="alert" className="font-semibold text-danger">
          <span aria-hidden="true">⚠ </span>
          {submit.error.message}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button
          className="min-h-16 text-xl"
          disabled={missing}
          aria-describedby={missing ? missingId : undefined}
          pending={submit.isPending}
          pendingLabel="Submitting…"
          onClick={() => void send().catch(() => undefined)}
        >
          {submitLabel(runIds.length)}
        </Button>
        <Button variant="secondary" onClick={onClose}>
          Not yet
        </Button>
      </div>
    </>
  );
}

function NoteField({ note, onChange }: { note: string; onChange: (note: string) => void }) {
  return (
    <Field label="Note to the workshop" hint={NOTE_HINT}>
      {(control) => (
        <textarea
          {...control}
          required
          rows={4}
          maxLength={MAX_SUBMIT_NOTE}
          value={note}
          onChange={(e) => onChange(e.target.value)}
          className={`${controlClass} py-2`}
        />
      )}
    </Field>
  );
}
