import type { DataSource } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import {
  calendarDateIn,
  engineHoursNow,
  firstServiceView,
  type FirstServiceView,
} from '../../../shared/review/first-service.js';
import {
  FIRST_SERVICE_DEFAULT,
  type ServiceInterval,
} from '../../../shared/service/service.schema.js';
import type { Clock } from '../../lib/clock.js';
import { NotFoundError } from '../../lib/errors.js';
import type { RunSummaries } from '../review/run-summaries.js';
import { visibleVesselIds } from '../vessels/vessel-access.js';
import { Workshop } from '../workshops/workshop.entity.js';
import { ServiceReminder } from './service-reminder.entity.js';

type EngineSqlRow = {
  id: string;
  vesselId: string;
  vesselName: string;
  position: string;
  maker: string;
  model: string;
  serialNumber: string;
  hourMeterAtCommissioning: number | null;
  commissionedOn: string | null;
  serviceHours: number | null;
  serviceMonths: number | null;
  sessionMs: number | null;
  hourMeter: number | null;
};

export interface EngineServiceDue {
  engine: {
    id: string;
    vesselId: string;
    vesselName: string;
    position: string;
    maker: string;
    model: string;
    serialNumber: string;
  };
  interval: ServiceInterval;
  /** Null when the engine's commissioning hour meter or date is not recorded. */
  firstService: FirstServiceView | null;
}

// The interval comes from the engine's newest run (its frozen program); hours from every run's summary.
const ENGINES_SQL = `
SELECT e."id", e."vesselId", v."name" AS "vesselName", e."position", e."maker", e."model", e."serialNumber", e."hourMeterAtCommissioning", e."commissionedOn",
  (SELECT json_extract(r."program", '$.firstService.hours') FROM "run" r WHERE r."engineId" = e."id" ORDER BY r."createdAt" DESC LIMIT 1) AS "serviceHours",
  (SELECT json_extract(r."program", '$.firstService.months') FROM "run" r WHERE r."engineId" = e."id" ORDER BY r."createdAt" DESC LIMIT 1) AS "serviceMonths",
  (SELECT SUM(s."sessionMs") FROM "run_summary" s JOIN "run" r ON r."id" = s."runId" WHERE r."engineId" = e."id") AS "sessionMs",
  (SELECT s."hourMeter" FROM "run_summary" s JOIN "run" r ON r."id" = s."runId" WHERE r."engineId" = e."id" AND s."hourMeter" IS NOT NULL ORDER BY s."hourMeterAt" DESC LIMIT 1) AS "hourMeter"
  FROM "engine" e JOIN "vessel" v ON v."id" = e."vesselId"
 WHERE e."workshopId" = ? AND e."archivedAt" IS NULL AND v."archivedAt" IS NULL`;

function intervalOf(row: EngineSqlRow): ServiceInterval {
  if (row.serviceHours === null && row.serviceMonths === null) return FIRST_SERVICE_DEFAULT;
  return {
    ...(row.serviceHours !== null ? { hours: row.serviceHours } : {}),
    ...(row.serviceMonths !== null ? { months: row.serviceMonths } : {}),
  };
}

function toServiceDue(row: EngineSqlRow, today: string): EngineServiceDue {
  const { id, vesselId, vesselName, position, maker, model, serialNumber } = row;
  const interval = intervalOf(row);
  const commissioned = row.hourMeterAtCommissioning !== null && row.commissionedOn !== null;
  const firstService = commissioned
    ? firstServiceView(
        { hourMeter: row.hourMeterAtCommissioning!, date: row.commissionedOn! },
        interval,
        engineHoursNow(
          row.hourMeterAtCommissioning!,
          row.hourMeter === null ? null : { hourMeter: row.hourMeter },
          row.sessionMs ?? 0,
        ),
        today,
      )
    : null;
  return {
    engine: { id, vesselId, vesselName, position, maker, model, serialNumber },
    interval,
    firstService,
  };
}

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

  async forEngine(user: SessionUser, engineId: string) {
    const visible = await visibleVesselIds(this.dataSource.manager, user);
    const found = (await this.forWorkshop(user.workshopId)).find((e) => e.engine.id === engineId);
    if (!found || (visible !== 'all' && !visible.includes(found.engine.vesselId)))
      throw new NotFoundError('engine', engineId);
    const reminder = await this.dataSource
      .getRepository(ServiceReminder)
      .findOne({ where: { engineId, kind: 'first-service' } });
    return {
      ...found,
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
}
