import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import type { EngineFormInput } from '../../../../shared/engines/engine.schema';
import { SelectField, TextField } from '../../../components/ui/field';
import { toNumberOrNull } from '../form-values';

/* The inputs the engine form's sections are made of. */

export interface SectionProps {
  register: UseFormRegister<EngineFormInput>;
  errors: FieldErrors<EngineFormInput>;
}

type NumberName =
  | 'ratedPowerKw'
  | 'ratedRpmMin'
  | 'ratedRpmMax'
  | 'gearRatio'
  | 'propBlades'
  | 'propDiameterIn'
  | 'propPitchIn'
  | 'poles'
  | 'pulleyRatio'
  | 'hourMeterAtCommissioning';

export function NumberField({
  name,
  label,
  hint,
  whole = false,
  register,
  errors,
}: SectionProps & { name: NumberName; label: string; hint?: string; whole?: boolean }) {
  return (
    <TextField
      label={label}
      hint={hint}
      inputMode={whole ? 'numeric' : 'decimal'}
      autoComplete="off"
      className="figures"
      error={errors[name]?.message}
      {...register(name, { setValueAs: toNumberOrNull })}
    />
  );
}

type ChoiceName = 'position' | 'installation' | 'fuel' | 'cycle' | 'tachSource';

/** A select over a fixed list of values, each shown with its label, in the list's order. */
export function ChoiceField<V extends string>({
  name,
  label,
  values,
  labels,
  placeholder,
  register,
  errors,
}: SectionProps & {
  name: ChoiceName;
  label: string;
  values: readonly V[];
  labels: Record<V, string>;
  /** An empty first choice, so the value has to be picked (the schema names it if not). */
  placeholder?: string;
}) {
  return (
    <SelectField label={label} error={errors[name]?.message} {...register(name)}>
      {placeholder && <option value="">{placeholder}</option>}
      {values.map((value) => (
        <option key={value} value={value}>
          {labels[value]}
        </option>
      ))}
    </SelectField>
  );
}

export function Fieldset({ legend, children }: { legend: string; children: React.ReactNode }) {
  return (
    <fieldset className="grid gap-4 rounded-lg border-2 border-line p-3 sm:grid-cols-2 sm:p-4 lg:grid-cols-3">
      <legend className="px-1 text-lg font-bold">{legend}</legend>
      {children}
    </fieldset>
  );
}
