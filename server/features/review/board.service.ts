import type { DataSource } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import {
  actionGroup,
  compareForAction,
  needsAction,
  type RankedRun,
} from '../../../shared/review/board-order.js';
import { filterRuns } from '../../../shared/review/board-filter.js';
import type { BoardQuery } from '../../../shared/review/review.schema.js';
import {
  calendarDateIn,
  engineHoursNow,
  firstServiceView,
  type FirstServiceView,
} from '../../../shared/review/first-service.js';
import type { BoardFlagCode } from '../../../shared/review/run-words.js';
import type { BoardRow, BoardView } from '../../../shared/review/views.js';
import type { Verdict } from '../../../shared/runs/phase-tally.js';
import { RUN_STATES, type RunState } from '../../../shared/runs/run.schema.js';
import { isoTime } from '../../../shared/runs/event-time.js';
import { CLOCK_SKEW_FLAG_MS } from '../../../shared/sync/sync.schema.js';
import type { Clock } from '../../lib/clock.js';
import { nativeStatement } from '../../lib/native-sql.js';
import { Workshop } from '../workshops/workshop.entity.js';
import type { RunSummaries } from './run-summaries.js';

type BoardSqlRow = {
  id: string;
  state: RunState;
  vesselId: string;
  vesselName: string;
  engineId: string;
  position: string;
  maker: string;
  model: string;
  serialNumber: string;
  hourMeterAtCommissioning: number | null;
  commissionedOn: string | null;
  clockSkewMs: number | null;
  lastEventAt: number | null;
  submittedAt: string | null;
  signedOffAt: string | null;
  createdAt: string;
  programName: string;
  serviceHours: number | null;
  serviceMonths: number | null;
  verdict: string | null;
  progress: number | null;
  breachCount: number | null;
  openPhaseName: string | null;
  sessionMs: number | null;
  hourMeter: number | null;
  firstServiceDoneOn: string | null;
};

// One query for the whole board; the program's name and first-service interval come from the
// summary, so 2,000 frozen programs are never parsed.
const BOARD_SQL = `
SELECT r."id", r."state", r."vesselId", v."name" AS "vesselName", r."engineId", e."position", e."maker", e."model", e."serialNumber",
       e."hourMeterAtCommissioning", e."commissionedOn", r."clockSkewMs", r."lastEventAt", r."submittedAt", r."signedOffAt", r."createdAt",
       s."programName", s."serviceHours", s."serviceMonths", s."verdict", s."progress", s."breachCount", s."openPhaseName", s."sessionMs", s."hourMeter",
       (SELECT sr."doneOn" FROM "service_record" sr WHERE sr."engineId" = r."engineId" AND sr."kind" = 'first') AS "firstServiceDoneOn"
  FROM "run" r JOIN "engine" e ON e."id" = r."engineId" JOIN "vessel" v ON v."id" = r."vesselId" LEFT JOIN "run_summary" s ON s."runId" = r."id"
 WHERE r."workshopId" = ?`;

/** The board's rows in one prepared statement (2,000 rows through TypeORM cost several times more). */
function boardRows(dataSource: DataSource, workshopId: string): BoardSqlRow[] {
  return nativeStatement(dataSource, BOARD_SQL).all(workshopId) as BoardSqlRow[];
}

/** SQLite keeps TypeORM datetimes as UTC text, "2026-12-01 09:00:00.000". */
const sqlDateMs = (text: string | null): number | null =>
  text === null ? null : Date.parse(`${text.replace(' ', 'T')}Z`);

export class BoardService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly summaries: RunSummaries,
    private readonly clock: Clock,
  ) {}

  async board(user: SessionUser, query: BoardQuery): Promise<BoardView> {
    await this.summaries.refresh(user.workshopId);
    const rows = boardRows(this.dataSource, user.workshopId);
    const workshop = await this.dataSource
      .getRepository(Workshop)
      .findOneByOrFail({ id: user.workshopId });
    const today = calendarDateIn(workshop.timezone, this.clock.now());
    const ranked = rows.map((row) => toBoardRow(row, today));
    ranked.sort((a, b) => compareForAction(a.key, b.key));
    const runs = ranked.map((r) => r.run);
    const counts = Object.fromEntries(RUN_STATES.map((s) => [s, 0])) as Record<RunState, number>;
    for (const run of runs) counts[run.state]++;
    const matching = filterRuns(runs, query.show, query.q);
    return {
      today,
      counts,
      actionCount: runs.filter((r) => needsAction(r.group)).length,
      total: runs.length,
      matching: matching.length,
      runs: matching.slice(0, query.limit),
    };
  }
}

/** First service of the run's engine, when commissioning is recorded. */
function serviceOf(row: BoardSqlRow, today: string): FirstServiceView | null {
  if (row.hourMeterAtCommissioning === null || row.commissionedOn === null) return null;
  if (row.serviceHours === null && row.serviceMonths === null) return null;
  const interval = {
    ...(row.serviceHours !== null ? { hours: row.serviceHours } : {}),
    ...(row.serviceMonths !== null ? { months: row.serviceMonths } : {}),
  };
  const hours = engineHoursNow(
    row.hourMeterAtCommissioning,
    row.hourMeter === null ? null : { hourMeter: row.hourMeter },
    row.sessionMs ?? 0,
  );
  return firstServiceView(
    { hourMeter: row.hourMeterAtCommissioning, date: row.commissionedOn },
    interval,
    hours,
    today,
  );
}

/** What the board points out on a run, in the order the flags are shown. */
function flagsOf(row: BoardSqlRow, firstService: FirstServiceView | null): BoardFlagCode[] {
  const flags: BoardFlagCode[] = [];
  // A cancelled run was a mistake: nothing on it asks anything of the workshop.
  if (row.state === 'cancelled') return flags;
  if ((row.breachCount ?? 0) > 0) flags.push('breach');
  if (row.clockSkewMs !== null && Math.abs(row.clockSkewMs) > CLOCK_SKEW_FLAG_MS)
    flags.push('clock-skew');
  // A first service recorded as done ends its flags (and its reminders).
  if (row.firstServiceDoneOn !== null) return flags;
  if (firstService?.state === 'overdue') flags.push('service-overdue');
  if (firstService?.state === 'due-soon') flags.push('service-due-soon');
  return flags;
}

function toBoardRow(row: BoardSqlRow, today: string): { run: BoardRow; key: RankedRun } {
  const submitted = sqlDateMs(row.submittedAt);
  const signedOff = sqlDateMs(row.signedOffAt);
  const lastActivity =
    Math.max(row.lastEventAt ?? 0, submitted ?? 0, signedOff ?? 0, sqlDateMs(row.createdAt) ?? 0) ||
    null;
  const firstService = serviceOf(row, today);
  const flags = flagsOf(row, firstService);
  const run = {
    id: row.id,
    state: row.state,
    vessel: { id: row.vesselId, name: row.vesselName },
    engine: {
      id: row.engineId,
      position: row.position,
      maker: row.maker,
      model: row.model,
      serialNumber: row.serialNumber,
    },
    programName: row.programName,
    progress: row.progress ?? 0,
    verdict: (row.verdict ?? 'incomplete') as Verdict,
    breachCount: row.breachCount ?? 0,
    currentPhaseName: row.openPhaseName,
    lastActivityAt: isoTime(lastActivity),
    flags,
    firstService: firstService && {
      state: firstService.state,
      dueAtHours: firstService.dueAtHours,
      dueOn: firstService.dueOn,
      hoursNow: firstService.hoursNow,
      hoursSource: firstService.hoursSource,
      doneOn: row.firstServiceDoneOn,
    },
  };
  return {
    run: { ...run, group: actionGroup(run) },
    key: { state: row.state, flags, lastActivityMs: lastActivity, submittedAtMs: submitted },
  };
}
