import type { EntityManager } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import type { AttachmentRecordType } from '../../../shared/attachments/attachment.schema.js';
import { ConflictError, ForbiddenError, NotFoundError } from '../../lib/errors.js';
import { CommissioningChecklist } from '../checklists/checklist.entity.js';
import { findVisibleServiceRecord } from '../reminders/service-records.service.js';
import { Run } from '../runs/run.entity.js';
import { findVisibleEngine, mayViewVessel } from '../vessels/vessel-access.js';

/** What an attachment hangs on, as far as permissions go. */
export interface AttachableRecord {
  workshopId: string;
  /** Skippers may add photos to their own runs; engines and checklists are the workshop's. */
  skipperMayAdd: boolean;
  /** Why nothing more may be added (a signed-off run is frozen), when that is so. */
  frozen: string | null;
}

async function checklistRecord(
  manager: EntityManager,
  user: SessionUser,
  id: string,
): Promise<AttachableRecord> {
  const checklist = await manager
    .getRepository(CommissioningChecklist)
    .findOne({ where: { id, workshopId: user.workshopId } });
  if (!checklist) throw new NotFoundError('checklist', id);
  await findVisibleEngine(manager, user, checklist.engineId).catch(() => {
    throw new NotFoundError('checklist', id);
  });
  return { workshopId: checklist.workshopId, skipperMayAdd: false, frozen: null };
}

async function runRecord(
  manager: EntityManager,
  user: SessionUser,
  id: string,
): Promise<AttachableRecord> {
  const run = await manager
    .getRepository(Run)
    .findOne({ where: { id, workshopId: user.workshopId } });
  if (!run || !(await mayViewVessel(manager, user, run.vesselId)))
    throw new NotFoundError('run', id);
  const frozen =
    run.state === 'signed-off'
      ? 'This run is signed off and frozen: nothing more can be attached to it.'
      : null;
  return { workshopId: run.workshopId, skipperMayAdd: true, frozen };
}

/** The record if the user may see it; 404 otherwise (another workshop's ids are never confirmed). */
export async function findVisibleRecord(
  manager: EntityManager,
  user: SessionUser,
  type: AttachmentRecordType,
  id: string,
): Promise<AttachableRecord> {
  if (type === 'engine') {
    const engine = await findVisibleEngine(manager, user, id);
    return { workshopId: engine.workshopId, skipperMayAdd: false, frozen: null };
  }
  if (type === 'service') {
    // A service's papers (invoice, photos) are the workshop's, like the engine's.
    const record = await findVisibleServiceRecord(manager, user, id);
    return { workshopId: record.workshopId, skipperMayAdd: false, frozen: null };
  }
  return type === 'checklist' ? checklistRecord(manager, user, id) : runRecord(manager, user, id);
}

/** The record if the user may add files to it. */
export async function findAttachableRecord(
  manager: EntityManager,
  user: SessionUser,
  type: AttachmentRecordType,
  id: string,
): Promise<AttachableRecord> {
  const record = await findVisibleRecord(manager, user, type, id);
  if (user.role === 'skipper' && !record.skipperMayAdd)
    throw new ForbiddenError(
      `Only the workshop adds files to ${type === 'engine' ? 'an engine' : type === 'service' ? 'a service record' : 'a checklist'}.`,
    );
  if (record.frozen) throw new ConflictError(record.frozen);
  return record;
}
