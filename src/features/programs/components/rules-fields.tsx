import { useFormContext } from 'react-hook-form';
import { TextField } from '../../../components/ui/field';
import { errorAt, numberOptions, type ProgramFormValues } from '../form-values';

const RULES = [
  { key: 'changeSpeedEveryMinutes', label: 'Change speed at least every (minutes)' },
  { key: 'fullThrottleMaxSeconds', label: 'Longest full-throttle stretch (seconds)' },
  { key: 'fullThrottleMaxMinutesPerHour', label: 'Most full throttle in any hour (minutes)' },
  { key: 'idleMaxMinutes', label: 'Longest idling stretch (minutes)' },
] as const;

/** Optional limits within a phase; an empty box means the phase sets no such limit. */
export function RulesFields({ index }: { index: number }) {
  const { register, formState } = useFormContext<ProgramFormValues>();
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="font-semibold">Rules</legend>
      <p className="text-sm text-muted">Leave a box empty for no limit.</p>
      <div className="grid gap-3 sm:grid-cols-2">
        {RULES.map(({ key, label }) => {
          const name = `phases.${index}.rules.${key}` as const;
          return (
            <TextField
              key={key}
              label={label}
              inputMode="decimal"
              error={errorAt(formState.errors, name)}
              {...register(name, numberOptions)}
            />
          );
        })}
      </div>
    </fieldset>
  );
}
