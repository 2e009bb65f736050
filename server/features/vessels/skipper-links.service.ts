import { In, IsNull, type DataSource } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import type { SkipperOption, VesselView } from '../../../shared/vessels/vessel-view.js';
import { ValidationError } from '../../lib/errors.js';
import { User } from '../users/user.entity.js';
import { findVisibleVessel } from './vessel-access.js';
import { VesselSkipper } from './vessel-skipper.entity.js';
import { refuseArchived, type VesselsService } from './vessels.service.js';

/** Which skippers may see and log which vessels (vessel_skipper). Staff only. */
export class SkipperLinksService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly vessels: VesselsService,
  ) {}

  /** The workshop's skippers with the vessels each is linked to, for the link picker. */
  async listSkippers(user: SessionUser): Promise<SkipperOption[]> {
    const skippers = await this.dataSource.getRepository(User).find({
      where: { workshopId: user.workshopId, role: 'skipper', archivedAt: IsNull() },
      order: { name: 'ASC' },
    });
    if (skippers.length === 0) return [];
    const links = await this.dataSource
      .getRepository(VesselSkipper)
      .find({ where: { userId: In(skippers.map((s) => s.id)) } });
    return skippers.map((s) => ({
      id: s.id,
      name: s.name,
      email: s.email,
      vesselIds: links.filter((l) => l.userId === s.id).map((l) => l.vesselId),
    }));
  }

  /** Linking twice changes nothing, so a retried request is harmless. */
  async link(user: SessionUser, vesselId: string, skipperId: string): Promise<VesselView> {
    await this.dataSource.transaction(async (manager) => {
      const vessel = await findVisibleVessel(manager, user, vesselId);
      refuseArchived(vessel);
      const skipper = await manager
        .getRepository(User)
        .findOne({ where: { id: skipperId, workshopId: user.workshopId, archivedAt: IsNull() } });
      if (!skipper || skipper.role !== 'skipper') {
        throw new ValidationError([
          { field: 'userId', message: 'Choose a skipper of your workshop.' },
        ]);
      }
      await manager
        .getRepository(VesselSkipper)
        .upsert({ vesselId, userId: skipperId }, ['vesselId', 'userId']);
    });
    return this.vessels.get(user, vesselId);
  }

  async unlink(user: SessionUser, vesselId: string, skipperId: string): Promise<VesselView> {
    await findVisibleVessel(this.dataSource.manager, user, vesselId);
    await this.dataSource.getRepository(VesselSkipper).delete({ vesselId, userId: skipperId });
    return this.vessels.get(user, vesselId);
  }
}
