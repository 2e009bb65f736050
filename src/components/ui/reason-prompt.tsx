import { useState, type FormEvent, type ReactNode } from 'react';
import { Button } from './button';
import { controlClass, Field } from './field';

interface ReasonPromptProps {
  /** Names the group for screen readers, e.g. "Cancel this run". */
  title: string;
  label: string;
  hint?: ReactNode;
  submitLabel: string;
  pendingLabel: string;
  pending?: boolean;
  maxLength: number;
  /** The shared schema's message for a reason it refuses, or null when it is fine. */
  check: (reason: string) => string | null;
  /** The server's message for the reason field, when it refused it. */
  serverError?: string;
  onSubmit: (reason: string) => void;
  onCancel: () => void;
}

/**
 * Asks why before an action that needs a reason on the record (cancelling a run, reopening a
 * checklist, assigning a program that does not suit the engine). Nothing is sent without one.
 */
export function ReasonPrompt(props: ReasonPromptProps) {
  const [reason, setReason] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const refused = props.check(reason);
    setProblem(refused);
    if (!refused) props.onSubmit(reason.trim());
  };
  return (
    <form
      noValidate
      onSubmit={submit}
      aria-label={props.title}
      className="flex flex-col gap-3 rounded-md border-2 border-ink p-3"
    >
      <Field label={props.label} hint={props.hint} error={problem ?? props.serverError}>
        {(control) => (
          <textarea
            {...control}
            rows={3}
            maxLength={props.maxLength}
            value={reason}
            onChange={(event) => setReason(event.target.value)}
            className={`${controlClass} py-2`}
          />
        )}
      </Field>
      <div className="flex flex-wrap gap-3">
        <Button type="submit" pending={props.pending} pendingLabel={props.pendingLabel}>
          {props.submitLabel}
        </Button>
        <Button variant="secondary" onClick={props.onCancel}>
          Back
        </Button>
      </div>
    </form>
  );
}
