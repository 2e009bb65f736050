import { spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { assignRun, readingFor } from '../../tests/helpers/runs.js';
import { runDatabaseCommand } from '../../tests/helpers/real-server.js';
import {
  DEMO,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../tests/helpers/test-server.js';
import { makePng } from '../features/attachments/test-files.js';
import { storeMissingCertificates } from '../features/signoff/certificate-files.js';
import { CertificateStore } from '../features/signoff/certificate-store.js';
import { filesUnder, sha256Of } from './archive.js';

/* A backup taken while readings arrive, restored into a new folder, compared table by table. */

let server: TestServer;
const dirs: string[] = [];
const freshDir = () => {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ringseat-restored-'));
  dirs.push(dir);
  return dir;
};
beforeAll(async () => {
  server = await startTestServer();
  await storeMissingCertificates(server.dataSource, new CertificateStore(server.dir), new Date());
  const tech = await signedInAgent(server.app, DEMO.technician);
  const engine = (await tech.get('/api/vessels')).body.vessels[0].engines[0].id;
  await tech
    .post('/api/attachments')
    .field('recordType', 'engine')
    .field('recordId', engine)
    .attach('file', makePng(4, 4), 'prop.png');
});
afterAll(async () => {
  await server.close();
  for (const dir of dirs) fs.rmSync(dir, { recursive: true, force: true });
});

function backupWhile(load: () => Promise<unknown>, outDir: string): Promise<string> {
  const child = spawn(
    process.execPath,
    [path.join('node_modules', 'tsx', 'dist', 'cli.mjs'), 'server/cli/backup.ts', '--out', outDir],
    {
      env: {
        ...process.env,
        RINGSEAT_DB: path.join(server.dir, 'ringseat.sqlite'),
        RINGSEAT_DATA_DIR: server.dir,
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    },
  );
  let out = '';
  child.stdout.on('data', (c) => (out += c));
  child.stderr.on('data', (c) => (out += c));
  let running = true;
  const loading = (async () => {
    while (running) {
      await load();
      await new Promise((resolve) => setImmediate(resolve));
    }
  })();
  return new Promise((resolve, reject) =>
    child.once('exit', async (code) => {
      running = false;
      await loading;
      if (code === 0) resolve(out);
      else reject(new Error(out));
    }),
  );
}

const tablesOf = (db: Database.Database) =>
  (
    db.prepare("SELECT name FROM sqlite_master WHERE type = 'table'").all() as Array<{
      name: string;
    }>
  ).map((t) => t.name);
const rowsOf = (db: Database.Database, table: string) =>
  (db.prepare(`SELECT * FROM "${table}"`).all() as object[]).map((r) => JSON.stringify(r)).sort();

describe('backup and restore', () => {
  it('restores a backup taken under load: every table and file as it was at the copy', async () => {
    const run = await assignRun(server.app, 'Gannet', 'single');
    const sunniva = await signedInAgent(server.app, DEMO.skipperA);
    let at = Date.now() - 3_600_000;
    const push = () =>
      sunniva.post('/api/sync/push').send({
        deviceId: '5d1c1a47-3a2f-4c3e-9a43-6f0e5d1c1a47',
        sentAt: Date.now(),
        items: Array.from({ length: 50 }, () => readingFor(run, (at += 1000), 3000)),
      });
    const outDir = freshDir();
    const said = await backupWhile(push, outDir);
    const [archive] = fs.readdirSync(outDir).map((f) => path.join(outDir, f));
    expect(said).toContain('database (');

    const target = freshDir();
    const restored = runDatabaseCommand('server/cli/restore.ts', [archive], target);
    expect(restored.status, restored.stderr).toBe(0);
    const live = new Database(path.join(server.dir, 'ringseat.sqlite'), { readonly: true });
    const copy = new Database(path.join(target, 'ringseat.sqlite'), { readonly: true });
    try {
      expect(tablesOf(copy).sort()).toEqual(tablesOf(live).sort());
      const moving = new Set(['run_event', 'run', 'change_counter']);
      for (const table of tablesOf(live)) {
        const [was, now] = [rowsOf(copy, table), rowsOf(live, table)];
        if (moving.has(table))
          expect(was.every((row) => now.includes(row)) || table !== 'run_event').toBe(true);
        else expect(was, table).toEqual(now);
      }
      expect(rowsOf(copy, 'run_event').length).toBeGreaterThan(0);
    } finally {
      live.close();
      copy.close();
    }
    for (const folder of ['uploads', 'certificates']) {
      const files = filesUnder(path.join(server.dir, folder));
      expect(files.length, folder).toBeGreaterThan(0);
      expect(filesUnder(path.join(target, folder))).toEqual(files);
      for (const f of files)
        expect(sha256Of(path.join(target, folder, f))).toBe(
          sha256Of(path.join(server.dir, folder, f)),
        );
    }
  });

  it('checks an archive before replacing anything, and keeps what was there', async () => {
    const outDir = freshDir();
    await backupWhile(async () => undefined, outDir);
    const [archive] = fs.readdirSync(outDir).map((f) => path.join(outDir, f));
    const target = freshDir();
    fs.writeFileSync(path.join(target, 'ringseat.sqlite'), 'the database in place');
    const refused = runDatabaseCommand('server/cli/restore.ts', [archive], target);
    expect([refused.status, refused.stderr]).toEqual([1, expect.stringContaining('--replace')]);

    const broken = path.join(outDir, 'broken.tar.gz');
    fs.writeFileSync(broken, fs.readFileSync(archive).subarray(0, 2000));
    const bad = runDatabaseCommand('server/cli/restore.ts', [broken, '--replace'], target);
    expect(bad.status).not.toBe(0);
    expect(fs.readFileSync(path.join(target, 'ringseat.sqlite'), 'utf8')).toBe(
      'the database in place',
    );

    const replaced = runDatabaseCommand('server/cli/restore.ts', [archive, '--replace'], target);
    expect(replaced.status, replaced.stderr).toBe(0);
    const aside = fs.readdirSync(target).filter((f) => f.includes('.before-restore-'));
    expect(aside.map((f) => f.split('.before-restore-')[0])).toContain('ringseat.sqlite');
  });
});
