import { useState } from 'react';
import type { RunView } from '../../../../shared/runs/run-view';
import { OPEN_RUN_STATES } from '../../../../shared/runs/run.schema';
import { Alert } from '../../../components/ui/alert';
import { Loading } from '../../../components/ui/status-message';
import { errorMessage } from '../../../lib/api-client';
import { useAssignEngine, useEngineRuns } from '../assign-api';
import { OpenRunNote, PlannedRun, RunLink } from './engine-run-note';
import { ProgramChooser } from './program-chooser';

/** What just happened on this card, said until the engine's runs show it. */
function Outcome({ createdId, cancelled }: { createdId: string | null; cancelled: boolean }) {
  if (createdId)
    return (
      <p role="status" className="font-semibold">
        Run created. <RunLink runId={createdId} />
      </p>
    );
  if (!cancelled) return null;
  return (
    <p role="status" className="font-semibold">
      Run cancelled. Choose the program to assign instead.
    </p>
  );
}

/**
 * The engine page's assign card: the engine's planned run (which can be cancelled), its break-in
 * under way, or the list of programs to start one, those that suit the engine first.
 */
export function AssignProgram({ engineId }: { engineId: string }) {
  const engine = useAssignEngine(engineId);
  const runs = useEngineRuns(engineId);
  const [createdId, setCreatedId] = useState<string | null>(null);
  const [cancelled, setCancelled] = useState(false);
  const open: RunView | undefined = runs.data?.find((run) => OPEN_RUN_STATES.includes(run.state));
  // Waits for the engine too, so programs are never listed before it is known which suit.
  const loading = runs.isPending || engine.isPending;
  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm">
        The program sets the phases the skipper runs. Check it against the engine maker&rsquo;s
        manual first: the manual comes first.
      </p>
      {loading && <Loading label="Loading the engine's runs…" />}
      {runs.isError && <Alert title="Could not load the runs">{errorMessage(runs.error)}</Alert>}
      {!open && <Outcome createdId={createdId} cancelled={cancelled} />}
      {open?.state === 'planned' && (
        <PlannedRun
          run={open}
          justCreated={open.id === createdId}
          onCancelled={() => {
            setCreatedId(null);
            setCancelled(true);
          }}
        />
      )}
      {open && open.state !== 'planned' && <OpenRunNote run={open} />}
      {!open && !loading && (
        <ProgramChooser
          engineId={engineId}
          engine={engine.data}
          onAssigned={(run) => {
            setCreatedId(run.id);
            setCancelled(false);
          }}
        />
      )}
    </div>
  );
}
