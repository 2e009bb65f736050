import { useFormContext, useWatch } from 'react-hook-form';
import { SelectField, TextField } from '../../../components/ui/field';
import { errorAt, numberOptions, type ProgramFormValues } from '../form-values';

/**
 * The band a phase keeps the engine in: fixed engine rpm, or percent of the engine's rated
 * full-throttle rpm (resolved for each engine when the program is assigned).
 */
export function BandFields({ index }: { index: number }) {
  const { register, control, formState } = useFormContext<ProgramFormValues>();
  const kind = useWatch({ control, name: `phases.${index}.band.kind` });
  const base = `phases.${index}.band` as const;
  const error = (name: string) => errorAt(formState.errors, `${base}.${name}`);
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="font-semibold">RPM band</legend>
      <SelectField label="Band given in" error={error('kind')} {...register(`${base}.kind`)}>
        <option value="percent-of-rated">Percent of rated full-throttle rpm</option>
        <option value="absolute">Engine rpm</option>
      </SelectField>
      {/* Keyed, so switching units gives fresh inputs rather than the other unit's figures. */}
      {kind === 'absolute' ? (
        <div key="rpm" className="grid gap-3 sm:grid-cols-2">
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
        <div key="percent" className="grid gap-3 sm:grid-cols-2">
          <TextField
            label="Lowest % of rated rpm"
            inputMode="decimal"
            hint="0 for no lower limit"
            error={error('percentMin')}
            {...register(`${base}.percentMin`, numberOptions)}
          />
          <TextField
            label="Highest % of rated rpm"
            inputMode="decimal"
            hint="50 is half of rated full-throttle rpm: 3000 rpm on an engine rated 6000 rpm"
            error={error('percentMax')}
            {...register(`${base}.percentMax`, numberOptions)}
          />
        </div>
      )}
    </fieldset>
  );
}
