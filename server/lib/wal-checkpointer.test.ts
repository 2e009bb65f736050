import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { afterEach, describe, expect, it } from 'vitest';
import { createLogger } from './logger.js';
import { startWalCheckpointer, type WalCheckpointer } from './wal-checkpointer.js';

const dirs: string[] = [];
const running: WalCheckpointer[] = [];
afterEach(async () => {
  await Promise.all(running.splice(0).map((c) => c.stop()));
  for (const dir of dirs.splice(0)) fs.rmSync(dir, { recursive: true, force: true });
});

/** A WAL database whose own connection never checkpoints, so only the worker can move pages. */
function walDatabase() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ringseat-wal-'));
  dirs.push(dir);
  const file = path.join(dir, 'test.sqlite');
  const db = new Database(file);
  db.pragma('journal_mode = WAL');
  db.pragma('wal_autocheckpoint = 0');
  db.exec('CREATE TABLE t (id INTEGER PRIMARY KEY, body TEXT NOT NULL)');
  return { db, file };
}

function fillRows(db: Database.Database, count: number) {
  const insert = db.prepare('INSERT INTO t (body) VALUES (?)');
  db.transaction(() => {
    for (let i = 0; i < count; i++) insert.run('x'.repeat(200));
  })();
}

/** The database file holds every page the writer sees (nothing is left only in the log). */
function fileHoldsEveryPage(db: Database.Database, file: string) {
  const pages = db.pragma('page_count', { simple: true }) as number;
  const pageSize = db.pragma('page_size', { simple: true }) as number;
  return fs.statSync(file).size === pages * pageSize;
}

async function until(check: () => boolean, what: string) {
  for (let i = 0; i < 200; i++) {
    if (check()) return;
    await new Promise((r) => setTimeout(r, 25));
  }
  throw new Error(`gave up waiting: ${what}`);
}

describe('background WAL checkpoints', () => {
  it('copies committed pages from the log into the database file without the writer doing it', async () => {
    const { db, file } = walDatabase();
    fillRows(db, 5000);
    expect(fileHoldsEveryPage(db, file)).toBe(false);
    running.push(await startWalCheckpointer(file, createLogger('silent'), 20));
    await until(() => fileHoldsEveryPage(db, file), 'the database file to take the rows');
    expect(db.prepare('SELECT COUNT(*) AS n FROM t').get()).toEqual({ n: 5000 });
    db.close();
  });

  it('runs a last checkpoint on stop', async () => {
    const { db, file } = walDatabase();
    const checkpointer = await startWalCheckpointer(file, createLogger('silent'), 60_000);
    fillRows(db, 2000);
    fillRows(db, 2000);
    await checkpointer.stop();
    expect(fileHoldsEveryPage(db, file)).toBe(true);
    const reopened = new Database(file, { readonly: true });
    expect(reopened.prepare('SELECT COUNT(*) AS n FROM t').get()).toEqual({ n: 4000 });
    reopened.close();
    db.close();
  });

  it('does nothing for an in-memory database', async () => {
    const checkpointer = await startWalCheckpointer(':memory:', createLogger('silent'));
    await expect(checkpointer.stop()).resolves.toBeUndefined();
  });
});
