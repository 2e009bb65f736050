import { createHash } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { nativeConnection, nativeStatement } from '../lib/native-sql.js';

/**
 * What a request refused for bad input may legitimately leave behind, and nothing else:
 * - sign_in_failure: a wrong guess at a password, an invite link or a reset link is counted on
 *   purpose (server/features/auth/sign-in-throttle.ts); the count is the throttle doing its job.
 * - session.expiresAt: Lucia extends a session that is past half its life on any request, good
 *   or bad. Which sessions exist is still compared, so a bad request that signs anyone out fails.
 */
const SKIPPED_TABLES = new Set(['sign_in_failure']);
const SKIPPED_COLUMNS: Record<string, string[]> = { session: ['expiresAt'] };

export type Fingerprint = Map<string, { rows: number; hash: string }>;

/** Row count and a hash of every row (in rowid order) of every table but the skipped ones. */
export function fingerprint(dataSource: DataSource): Fingerprint {
  const db = nativeConnection(dataSource);
  const tables = db
    .prepare("SELECT name, sql FROM sqlite_master WHERE type = 'table' ORDER BY name")
    .all() as Array<{ name: string; sql: string }>;
  const result: Fingerprint = new Map();
  for (const { name, sql } of tables) {
    if (SKIPPED_TABLES.has(name)) continue;
    const columns = (db.prepare(`PRAGMA table_info(${quote(name)})`).all() as { name: string }[])
      .map((column) => column.name)
      .filter((column) => !SKIPPED_COLUMNS[name]?.includes(column));
    const order = /WITHOUT ROWID/i.test(sql) ? columns.map(quote).join(', ') : 'rowid';
    // Names come from sqlite_master itself, quoted; no value is ever spliced in.
    const rows = db
      .prepare(`SELECT ${columns.map(quote).join(', ')} FROM ${quote(name)} ORDER BY ${order}`)
      .raw(true)
      .all();
    const hash = createHash('sha256').update(JSON.stringify(rows)).digest('hex');
    result.set(name, { rows: rows.length, hash });
  }
  return result;
}

const quote = (identifier: string) => `"${identifier.replace(/"/g, '""')}"`;

/** The tables whose rows differ between two fingerprints, each with its row counts. */
export function changedTables(before: Fingerprint, after: Fingerprint): string[] {
  const names = new Set([...before.keys(), ...after.keys()]);
  return [...names]
    .filter((name) => before.get(name)?.hash !== after.get(name)?.hash)
    .map(
      (name) =>
        `${name} (${before.get(name)?.rows ?? 'no'} rows -> ${after.get(name)?.rows ?? 'no'})`,
    );
}

/**
 * Rows inserted, updated or deleted on the app's connection since it opened (SQLite's
 * total_changes()): cheap enough to read after every request, so only a request that wrote
 * something pays for a full fingerprint.
 */
export function changeCount(dataSource: DataSource): number {
  return (nativeStatement(dataSource, 'SELECT total_changes() AS n').get() as { n: number }).n;
}
