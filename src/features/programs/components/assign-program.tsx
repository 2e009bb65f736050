import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/field';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { useAssignProgram, usePrograms } from '../api';

/** The refusal's own words first, then any field's words it does not already say. */
function problemLines(error: Error): string[] {
  const message = errorMessage(error);
  const fieldErrors = isApiError(error) ? error.fieldErrors.map((e) => e.message) : [];
  return [message, ...fieldErrors.filter((m) => m !== message)];
}

function RunCreated({ runId }: { runId: string }) {
  return (
    <p role="status" className="font-semibold">
      Run created.{' '}
      <Link to={`/runs/${runId}`} className="underline underline-offset-4">
        Open the run
      </Link>
    </p>
  );
}

/** Starts a break-in run for one engine from one of the workshop's active programs. */
export function AssignProgram({ engineId }: { engineId: string }) {
  const programs = usePrograms();
  const assign = useAssignProgram();
  const [programId, setProgramId] = useState('');
  const active = (programs.data ?? []).filter((program) => !program.retiredAt);
  const chosen = programId || active[0]?.id || '';
  const problemText = assign.error ? problemLines(assign.error) : [];

  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm">
        The program sets the phases the skipper runs. Check it against the engine maker&rsquo;s
        manual first: the manual comes first.
      </p>
      <SelectField
        label="Break-in program"
        value={chosen}
        disabled={programs.isPending}
        onChange={(event) => setProgramId(event.target.value)}
      >
        {programs.isPending && <option value="">Loading programs…</option>}
        {active.map((program) => (
          <option key={program.id} value={program.id}>
            {program.name}
          </option>
        ))}
      </SelectField>
      {programs.isError && (
        <Alert title="Could not load the programs">{errorMessage(programs.error)}</Alert>
      )}
      <Button
        className="self-start"
        disabled={!chosen}
        pending={assign.isPending}
        pendingLabel="Assigning…"
        onClick={() => assign.mutate({ engineId, programId: chosen })}
      >
        Assign program
      </Button>
      {problemText.length > 0 && (
        <Alert title="The program was not assigned">
          {problemText.map((m) => (
            <p key={m}>{m}</p>
          ))}
        </Alert>
      )}
      {assign.data && <RunCreated runId={assign.data.run.id} />}
    </div>
  );
}
