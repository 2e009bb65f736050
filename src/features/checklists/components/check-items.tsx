import type { UseFormRegister, FieldErrors } from 'react-hook-form';
import {
  CHECK_ITEM_IDS,
  CHECK_ITEMS,
  type CheckItemId,
} from '../../../../shared/checklists/checklist-items';
import type { ChecklistFormInput } from '../../../../shared/checklists/checklist.schema';
import type { ItemEvaluation } from '../../../../shared/checklists/evaluation';
import { TextField } from '../../../components/ui/field';
import { VerdictPill } from './verdict';

const CHOICES = [
  { value: 'pass', label: 'Pass', mark: '✓' },
  { value: 'fail', label: 'Fail', mark: '✕' },
  { value: 'not-applicable', label: 'N/A', mark: '–' },
] as const;

interface CheckItemsProps {
  register: UseFormRegister<ChecklistFormInput>;
  errors: FieldErrors<ChecklistFormInput>;
  evaluations: ItemEvaluation[];
  disabled: boolean;
}

/** Pass needs no words; a fail, a not-applicable and a missing reason do. */
const showReason = (e: ItemEvaluation) =>
  e.verdict === 'fail' ||
  e.verdict === 'not-applicable' ||
  (e.verdict === 'open' && e.reasons[0] !== 'Not checked yet.');

function CheckItem({
  id,
  register,
  errors,
  evaluation,
  disabled,
}: Omit<CheckItemsProps, 'evaluations'> & { id: CheckItemId; evaluation: ItemEvaluation }) {
  const item = CHECK_ITEMS[id];
  const problem = errors.checks?.[id]?.result?.message;
  return (
    <fieldset
      disabled={disabled}
      className="flex flex-col gap-2 rounded-lg border-2 border-line bg-surface p-3"
    >
      <legend className="sr-only">{item.label}</legend>
      <div className="flex flex-wrap items-start justify-between gap-2">
        <p aria-hidden="true" className="text-lg font-bold">
          {item.label}
        </p>
        <VerdictPill verdict={evaluation.verdict} />
      </div>
      <p className="text-muted">{item.guidance}</p>
      <div role="radiogroup" aria-label={item.label} className="grid grid-cols-3 gap-2">
        {CHOICES.map((choice) => (
          <label key={choice.value} className="cursor-pointer">
            <input
              type="radio"
              value={choice.value}
              className="peer sr-only"
              {...register(`checks.${id}.result`)}
            />
            <span className="flex min-h-touch items-center justify-center gap-1 rounded-md border-2 border-ink bg-surface px-2 font-semibold peer-checked:bg-ink peer-checked:text-paper peer-focus-visible:outline-3 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-focus">
              <span aria-hidden="true">{choice.mark}</span>
              {choice.label}
            </span>
          </label>
        ))}
      </div>
      {problem && <p className="text-sm font-semibold text-danger">{problem}</p>}
      {showReason(evaluation) && <p className="text-sm">{evaluation.reasons[0]}</p>}
      <TextField
        label={`Note on ${item.label.toLowerCase()}`}
        autoComplete="off"
        error={errors.checks?.[id]?.note?.message}
        {...register(`checks.${id}.note`)}
      />
    </fieldset>
  );
}

/** Rigging and safety items: the technician's own pass or fail, with a note where it helps. */
export function CheckItems(props: CheckItemsProps) {
  const byId = new Map(props.evaluations.map((e) => [e.id, e]));
  return (
    <div className="grid gap-3 lg:grid-cols-2">
      {CHECK_ITEM_IDS.map((id) => (
        <CheckItem
          key={id}
          id={id}
          register={props.register}
          errors={props.errors}
          disabled={props.disabled}
          evaluation={byId.get(id)!}
        />
      ))}
    </div>
  );
}
