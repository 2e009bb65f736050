import type { ReactNode } from 'react';
import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import type { ChecklistFormInput } from '../../../../shared/checklists/checklist.schema';
import type { ItemEvaluation } from '../../../../shared/checklists/evaluation';
import { MEASURED_ITEMS, type MeasuredItemId } from '../../../../shared/checklists/checklist-items';
import { Checkbox } from '../../../components/ui/checkbox';
import { TextField } from '../../../components/ui/field';
import { toNumberOrNull } from '../form-values';
import { ItemOutcome, VerdictPill } from './verdict';

export interface FieldsProps {
  register: UseFormRegister<ChecklistFormInput>;
  errors: FieldErrors<ChecklistFormInput>;
  disabled: boolean;
}

/** One measured figure; empty means "not measured yet". */
export function MeasureField({
  label,
  hint,
  error,
  whole = false,
  registration,
}: {
  label: string;
  hint?: string;
  error?: string;
  whole?: boolean;
  registration: ReturnType<UseFormRegister<ChecklistFormInput>>;
}) {
  return (
    <TextField
      label={label}
      hint={hint}
      inputMode={whole ? 'numeric' : 'decimal'}
      autoComplete="off"
      className="figures"
      error={error}
      {...registration}
    />
  );
}

export const numberOptions = { setValueAs: toNumberOrNull };

/** A measured item: guidance, the figures to enter, and the computation's verdict as they are typed. */
export function MeasuredItem({
  id,
  evaluation,
  register,
  errors,
  disabled,
  children,
}: FieldsProps & { id: MeasuredItemId; evaluation: ItemEvaluation; children: ReactNode }) {
  const item = MEASURED_ITEMS[id];
  const sectionErrors = errors[id] as Record<string, { message?: string }> | undefined;
  return (
    <section
      aria-labelledby={`${id}-title`}
      className="flex flex-col gap-3 rounded-lg border-2 border-line bg-surface p-3 sm:p-4"
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <h3 id={`${id}-title`} className="text-lg font-bold">
          {item.label}
        </h3>
        <VerdictPill verdict={evaluation.verdict} />
      </div>
      <p className="text-muted">{item.guidance}</p>
      <fieldset disabled={disabled} className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        <legend className="sr-only">{item.label}: measurements</legend>
        {children}
      </fieldset>
      <ItemOutcome judgement={evaluation} />
      <fieldset disabled={disabled} className="grid gap-3 sm:grid-cols-[auto_1fr] sm:items-end">
        <legend className="sr-only">{item.label}: not applicable and note</legend>
        <Checkbox {...register(`${id}.notApplicable`)}>Not applicable</Checkbox>
        <TextField
          label={`Note on ${item.label.toLowerCase()}`}
          autoComplete="off"
          error={sectionErrors?.note?.message}
          {...register(`${id}.note`)}
        />
      </fieldset>
    </section>
  );
}
