import 'reflect-metadata';
import fs from 'node:fs';
import path from 'node:path';
import { DataSource } from 'typeorm';
import { ENTITIES } from './entities.js';
import { MIGRATIONS } from './migrations/index.js';

/**
 * One SQLite file through better-sqlite3 (TypeORM 1.x has no driver for the `sqlite3` package).
 * WAL lets readers go on while a sync batch writes; TypeORM turns foreign keys on itself.
 * The schema only ever changes through migrations: `synchronize` stays off.
 */
export function createDataSource(databasePath: string): DataSource {
  if (databasePath !== ':memory:') fs.mkdirSync(path.dirname(path.resolve(databasePath)), { recursive: true });
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
      db.pragma('busy_timeout = 5000');
      db.pragma('synchronous = NORMAL');
    },
  });
}

/** Used by the TypeORM CLI (`npm run db:generate`). */
export default createDataSource(process.env.RINGSEAT_DB ?? path.join('data', 'ringseat.sqlite'));
