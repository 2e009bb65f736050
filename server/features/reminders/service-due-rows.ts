import {
  engineHoursNow,
  firstServiceView,
  type EngineHours,
} from '../../../shared/review/first-service.js';
import {
  FIRST_SERVICE_DEFAULT,
  REGULAR_SERVICE_DEFAULT,
  type ServiceInterval,
} from '../../../shared/service/service.schema.js';
import type {
  EngineServiceView,
  NextServiceView,
  ServiceRecordView,
} from '../../../shared/service/service-views.js';

/** An engine's service due as the reminder job and the engine page read it. */
export type EngineServiceDue = Pick<
  EngineServiceView,
  | 'engine'
  | 'commissioning'
  | 'interval'
  | 'intervalFrom'
  | 'firstService'
  | 'firstServiceDone'
  | 'nextService'
>;

export type EngineSqlRow = {
  id: string;
  vesselId: string;
  vesselName: string;
  position: string;
  maker: string;
  model: string;
  serialNumber: string;
  hourMeterAtCommissioning: number | null;
  commissionedOn: string | null;
  programName: string | null;
  serviceHours: number | null;
  serviceMonths: number | null;
  sessionMs: number | null;
  hourMeter: number | null;
  doneId: string | null;
  doneOn: string | null;
  doneHourMeter: number | null;
  doneBy: string | null;
  doneNotes: string | null;
  doneRecordedAt: string | null;
  doneRecordedById: string | null;
  doneRecordedByName: string | null;
};

// The interval comes from the engine's newest run (its frozen program); hours from every run's
// summary; the first service done, when recorded, from service_record.
export const ENGINES_SQL = `
SELECT e."id", e."vesselId", v."name" AS "vesselName", e."position", e."maker", e."model", e."serialNumber", e."hourMeterAtCommissioning", e."commissionedOn",
  (SELECT json_extract(r."program", '$.name') FROM "run" r WHERE r."engineId" = e."id" ORDER BY r."createdAt" DESC LIMIT 1) AS "programName",
  (SELECT json_extract(r."program", '$.firstService.hours') FROM "run" r WHERE r."engineId" = e."id" ORDER BY r."createdAt" DESC LIMIT 1) AS "serviceHours",
  (SELECT json_extract(r."program", '$.firstService.months') FROM "run" r WHERE r."engineId" = e."id" ORDER BY r."createdAt" DESC LIMIT 1) AS "serviceMonths",
  (SELECT SUM(s."sessionMs") FROM "run_summary" s JOIN "run" r ON r."id" = s."runId" WHERE r."engineId" = e."id") AS "sessionMs",
  (SELECT s."hourMeter" FROM "run_summary" s JOIN "run" r ON r."id" = s."runId" WHERE r."engineId" = e."id" AND s."hourMeter" IS NOT NULL ORDER BY s."hourMeterAt" DESC LIMIT 1) AS "hourMeter",
  sr."id" AS "doneId", sr."doneOn", sr."hourMeter" AS "doneHourMeter", sr."doneBy", sr."notes" AS "doneNotes", sr."recordedAt" AS "doneRecordedAt",
  sr."recordedById" AS "doneRecordedById", sr."recordedByName" AS "doneRecordedByName"
  FROM "engine" e JOIN "vessel" v ON v."id" = e."vesselId"
  LEFT JOIN "service_record" sr ON sr."engineId" = e."id" AND sr."kind" = 'first'
 WHERE e."workshopId" = ? AND e."archivedAt" IS NULL AND v."archivedAt" IS NULL`;

function intervalOf(row: EngineSqlRow): ServiceInterval {
  if (row.serviceHours === null && row.serviceMonths === null) return FIRST_SERVICE_DEFAULT;
  return {
    ...(row.serviceHours !== null ? { hours: row.serviceHours } : {}),
    ...(row.serviceMonths !== null ? { months: row.serviceMonths } : {}),
  };
}

/** SQLite keeps TypeORM datetimes as UTC text, "2026-12-01 09:00:00.000". */
const sqlDateIso = (text: string) => new Date(`${text.replace(' ', 'T')}Z`).toISOString();

function doneOf(row: EngineSqlRow): ServiceRecordView | null {
  if (row.doneId === null) return null;
  return {
    id: row.doneId,
    date: row.doneOn!,
    hourMeter: row.doneHourMeter!,
    doneBy: row.doneBy!,
    notes: row.doneNotes ?? '',
    recordedAt: sqlDateIso(row.doneRecordedAt!),
    recordedBy: { id: row.doneRecordedById!, name: row.doneRecordedByName! },
  };
}

/**
 * The next service, counted from the first (REGULAR_SERVICE_DEFAULT). Hour meters only go up, so
 * the hours now are the larger of the meter read at the service and what the runs give.
 */
function nextServiceOf(done: ServiceRecordView, runHours: EngineHours, today: string) {
  const fromService = done.hourMeter >= runHours.hours;
  const hours: EngineHours = fromService ? { hours: done.hourMeter, source: 'logged' } : runHours;
  const interval = REGULAR_SERVICE_DEFAULT;
  const status = firstServiceView(
    { hourMeter: done.hourMeter, date: done.date },
    interval,
    hours,
    today,
  );
  return { ...status, interval, hoursFromService: fromService } satisfies NextServiceView;
}

export function toServiceDue(row: EngineSqlRow, today: string): EngineServiceDue {
  const { id, vesselId, vesselName, position, maker, model, serialNumber } = row;
  const interval = intervalOf(row);
  const commissioning =
    row.hourMeterAtCommissioning !== null && row.commissionedOn !== null
      ? { hourMeter: row.hourMeterAtCommissioning, date: row.commissionedOn }
      : null;
  const runHours = engineHoursNow(
    row.hourMeterAtCommissioning ?? 0,
    row.hourMeter === null ? null : { hourMeter: row.hourMeter },
    row.sessionMs ?? 0,
  );
  const done = doneOf(row);
  return {
    engine: { id, vesselId, vesselName, position, maker, model, serialNumber },
    commissioning,
    interval,
    intervalFrom: row.programName === null ? null : { programName: row.programName },
    firstService: commissioning && firstServiceView(commissioning, interval, runHours, today),
    firstServiceDone: done,
    nextService: done && nextServiceOf(done, runHours, today),
  };
}
