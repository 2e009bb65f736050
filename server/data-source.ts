import 'reflect-metadata';
import fs from 'node:fs';
import path from 'node:path';
import { DataSource } from 'typeorm';
import { ENTITIES } from './entities.js';
import { MIGRATIONS } from './migrations/index.js';

/**
 * Set on every connection. NORMAL is the usual pairing with WAL: a commit survives the process
 * dying; only an OS crash or power cut can lose the last commits. The server folds the WAL back
 * into the database file from a worker thread (lib/wal-checkpointer.ts); SQLite's own automatic
 * checkpoint stays as a backstop, raised from 1,000 to 4,000 pages (16 MB) because one sync batch
 * of 2,000 readings writes about 700 pages and at 1,000 every other batch paid for a checkpoint
 * before its answer.
 */
const CONNECTION_PRAGMAS = [
  'busy_timeout = 5000',
  'synchronous = NORMAL',
  'wal_autocheckpoint = 4000',
] as const;

/**
 * One SQLite file through better-sqlite3 (TypeORM 1.x has no driver for the `sqlite3` package).
 * WAL lets readers go on while a sync batch writes; TypeORM turns foreign keys on itself.
 * The schema only ever changes through migrations: `synchronize` stays off.
 */
export function createDataSource(databasePath: string): DataSource {
  if (databasePath !== ':memory:')
    fs.mkdirSync(path.dirname(path.resolve(databasePath)), { recursive: true });
  return new DataSource({
    type: 'better-sqlite3',
    database: databasePath,
    enableWAL: true,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsRun: false,
    synchronize: false,
    logging: false,
    prepareDatabase: (db: { pragma: (sql: string) => unknown }) => {
      for (const pragma of CONNECTION_PRAGMAS) db.pragma(pragma);
    },
  });
}

/** Used by the TypeORM CLI (`npm run db:generate`). */
export default createDataSource(process.env.RINGSEAT_DB ?? path.join('data', 'ringseat.sqlite'));
