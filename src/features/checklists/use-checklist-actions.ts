import { useState } from 'react';
import type { Path, UseFormReturn } from 'react-hook-form';
import type {
  ChecklistFormInput,
  ChecklistInput,
} from '../../../shared/checklists/checklist.schema';
import type { ChecklistView } from '../../../shared/checklists/checklist-view';
import { isApiError } from '../../lib/api-client';
import { serverErrorMessages } from '../../lib/form-errors';
import { useCompleteChecklist, useSaveChecklist } from './api';

/** The form fields a server's field error can name. */
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

export type ChecklistFormApi = UseFormReturn<ChecklistFormInput, unknown, ChecklistInput>;

/**
 * What the alert says about a refusal. A refused completion names its items and says the entries
 * were kept as the draft (the server's own words), so the technician knows nothing was lost.
 */
function refusalLines(completing: boolean, error: Error, form: ChecklistFormApi): string[] {
  const lines = serverErrorMessages(error, form.setError, FIELD_PATHS);
  const itemRefusal = completing && isApiError(error) && error.fieldErrors.length > 0;
  return itemRefusal && !lines.includes(error.message) ? [error.message, ...lines] : lines;
}

/**
 * Saving for later and completing: each sends the form, then keeps what the server stored or
 * shows what it refused.
 */
export function useChecklistActions(
  checklist: ChecklistView,
  form: ChecklistFormApi,
  onChanged?: () => void,
) {
  const save = useSaveChecklist(checklist.engineId, onChanged);
  const complete = useCompleteChecklist(checklist.engineId, onChanged);
  const [refusals, setRefusals] = useState<string[]>([]);
  const [notice, setNotice] = useState<string | null>(null);
  const send = (action: typeof save, done: string) =>
    form.handleSubmit((input) => {
      setRefusals([]);
      setNotice(null);
      action.mutate(input, {
        onSuccess: ({ checklist: stored }) => {
          form.reset(stored.entries);
          setNotice(done);
        },
        onError: (error) => setRefusals(refusalLines(action === complete, error, form)),
      });
    });
  return {
    save,
    complete,
    refusals,
    notice,
    onSave: send(save, 'Saved. The checklist can be finished later, on this or another device.'),
    onComplete: send(complete, 'Checklist completed.'),
  };
}

export type ChecklistActions = ReturnType<typeof useChecklistActions>;
