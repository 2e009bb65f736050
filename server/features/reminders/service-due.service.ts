import type { DataSource } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import { calendarDateIn } from '../../../shared/review/first-service.js';
import type { EngineServiceView } from '../../../shared/service/service-views.js';
import { serviceWorkings } from '../../../shared/service/service-workings.js';
import type { Clock } from '../../lib/clock.js';
import type { CalendarFile } from '../mail/service-calendar.js';
import { NotFoundError } from '../../lib/errors.js';
import type { RunSummaries } from '../review/run-summaries.js';
import { visibleRun } from '../runs/run-access.js';
import { visibleVesselIds } from '../vessels/vessel-access.js';
import { Workshop } from '../workshops/workshop.entity.js';
import { firstServiceIcs } from './first-service-ics.js';
import {
  ENGINES_SQL,
  toServiceDue,
  type EngineServiceDue,
  type EngineSqlRow,
} from './service-due-rows.js';
import { ServiceReminder } from './service-reminder.entity.js';

export type { EngineServiceDue } from './service-due-rows.js';

/** First service per engine: what the engine page shows and what the reminder job checks. */
export class ServiceDueService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly summaries: RunSummaries,
    private readonly clock: Clock,
  ) {}

  async forWorkshop(workshopId: string): Promise<EngineServiceDue[]> {
    await this.summaries.refresh(workshopId);
    const workshop = await this.dataSource
      .getRepository(Workshop)
      .findOneByOrFail({ id: workshopId });
    const today = calendarDateIn(workshop.timezone, this.clock.now());
    const rows: EngineSqlRow[] = await this.dataSource.query(ENGINES_SQL, [workshopId]);
    return rows.map((row) => toServiceDue(row, today));
  }

  /** The engine's service due with its working; 404 unless the user may see the engine. */
  async forEngine(user: SessionUser, engineId: string): Promise<EngineServiceView> {
    const visible = await visibleVesselIds(this.dataSource.manager, user);
    const found = (await this.forWorkshop(user.workshopId)).find((e) => e.engine.id === engineId);
    if (!found || (visible !== 'all' && !visible.includes(found.engine.vesselId)))
      throw new NotFoundError('engine', engineId);
    const reminder = await this.dataSource
      .getRepository(ServiceReminder)
      .findOne({ where: { engineId, kind: 'first-service' } });
    return {
      ...found,
      workings: serviceWorkings(found),
      reason: found.firstService
        ? null
        : 'The hour meter and date at commissioning are not recorded for this engine, so the first service cannot be worked out.',
      reminder: reminder
        ? {
            state: reminder.state,
            sentAt: reminder.sentAt.toISOString(),
            recipients: user.role === 'skipper' ? [] : reminder.recipients,
          }
        : null,
    };
  }

  /** The first service as a calendar file (409 when it is done or has no date). */
  async calendarFile(user: SessionUser, engineId: string): Promise<CalendarFile> {
    return firstServiceIcs(user, await this.forEngine(user, engineId), this.clock.now());
  }

  /** The same for the engine of a run: what the skipper's run page shows. */
  async forRun(user: SessionUser, runId: string): Promise<EngineServiceView> {
    const run = await visibleRun(this.dataSource, user, runId);
    return this.forEngine(user, run.engineId);
  }
}
