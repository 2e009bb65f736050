import type { DataSource, EntityManager } from 'typeorm';
import type { RpmBand } from '../../../shared/programs/phase-band.schema.js';
import type { Program } from '../../../shared/programs/program.schema.js';
import { frozenPhases } from '../../../shared/review/frozen-phases.js';
import { accountRun } from '../../../shared/runs/run-accounting.js';
import type { RunEvent } from '../../../shared/runs/run-event.schema.js';
import { latestHourMeters, loadRunEvents } from '../runs/run-events.js';

const BATCH = 200;

const UPSERT_SUMMARY_SQL = `INSERT INTO "run_summary" ("runId", "workshopId", "eventSeq", "programName", "serviceHours", "serviceMonths", "verdict", "progress", "breachCount", "openPhaseName", "sessionMs", "hourMeter", "hourMeterAt")
         VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)
         ON CONFLICT ("runId") DO UPDATE SET "eventSeq" = excluded."eventSeq", "programName" = excluded."programName", "serviceHours" = excluded."serviceHours",
           "serviceMonths" = excluded."serviceMonths", "verdict" = excluded."verdict", "progress" = excluded."progress",
           "breachCount" = excluded."breachCount", "openPhaseName" = excluded."openPhaseName", "sessionMs" = excluded."sessionMs",
           "hourMeter" = excluded."hourMeter", "hourMeterAt" = excluded."hourMeterAt"`;

type RunRow = {
  id: string;
  workshopId: string;
  engineId: string;
  program: string;
  bands: string;
  rerunFrom: string;
};

/**
 * Keeps run_summary in step with the events. Every event carries a change number handed out in
 * commit order and events are never edited, so "events numbered above the workshop's mark" is
 * exactly what is new since the last refresh; only those runs (and runs never summarised) are
 * accounted again. A return changes how a run counts without any new event, so it deletes the
 * run's summary (forgetSummary) and the next refresh counts the run as never summarised.
 */
export class RunSummaries {
  constructor(private readonly dataSource: DataSource) {}

  private readonly running = new Map<string, Promise<void>>();

  /** Brings the workshop's summaries up to date; refreshes of one workshop run one after another. */
  async refresh(workshopId: string): Promise<void> {
    const previous = this.running.get(workshopId) ?? Promise.resolve();
    const next = previous.catch(() => undefined).then(() => this.refreshNow(workshopId));
    this.running.set(workshopId, next);
    try {
      await next;
    } finally {
      if (this.running.get(workshopId) === next) this.running.delete(workshopId);
    }
  }

  private async refreshNow(workshopId: string): Promise<void> {
    const db = this.dataSource.manager;
    const mark = await this.mark(db, workshopId);
    // Read by the change-number index; usually only a handful of rows are new.
    const newer: Array<{ runId: string; seq: number }> = await db.query(
      'SELECT "runId", "seq" FROM "run_event" WHERE "seq" > ? AND "workshopId" = ? ORDER BY "seq"',
      [mark, workshopId],
    );
    const changed = newer.reduce(
      (latest, e) => latest.set(e.runId, e.seq),
      new Map<string, number>(),
    );
    const missing: Array<{ id: string }> = await db.query(
      'SELECT "r"."id" FROM "run" "r" LEFT JOIN "run_summary" "s" ON "s"."runId" = "r"."id" WHERE "r"."workshopId" = ? AND "s"."runId" IS NULL',
      [workshopId],
    );
    const stale = [...new Set([...changed.keys(), ...missing.map((m) => m.id)])];
    // A batch at a time, each its own transaction, letting other requests in between: the first
    // visit after a large import accounts thousands of runs.
    for (let from = 0; from < stale.length; from += BATCH) {
      await this.dataSource.transaction((manager) =>
        this.summarise(manager, stale.slice(from, from + BATCH)),
      );
      if (from + BATCH < stale.length) await new Promise((resolve) => setImmediate(resolve));
    }
    const newest = Math.max(mark, ...changed.values());
    if (newest > mark) {
      await db.query(
        `INSERT INTO "run_summary_mark" ("workshopId", "eventSeq") VALUES (?, ?)
         ON CONFLICT ("workshopId") DO UPDATE SET "eventSeq" = MAX("eventSeq", excluded."eventSeq")`,
        [workshopId, newest],
      );
    }
  }

  private async mark(manager: EntityManager, workshopId: string): Promise<number> {
    const rows: Array<{ eventSeq: number }> = await manager.query(
      'SELECT "eventSeq" FROM "run_summary_mark" WHERE "workshopId" = ?',
      [workshopId],
    );
    return rows[0]?.eventSeq ?? 0;
  }

  private async summarise(manager: EntityManager, runIds: string[]): Promise<void> {
    const runs: RunRow[] = await manager.query(
      `SELECT "id", "workshopId", "engineId", "program", "bands", "rerunFrom" FROM "run" WHERE "id" IN (${runIds.map(() => '?').join(', ')})`,
      runIds,
    );
    const events = await loadRunEvents(manager, runIds);
    const meters = await latestHourMeters(manager, runIds);
    for (const run of runs) {
      const { events: list, maxSeq } = events.get(run.id)!;
      await manager.query(UPSERT_SUMMARY_SQL, summaryRow(run, list, maxSeq, meters.get(run.id)));
    }
  }
}

/** A run's summary row: its accounting result and first-service figures, with the change number they are from. */
function summaryRow(
  run: RunRow,
  list: RunEvent[],
  maxSeq: number,
  meter: { hourMeter: number; at: number } | undefined,
): unknown[] {
  const program = JSON.parse(run.program) as Program;
  const phases = frozenPhases(
    program,
    JSON.parse(run.bands) as Record<string, RpmBand>,
    JSON.parse(run.rerunFrom) as Record<string, number>,
  );
  const account = accountRun(list, phases, { engineId: run.engineId });
  const open = account.phases.findIndex((p) => p.progressShare < 1);
  return [
    run.id,
    run.workshopId,
    maxSeq,
    program.name,
    program.firstService.hours ?? null,
    program.firstService.months ?? null,
    account.verdict,
    account.overallProgress,
    account.phases.reduce(
      (n, p) => n + p.reasons.filter((r) => r.code !== 'short-of-time').length,
      0,
    ),
    open < 0 ? null : program.phases[open].name,
    account.sessionMs,
    meter?.hourMeter ?? null,
    meter?.at ?? null,
  ];
}

/** Drops a run's summary so the next refresh accounts it afresh (a return changed how it counts). */
export async function forgetSummary(manager: EntityManager, runId: string): Promise<void> {
  await manager.query('DELETE FROM "run_summary" WHERE "runId" = ?', [runId]);
}
