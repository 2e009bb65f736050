import type { EntityManager } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import { NotFoundError } from '../../lib/errors.js';
import { Engine } from './engine.entity.js';
import { VesselSkipper } from './vessel-skipper.entity.js';
import { Vessel } from './vessel.entity.js';

/*
 * Who may see what: staff see every record of their own workshop; a skipper only the vessels
 * linked to them (vessel_skipper) and what hangs off those. Anything else answers 404, never 403,
 * so ids of another workshop are not confirmed. Other features use these for their own records.
 */

export async function mayViewVessel(
  manager: EntityManager,
  user: SessionUser,
  vesselId: string,
): Promise<boolean> {
  if (user.role !== 'skipper') return true;
  return manager.getRepository(VesselSkipper).exists({ where: { vesselId, userId: user.id } });
}

/** Vessel ids a skipper is linked to; 'all' for staff. */
export async function visibleVesselIds(
  manager: EntityManager,
  user: SessionUser,
): Promise<string[] | 'all'> {
  if (user.role !== 'skipper') return 'all';
  const links = await manager.getRepository(VesselSkipper).find({ where: { userId: user.id } });
  return links.map((l) => l.vesselId);
}

export async function findVisibleVessel(
  manager: EntityManager,
  user: SessionUser,
  id: string,
): Promise<Vessel> {
  const vessel = await manager
    .getRepository(Vessel)
    .findOne({ where: { id, workshopId: user.workshopId } });
  if (!vessel || !(await mayViewVessel(manager, user, vessel.id)))
    throw new NotFoundError('vessel', id);
  return vessel;
}

export async function findVisibleEngine(
  manager: EntityManager,
  user: SessionUser,
  id: string,
): Promise<Engine> {
  const engine = await manager
    .getRepository(Engine)
    .findOne({ where: { id, workshopId: user.workshopId }, relations: { vessel: true } });
  if (!engine || !(await mayViewVessel(manager, user, engine.vesselId)))
    throw new NotFoundError('engine', id);
  return engine;
}
