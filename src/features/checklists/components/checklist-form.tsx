import { useMemo } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import {
  ChecklistInputSchema,
  type ChecklistFormInput,
  type ChecklistInput,
} from '../../../../shared/checklists/checklist.schema';
import type { ChecklistView } from '../../../../shared/checklists/checklist-view';
import { evaluateChecklist } from '../../../../shared/checklists/evaluate-checklist';
import type { ChecklistEngine } from '../../../../shared/checklists/evaluation';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { formatDate } from '../../../lib/format';
import { liveEntries } from '../form-values';
import { useChecklistActions, type ChecklistActions } from '../use-checklist-actions';
import { CheckItems } from './check-items';
import { ChecklistSummaryBar } from './checklist-summary';
import { MeasuredItems } from './measured-fields';
import { ReopenChecklist, ReopenedNote } from './reopen-checklist';

interface ChecklistFormProps {
  checklist: ChecklistView;
  engine: ChecklistEngine;
  /** Called after a save or completion, so the page can refresh what shows the checklist's state. */
  onChanged?: () => void;
}

/** What the last save or completion came to: the server's refusals, or a short notice. */
function Outcome({ actions }: { actions: ChecklistActions }) {
  return (
    <>
      {actions.refusals.length > 0 && (
        <Alert title={actions.complete.isError ? 'Not completed yet' : 'Not saved'}>
          <ul className="list-disc pl-5">
            {actions.refusals.map((r) => (
              <li key={r}>{r}</li>
            ))}
          </ul>
        </Alert>
      )}
      {actions.notice && (
        <p role="status" className="font-semibold">
          {actions.notice}
        </p>
      )}
    </>
  );
}

function CompletedNote({ checklist }: { checklist: ChecklistView }) {
  return (
    <p className="rounded-md border-4 border-ink p-3 font-bold">
      Completed by {checklist.completedBy?.name} on {formatDate(checklist.completedAt!)}. It is kept
      as the record of the handover; reopen it, giving the reason, to change it.
    </p>
  );
}

function ChecklistButtons({ actions }: { actions: ChecklistActions }) {
  return (
    <div className="flex flex-wrap gap-3">
      <Button
        type="submit"
        variant="secondary"
        pending={actions.save.isPending}
        pendingLabel="Saving…"
      >
        Save for later
      </Button>
      <Button
        onClick={actions.onComplete}
        pending={actions.complete.isPending}
        pendingLabel="Completing…"
      >
        Complete checklist
      </Button>
    </div>
  );
}

/** The commissioning checklist: saved part-done as often as needed, completed once every item is done. */
export function ChecklistForm({ checklist, engine, onChanged }: ChecklistFormProps) {
  const completed = Boolean(checklist.completedAt);
  const form = useForm<ChecklistFormInput, unknown, ChecklistInput>({
    resolver: zodResolver(ChecklistInputSchema),
    defaultValues: checklist.entries,
  });
  const actions = useChecklistActions(checklist, form, onChanged);
  const values = useWatch({ control: form.control }) as ChecklistFormInput;
  const evaluation = useMemo(
    () => (completed ? checklist.evaluation : evaluateChecklist(liveEntries(values), engine)),
    [completed, checklist.evaluation, values, engine],
  );
  const fields = { register: form.register, errors: form.formState.errors, disabled: completed };

  return (
    <div className="flex flex-col gap-5">
      <form
        noValidate
        onSubmit={actions.onSave}
        className="flex flex-col gap-5"
        aria-label="Commissioning checklist"
      >
        <ChecklistSummaryBar summary={evaluation.summary} />
        {completed && <CompletedNote checklist={checklist} />}
        <ReopenedNote checklist={checklist} />
        <h2 className="text-xl font-bold">Measured at handover</h2>
        <MeasuredItems fields={fields} evaluation={evaluation} engine={engine} />
        <h2 className="text-xl font-bold">Rigging and safety</h2>
        <CheckItems {...fields} evaluations={evaluation.items} />
        <label className="flex flex-col gap-1 font-semibold">
          Notes for the record
          <textarea
            rows={3}
            disabled={completed}
            className="rounded-md border-2 border-line bg-surface p-3 font-normal text-ink"
            {...form.register('notes')}
          />
        </label>
        <Outcome actions={actions} />
        {!completed && <ChecklistButtons actions={actions} />}
        {checklist.updatedBy && !completed && (
          <p className="text-sm text-muted">
            Last saved by {checklist.updatedBy.name}, {formatDate(checklist.updatedAt!)}.
          </p>
        )}
      </form>
      {completed && <ReopenChecklist checklist={checklist} onChanged={onChanged} />}
    </div>
  );
}
