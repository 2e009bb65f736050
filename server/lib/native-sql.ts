import type { Database, Statement } from 'better-sqlite3';
import type { DataSource, EntityManager } from 'typeorm';

/*
 * The one place that reaches past TypeORM to better-sqlite3. The hot paths (sync writes, the
 * review's event read, the board) run prepared statements on the connection TypeORM already
 * holds: better-sqlite3 has a single connection, so inside a TypeORM transaction they see and
 * join its writes. TypeORM's own query path costs several times what SQLite takes for those rows
 * (bench/sync.bench.ts, bench/review.bench.ts). SQL here is always a constant with `?`
 * parameters, never values spliced into text.
 */

export type NativeStatement = Statement<unknown[], unknown>;

/** Where a native statement runs: TypeORM's connection, or a better-sqlite3 one of its own (a worker thread's). */
export type NativeDb = DataSource | EntityManager | Database;

const isDatabase = (db: NativeDb): db is Database =>
  typeof (db as Database).prepare === 'function' && !('driver' in db) && !('connection' in db);

const statements = new WeakMap<Database, Map<string, NativeStatement>>();

/** better-sqlite3's connection under TypeORM (for bulk loads in benchmarks; the app uses nativeStatement). */
export function nativeConnection(db: NativeDb): Database {
  if (isDatabase(db)) return db;
  const dataSource = 'connection' in db && db.connection !== undefined ? db.connection : db;
  return ((dataSource as DataSource).driver as unknown as { databaseConnection: Database })
    .databaseConnection;
}

/**
 * A prepared statement for `sql`, made once per connection and kept. With `raw`, rows come back
 * as arrays in column order instead of objects (less to allocate for long runs).
 */
export function nativeStatement(
  db: NativeDb,
  sql: string,
  options: { raw?: boolean } = {},
): NativeStatement {
  const connection = nativeConnection(db);
  let cache = statements.get(connection);
  if (!cache) statements.set(connection, (cache = new Map()));
  const key = options.raw ? `raw:${sql}` : sql;
  let statement = cache.get(key);
  if (!statement) {
    const prepared = connection.prepare<unknown[], unknown>(sql);
    statement = options.raw ? prepared.raw(true) : prepared;
    cache.set(key, statement);
  }
  return statement;
}

/** `?, ?, ?` for a list of `count` parameters. */
export const placeholders = (count: number): string =>
  Array.from({ length: count }, () => '?').join(', ');
