import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { openDatabase } from '../lib/database.js';

describe('migrations', () => {
  it('build exactly the schema the entities describe (nothing left for synchronize to do)', async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ringseat-migrations-'));
    const dataSource = await openDatabase(path.join(dir, 'schema.sqlite'));
    try {
      const pending = await dataSource.driver.createSchemaBuilder().log();
      expect(pending.upQueries.map((q) => q.query)).toEqual([]);
      const [{ journal_mode }] = await dataSource.query('PRAGMA journal_mode');
      const [{ foreign_keys }] = await dataSource.query('PRAGMA foreign_keys');
      expect(journal_mode).toBe('wal');
      expect(foreign_keys).toBe(1);
    } finally {
      await dataSource.destroy();
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });

  it('can be run again on an up-to-date database without changing anything', async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ringseat-migrations-'));
    const file = path.join(dir, 'again.sqlite');
    try {
      const first = await openDatabase(file);
      const applied = (await first.query('SELECT COUNT(*) AS n FROM migrations'))[0].n;
      await first.destroy();
      const second = await openDatabase(file);
      expect((await second.query('SELECT COUNT(*) AS n FROM migrations'))[0].n).toBe(applied);
      await second.destroy();
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });
});
