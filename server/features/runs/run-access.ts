import { In, type DataSource, type EntityManager, type FindOptionsWhere } from 'typeorm';
import { OPEN_RUN_STATES, type RunState } from '../../../shared/runs/run.schema.js';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import { NotFoundError } from '../../lib/errors.js';
import { visibleVesselIds } from '../vessels/vessel-access.js';
import { Run } from './run.entity.js';

/*
 * Who may see a run: the same rule as for its vessel (vessels/vessel-access.ts). Staff see every
 * run of their workshop, a skipper the runs of linked vessels; anything else answers 404.
 */

/** The `where` that limits runs to those the user may see. */
export async function visibleRunsWhere(
  dataSource: DataSource,
  user: SessionUser,
): Promise<FindOptionsWhere<Run>> {
  const visible = await visibleVesselIds(dataSource.manager, user);
  return visible === 'all'
    ? { workshopId: user.workshopId }
    : { workshopId: user.workshopId, vesselId: In(visible) };
}

/** The run (with its engine) if the user may see it, else 404. */
export async function visibleRun(
  dataSource: DataSource,
  user: SessionUser,
  runId: string,
): Promise<Run> {
  const run = await dataSource
    .getRepository(Run)
    .findOne({ where: { id: runId, workshopId: user.workshopId }, relations: { engine: true } });
  const visible = await visibleVesselIds(dataSource.manager, user);
  if (!run || (visible !== 'all' && !visible.includes(run.vesselId)))
    throw new NotFoundError('run', runId);
  return run;
}

/** True when a run on the vessel or engine is not signed off yet (vessels refuse to archive then). */
export function hasOpenRun(
  manager: EntityManager,
  where: { vesselId: string } | { engineId: string },
): Promise<boolean> {
  return manager
    .getRepository(Run)
    .exists({ where: { ...where, state: In([...OPEN_RUN_STATES]) } });
}

/** Each engine's newest run (any state), for the deck's vessel picker to say where each engine stands. */
export async function latestRunsOf(
  manager: EntityManager,
  engineIds: string[],
): Promise<Array<{ engineId: string; runId: string; state: RunState }>> {
  if (engineIds.length === 0) return [];
  const runs = await manager.getRepository(Run).find({
    where: { engineId: In(engineIds) },
    select: { id: true, engineId: true, state: true, createdAt: true },
    order: { createdAt: 'DESC' },
  });
  const newest = new Map<string, { engineId: string; runId: string; state: RunState }>();
  for (const r of runs)
    if (!newest.has(r.engineId))
      newest.set(r.engineId, { engineId: r.engineId, runId: r.id, state: r.state });
  return [...newest.values()];
}
