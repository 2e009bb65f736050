import { useFormContext, useWatch } from 'react-hook-form';
import { SelectField, TextField } from '../../../components/ui/field';
import { errorAt, numberOptions, type ProgramFormValues } from '../form-values';

/** The band a phase keeps the engine in: fixed rpm, or a share of the engine's rated full-throttle rpm. */
export function BandFields({ index }: { index: number }) {
  const { register, control, formState } = useFormContext<ProgramFormValues>();
  const kind = useWatch({ control, name: `phases.${index}.band.kind` });
  const base = `phases.${index}.band` as const;
  const error = (name: string) => errorAt(formState.errors, `${base}.${name}`);
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="font-semibold">RPM band</legend>
      <SelectField label="Band given as" error={error('kind')} {...register(`${base}.kind`)}>
        <option value="share-of-rated">Share of rated full-throttle rpm (0 to 1)</option>
        <option value="absolute">Engine rpm</option>
      </SelectField>
      {kind === 'absolute' ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <TextField
            label="Lowest rpm"
            inputMode="numeric"
            error={error('rpmMin')}
            {...register(`${base}.rpmMin`, numberOptions)}
          />
          <TextField
            label="Highest rpm"
            inputMode="numeric"
            error={error('rpmMax')}
            {...register(`${base}.rpmMax`, numberOptions)}
          />
        </div>
      ) : (
        <div className="grid gap-3 sm:grid-cols-2">
          <TextField
            label="Lowest share"
            inputMode="decimal"
            hint="0.5 means half of rated rpm"
            error={error('shareMin')}
            {...register(`${base}.shareMin`, numberOptions)}
          />
          <TextField
            label="Highest share"
            inputMode="decimal"
            hint="1 means rated full-throttle rpm"
            error={error('shareMax')}
            {...register(`${base}.shareMax`, numberOptions)}
          />
        </div>
      )}
    </fieldset>
  );
}
