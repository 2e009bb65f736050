import type { DataSource } from 'typeorm';
import { createDataSource } from '../data-source.js';
import { installTransactionLock } from './transaction-lock.js';
import { installWriteRecovery } from './write-status.js';

/** Opens the database file and brings its schema up to date. */
export async function openDatabase(databasePath: string): Promise<DataSource> {
  const dataSource = createDataSource(databasePath);
  await dataSource.initialize();
  installWriteRecovery(dataSource);
  installTransactionLock(dataSource);
  await dataSource.runMigrations({ transaction: 'each' });
  return dataSource;
}

export type MigrationLevel = { applied: number; latest: string | null; pending: boolean };

export async function migrationLevel(dataSource: DataSource): Promise<MigrationLevel> {
  const rows: Array<{ name: string }> = await dataSource.query(
    'SELECT name FROM "migrations" ORDER BY id',
  );
  return {
    applied: rows.length,
    latest: rows.at(-1)?.name ?? null,
    pending: await dataSource.showMigrations(),
  };
}
