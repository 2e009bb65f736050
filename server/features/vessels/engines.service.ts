import { randomUUID } from 'node:crypto';
import {
  In,
  IsNull,
  Not,
  type DataSource,
  type EntityManager,
  type FindOptionsWhere,
} from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import { positionLabel, type EngineInput } from '../../../shared/engines/engine.schema.js';
import type { EngineRow } from '../../../shared/vessels/vessel-view.js';
import type { ListStatus } from '../../../shared/vessels/vessel.schema.js';
import { systemClock, type Clock } from '../../lib/clock.js';
import { ConflictError, ValidationError } from '../../lib/errors.js';
import { Engine } from './engine.entity.js';
import { findVisibleEngine, visibleVesselIds } from './vessel-access.js';
import { byPosition, engineMatches, toEngineView } from './vessel-views.js';
import { refuseOpenRuns, type VesselRecordChecks } from './record-checks.js';
import { refuseArchived } from './vessels.service.js';
import { Vessel } from './vessel.entity.js';

export type EngineListQuery = { q: string; status: ListStatus; vesselId?: string };

const archivedWhere = (status: ListStatus) =>
  status === 'active'
    ? { archivedAt: IsNull() }
    : status === 'archived'
      ? { archivedAt: Not(IsNull()) }
      : {};

export class EnginesService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly checks: VesselRecordChecks,
    private readonly clock: Clock = systemClock,
  ) {}

  async list(user: SessionUser, query: EngineListQuery): Promise<EngineRow[]> {
    const visible = await visibleVesselIds(this.dataSource.manager, user);
    const status = user.role === 'skipper' ? 'active' : query.status;
    const where: FindOptionsWhere<Engine> = {
      workshopId: user.workshopId,
      ...archivedWhere(status),
    };
    if (query.vesselId) where.vesselId = query.vesselId;
    if (visible !== 'all') {
      const allowed = query.vesselId ? visible.filter((id) => id === query.vesselId) : visible;
      if (allowed.length === 0) return [];
      where.vesselId = In(allowed);
    }
    const engines = await this.dataSource
      .getRepository(Engine)
      .find({ where, relations: { vessel: true } });
    const shown = engines
      .filter((e) => user.role !== 'skipper' || !e.vessel?.archivedAt)
      .filter((e) => engineMatches(e, e.vessel?.name ?? '', query.q))
      .sort(
        (a, b) => (a.vessel?.name ?? '').localeCompare(b.vessel?.name ?? '') || byPosition(a, b),
      );
    return this.rows(this.dataSource.manager, shown);
  }

  async get(user: SessionUser, id: string): Promise<EngineRow> {
    const engine = await findVisibleEngine(this.dataSource.manager, user, id);
    return (await this.rows(this.dataSource.manager, [engine]))[0];
  }

  async create(user: SessionUser, input: EngineInput): Promise<EngineRow> {
    const id = randomUUID();
    await this.dataSource.transaction(async (manager) => {
      await this.checkPlacement(manager, user, input, null);
      await manager
        .getRepository(Engine)
        .insert({ id, workshopId: user.workshopId, ...input, archivedAt: null })
        .catch(serialTaken(input));
    });
    return this.get(user, id);
  }

  async update(user: SessionUser, id: string, input: EngineInput): Promise<EngineRow> {
    await this.dataSource.transaction(async (manager) => {
      const engine = await findVisibleEngine(manager, user, id);
      if (engine.archivedAt)
        throw new ConflictError('This engine is archived. Restore it before changing it.');
      await this.checkPlacement(manager, user, input, id);
      await manager
        .getRepository(Engine)
        .update({ id }, { ...input })
        .catch(serialTaken(input));
    });
    return this.get(user, id);
  }

  async setArchived(user: SessionUser, id: string, archived: boolean): Promise<EngineRow> {
    await this.dataSource.transaction(async (manager) => {
      const engine = await findVisibleEngine(manager, user, id);
      if (archived && !engine.archivedAt) {
        await refuseOpenRuns(
          this.checks,
          manager,
          { engineId: id },
          'This engine has a break-in run that is not signed off. Finish or sign off that run first.',
        );
      }
      if (!archived && engine.vessel?.archivedAt) refuseArchived(engine.vessel);
      if (!archived && engine.archivedAt)
        await this.checkPosition(manager, engine, engine.vesselId, engine.position);
      await manager
        .getRepository(Engine)
        .update({ id }, { archivedAt: archived ? (engine.archivedAt ?? this.clock.now()) : null });
    });
    return this.get(user, id);
  }

  /** The vessel is the workshop's and in use; the serial is new to the workshop; the position is free. */
  private async checkPlacement(
    manager: EntityManager,
    user: SessionUser,
    input: EngineInput,
    engineId: string | null,
  ) {
    const vessel = await manager
      .getRepository(Vessel)
      .findOne({ where: { id: input.vesselId, workshopId: user.workshopId } });
    if (!vessel)
      throw new ValidationError([
        { field: 'vesselId', message: 'Choose a vessel of your workshop.' },
      ]);
    if (vessel.archivedAt)
      throw new ValidationError([
        {
          field: 'vesselId',
          message: `${vessel.name} is archived: restore it before adding engines.`,
        },
      ]);
    const twin = await manager.getRepository(Engine).findOne({
      where: { workshopId: user.workshopId, serialNumber: input.serialNumber },
      relations: { vessel: true },
    });
    if (twin && twin.id !== engineId) {
      const where = `${positionLabel[twin.position].toLowerCase()} engine of ${twin.vessel?.name ?? 'another vessel'}${twin.archivedAt ? ' (archived)' : ''}`;
      const message = `Serial number ${input.serialNumber} is already recorded on the ${where}.`;
      throw new ConflictError(message, [{ field: 'serialNumber', message }]);
    }
    await this.checkPosition(manager, { id: engineId ?? '' }, vessel.id, input.position);
  }

  /** Two engines in use cannot share one position on a vessel (two "port" engines is a slip). */
  private async checkPosition(
    manager: EntityManager,
    engine: { id: string },
    vesselId: string,
    position: Engine['position'],
  ) {
    const taken = await manager
      .getRepository(Engine)
      .findOne({ where: { vesselId, position, archivedAt: IsNull(), id: Not(engine.id) } });
    if (taken) {
      const word = positionLabel[position].toLowerCase();
      const message = `This vessel already has ${/^[aeiou]/.test(word) ? 'an' : 'a'} ${word} engine (${taken.maker} ${taken.model}, ${taken.serialNumber}).`;
      throw new ConflictError(message, [{ field: 'position', message }]);
    }
  }

  private async rows(manager: EntityManager, engines: Engine[]): Promise<EngineRow[]> {
    if (engines.length === 0) return [];
    const checklists = await this.checks.checklistsOf(
      manager,
      engines.map((e) => e.id),
    );
    const checklistOf = new Map(checklists.map((c) => [c.engineId, c]));
    return engines.map((engine) => {
      const checklist = checklistOf.get(engine.id);
      return {
        ...toEngineView(engine),
        vessel: {
          id: engine.vesselId,
          name: engine.vessel?.name ?? '',
          archivedAt: engine.vessel?.archivedAt?.toISOString() ?? null,
        },
        checklist: checklist ? { completedAt: checklist.completedAt?.toISOString() ?? null } : null,
      };
    });
  }
}

/** Two requests racing past the serial check meet the unique index; answer as the check would. */
const serialTaken =
  (input: EngineInput) =>
  (error: unknown): never => {
    if (String((error as { code?: string }).code ?? '').startsWith('SQLITE_CONSTRAINT_UNIQUE')) {
      const message = `Serial number ${input.serialNumber} is already recorded in your workshop.`;
      throw new ConflictError(message, [{ field: 'serialNumber', message }]);
    }
    throw error;
  };
