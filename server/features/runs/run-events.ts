import type { DataSource, EntityManager } from 'typeorm';
import type { RunEvent } from '../../../shared/runs/run-event.schema.js';
import type { ThrottlePosition } from '../../../shared/programs/throttle.js';

type Db = DataSource | EntityManager;
type Statement = { raw: (on: boolean) => Statement; all: (...params: unknown[]) => unknown[] };
type Native = { prepare: (sql: string) => Statement };

/*
 * Events are read with prepared better-sqlite3 statements on the connection TypeORM holds (the
 * same one, so inside a transaction they see its writes), in raw mode: a long run has tens of
 * thousands of readings, and row objects and TypeORM's query path cost more than the reading
 * itself. A reading needs only the columns copied out of its body; the JSON body is parsed only
 * for the few events of other kinds.
 */
const EVENTS_SQL = (n: number) =>
  `SELECT "runId", "id", "kind", "at", "engineId", "phaseId", "rpm", "throttle", "seq", CASE WHEN "kind" = 'reading' THEN NULL ELSE "body" END
     FROM "run_event" WHERE "runId" IN (${Array.from({ length: n }, () => '?').join(', ')})`;

// The hour meter is in a few readings' bodies only; instr() skips the rest before any JSON is parsed.
const METERS_SQL = (n: number) =>
  `SELECT "runId", "at", json_extract("body", '$.hourMeter') FROM "run_event"
    WHERE "runId" IN (${Array.from({ length: n }, () => '?').join(', ')}) AND "kind" = 'reading' AND instr("body", '"hourMeter"') > 0`;

const statements = new WeakMap<Native, Map<string, Statement>>();

function prepared(db: Db, sql: string): Statement {
  const driver = ('connection' in db && db.connection !== undefined
    ? db.connection.driver
    : (db as DataSource).driver) as unknown as { databaseConnection: Native };
  const native = driver.databaseConnection;
  let cache = statements.get(native);
  if (!cache) statements.set(native, (cache = new Map()));
  let statement = cache.get(sql);
  if (!statement) cache.set(sql, (statement = native.prepare(sql).raw(true)));
  return statement;
}

const CHUNK = 400;

type EventRow = [
  string,
  string,
  string,
  number,
  string,
  string | null,
  number | null,
  string | null,
  number,
  string | null,
];

/** Each run's events (any order) and the newest change number among them. */
export async function loadRunEvents(
  db: Db,
  runIds: readonly string[],
): Promise<Map<string, { events: RunEvent[]; maxSeq: number }>> {
  const found = new Map(runIds.map((id) => [id, { events: [] as RunEvent[], maxSeq: 0 }]));
  for (let from = 0; from < runIds.length; from += CHUNK) {
    const chunk = runIds.slice(from, from + CHUNK);
    const rows = prepared(db, EVENTS_SQL(chunk.length)).all(...chunk) as EventRow[];
    for (const [runId, id, kind, at, engineId, phaseId, rpm, throttle, seq, body] of rows) {
      const entry = found.get(runId)!;
      entry.events.push(
        kind === 'reading'
          ? {
              kind: 'reading',
              id,
              at,
              engineId,
              phaseId: phaseId ?? '',
              rpm: rpm ?? 0,
              throttle: (throttle ?? 'idle') as ThrottlePosition,
            }
          : (JSON.parse(body ?? '{}') as RunEvent),
      );
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
    for (const [runId, at, hourMeter] of prepared(db, METERS_SQL(chunk.length)).all(
      ...chunk,
    ) as Array<[string, number, number | null]>) {
      if (hourMeter === null) continue;
      const seen = latest.get(runId);
      if (!seen || at > seen.at) latest.set(runId, { hourMeter, at });
    }
  }
  return latest;
}

/** How many events a run has; events are only ever added, so a new count means new events. */
export function countRunEvents(db: Db, runId: string): number {
  const [[count]] = prepared(db, 'SELECT COUNT(*) FROM "run_event" WHERE "runId" = ?').all(
    runId,
  ) as Array<[number]>;
  return count;
}
