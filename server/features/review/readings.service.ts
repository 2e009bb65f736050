import type { DataSource } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import { csvLine } from '../../../shared/review/csv.js';
import { frozenPhases } from '../../../shared/review/frozen-phases.js';
import {
  READING_CSV_HEADER,
  readingCsvCells,
  readingRow,
  type ReadingRow,
} from '../../../shared/review/readings.js';
import type { ReadingsPage, VoidedMark } from '../../../shared/review/views.js';
import type { Reading } from '../../../shared/runs/run-event.schema.js';
import type { Run } from '../runs/run.entity.js';
import { visibleRun } from '../runs/run-access.js';
import { voidMarks } from '../runs/run-voids.js';

type Row = { body: string; receivedAt: number };

const ORDERED = 'FROM "run_event" WHERE "runId" = ? AND "kind" = \'reading\' ORDER BY "at", "id"';
const CSV_BATCH = 2000;

/** A file name that any system accepts: letters, digits and hyphens. */
const slug = (text: string) =>
  text
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '') || 'run';

export class ReadingsService {
  constructor(private readonly dataSource: DataSource) {}

  private rowsOf(run: Run, rows: Row[], voided: Map<string, VoidedMark>): ReadingRow[] {
    const phases = new Map(
      frozenPhases(run.program, run.bands, run.rerunFrom).map((p) => [p.id, p]),
    );
    return rows.map((r) => {
      const reading = JSON.parse(r.body) as Reading;
      const mark = voided.get(reading.id) ?? null;
      return readingRow(reading, r.receivedAt, phases.get(reading.phaseId), mark);
    });
  }

  /** One page of the run's readings in time order. */
  async page(
    user: SessionUser,
    runId: string,
    offset: number,
    limit: number,
  ): Promise<ReadingsPage> {
    const run = await visibleRun(this.dataSource, user, runId);
    const [{ total }] = await this.dataSource.query(
      'SELECT COUNT(*) AS "total" FROM "run_event" WHERE "runId" = ? AND "kind" = \'reading\'',
      [run.id],
    );
    const rows: Row[] = await this.dataSource.query(
      `SELECT "body", "receivedAt" ${ORDERED} LIMIT ? OFFSET ?`,
      [run.id, limit, offset],
    );
    return {
      total: Number(total),
      offset,
      limit,
      readings: this.rowsOf(run, rows, voidMarks(this.dataSource, run.id)),
    };
  }

  /**
   * Writes every reading as CSV, a batch at a time, so a 36,000-reading run never sits in memory
   * as one string. Each batch is its own query ordered by (at, id); readings are append-only and
   * the run's device may still be logging, so a keyset (after this at and id) keeps batches exact.
   */
  async exportCsv(user: SessionUser, runId: string, write: (chunk: string) => void): Promise<void> {
    const run = await visibleRun(this.dataSource, user, runId);
    write(csvLine(READING_CSV_HEADER));
    const voided = voidMarks(this.dataSource, run.id);
    let after: { at: number; id: string } | null = null;
    for (;;) {
      const rows: Array<Row & { at: number; id: string }> = after
        ? await this.dataSource.query(
            'SELECT "id", "at", "body", "receivedAt" FROM "run_event" WHERE "runId" = ? AND "kind" = \'reading\' AND ("at" > ? OR ("at" = ? AND "id" > ?)) ORDER BY "at", "id" LIMIT ?',
            [run.id, after.at, after.at, after.id, CSV_BATCH],
          )
        : await this.dataSource.query(
            `SELECT "id", "at", "body", "receivedAt" ${ORDERED} LIMIT ?`,
            [run.id, CSV_BATCH],
          );
      if (rows.length === 0) return;
      write(
        this.rowsOf(run, rows, voided)
          .map((r) => csvLine(readingCsvCells(r)))
          .join(''),
      );
      const last = rows[rows.length - 1];
      after = { at: last.at, id: last.id };
      if (rows.length < CSV_BATCH) return;
    }
  }

  async csvFileName(user: SessionUser, runId: string): Promise<string> {
    const run = await visibleRun(this.dataSource, user, runId);
    const engine = run.engine!;
    const vessel = await this.dataSource.query('SELECT "name" FROM "vessel" WHERE "id" = ?', [
      run.vesselId,
    ]);
    return `${slug(vessel[0]?.name ?? 'vessel')}-${slug(engine.position)}-${slug(engine.serialNumber)}-readings.csv`;
  }
}
