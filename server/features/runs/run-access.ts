import { In, type DataSource, type FindOptionsWhere } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import { VesselSkipper } from '../vessels/vessel-skipper.entity.js';
import { Run } from './run.entity.js';

/** Vessel ids the user may see: every vessel of the workshop for staff, the linked ones for a skipper. */
export async function visibleVesselIds(
  dataSource: DataSource,
  user: SessionUser,
): Promise<string[] | 'all'> {
  if (user.role !== 'skipper') return 'all';
  const links = await dataSource.getRepository(VesselSkipper).find({ where: { userId: user.id } });
  return links.map((l) => l.vesselId);
}

/** The `where` that limits runs to those the user may see. */
export async function visibleRunsWhere(
  dataSource: DataSource,
  user: SessionUser,
): Promise<FindOptionsWhere<Run>> {
  const visible = await visibleVesselIds(dataSource, user);
  return visible === 'all'
    ? { workshopId: user.workshopId }
    : { workshopId: user.workshopId, vesselId: In(visible) };
}
