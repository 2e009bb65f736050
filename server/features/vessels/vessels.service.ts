import { IsNull, type DataSource, type FindOptionsWhere } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import { Vessel } from './vessel.entity.js';

export class VesselsService {
  constructor(private readonly dataSource: DataSource) {}

  /** Staff see every vessel of their workshop; a skipper only the vessels linked to them. */
  async listFor(user: SessionUser) {
    const where: FindOptionsWhere<Vessel> = { workshopId: user.workshopId, archivedAt: IsNull() };
    if (user.role === 'skipper') where.skippers = { userId: user.id };
    const ids = (await this.dataSource.getRepository(Vessel).find({ select: { id: true }, where })).map((v) => v.id);
    if (ids.length === 0) return [];
    const vessels = await this.dataSource.getRepository(Vessel).find({
      where: ids.map((id) => ({ id })),
      relations: { engines: true, skippers: { user: true } },
      order: { name: 'ASC' },
    });
    return vessels.map(toVesselView);
  }
}

function toVesselView(vessel: Vessel) {
  return {
    id: vessel.id,
    name: vessel.name,
    hin: vessel.hin,
    type: vessel.type,
    lengthM: vessel.lengthM,
    homePort: vessel.homePort,
    skippers: (vessel.skippers ?? []).map((s) => ({ id: s.userId, name: s.user?.name ?? '' })),
    engines: (vessel.engines ?? [])
      .filter((e) => !e.archivedAt)
      .sort((a, b) => POSITION_ORDER.indexOf(a.position) - POSITION_ORDER.indexOf(b.position))
      .map(({ createdAt, updatedAt, archivedAt: _a, vessel: _v, workshopId: _w, ...engine }) => ({
        ...engine,
        createdAt: createdAt.toISOString(),
        updatedAt: updatedAt.toISOString(),
      })),
  };
}

const POSITION_ORDER = ['port', 'centre', 'starboard', 'single', 'inboard'];
