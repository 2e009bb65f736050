import type { EntityManager } from 'typeorm';
import { frozenPhases } from '../../../shared/review/frozen-phases.js';
import { accountRun } from '../../../shared/runs/run-accounting.js';
import type { RunPatchItem } from '../../../shared/sync/sync.schema.js';
import { loadRunEvents } from '../runs/run-events.js';
import type { Run } from '../runs/run.entity.js';
import type { Refusal } from './void-check.js';

const STATE_REFUSALS: Partial<Record<string, string>> = {
  submitted: 'This run is already submitted for review (submit); the workshop decides on it next.',
  'signed-off': 'This run is signed off (submit); it can no longer be submitted.',
  cancelled: 'This run was cancelled by the workshop (submit); there is nothing to submit.',
  planned: 'Nothing has been logged on this run yet (submit), so there is nothing to submit.',
};

/**
 * Why a submit cannot be taken, or null. Called once the batch's earlier events are written, so
 * the run is judged on everything the device sent before the submit. A run not judged complete
 * goes to the workshop only with the skipper's note saying why.
 */
export async function submitRefusal(
  manager: EntityManager,
  run: Run,
  patch: RunPatchItem,
): Promise<Refusal | null> {
  const refusal = STATE_REFUSALS[run.state];
  if (refusal) return { reason: refusal, field: 'submit' };
  if (patch.submitNote) return null;
  const { events } = (await loadRunEvents(manager, [run.id])).get(run.id)!;
  const phases = frozenPhases(run.program, run.bands, run.rerunFrom);
  const account = accountRun(events, phases, { engineId: run.engineId });
  if (account.verdict === 'complete') return null;
  const open = account.phases.find((p) => p.verdict !== 'complete');
  const name = run.program.phases.find((p) => p.id === open?.phaseId)?.name ?? 'A phase';
  const why = open?.reasons[0]?.message ?? 'not complete';
  return {
    reason: `${name}: ${why} Write a note to the workshop (submitNote) saying why the run is submitted as it is.`,
    field: 'submitNote',
  };
}
