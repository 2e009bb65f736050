import { useMemo, useState } from 'react';
import { useForm, useWatch, type Path } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import {
  ChecklistInputSchema,
  type ChecklistFormInput,
  type ChecklistInput,
} from '../../../../shared/checklists/checklist.schema';
import type { ChecklistView } from '../../../../shared/checklists/checklist-view';
import { evaluateChecklist } from '../../../../shared/checklists/evaluate-checklist';
import type { ChecklistEngine } from '../../../../shared/checklists/evaluation';
import { signalSourceOf } from '../../../../shared/checklists/evaluate-tachometer';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { serverErrorMessages } from '../../../lib/form-errors';
import { formatDate } from '../../../lib/format';
import { useCompleteChecklist, useSaveChecklist } from '../api';
import { liveEntries } from '../form-values';
import { CheckItems } from './check-items';
import { ChecklistSummaryBar } from './checklist-summary';
import {
  ChargingFields,
  FullThrottleFields,
  IdleFields,
  TachometerFields,
} from './measured-fields';
import { MeasuredItem } from './measured-item';

const FIELD_PATHS = [
  'tachometer.measuredHz',
  'tachometer.referenceRpm',
  'tachometer.tachReadingRpm',
  'tachometer.note',
  'charging.chemistry',
  'charging.measuredV',
  'charging.batteryTemperatureC',
  'charging.atRpm',
  'charging.note',
  'idleInGear.idleRpm',
  'idleInGear.specMinRpm',
  'idleInGear.specMaxRpm',
  'idleInGear.note',
  'fullThrottle.rpm',
  'fullThrottle.speedKn',
  'fullThrottle.note',
  'notes',
] as const satisfies readonly Path<ChecklistFormInput>[];

interface ChecklistFormProps {
  checklist: ChecklistView;
  engine: ChecklistEngine;
  /** Called after a save or completion, so the page can refresh what shows the checklist's state. */
  onChanged?: () => void;
}

/** The commissioning checklist: saved part-done as often as needed, completed once every item is done. */
export function ChecklistForm({ checklist, engine, onChanged }: ChecklistFormProps) {
  const save = useSaveChecklist(checklist.engineId, onChanged);
  const complete = useCompleteChecklist(checklist.engineId, onChanged);
  const [refusals, setRefusals] = useState<string[]>([]);
  const [notice, setNotice] = useState<string | null>(null);
  const completed = Boolean(checklist.completedAt);
  const { register, control, handleSubmit, setError, reset, formState } = useForm<
    ChecklistFormInput,
    unknown,
    ChecklistInput
  >({
    resolver: zodResolver(ChecklistInputSchema),
    defaultValues: checklist.entries,
  });
  const values = useWatch({ control }) as ChecklistFormInput;
  const evaluation = useMemo(
    () => (completed ? checklist.evaluation : evaluateChecklist(liveEntries(values), engine)),
    [completed, checklist.evaluation, values, engine],
  );
  const byId = new Map(evaluation.items.map((item) => [item.id, item]));
  const fields = { register, errors: formState.errors, disabled: completed };

  const onError = (error: unknown) =>
    setRefusals(serverErrorMessages(error, setError, FIELD_PATHS));
  const send = (action: typeof save, done: string) =>
    handleSubmit((input) => {
      setRefusals([]);
      setNotice(null);
      action.mutate(input, {
        onSuccess: ({ checklist: stored }) => {
          reset(stored.entries);
          setNotice(done);
        },
        onError,
      });
    });
  const onSave = send(
    save,
    'Saved. The checklist can be finished later, on this or another device.',
  );
  const onComplete = send(complete, 'Checklist completed.');

  return (
    <form
      noValidate
      onSubmit={onSave}
      className="flex flex-col gap-5"
      aria-label="Commissioning checklist"
    >
      <ChecklistSummaryBar summary={evaluation.summary} />
      {completed && (
        <p className="rounded-md border-4 border-ink p-3 font-bold">
          Completed by {checklist.completedBy?.name} on {formatDate(checklist.completedAt!)}. It is
          kept as the record of the handover.
        </p>
      )}
      <h2 className="text-xl font-bold">Measured at handover</h2>
      <MeasuredItem id="tachometer" evaluation={byId.get('tachometer')!} {...fields}>
        <TachometerFields {...fields} hasSignal={signalSourceOf(engine) !== null} />
      </MeasuredItem>
      <MeasuredItem id="charging" evaluation={byId.get('charging')!} {...fields}>
        <ChargingFields {...fields} />
      </MeasuredItem>
      <MeasuredItem id="idleInGear" evaluation={byId.get('idleInGear')!} {...fields}>
        <IdleFields {...fields} />
      </MeasuredItem>
      <MeasuredItem id="fullThrottle" evaluation={byId.get('fullThrottle')!} {...fields}>
        <FullThrottleFields {...fields} />
      </MeasuredItem>
      <h2 className="text-xl font-bold">Rigging and safety</h2>
      <CheckItems {...fields} evaluations={evaluation.items} />
      <label className="flex flex-col gap-1 font-semibold">
        Notes for the record
        <textarea
          rows={3}
          disabled={completed}
          className="rounded-md border-2 border-line bg-surface p-3 font-normal text-ink"
          {...register('notes')}
        />
      </label>
      {refusals.length > 0 && (
        <Alert title={complete.isError ? 'Not completed yet' : 'Not saved'}>
          <ul className="list-disc pl-5">
            {refusals.map((r) => (
              <li key={r}>{r}</li>
            ))}
          </ul>
        </Alert>
      )}
      {notice && (
        <p role="status" className="font-semibold">
          {notice}
        </p>
      )}
      {!completed && (
        <div className="flex flex-wrap gap-3">
          <Button type="submit" variant="secondary" pending={save.isPending} pendingLabel="Saving…">
            Save for later
          </Button>
          <Button onClick={onComplete} pending={complete.isPending} pendingLabel="Completing…">
            Complete checklist
          </Button>
        </div>
      )}
      {checklist.updatedBy && !completed && (
        <p className="text-sm text-muted">
          Last saved by {checklist.updatedBy.name}, {formatDate(checklist.updatedAt!)}.
        </p>
      )}
    </form>
  );
}
