import type { EntityManager } from 'typeorm';

/** The better-sqlite3 statements this module needs (typed narrowly: the driver exposes `any`). */
type Statement = {
  run: (...params: unknown[]) => { changes: number };
  get: (...params: unknown[]) => unknown;
};
type NativeDatabase = { prepare: (sql: string) => Statement };

export type EventRowValues = [
  id: string,
  runId: string,
  workshopId: string,
  engineId: string,
  kind: string,
  at: number,
  receivedAt: number,
  authorId: string,
  phaseId: string | null,
  rpm: number | null,
  throttle: string | null,
  body: string,
  seq: number,
];

const INSERT_SQL =
  'INSERT OR IGNORE INTO "run_event" ("id", "runId", "workshopId", "engineId", "kind", "at", "receivedAt", "authorId", "phaseId", "rpm", "throttle", "body", "seq") VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)';
const EXISTS_SQL = 'SELECT 1 FROM "run_event" WHERE "id" = ?';

const cache = new WeakMap<NativeDatabase, { insert: Statement; exists: Statement }>();

/**
 * Prepared statements on the connection TypeORM already holds, used inside TypeORM's own
 * transaction (better-sqlite3 has one connection, so they share it). Sync writes thousands of
 * rows a minute; one prepared single-row statement per row runs at the speed of SQLite itself,
 * where TypeORM's query path costs several times that (bench/sync.bench.ts).
 */
export function eventStore(manager: EntityManager) {
  const native = manager.connection.driver as unknown as { databaseConnection: NativeDatabase };
  const db = native.databaseConnection;
  let statements = cache.get(db);
  if (!statements) {
    statements = { insert: db.prepare(INSERT_SQL), exists: db.prepare(EXISTS_SQL) };
    cache.set(db, statements);
  }
  const { insert, exists } = statements;
  return {
    exists: (id: string): boolean => exists.get(id) !== undefined,
    /** True when the row is new; false when a row with this id was already there. */
    insert: (values: EventRowValues): boolean => insert.run(...values).changes === 1,
  };
}
