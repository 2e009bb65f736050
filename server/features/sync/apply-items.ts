import { nextTurn } from '../../lib/next-turn.js';
import type { EntityManager } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import type { RunEvent, VoidEvent } from '../../../shared/runs/run-event.schema.js';
import type {
  EventItem,
  PushItem,
  PushResult,
  RunPatchItem,
} from '../../../shared/sync/sync.schema.js';
import type { Run } from '../runs/run.entity.js';
import { reserveChangeSeq } from '../../lib/change-seq.js';
import { eventStore } from './event-store.js';
import { recordAudit } from '../audit/audit.service.js';
import { RunPatchRow } from './run-patch.entity.js';
import { submitRefusal } from './submit-check.js';
import { eventTimeRefusal } from '../../../shared/runs/event-time.js';
import { voidRefusal, type BatchEntries } from './void-check.js';

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
function eventRefusal(
  run: Run,
  event: RunEvent,
  { user, now }: Context,
): { reason: string; field?: string } | null {
  const badTime = eventTimeRefusal(event.at, now);
  if (badTime) return { reason: badTime, field: 'event.at' };
  if (run.state === 'signed-off') {
    return {
      reason: `This run was signed off by the workshop${run.signedOffAt ? ` on ${run.signedOffAt.toISOString().slice(0, 10)}` : ''}; nothing more can be added to it.`,
    };
  }
  if ((run.state as string) === 'cancelled')
    return { reason: 'This run was cancelled by the workshop; nothing more can be added to it.' };
  // Staff may still take an entry back while deciding; nothing else is added under review.
  const staffVoid = event.kind === 'void' && user.role !== 'skipper';
  if (run.state === 'submitted' && !staffVoid)
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

function refusePatch(
  run: Run,
  patch: RunPatchItem,
  now: number,
): { reason: string; field?: string } | null {
  const badTime = eventTimeRefusal(patch.at, now);
  if (badTime) return { reason: badTime, field: 'at' };
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
  const refusal =
    refusePatch(run, patch, ctx.now) ??
    (patch.submit ? await submitRefusal(manager, run, patch) : null);
  if (refusal) return rejected(patch.id, refusal.reason, refusal.field);
  if (patch.currentPhaseId !== undefined) run.currentPhaseId = patch.currentPhaseId;
  if (patch.notes !== undefined) run.notes = patch.notes;
  if (patch.submit) {
    run.state = 'submitted';
    run.submittedAt = new Date(ctx.now);
    run.submitNote = patch.submitNote || null;
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

/** A void's author and reason go into the run's trail as well as the log. */
async function auditVoid(manager: EntityManager, ctx: Context, run: Run, event: VoidEvent) {
  await recordAudit(manager, {
    workshopId: run.workshopId,
    recordType: 'run',
    recordId: run.id,
    action: 'entry-voided',
    actor: { id: ctx.user.id, name: ctx.user.name },
    at: new Date(ctx.now),
    detail: event.reason,
  });
}

/** Writes the events decided so far and settles their results; a submit needs them on disk first. */
async function flush(manager: EntityManager, ctx: Context, pending: Candidate[], out: Applied) {
  const stored = await insertEvents(manager, ctx, pending);
  for (const { index, item, run } of pending) {
    const isNew = stored.has(item.event.id);
    out.results[index] = { id: item.event.id, status: isNew ? 'stored' : 'duplicate' };
    if (isNew) out.touched.add(run);
    if (isNew && item.event.kind === 'void') await auditVoid(manager, ctx, run, item.event);
  }
  pending.length = 0;
}

/** Why this event will not be taken (its run's state, its engine and phase, a void's target). */
function refusalOf(
  manager: EntityManager,
  ctx: Context,
  run: Run,
  event: RunEvent,
  batch: BatchEntries,
) {
  return (
    eventRefusal(run, event, ctx) ??
    (event.kind === 'void' ? voidRefusal(manager, ctx.user, run, event, batch) : null)
  );
}

/** Decides every item in batch order, writing new events in bulk (before a submit, and at the end). */
/** Items handled between two chances for other requests to run. */
const TURN = 100;

export async function applyItems(manager: EntityManager, ctx: Context): Promise<Applied> {
  const out: Applied = { results: new Array(ctx.items.length), touched: new Set<Run>() };
  const pending: Candidate[] = [];
  const batch: BatchEntries = { entries: new Map(), voided: new Set() };
  const store = eventStore(manager);
  for (const [index, item] of ctx.items.entries()) {
    if (index > 0 && index % TURN === 0) {
      // A long batch lets other requests (health, pages) in between; reads go on meanwhile.
      await flush(manager, ctx, pending, out);
      await nextTurn();
    }
    const run = ctx.runs.get(item.runId)!;
    if (item.type === 'run-patch') {
      if (item.submit) await flush(manager, ctx, pending, out);
      out.results[index] = await applyPatch(manager, ctx, run, item);
      if (out.results[index].status === 'stored') out.touched.add(run);
      continue;
    }
    const event = item.event;
    const refusal = refusalOf(manager, ctx, run, event, batch);
    // A copy of something already stored is "duplicate" even on a run now frozen, so the device
    // can clear it; only refused items need the look-up, the rest learn it from the insert.
    if (batch.entries.has(event.id) || (refusal && store.exists(event.id)))
      out.results[index] = { id: event.id, status: 'duplicate' };
    else if (refusal) out.results[index] = rejected(event.id, refusal.reason, refusal.field);
    else {
      batch.entries.set(event.id, { runId: run.id, kind: event.kind, authorId: ctx.user.id });
      if (event.kind === 'void') batch.voided.add(event.targetId);
      pending.push({ index, item, run });
      noteEventOnRun(run, event);
    }
  }
  await flush(manager, ctx, pending, out);
  return out;
}
