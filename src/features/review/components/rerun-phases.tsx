import type { UseFormRegisterReturn } from 'react-hook-form';
import { FieldsetError } from '../../../components/ui/field';

/** On a return: which of the run's phases the skipper must run again (at least one). */
export function RerunPhases({
  phases,
  field,
  error,
}: {
  phases: ReadonlyArray<{ id: string; name: string }>;
  /** The form's registration of the phase list (its name differs per engine on a vessel's page). */
  field: UseFormRegisterReturn;
  error?: string;
}) {
  return (
    <fieldset className="flex flex-col gap-2" aria-describedby="rerun-hint">
      <legend className="mb-1 font-semibold">Phases to run again</legend>
      <p id="rerun-hint" className="text-sm text-muted">
        Each phase chosen counts again from now; time logged on it before stays in the record but no
        longer counts.
      </p>
      {phases.map((phase) => (
        <label key={phase.id} className="flex min-h-touch cursor-pointer items-center gap-3">
          <input
            type="checkbox"
            value={phase.id}
            className="size-5 accent-[var(--rs-accent)]"
            {...field}
          />
          {phase.name}
        </label>
      ))}
      <FieldsetError error={error} />
    </fieldset>
  );
}
