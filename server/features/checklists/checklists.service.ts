import { randomUUID } from 'node:crypto';
import { In, type DataSource, type EntityManager } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import type {
  ChecklistInput,
  ReopenChecklistInput,
} from '../../../shared/checklists/checklist.schema.js';
import type { ChecklistView } from '../../../shared/checklists/checklist-view.js';
import {
  completionProblems,
  evaluateChecklist,
} from '../../../shared/checklists/evaluate-checklist.js';
import type { FieldError } from '../../../shared/problem/problem.schema.js';
import { systemClock, type Clock } from '../../lib/clock.js';
import { ConflictError, ValidationError } from '../../lib/errors.js';
import { recordAudit, type AuditAction } from '../audit/audit.service.js';
import type { Engine } from '../vessels/engine.entity.js';
import { findVisibleEngine } from '../vessels/vessel-access.js';
import { CommissioningChecklist } from './checklist.entity.js';
import { checklistView } from './checklist-views.js';
import { commissionOnCompletion } from './commission-date.js';

/** A completion either closes the checklist or leaves it as a draft with what is missing. */
type Completion = { view: ChecklistView } | { problems: FieldError[] };

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
    return checklistView(this.dataSource.manager, engine, row);
  }

  /** Saves a part-done checklist; nothing is required until it is completed. */
  async save(user: SessionUser, engineId: string, input: ChecklistInput): Promise<ChecklistView> {
    return this.dataSource.transaction(async (manager) => {
      const { engine, row } = await this.writable(manager, user, engineId);
      const saved = await this.store(manager, user, engine, row, input, false);
      return checklistView(manager, engine, saved);
    });
  }

  /**
   * Completes the checklist, recording who and when. When it is not ready, everything entered is
   * still saved as the draft (a technician at the dock must not lose a page of measurements to
   * one open item) and the refusal names every unfinished or failed item.
   */
  async complete(
    user: SessionUser,
    engineId: string,
    input: ChecklistInput,
  ): Promise<ChecklistView> {
    const outcome = await this.dataSource.transaction(async (manager): Promise<Completion> => {
      const { engine, row } = await this.writable(manager, user, engineId);
      const evaluation = evaluateChecklist(input, engine);
      const ready = evaluation.summary.readyToComplete;
      const saved = await this.store(manager, user, engine, row, input, ready);
      if (!ready) return { problems: completionProblems(evaluation) };
      const dated = await commissionOnCompletion(manager, engine, this.clock.now());
      const detail = dated ? `Commissioning date set to ${dated}, the day of completion.` : '';
      await this.trail(manager, user, engine, 'checklist-completed', detail);
      return { view: await checklistView(manager, engine, saved) };
    });
    if ('view' in outcome) return outcome.view;
    const { problems } = outcome;
    throw new ValidationError(
      problems,
      `The checklist cannot be completed yet: ${problems.length} ${problems.length === 1 ? 'item needs' : 'items need'} attention. What you entered is saved as a draft.`,
    );
  }

  /** Opens a completed checklist again, with the reason in the engine's trail, to be edited and completed anew. */
  async reopen(
    user: SessionUser,
    engineId: string,
    input: ReopenChecklistInput,
  ): Promise<ChecklistView> {
    return this.dataSource.transaction(async (manager) => {
      const engine = await this.changeable(manager, user, engineId);
      const repo = manager.getRepository(CommissioningChecklist);
      const row = await repo.findOne({ where: { engineId } });
      if (!row?.completedAt)
        throw new ConflictError('This checklist is not completed, so there is nothing to reopen.');
      Object.assign(row, { completedAt: null, completedById: null, updatedById: user.id });
      const saved = await repo.save(row);
      await this.trail(manager, user, engine, 'checklist-reopened', input.reason);
      return checklistView(manager, engine, saved);
    });
  }

  private async changeable(manager: EntityManager, user: SessionUser, engineId: string) {
    const engine = await findVisibleEngine(manager, user, engineId);
    if (engine.archivedAt)
      throw new ConflictError('This engine is archived. Restore it before changing its checklist.');
    return engine;
  }

  private async writable(manager: EntityManager, user: SessionUser, engineId: string) {
    const engine = await this.changeable(manager, user, engineId);
    const row = await manager
      .getRepository(CommissioningChecklist)
      .findOne({ where: { engineId } });
    if (row?.completedAt) {
      throw new ConflictError(
        'This checklist was completed at handover and is kept as the record of it. Reopen it, giving the reason, to change it.',
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

  /** Completions and reopenings go into the engine's trail, so every handover record stays visible. */
  private trail(
    manager: EntityManager,
    user: SessionUser,
    engine: Engine,
    action: Extract<AuditAction, 'checklist-completed' | 'checklist-reopened'>,
    detail: string,
  ) {
    return recordAudit(manager, {
      workshopId: engine.workshopId,
      recordType: 'engine',
      recordId: engine.id,
      action,
      actor: { id: user.id, name: user.name },
      at: this.clock.now(),
      detail,
    });
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
