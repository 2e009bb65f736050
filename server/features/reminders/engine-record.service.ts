import type { DataSource } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import type { Verdict } from '../../../shared/runs/phase-tally.js';
import type { RunState } from '../../../shared/runs/run.schema.js';
import type { EngineRunRow } from '../../../shared/service/service-views.js';
import type { RunSummaries } from '../review/run-summaries.js';
import { findVisibleEngine } from '../vessels/vessel-access.js';

type RunSqlRow = {
  id: string;
  state: RunState;
  programName: string;
  verdict: Verdict | null;
  progress: number | null;
  createdAt: string;
  submittedAt: string | null;
  signedOffAt: string | null;
  certificateNumber: string | null;
};

// Verdict and progress from the board's summaries, so no run's events are accounted here.
const RUNS_SQL = `
SELECT r."id", r."state", COALESCE(s."programName", json_extract(r."program", '$.name')) AS "programName", s."verdict", s."progress",
       r."createdAt", r."submittedAt", r."signedOffAt", c."number" AS "certificateNumber"
  FROM "run" r LEFT JOIN "run_summary" s ON s."runId" = r."id" LEFT JOIN "certificate" c ON c."runId" = r."id"
 WHERE r."engineId" = ? AND r."workshopId" = ?
 ORDER BY r."createdAt" DESC`;

/** SQLite keeps TypeORM datetimes as UTC text, "2026-12-01 09:00:00.000". */
const iso = (text: string | null) =>
  text === null ? null : new Date(`${text.replace(' ', 'T')}Z`).toISOString();

/** The engine's record on the engine page: every break-in run, newest first. */
export class EngineRecordService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly summaries: RunSummaries,
  ) {}

  async runs(user: SessionUser, engineId: string): Promise<EngineRunRow[]> {
    const engine = await findVisibleEngine(this.dataSource.manager, user, engineId);
    await this.summaries.refresh(user.workshopId);
    const rows: RunSqlRow[] = await this.dataSource.query(RUNS_SQL, [engine.id, user.workshopId]);
    return rows.map((row) => ({
      id: row.id,
      state: row.state,
      programName: row.programName,
      verdict: row.verdict ?? 'incomplete',
      progress: row.progress ?? 0,
      createdAt: iso(row.createdAt)!,
      submittedAt: iso(row.submittedAt),
      signedOffAt: iso(row.signedOffAt),
      certificateNumber: row.certificateNumber,
    }));
  }
}
