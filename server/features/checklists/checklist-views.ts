import { In, type EntityManager } from 'typeorm';
import {
  ChecklistInputSchema,
  emptyChecklist,
} from '../../../shared/checklists/checklist.schema.js';
import type { ChecklistView } from '../../../shared/checklists/checklist-view.js';
import { evaluateChecklist } from '../../../shared/checklists/evaluate-checklist.js';
import { AuditEntry } from '../audit/audit-entry.entity.js';
import { User } from '../users/user.entity.js';
import type { Engine } from '../vessels/engine.entity.js';
import { CommissioningChecklist } from './checklist.entity.js';

/** The checklist as the API answers it; an engine with none yet gets an empty, unsaved one. */
export async function checklistView(
  manager: EntityManager,
  engine: Engine,
  row: CommissioningChecklist | null,
): Promise<ChecklistView> {
  if (!row) {
    const entries = emptyChecklist();
    return {
      id: null,
      engineId: engine.id,
      entries,
      evaluation: evaluateChecklist(entries, engine),
      updatedAt: null,
      updatedBy: null,
      completedAt: null,
      completedBy: null,
      reopened: null,
    };
  }
  // Stored entries go back through the schema, so fields added later get their defaults.
  const entries = ChecklistInputSchema.parse(row.entries);
  const people = await names(manager, [row.updatedById, row.completedById]);
  return {
    id: row.id,
    engineId: engine.id,
    entries,
    // A completed checklist keeps the judgement made at handover; an open one follows the engine record.
    evaluation: row.completedAt ? row.evaluation : evaluateChecklist(entries, engine),
    updatedAt: row.updatedAt.toISOString(),
    updatedBy: people(row.updatedById),
    completedAt: row.completedAt?.toISOString() ?? null,
    completedBy: people(row.completedById),
    reopened: await lastReopening(manager, engine.id),
  };
}

/** Reopenings live in the engine's trail (audit_entry), which keeps every one. */
async function lastReopening(manager: EntityManager, engineId: string) {
  const entry = await manager.getRepository(AuditEntry).findOne({
    where: { recordType: 'engine', recordId: engineId, action: 'checklist-reopened' },
    order: { at: 'DESC' },
  });
  return entry
    ? { at: entry.at.toISOString(), byName: entry.actorName, reason: entry.detail }
    : null;
}

async function names(manager: EntityManager, ids: Array<string | null>) {
  const wanted = ids.filter((id): id is string => Boolean(id));
  const users = wanted.length
    ? await manager
        .getRepository(User)
        .find({ select: { id: true, name: true }, where: { id: In(wanted) } })
    : [];
  const nameOf = new Map(users.map((u) => [u.id, u.name]));
  return (id: string | null) =>
    id ? { id, name: nameOf.get(id) ?? 'a former member of staff' } : null;
}
