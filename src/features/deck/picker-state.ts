import type { Role } from '../../../shared/auth/auth.schema';
import type { RunRecord } from '../../lib/db';
import type { RunEvent } from '../../../shared/runs/run-event.schema';
import { canWorkOn, engineSnapshot, type EngineSnapshot } from './engine-snapshot';
import { isLoggable } from './run-phases';

/** Where an engine's break-in stands, for the person looking (a skipper or the workshop). */
export type EngineRunState =
  'workshop-waiting' | 'workshop-yours' | 'with-skipper' | 'submitted' | 'returned' | 'signed-off';

export const ENGINE_STATE_WORDS: Record<EngineRunState | 'no-run', string> = {
  'no-run': 'No break-in run assigned',
  'workshop-waiting': 'Workshop phase waiting',
  'workshop-yours': 'Workshop phase: yours to run',
  'with-skipper': 'With the skipper',
  submitted: 'Submitted for review',
  returned: 'Returned: phases to run again',
  'signed-off': 'Signed off',
};

/** The state of one engine's run, from its events on this device (so it is true offline too). */
export function engineRunState(snapshot: EngineSnapshot, role: Role): EngineRunState {
  const { run } = snapshot;
  if (run.state === 'signed-off') return 'signed-off';
  if (!isLoggable(run)) return 'submitted';
  const workshopPhase = snapshot.phase?.performedBy === 'workshop' && !snapshot.phaseComplete;
  if (workshopPhase) return role === 'skipper' ? 'workshop-waiting' : 'workshop-yours';
  if (run.lastDecision?.decision === 'returned') return 'returned';
  return 'with-skipper';
}

export interface PickerEngine {
  run: RunRecord;
  state: EngineRunState;
  /** This user has something to log (or to submit) on it. */
  workable: boolean;
}

/** Each run of the vessel with its state, and whether "On deck" has anything for this user. */
export function pickerEngines(
  vessel: { runs: RunRecord[]; events: Record<string, RunEvent[]> },
  role: Role,
  nowMs: number,
): PickerEngine[] {
  return vessel.runs.map((run) => {
    const snapshot = engineSnapshot(run, vessel.events[run.id] ?? [], nowMs, role);
    return { run, state: engineRunState(snapshot, role), workable: canWorkOn(snapshot, role) };
  });
}

const RANK: Partial<Record<RunRecord['state'], number>> = {
  planned: 3,
  'under-way': 3,
  returned: 3,
  submitted: 3,
  'signed-off': 2,
};

/**
 * The one run per engine that matters now: the open one, else the newest signed off. A
 * cancelled run was a mistake and is left out, so its engine reads as having no run.
 */
export function runPerEngine(runs: readonly RunRecord[]): RunRecord[] {
  const best = new Map<string, RunRecord>();
  for (const run of runs) {
    const rank = RANK[run.state];
    if (rank === undefined) continue;
    const seen = best.get(run.engine.id);
    const seenRank = seen ? RANK[seen.state]! : -1;
    if (rank > seenRank || (rank === seenRank && run.createdAt > seen!.createdAt))
      best.set(run.engine.id, run);
  }
  return runs.filter((run) => best.get(run.engine.id) === run);
}
