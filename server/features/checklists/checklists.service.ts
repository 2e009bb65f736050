import { randomUUID } from 'node:crypto';
import { In, type DataSource, type EntityManager } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import {
  ChecklistInputSchema,
  emptyChecklist,
  type ChecklistInput,
} from '../../../shared/checklists/checklist.schema.js';
import type { ChecklistView } from '../../../shared/checklists/checklist-view.js';
import {
  completionProblems,
  evaluateChecklist,
} from '../../../shared/checklists/evaluate-checklist.js';
import { systemClock, type Clock } from '../../lib/clock.js';
import { ConflictError, ValidationError } from '../../lib/errors.js';
import { User } from '../users/user.entity.js';
import type { Engine } from '../vessels/engine.entity.js';
import { findVisibleEngine } from '../vessels/vessel-access.js';
import { CommissioningChecklist } from './checklist.entity.js';

export class ChecklistsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock = systemClock,
  ) {}

  /** The engine's checklist, or an empty one not saved yet. */
  async get(user: SessionUser, engineId: string): Promise<ChecklistView> {
    const engine = await findVisibleEngine(this.dataSource.manager, user, engineId);
    const row = await this.dataSource
      .getRepository(CommissioningChecklist)
      .findOne({ where: { engineId } });
    return this.view(this.dataSource.manager, engine, row);
  }

  /** Saves a part-done checklist; nothing is required until it is completed. */
  async save(user: SessionUser, engineId: string, input: ChecklistInput): Promise<ChecklistView> {
    return this.dataSource.transaction(async (manager) => {
      const { engine, row } = await this.writable(manager, user, engineId);
      const saved = await this.store(manager, user, engine, row, input, false);
      return this.view(manager, engine, saved);
    });
  }

  /**
   * Saves and completes in one step, recording who and when. Refused with every unfinished or
   * failed item named when the checklist is not ready; then nothing at all is changed.
   */
  async complete(
    user: SessionUser,
    engineId: string,
    input: ChecklistInput,
  ): Promise<ChecklistView> {
    return this.dataSource.transaction(async (manager) => {
      const { engine, row } = await this.writable(manager, user, engineId);
      const evaluation = evaluateChecklist(input, engine);
      if (!evaluation.summary.readyToComplete) {
        const problems = completionProblems(evaluation);
        throw new ValidationError(
          problems,
          `The checklist cannot be completed yet: ${problems.length} ${problems.length === 1 ? 'item needs' : 'items need'} attention.`,
        );
      }
      const saved = await this.store(manager, user, engine, row, input, true);
      return this.view(manager, engine, saved);
    });
  }

  private async writable(manager: EntityManager, user: SessionUser, engineId: string) {
    const engine = await findVisibleEngine(manager, user, engineId);
    if (engine.archivedAt)
      throw new ConflictError('This engine is archived. Restore it before changing its checklist.');
    const row = await manager
      .getRepository(CommissioningChecklist)
      .findOne({ where: { engineId } });
    if (row?.completedAt) {
      throw new ConflictError(
        'This checklist was completed at handover and is kept as the record of it; it can no longer be changed.',
      );
    }
    return { engine, row };
  }

  private async store(
    manager: EntityManager,
    user: SessionUser,
    engine: Engine,
    row: CommissioningChecklist | null,
    entries: ChecklistInput,
    completing: boolean,
  ) {
    const saved = Object.assign(row ?? new CommissioningChecklist(), {
      id: row?.id ?? randomUUID(),
      workshopId: engine.workshopId,
      engineId: engine.id,
      entries,
      evaluation: evaluateChecklist(entries, engine),
      updatedById: user.id,
      completedAt: completing ? this.clock.now() : null,
      completedById: completing ? user.id : null,
    });
    return manager.getRepository(CommissioningChecklist).save(saved);
  }

  private async view(
    manager: EntityManager,
    engine: Engine,
    row: CommissioningChecklist | null,
  ): Promise<ChecklistView> {
    if (!row) {
      const entries = emptyChecklist();
      const base = {
        id: null,
        engineId: engine.id,
        entries,
        updatedAt: null,
        updatedBy: null,
        completedAt: null,
        completedBy: null,
      };
      return { ...base, evaluation: evaluateChecklist(entries, engine) };
    }
    // Stored entries go back through the schema, so fields added later get their defaults.
    const entries = ChecklistInputSchema.parse(row.entries);
    const people = await this.names(manager, [row.updatedById, row.completedById]);
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
    };
  }

  private async names(manager: EntityManager, ids: Array<string | null>) {
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
}

/** Each engine's checklist and whether it is complete (for the engines list). */
export function checklistsOf(
  manager: EntityManager,
  engineIds: string[],
): Promise<Array<{ engineId: string; completedAt: Date | null }>> {
  return manager.getRepository(CommissioningChecklist).find({
    select: { engineId: true, completedAt: true },
    where: { engineId: In(engineIds) },
  });
}
