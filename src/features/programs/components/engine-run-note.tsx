import { useState } from 'react';
import { Link } from 'react-router-dom';
import { RUN_STATE_WORDS } from '../../../../shared/review/run-words';
import { CancelRunInputSchema, MAX_REASON_LENGTH } from '../../../../shared/runs/run.schema';
import type { RunView } from '../../../../shared/runs/run-view';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { ReasonPrompt } from '../../../components/ui/reason-prompt';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { formatDate } from '../../../lib/format';
import { useCancelRun } from '../assign-api';

const reasonProblem = (reason: string) =>
  CancelRunInputSchema.safeParse({ reason }).error?.issues[0]?.message ?? null;

/** Staff open a run at its review, where every entry and decision is. */
export const RunLink = ({ runId }: { runId: string }) => (
  <Link to={`/runs/${runId}/review`} className="underline underline-offset-4">
    Open the run
  </Link>
);

/** A run under way, submitted or returned: no new program until it is signed off. */
export function OpenRunNote({ run }: { run: RunView }) {
  return (
    <p>
      This engine&rsquo;s break-in on &ldquo;{run.programName}&rdquo; is{' '}
      {RUN_STATE_WORDS[run.state].toLowerCase()}. A new program can be assigned once it is signed
      off. <RunLink runId={run.id} />
    </p>
  );
}

interface PlannedRunProps {
  run: RunView;
  /** Set right after this card assigned it. */
  justCreated: boolean;
  onCancelled: () => void;
}

/** The engine's planned run; one assigned by mistake is cancelled here, with the reason. */
export function PlannedRun({ run, justCreated, onCancelled }: PlannedRunProps) {
  const cancel = useCancelRun();
  const [asking, setAsking] = useState(false);
  const reasonError = isApiError(cancel.error)
    ? cancel.error.fieldErrors.find((e) => e.field === 'reason')?.message
    : undefined;
  return (
    <div className="flex flex-col gap-3">
      {justCreated ? (
        <p role="status" className="font-semibold">
          Run created. <RunLink runId={run.id} />
        </p>
      ) : (
        <p>
          Planned: &ldquo;{run.programName}&rdquo;, assigned {formatDate(run.createdAt)}. Nothing is
          logged on it yet. <RunLink runId={run.id} />
        </p>
      )}
      {asking ? (
        <ReasonPrompt
          title="Cancel this run"
          label="Reason for cancelling"
          hint="Kept in the run's record, e.g. assigned to the wrong engine or the wrong program."
          submitLabel="Cancel the run"
          pendingLabel="Cancelling…"
          pending={cancel.isPending}
          maxLength={MAX_REASON_LENGTH}
          check={reasonProblem}
          serverError={reasonError}
          onSubmit={(reason) =>
            cancel.mutate({ runId: run.id, reason }, { onSuccess: onCancelled })
          }
          onCancel={() => setAsking(false)}
        />
      ) : (
        <Button variant="secondary" className="self-start" onClick={() => setAsking(true)}>
          Cancel this run
        </Button>
      )}
      {cancel.error && !reasonError && (
        <Alert title="The run was not cancelled">{errorMessage(cancel.error)}</Alert>
      )}
    </div>
  );
}
