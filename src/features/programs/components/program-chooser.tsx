import { useState } from 'react';
import { suitingFirst, type Suitability } from '../../../../shared/programs/program-suits';
import { AssignProgramInputSchema, MAX_REASON_LENGTH } from '../../../../shared/runs/run.schema';
import type { EngineRow } from '../../../../shared/vessels/vessel-view';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/field';
import { ReasonPrompt } from '../../../components/ui/reason-prompt';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { usePrograms, type ProgramSummary } from '../api';
import { useAssignProgram, type AssignedRun } from '../assign-api';

type Judged = { program: ProgramSummary; suitability: Suitability };

/** The refusal's own words first, then any field's words it does not already say. */
function problemLines(error: Error): string[] {
  const message = errorMessage(error);
  const fieldErrors = isApiError(error) ? error.fieldErrors.map((e) => e.message) : [];
  return [message, ...fieldErrors.filter((m) => m !== message)];
}

const reasonProblem = (reason: string) =>
  AssignProgramInputSchema.shape.reason.safeParse(reason).error?.issues[0]?.message ?? null;

/** Active programs, those that suit the engine first (all count as suiting until it loads). */
function judgedPrograms(programs: ProgramSummary[] | undefined, engine?: EngineRow): Judged[] {
  const active = (programs ?? []).filter((program) => !program.retiredAt);
  if (!engine) return active.map((program) => ({ program, suitability: { suits: true } }));
  return suitingFirst(active, engine);
}

const optionLabel = ({ program, suitability }: Judged) =>
  suitability.suits
    ? program.name
    : `${program.name} — does not suit: ${suitability.reasons.join(' ')}`;

interface ProgramSelectProps {
  judged: Judged[];
  chosen?: Judged;
  loading: boolean;
  onChoose: (programId: string) => void;
}

/** The list of programs, and why the chosen one does not suit the engine when it does not. */
function ProgramSelect({ judged, chosen, loading, onChoose }: ProgramSelectProps) {
  return (
    <>
      <SelectField
        label="Break-in program"
        value={chosen?.program.id ?? ''}
        disabled={loading}
        onChange={(event) => onChoose(event.target.value)}
      >
        {loading && <option value="">Loading programs…</option>}
        {judged.map((j) => (
          <option key={j.program.id} value={j.program.id}>
            {optionLabel(j)}
          </option>
        ))}
      </SelectField>
      {chosen && !chosen.suitability.suits && (
        <p className="font-semibold">
          <span aria-hidden="true">⚠ </span>
          This program does not suit this engine. {chosen.suitability.reasons.join(' ')}
        </p>
      )}
    </>
  );
}

interface AssignActionProps {
  suitability: Suitability;
  disabled: boolean;
  assign: ReturnType<typeof useAssignProgram>;
  onSend: (reason?: string) => void;
}

/** Assigns at once when the program suits the engine; otherwise asks why first. */
function AssignAction({ suitability, disabled, assign, onSend }: AssignActionProps) {
  const [asking, setAsking] = useState(false);
  const reasonError = isApiError(assign.error)
    ? assign.error.fieldErrors.find((e) => e.field === 'reason')?.message
    : undefined;
  if (asking && !suitability.suits)
    return (
      <ReasonPrompt
        title="Assign a program that does not suit"
        label="Reason for assigning it anyway"
        hint="Kept in the run's record, e.g. the maker's schedule for this engine matches it."
        submitLabel="Assign anyway"
        pendingLabel="Assigning…"
        pending={assign.isPending}
        maxLength={MAX_REASON_LENGTH}
        check={reasonProblem}
        serverError={reasonError}
        onSubmit={onSend}
        onCancel={() => setAsking(false)}
      />
    );
  return (
    <Button
      className="self-start"
      disabled={disabled}
      pending={assign.isPending}
      pendingLabel="Assigning…"
      onClick={() => (suitability.suits ? onSend() : setAsking(true))}
    >
      Assign program
    </Button>
  );
}

interface ChooserProps {
  engineId: string;
  engine?: EngineRow;
  onAssigned: (run: AssignedRun) => void;
}

/** Picks one of the workshop's active programs; one that does not suit the engine needs a reason. */
export function ProgramChooser({ engineId, engine, onAssigned }: ChooserProps) {
  const programs = usePrograms();
  const assign = useAssignProgram();
  const [programId, setProgramId] = useState('');
  const judged = judgedPrograms(programs.data, engine);
  const chosen = judged.find((j) => j.program.id === programId) ?? judged[0];
  const send = (reason?: string) =>
    assign.mutate(
      { engineId, programId: chosen!.program.id, ...(reason ? { reason } : {}) },
      { onSuccess: ({ run }) => onAssigned(run) },
    );
  const onlyReason = isApiError(assign.error) && assign.error.fieldErrors[0]?.field === 'reason';
  return (
    <div className="flex flex-col gap-3">
      <ProgramSelect
        judged={judged}
        chosen={chosen}
        loading={programs.isPending}
        onChoose={setProgramId}
      />
      {programs.isError && (
        <Alert title="Could not load the programs">{errorMessage(programs.error)}</Alert>
      )}
      <AssignAction
        key={chosen?.program.id}
        suitability={chosen?.suitability ?? { suits: true }}
        disabled={!chosen}
        assign={assign}
        onSend={send}
      />
      {assign.error && !onlyReason && (
        <Alert title="The program was not assigned">
          {problemLines(assign.error).map((m) => (
            <p key={m}>{m}</p>
          ))}
        </Alert>
      )}
    </div>
  );
}
