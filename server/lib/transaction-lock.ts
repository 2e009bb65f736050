import { AsyncLocalStorage } from 'node:async_hooks';
import type { DataSource } from 'typeorm';

/*
 * better-sqlite3 gives TypeORM one connection and one query runner for the whole process. Two
 * transactions that overlap in time (each awaits between its statements) used to share it: the
 * second became a savepoint inside the first, so its "commit" only released the savepoint and a
 * rollback of the first then took back writes already answered as stored. Here every
 * transaction started through `dataSource.transaction` waits its turn, and a write outside any
 * transaction waits for the open one to end instead of joining it. Reads go straight through.
 *
 * Transactions begin IMMEDIATE: the write lock is taken at BEGIN, where SQLite's busy timeout
 * waits for another process's writer, instead of at the first write inside the transaction,
 * where a read-then-write transaction fails at once with "database is locked". One database
 * file is still meant to be served by one process (README).
 */

type AsyncFn = (...args: unknown[]) => Promise<unknown>;

class TurnQueue {
  private tail: Promise<unknown> = Promise.resolve();
  private waiting = 0;

  get busy(): boolean {
    return this.waiting > 0;
  }

  run<T>(fn: () => Promise<T>): Promise<T> {
    this.waiting++;
    const result = this.tail.then(fn).finally(() => this.waiting--);
    this.tail = result.catch(() => undefined);
    return result;
  }
}

const READ = /^\s*(SELECT|PRAGMA|EXPLAIN|WITH\s[\s\S]*\bSELECT\b)/i;

export function installTransactionLock(dataSource: DataSource): void {
  const turns = new TurnQueue();
  const inTransaction = new AsyncLocalStorage<true>();
  const manager = dataSource.manager as unknown as { transaction: AsyncFn };
  const transaction = manager.transaction;
  manager.transaction = function (this: unknown, ...args) {
    if (inTransaction.getStore()) return transaction.apply(this, args);
    return turns.run(() => inTransaction.run(true, () => transaction.apply(this, args)));
  };
  const runner = dataSource.createQueryRunner() as unknown as { query: AsyncFn };
  const query = runner.query;
  runner.query = function (this: unknown, ...args) {
    if (args[0] === 'BEGIN TRANSACTION') args[0] = 'BEGIN IMMEDIATE TRANSACTION';
    const sql = typeof args[0] === 'string' ? args[0] : '';
    if (inTransaction.getStore() || !turns.busy || READ.test(sql)) return query.apply(this, args);
    return turns.run(() => query.apply(this, args));
  };
}
