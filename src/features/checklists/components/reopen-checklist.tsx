import { useState } from 'react';
import {
  ReopenChecklistInputSchema,
  type ReopenChecklistInput,
} from '../../../../shared/checklists/checklist.schema';
import type { ChecklistView } from '../../../../shared/checklists/checklist-view';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { ReasonPrompt } from '../../../components/ui/reason-prompt';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { formatDate } from '../../../lib/format';
import { useReopenChecklist } from '../api';

const reasonProblem = (reason: string) =>
  ReopenChecklistInputSchema.safeParse({ reason } satisfies ReopenChecklistInput).error?.issues[0]
    ?.message ?? null;

/** Who reopened the checklist last, when and why: the record of a changed handover. */
export function ReopenedNote({ checklist }: { checklist: ChecklistView }) {
  const { reopened } = checklist;
  if (!reopened) return null;
  return (
    <p className="rounded-md border-2 border-line p-3">
      Reopened by {reopened.byName} on {formatDate(reopened.at)}: {reopened.reason}
    </p>
  );
}

/** A completed checklist is reopened only with a reason, so the change of record is explained. */
export function ReopenChecklist({
  checklist,
  onChanged,
}: {
  checklist: ChecklistView;
  onChanged?: () => void;
}) {
  const reopen = useReopenChecklist(checklist.engineId, onChanged);
  const [asking, setAsking] = useState(false);
  const fieldError = isApiError(reopen.error)
    ? reopen.error.fieldErrors.find((e) => e.field === 'reason')?.message
    : undefined;
  if (!asking)
    return (
      <Button variant="secondary" className="self-start" onClick={() => setAsking(true)}>
        Reopen the checklist
      </Button>
    );
  return (
    <div className="flex flex-col gap-3">
      <ReasonPrompt
        title="Reopen the checklist"
        label="Reason for reopening"
        hint="Kept in the engine's record with your name, e.g. a part replaced and measured again."
        submitLabel="Reopen checklist"
        pendingLabel="Reopening…"
        pending={reopen.isPending}
        maxLength={500}
        check={reasonProblem}
        serverError={fieldError}
        onSubmit={(reason) => reopen.mutate({ reason }, { onSuccess: () => setAsking(false) })}
        onCancel={() => setAsking(false)}
      />
      {reopen.isError && !fieldError && (
        <Alert title="Not reopened">{errorMessage(reopen.error)}</Alert>
      )}
    </div>
  );
}
