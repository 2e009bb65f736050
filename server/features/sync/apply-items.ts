import type { EntityManager } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import type { RunEvent } from '../../../shared/runs/run-event.schema.js';
import type {
  EventItem,
  PushItem,
  PushResult,
  RunPatchItem,
} from '../../../shared/sync/sync.schema.js';
import type { Run } from '../runs/run.entity.js';
import { reserveChangeSeq } from '../../lib/change-seq.js';
import { eventStore } from './event-store.js';
import { RunPatchRow } from './run-patch.entity.js';

export type Applied = { results: PushResult[]; touched: Set<Run> };
type Context = { user: SessionUser; runs: Map<string, Run>; items: PushItem[]; now: number };
type Candidate = { index: number; item: EventItem; run: Run };

const rejected = (id: string, reason: string, field?: string): PushResult => ({
  id,
  status: 'rejected',
  reason,
  ...(field ? { field } : {}),
});

/** Why the server will not take this event for this run, or null when it will. */
function eventRefusal(run: Run, event: RunEvent): { reason: string; field?: string } | null {
  if (run.state === 'signed-off') {
    return {
      reason: `This run was signed off by the workshop${run.signedOffAt ? ` on ${run.signedOffAt.toISOString().slice(0, 10)}` : ''}; nothing more can be added to it.`,
    };
  }
  if (run.state === 'submitted')
    return {
      reason:
        'This run is with the workshop for review; logging opens again if the workshop returns it.',
    };
  if (event.engineId !== run.engineId)
    return {
      reason: "This entry names a different engine from the run's engine.",
      field: 'event.engineId',
    };
  const phaseId = 'phaseId' in event ? event.phaseId : undefined;
  if (phaseId !== undefined && !run.program.phases.some((p) => p.id === phaseId)) {
    return { reason: `The run's program has no phase "${phaseId}".`, field: 'event.phaseId' };
  }
  return null;
}

function refusePatch(run: Run, patch: RunPatchItem): { reason: string; field?: string } | null {
  if (run.state === 'signed-off')
    return { reason: 'This run was signed off by the workshop; it can no longer be changed.' };
  if (
    patch.currentPhaseId !== undefined &&
    !run.program.phases.some((p) => p.id === patch.currentPhaseId)
  ) {
    return {
      reason: `The run's program has no phase "${patch.currentPhaseId}".`,
      field: 'currentPhaseId',
    };
  }
  if (patch.submit && run.state === 'planned')
    return {
      reason: 'Nothing has been logged on this run yet, so there is nothing to submit.',
      field: 'submit',
    };
  return null;
}

/** Readings, notes and alerts are append-only; run fields are last-writer-wins by arrival (DEVELOPERS.md). */
async function applyPatch(
  manager: EntityManager,
  ctx: Context,
  run: Run,
  patch: RunPatchItem,
): Promise<PushResult> {
  if (await manager.getRepository(RunPatchRow).existsBy({ id: patch.id }))
    return { id: patch.id, status: 'duplicate' };
  const refusal = refusePatch(run, patch);
  if (refusal) return rejected(patch.id, refusal.reason, refusal.field);
  if (patch.currentPhaseId !== undefined) run.currentPhaseId = patch.currentPhaseId;
  if (patch.notes !== undefined) run.notes = patch.notes;
  if (patch.submit && run.state !== 'submitted') {
    run.state = 'submitted';
    run.submittedAt = new Date(ctx.now);
  }
  const { id, runId, at, ...body } = patch;
  await manager
    .getRepository(RunPatchRow)
    .insert({ id, runId, at, authorId: ctx.user.id, receivedAt: ctx.now, body });
  return { id: patch.id, status: 'stored' };
}

/** Inserts the events that are new, each with its change number; returns the ids that were new. */
async function insertEvents(
  manager: EntityManager,
  ctx: Context,
  candidates: Candidate[],
): Promise<Set<string>> {
  const stored = new Set<string>();
  if (candidates.length === 0) return stored;
  let seq = await reserveChangeSeq(manager, candidates.length);
  const store = eventStore(manager);
  for (const { item, run } of candidates) {
    const e = item.event;
    const isNew = store.insert(e, {
      runId: run.id,
      workshopId: run.workshopId,
      receivedAt: ctx.now,
      authorId: ctx.user.id,
      seq: seq++,
    });
    if (isNew) stored.add(e.id);
  }
  return stored;
}

function noteEventOnRun(run: Run, event: RunEvent) {
  if (run.state === 'planned' || run.state === 'returned') run.state = 'under-way';
  run.lastEventAt = Math.max(run.lastEventAt ?? 0, event.at);
}

/** Decides every item in batch order, then writes the new events in bulk. */
export async function applyItems(manager: EntityManager, ctx: Context): Promise<Applied> {
  const results: PushResult[] = new Array(ctx.items.length);
  const touched = new Set<Run>();
  const candidates: Candidate[] = [];
  const seen = new Set<string>();
  const store = eventStore(manager);
  for (const [index, item] of ctx.items.entries()) {
    const run = ctx.runs.get(item.runId)!;
    if (item.type === 'run-patch') {
      results[index] = await applyPatch(manager, ctx, run, item);
      if (results[index].status === 'stored') touched.add(run);
      continue;
    }
    const refusal = eventRefusal(run, item.event);
    // A copy of something already stored is "duplicate" even on a run now frozen, so the device
    // can clear it; only refused items need the look-up, the rest learn it from the insert.
    if (seen.has(item.event.id) || (refusal && store.exists(item.event.id)))
      results[index] = { id: item.event.id, status: 'duplicate' };
    else if (refusal) results[index] = rejected(item.event.id, refusal.reason, refusal.field);
    else {
      seen.add(item.event.id);
      candidates.push({ index, item, run });
      noteEventOnRun(run, item.event);
    }
  }
  const stored = await insertEvents(manager, ctx, candidates);
  for (const { index, item, run } of candidates) {
    const isNew = stored.has(item.event.id);
    results[index] = { id: item.event.id, status: isNew ? 'stored' : 'duplicate' };
    if (isNew) touched.add(run);
  }
  return { results, touched };
}
