import { spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openDatabase } from './database.js';

/* Transactions that overlap in time, in one process and across two. */

let dir: string;
let dataSource: DataSource;
const file = () => path.join(dir, 'ringseat.sqlite');
const ids = async () =>
  (
    (await dataSource.query('SELECT "id" FROM "scratch" ORDER BY "id"')) as Array<{ id: string }>
  ).map((r) => r.id);
const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

beforeEach(async () => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ringseat-lock-'));
  dataSource = await openDatabase(file());
  await dataSource.query('CREATE TABLE "scratch" ("id" text PRIMARY KEY, "seen" integer)');
});
afterEach(async () => {
  await dataSource.destroy();
  fs.rmSync(dir, { recursive: true, force: true });
});

describe('in one process', () => {
  it('keeps a transaction that committed while another was open and then failed', async () => {
    const failing = dataSource.transaction(async (manager) => {
      await manager.query('INSERT INTO "scratch" ("id") VALUES (?)', ['a']);
      await pause(30);
      throw new Error('the first one fails after the second has begun');
    });
    await pause(5);
    const committed = dataSource.transaction(async (manager) => {
      await manager.query('INSERT INTO "scratch" ("id") VALUES (?)', ['b']);
    });
    await expect(failing).rejects.toThrow('the first one fails');
    await committed;
    expect(await ids()).toEqual(['b']);
  });

  it('keeps a write made outside any transaction while one was open and then failed', async () => {
    const failing = dataSource.transaction(async (manager) => {
      await manager.query('INSERT INTO "scratch" ("id") VALUES (?)', ['a']);
      await pause(30);
      throw new Error('rolled back');
    });
    await pause(5);
    const single = dataSource.query('INSERT INTO "scratch" ("id") VALUES (?)', ['c']);
    await expect(failing).rejects.toThrow('rolled back');
    await single;
    expect(await ids()).toEqual(['c']);
  });
});

function writer(name: string, count: number): Promise<{ code: number | null; out: string }> {
  const child = spawn(
    process.execPath,
    [
      path.join('node_modules', 'tsx', 'dist', 'cli.mjs'),
      'tests/helpers/concurrent-writer.ts',
      file(),
      name,
      String(count),
    ],
    { stdio: ['ignore', 'pipe', 'pipe'] },
  );
  let out = '';
  child.stdout.on('data', (chunk) => (out += chunk));
  child.stderr.on('data', (chunk) => (out += chunk));
  return new Promise((resolve) => child.once('exit', (code) => resolve({ code, out })));
}

describe('two processes on one file', () => {
  it('commits every read-then-write transaction of both, none refused as locked', async () => {
    const results = await Promise.all([writer('one', 30), writer('two', 30)]);
    for (const { code, out } of results) {
      expect(out).not.toContain('database is locked');
      expect([code, out.trim().split('\n').at(-1)]).toEqual([0, '{"failed":0}']);
    }
    expect(await ids()).toHaveLength(60);
  });
});
