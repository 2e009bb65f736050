import type { EntityManager } from 'typeorm';
import { calendarDateIn } from '../../../shared/review/first-service.js';
import { Engine } from '../vessels/engine.entity.js';
import { Workshop } from '../workshops/workshop.entity.js';

/**
 * Completing the commissioning checklist is the handover: when the engine has no commissioning
 * date yet, the day of completion (in the workshop's zone) becomes it, so the first service can
 * be worked out by date. A date the technician entered is never changed. Returns the date set,
 * or null when the engine had one.
 */
export async function commissionOnCompletion(
  manager: EntityManager,
  engine: Engine,
  now: Date,
): Promise<string | null> {
  if (engine.commissionedOn) return null;
  const workshop = await manager.getRepository(Workshop).findOneByOrFail({ id: engine.workshopId });
  const commissionedOn = calendarDateIn(workshop.timezone, now);
  await manager.getRepository(Engine).update({ id: engine.id }, { commissionedOn });
  return commissionedOn;
}
