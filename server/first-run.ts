import fs from 'node:fs';
import type { DataSource } from 'typeorm';
import { Workshop } from './features/workshops/workshop.entity.js';
import type { AppConfig } from './lib/config.js';

/*
 * What a starting server checks before it serves. In production a database is never made by
 * itself: a missing or empty file is far more often a wrong path, a lost volume or a restore
 * gone wrong than a first start, and a fresh file would hide that (or, with demo data, let
 * anyone in with the published demo password). The operator creates the first workshop with
 * `npm run db:create-workshop`; development and RINGSEAT_DEMO=demo keep the demo start.
 */

export const CREATE_COMMAND =
  'npm run db:create-workshop -- --workshop "Your workshop" --email manager@example.org';

/** A start refused for a reason the operator can act on; printed without a stack. */
export class StartRefused extends Error {}

export type DatabaseFileState = 'missing' | 'empty' | 'present';

export function databaseFileState(databasePath: string): DatabaseFileState {
  try {
    return fs.statSync(databasePath).size === 0 ? 'empty' : 'present';
  } catch {
    return 'missing';
  }
}

/** Whether this start may make the database and fill it by itself. */
const makesItsOwn = (config: Pick<AppConfig, 'production' | 'demo'>) =>
  !config.production || config.demo === 'demo';

/** Throws, before anything is opened or created, when production finds no database file. */
export function refuseMissingDatabase(
  config: Pick<AppConfig, 'production' | 'demo' | 'databasePath'>,
): void {
  const state = databaseFileState(config.databasePath);
  if (state === 'present' || makesItsOwn(config)) return;
  const found = state === 'missing' ? 'there is no file there' : 'the file there is empty';
  throw new StartRefused(
    `No database at ${config.databasePath}: ${found}. In production Ringseat does not make a new ` +
      'one by itself. Put the right file back there (npm run db:restore), point RINGSEAT_DB at it, ' +
      `or create the first workshop with: ${CREATE_COMMAND}`,
  );
}

/** Throws when production opens a database that holds no workshop, so nobody could sign in. */
export async function refuseEmptyDatabase(
  dataSource: DataSource,
  config: Pick<AppConfig, 'production' | 'demo' | 'databasePath'>,
): Promise<void> {
  if (makesItsOwn(config)) return;
  if ((await dataSource.getRepository(Workshop).count()) > 0) return;
  throw new StartRefused(
    `The database at ${config.databasePath} holds no workshop, so nobody can sign in. ` +
      `Create the first one with: ${CREATE_COMMAND}`,
  );
}
