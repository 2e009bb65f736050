import type { DataSource } from 'typeorm';
import { nativeConnection } from './native-sql.js';

/*
 * Keeps TypeORM's one better-sqlite3 query runner in step with SQLite after a failed write.
 * On SQLITE_FULL or an I/O error SQLite may roll the whole transaction back by itself; TypeORM's
 * own ROLLBACK then fails, is swallowed, and the runner believes a transaction is still open, so
 * every later transaction became a savepoint that never committed while requests were answered
 * "stored". Here a failed ROLLBACK with no transaction open on the connection resets the runner,
 * and storage failures are remembered for /api/health until a write commits again (the
 * device retrying its outbox is that write).
 */

export const STORAGE_CODES = /^SQLITE_(FULL|IOERR|READONLY|CANTOPEN|CORRUPT|NOTADB)/;

export type WriteStatus = { failing: false } | { failing: true; since: string; code: string };

type Runner = {
  isTransactionActive: boolean;
  transactionDepth: number;
  query: AsyncFn;
  rollbackTransaction: () => Promise<void>;
  commitTransaction: () => Promise<void>;
};

const statuses = new WeakMap<DataSource, WriteStatus>();

export function writeStatus(dataSource: DataSource): WriteStatus {
  return statuses.get(dataSource) ?? { failing: false };
}

function noteWriteFailure(dataSource: DataSource, error: unknown) {
  const code = (error as { code?: unknown } | null)?.code;
  if (typeof code !== 'string' || !STORAGE_CODES.test(code)) return;
  if (!writeStatus(dataSource).failing)
    statuses.set(dataSource, { failing: true, since: new Date().toISOString(), code });
}

type AsyncFn = (...args: unknown[]) => Promise<unknown>;

/** `fn` with a storage failure it throws remembered before it goes on up. */
function notingFailures(dataSource: DataSource, fn: AsyncFn): AsyncFn {
  return async function (this: unknown, ...args) {
    try {
      return await fn.apply(this, args);
    } catch (error) {
      noteWriteFailure(dataSource, error);
      throw error;
    }
  };
}

export function installWriteRecovery(dataSource: DataSource): void {
  const runner = dataSource.createQueryRunner() as unknown as Runner;
  const connection = nativeConnection(dataSource);
  const { query, rollbackTransaction, commitTransaction } = runner;
  const manager = dataSource.manager as unknown as { transaction: AsyncFn };
  manager.transaction = notingFailures(dataSource, manager.transaction);
  runner.query = notingFailures(dataSource, query);
  runner.commitTransaction = async function () {
    await commitTransaction.call(this);
    if (!this.isTransactionActive) statuses.delete(dataSource);
  };
  runner.rollbackTransaction = async function () {
    try {
      await rollbackTransaction.call(this);
    } catch (error) {
      if (connection.inTransaction) throw error;
      this.isTransactionActive = false;
      this.transactionDepth = 0;
    }
  };
}
