import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import { EngineInputSchema } from '../../shared/engines/engine.schema.js';
import { VesselInputSchema } from '../../shared/vessels/vessel.schema.js';
import { User } from '../features/users/user.entity.js';
import { Engine } from '../features/vessels/engine.entity.js';
import { VesselSkipper } from '../features/vessels/vessel-skipper.entity.js';
import { Vessel } from '../features/vessels/vessel.entity.js';
import { Workshop } from '../features/workshops/workshop.entity.js';
import { hashPassword } from '../lib/passwords.js';
import { DEMO_VESSELS } from './demo-fleet.js';
import { DEMO_PASSWORD, DEMO_USERS, DEMO_WORKSHOP } from './demo-people.js';
import { addDemoRuns } from './demo-run-records.js';

/** True when the database holds no workshop yet: the only case in which demo data is added. */
async function isEmpty(dataSource: DataSource): Promise<boolean> {
  return (await dataSource.getRepository(Workshop).count()) === 0;
}

/** Adds the demo workshop in one transaction. Returns false (and changes nothing) on a non-empty database. */
export async function addDemoWorkshop(dataSource: DataSource): Promise<boolean> {
  if (!(await isEmpty(dataSource))) return false;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await dataSource.transaction(async (manager) => {
    const workshopId = randomUUID();
    await manager
      .getRepository(Workshop)
      .insert({ id: workshopId, ...DEMO_WORKSHOP, units: { ...DEMO_WORKSHOP.units } });
    const userIds = new Map<string, string>();
    for (const user of DEMO_USERS) {
      const id = randomUUID();
      userIds.set(user.key, id);
      await manager.getRepository(User).insert({
        id,
        workshopId,
        email: user.email,
        name: user.name,
        role: user.role,
        passwordHash,
        archivedAt: null,
      });
    }
    const engineIds = new Map<string, string>();
    for (const vessel of DEMO_VESSELS)
      await addDemoVessel(
        manager,
        workshopId,
        vessel,
        vessel.skipper ? userIds.get(vessel.skipper)! : null,
        engineIds,
      );
    await addDemoRuns(manager, { workshopId, userIds, engineIds });
  });
  return true;
}

async function addDemoVessel(
  manager: EntityManager,
  workshopId: string,
  vessel: (typeof DEMO_VESSELS)[number],
  skipperId: string | null,
  engineIds: Map<string, string>,
) {
  const vesselId = randomUUID();
  // Demo data goes through the same schemas as user input, so it can never hold what a form would refuse.
  const checked = VesselInputSchema.parse({
    name: vessel.name,
    hin: vessel.hin,
    type: vessel.type,
    lengthM: vessel.lengthM,
    homePort: vessel.homePort,
  });
  await manager
    .getRepository(Vessel)
    .insert({ id: vesselId, workshopId, ...checked, archivedAt: null });
  if (skipperId) await manager.getRepository(VesselSkipper).insert({ vesselId, userId: skipperId });
  for (const { key, ...engine } of vessel.engines) {
    const input = EngineInputSchema.parse({ ...engine, vesselId });
    const id = randomUUID();
    engineIds.set(key, id);
    await manager.getRepository(Engine).insert({ id, workshopId, ...input, archivedAt: null });
  }
}
