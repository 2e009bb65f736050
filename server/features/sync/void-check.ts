import type { EntityManager } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import { VOIDABLE_KINDS, type VoidEvent } from '../../../shared/runs/run-event.schema.js';
import { nativeStatement } from '../../lib/native-sql.js';
import type { Run } from '../runs/run.entity.js';
import { storedEntry } from '../runs/run-voids.js';

export type Refusal = { reason: string; field?: string };

const VOIDED_SQL = `SELECT 1 FROM "run_event" WHERE "runId" = ? AND "kind" = 'void'
  AND json_extract("body", '$.targetId') = ? LIMIT 1`;

/** What this batch has already taken, so a void may name an entry made in the same batch. */
export interface BatchEntries {
  /** Entries taken so far, by id: run, kind and author. */
  entries: Map<string, { runId: string; kind: string; authorId: string }>;
  /** Ids voided so far in this batch. */
  voided: Set<string>;
}

const targetField = 'event.targetId';

/**
 * Why a void cannot be taken, or null. It must name a reading or note of the same run, not yet
 * voided; a skipper may void only their own entries (staff any, before sign-off).
 */
export function voidRefusal(
  manager: EntityManager,
  user: SessionUser,
  run: Run,
  event: VoidEvent,
  batch: BatchEntries,
): Refusal | null {
  const target =
    batch.entries.get(event.targetId) ?? storedEntry(manager, event.targetId) ?? undefined;
  if (target === undefined || target.runId !== run.id)
    return {
      reason: 'The entry to void (targetId) is not an entry of this run.',
      field: targetField,
    };
  if (!(VOIDABLE_KINDS as readonly string[]).includes(target.kind))
    return {
      reason:
        'Only a reading or a note can be voided (targetId); sessions, phase moves and alerts stand.',
      field: targetField,
    };
  if (user.role === 'skipper' && target.authorId !== user.id)
    return { reason: 'A skipper can void only their own entries (targetId).', field: targetField };
  const already =
    batch.voided.has(event.targetId) ||
    nativeStatement(manager, VOIDED_SQL).get(run.id, event.targetId) !== undefined;
  if (already) return { reason: 'This entry is already voided (targetId).', field: targetField };
  return null;
}
