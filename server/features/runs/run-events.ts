import type { RunEvent } from '../../../shared/runs/run-event.schema.js';
import { nativeStatement, type NativeDb, placeholders } from '../../lib/native-sql.js';
import { EVENT_COLUMNS, eventFromRow, type EventColumnsRow } from './run-event-row.js';

type Db = NativeDb;

/*
 * Events are read with prepared statements on TypeORM's own connection (lib/native-sql.ts), in
 * raw mode: a long run has tens of thousands of readings, and row objects and TypeORM's query
 * path cost more than the reading itself. Rows become events through the run_event codec.
 */
const EVENTS_SQL = (n: number) =>
  `SELECT ${EVENT_COLUMNS}, "runId", "seq" FROM "run_event" WHERE "runId" IN (${placeholders(n)})`;

// The hour meter is in a few readings' bodies only; instr() skips the rest before any JSON is parsed.
const METERS_SQL = (n: number) =>
  `SELECT "runId", "at", json_extract("body", '$.hourMeter') FROM "run_event"
    WHERE "runId" IN (${placeholders(n)}) AND "kind" = 'reading' AND instr("body", '"hourMeter"') > 0`;

const COUNT_SQL = 'SELECT COUNT(*) FROM "run_event" WHERE "runId" = ?';

const CHUNK = 400;

type EventRow = [...EventColumnsRow, runId: string, seq: number];

/** Each run's events (any order) and the newest change number among them. */
export async function loadRunEvents(
  db: Db,
  runIds: readonly string[],
): Promise<Map<string, { events: RunEvent[]; maxSeq: number }>> {
  const found = new Map(runIds.map((id) => [id, { events: [] as RunEvent[], maxSeq: 0 }]));
  for (let from = 0; from < runIds.length; from += CHUNK) {
    const chunk = runIds.slice(from, from + CHUNK);
    const rows = nativeStatement(db, EVENTS_SQL(chunk.length), { raw: true }).all(
      ...chunk,
    ) as EventRow[];
    for (const row of rows) {
      const runId = row[8];
      const seq = row[9];
      const entry = found.get(runId)!;
      entry.events.push(eventFromRow(row));
      if (seq > entry.maxSeq) entry.maxSeq = seq;
    }
  }
  return found;
}

/** The newest hour meter logged with a reading, per run. */
export async function latestHourMeters(
  db: Db,
  runIds: readonly string[],
): Promise<Map<string, { hourMeter: number; at: number }>> {
  const latest = new Map<string, { hourMeter: number; at: number }>();
  for (let from = 0; from < runIds.length; from += CHUNK) {
    const chunk = runIds.slice(from, from + CHUNK);
    for (const [runId, at, hourMeter] of nativeStatement(db, METERS_SQL(chunk.length), {
      raw: true,
    }).all(...chunk) as Array<[string, number, number | null]>) {
      if (hourMeter === null) continue;
      const seen = latest.get(runId);
      if (!seen || at > seen.at) latest.set(runId, { hourMeter, at });
    }
  }
  return latest;
}

/** How many events a run has; events are only ever added, so a new count means new events. */
export function countRunEvents(db: Db, runId: string): number {
  const [[count]] = nativeStatement(db, COUNT_SQL, { raw: true }).all(runId) as Array<[number]>;
  return count;
}
