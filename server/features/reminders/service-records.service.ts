import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import { dayWords } from '../../../shared/review/certificate-words.js';
import { calendarDateIn } from '../../../shared/review/first-service.js';
import type { FirstServiceInput } from '../../../shared/service/service-record.schema.js';
import type { ServiceRecordView } from '../../../shared/service/service-views.js';
import type { FieldError } from '../../../shared/problem/problem.schema.js';
import type { Clock } from '../../lib/clock.js';
import { ConflictError, NotFoundError, ValidationError } from '../../lib/errors.js';
import { recordAudit } from '../audit/audit.service.js';
import { Run } from '../runs/run.entity.js';
import { User } from '../users/user.entity.js';
import type { Engine } from '../vessels/engine.entity.js';
import { findVisibleEngine } from '../vessels/vessel-access.js';
import { Workshop } from '../workshops/workshop.entity.js';
import { ServiceRecord } from './service-record.entity.js';

export const toServiceRecordView = (row: ServiceRecord): ServiceRecordView => ({
  id: row.id,
  date: row.doneOn,
  hourMeter: row.hourMeter,
  doneBy: row.doneBy,
  notes: row.notes,
  recordedAt: row.recordedAt.toISOString(),
  recordedBy: { id: row.recordedById, name: row.recordedByName },
});

/** The checks that need the engine: each names its field, and all are reported at once. */
function fieldProblems(engine: Engine, input: FirstServiceInput, today: string): FieldError[] {
  const problems: FieldError[] = [];
  if (input.date > today)
    problems.push({
      field: 'date',
      message: `The date of the service (date) cannot be in the future: today is ${dayWords(today)}.`,
    });
  else if (engine.commissionedOn !== null && input.date < engine.commissionedOn)
    problems.push({
      field: 'date',
      message: `The date of the service (date) cannot be before commissioning on ${dayWords(engine.commissionedOn)}.`,
    });
  const floor = engine.hourMeterAtCommissioning;
  if (floor !== null && input.hourMeter < floor)
    problems.push({
      field: 'hourMeter',
      message: `The hour meter reading (hourMeter) cannot be below ${floor.toFixed(1)} h, its reading at commissioning.`,
    });
  return problems;
}

const newFirstService = (
  engine: Engine,
  input: FirstServiceInput,
  person: { id: string; name: string },
  now: Date,
): ServiceRecord =>
  Object.assign(new ServiceRecord(), {
    id: randomUUID(),
    workshopId: engine.workshopId,
    engineId: engine.id,
    kind: 'first',
    doneOn: input.date,
    hourMeter: input.hourMeter,
    doneBy: input.doneBy,
    notes: input.notes,
    recordedById: person.id,
    recordedByName: person.name,
    recordedAt: now,
  });

/** Services done on an engine, as the workshop records them on the engine page. */
export class ServiceRecordsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
  ) {}

  /**
   * Records the first service. Refused, with nothing saved, unless a break-in run of the engine is
   * signed off and the date and hour meter fit the engine's commissioning and today.
   */
  async recordFirst(
    user: SessionUser,
    engineId: string,
    input: FirstServiceInput,
  ): Promise<ServiceRecordView> {
    const engine = await findVisibleEngine(this.dataSource.manager, user, engineId);
    await this.refuseUnlessOpen(engine);
    const workshop = await this.dataSource
      .getRepository(Workshop)
      .findOneByOrFail({ id: user.workshopId });
    const now = this.clock.now();
    const problems = fieldProblems(engine, input, calendarDateIn(workshop.timezone, now));
    if (problems.length > 0) throw new ValidationError(problems);
    const person = await this.dataSource.getRepository(User).findOneByOrFail({ id: user.id });
    const row = newFirstService(engine, input, person, now);
    await this.dataSource.transaction(async (manager) => {
      await manager.getRepository(ServiceRecord).insert(row);
      await recordAudit(manager, {
        workshopId: engine.workshopId,
        recordType: 'engine',
        recordId: engine.id,
        action: 'first-service-recorded',
        actor: { id: person.id, name: person.name },
        at: now,
        detail: `First service on ${input.date} at ${input.hourMeter.toFixed(1)} h by ${input.doneBy}`,
      });
    });
    return toServiceRecordView(row);
  }

  /** A first service needs a signed-off break-in, and is recorded once. */
  private async refuseUnlessOpen(engine: Engine): Promise<void> {
    const existing = await this.dataSource
      .getRepository(ServiceRecord)
      .findOneBy({ engineId: engine.id, kind: 'first' });
    if (existing)
      throw new ConflictError(
        `The first service of this engine is already recorded (${dayWords(existing.doneOn)}, ${existing.hourMeter.toFixed(1)} h, by ${existing.doneBy}).`,
      );
    const signedOff = await this.dataSource
      .getRepository(Run)
      .exists({ where: { engineId: engine.id, state: 'signed-off' } });
    if (!signedOff)
      throw new ConflictError(
        'No break-in run of this engine is signed off yet: the first service is recorded after the break-in is signed off.',
      );
  }
}

/** A service record if the user may see its engine, else 404 (the attachments on it use this). */
export async function findVisibleServiceRecord(
  manager: EntityManager,
  user: SessionUser,
  id: string,
): Promise<ServiceRecord> {
  const row = await manager
    .getRepository(ServiceRecord)
    .findOneBy({ id, workshopId: user.workshopId });
  if (!row) throw new NotFoundError('service record', id);
  await findVisibleEngine(manager, user, row.engineId).catch(() => {
    throw new NotFoundError('service record', id);
  });
  return row;
}
