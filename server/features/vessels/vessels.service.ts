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
import type { VesselView } from '../../../shared/vessels/vessel-view.js';
import {
  VesselListQuerySchema,
  type VesselInput,
  type VesselListQuery,
} from '../../../shared/vessels/vessel.schema.js';
import type { Clock } from '../../lib/clock.js';
import { systemClock } from '../../lib/clock.js';
import { ConflictError } from '../../lib/errors.js';
import { refuseOpenRuns, type VesselRecordChecks } from './record-checks.js';
import { findVisibleVessel } from './vessel-access.js';
import { toVesselView, vesselMatches } from './vessel-views.js';
import { Vessel } from './vessel.entity.js';

const archivedWhere = (status: VesselListQuery['status']) =>
  status === 'active'
    ? { archivedAt: IsNull() }
    : status === 'archived'
      ? { archivedAt: Not(IsNull()) }
      : {};

export class VesselsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly checks: VesselRecordChecks,
    private readonly clock: Clock = systemClock,
  ) {}

  /**
   * Staff see every vessel of their workshop (archived ones when asked); a skipper only the
   * vessels linked to them that are in use.
   */
  async listFor(
    user: SessionUser,
    query: VesselListQuery = VesselListQuerySchema.parse({}),
  ): Promise<VesselView[]> {
    const status = user.role === 'skipper' ? 'active' : query.status;
    const where: FindOptionsWhere<Vessel> = {
      workshopId: user.workshopId,
      ...archivedWhere(status),
    };
    if (user.role === 'skipper') where.skippers = { userId: user.id };
    const ids = (
      await this.dataSource.getRepository(Vessel).find({ select: { id: true }, where })
    ).map((v) => v.id);
    if (ids.length === 0) return [];
    const vessels = await this.dataSource.getRepository(Vessel).find({
      where: { id: In(ids) },
      relations: { engines: true, skippers: { user: true } },
      order: { name: 'ASC' },
    });
    const views = vessels.map(toVesselView).filter((view) => vesselMatches(view, query.q));
    return this.withLatestRuns(views);
  }

  async get(user: SessionUser, id: string): Promise<VesselView> {
    await findVisibleVessel(this.dataSource.manager, user, id);
    const [view] = await this.withLatestRuns([await this.view(this.dataSource.manager, id)]);
    return view;
  }

  /** Each engine's newest run (the deck's picker and the vessel's decision page read it). */
  private async withLatestRuns(views: VesselView[]): Promise<VesselView[]> {
    const latest = await this.checks.latestRunsOf(
      this.dataSource.manager,
      views.flatMap((v) => v.engines.map((e) => e.id)),
    );
    const byEngine = new Map(latest.map((r) => [r.engineId, { id: r.runId, state: r.state }]));
    for (const view of views)
      for (const engine of view.engines) engine.latestRun = byEngine.get(engine.id) ?? null;
    return views;
  }

  async create(user: SessionUser, input: VesselInput): Promise<VesselView> {
    const id = randomUUID();
    await this.dataSource
      .getRepository(Vessel)
      .insert({ id, workshopId: user.workshopId, ...input, archivedAt: null });
    return this.view(this.dataSource.manager, id);
  }

  async update(user: SessionUser, id: string, input: VesselInput): Promise<VesselView> {
    return this.dataSource.transaction(async (manager) => {
      const vessel = await findVisibleVessel(manager, user, id);
      refuseArchived(vessel);
      await manager.getRepository(Vessel).update({ id }, { ...input });
      return this.view(manager, id);
    });
  }

  /** Archiving hides a vessel and its engines from everyday lists; nothing is deleted. */
  async setArchived(user: SessionUser, id: string, archived: boolean): Promise<VesselView> {
    return this.dataSource.transaction(async (manager) => {
      const vessel = await findVisibleVessel(manager, user, id);
      if (archived && !vessel.archivedAt) {
        await refuseOpenRuns(
          this.checks,
          manager,
          { vesselId: id },
          `${vessel.name} has an engine with a break-in run that is not signed off. Finish or sign off that run first.`,
        );
      }
      await manager
        .getRepository(Vessel)
        .update({ id }, { archivedAt: archived ? (vessel.archivedAt ?? this.clock.now()) : null });
      return this.view(manager, id);
    });
  }

  private async view(manager: EntityManager, id: string): Promise<VesselView> {
    const vessel = await manager
      .getRepository(Vessel)
      .findOneOrFail({ where: { id }, relations: { engines: true, skippers: { user: true } } });
    return toVesselView(vessel);
  }
}

export function refuseArchived(vessel: Vessel) {
  if (vessel.archivedAt)
    throw new ConflictError(`${vessel.name} is archived. Restore it before changing it.`);
}
