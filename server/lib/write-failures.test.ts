import { randomUUID } from 'node:crypto';
import path from 'node:path';
import Database from 'better-sqlite3';
import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { assignRun, readingFor, type RunDetail } from '../../tests/helpers/runs.js';
import {
  DEMO,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../tests/helpers/test-server.js';
import { nativeConnection } from './native-sql.js';

let server: TestServer;
let run: RunDetail;
const T0 = Date.parse('2026-12-01T08:00:00Z');
const deviceId = randomUUID();

beforeAll(async () => {
  server = await startTestServer();
  run = await assignRun(server.app, 'Gannet', 'single');
});
afterAll(() => server.close());

const db = () => nativeConnection(server.dataSource);
/** Caps the file at its present size, as a full disk would: the next page it needs is SQLITE_FULL. */
const fillDisk = () =>
  db().pragma(`max_page_count = ${db().pragma('page_count', { simple: true })}`);
const freeDisk = () => db().pragma('max_page_count = 1073741823');
const batch = (from: number, count: number) =>
  Array.from({ length: count }, (_, i) => {
    const item = readingFor(run, T0 + (from + i) * 1000, 3000);
    return { ...item, event: { ...item.event, note: 'x'.repeat(400) } };
  });
/** Readings committed to the file, read through a connection of its own (what a restart would find). */
function storedOnDisk(): number {
  const file = new Database(path.join(server.dir, 'ringseat.sqlite'), { readonly: true });
  try {
    const row = file.prepare('SELECT COUNT(*) AS n FROM "run_event" WHERE "runId" = ?').get(run.id);
    return (row as { n: number }).n;
  } finally {
    file.close();
  }
}

describe('when writes fail', () => {
  it('answers a push on a full disk as a failure, says so on health, and recovers once space is back', async () => {
    const skipper = await signedInAgent(server.app, DEMO.skipperA);
    const push = (items: unknown[]) =>
      skipper.post('/api/sync/push').send({ deviceId, sentAt: T0, items });
    expect((await push(batch(0, 1))).status).toBe(200);
    fillDisk();
    const refused = await push(batch(1, 300));
    expect(refused.status).toBe(503);
    expect(refused.body.type).toBe('/problems/storage-failing');
    const health = await supertest(server.app).get('/api/health');
    expect(health.status).toBe(503);
    expect(health.body.type).toBe('/problems/writes-failing');
    freeDisk();
    const again = await push(batch(1, 300));
    expect(again.body.results.every((r: { status: string }) => r.status === 'stored')).toBe(true);
    expect((await supertest(server.app).get('/api/health')).status).toBe(200);
    expect(storedOnDisk()).toBe(301);
  });

  it('commits later writes after SQLite rolled a transaction back by itself', async () => {
    const before = storedOnDisk();
    // SQLite ends the transaction on its own (as on SQLITE_FULL at commit); TypeORM's ROLLBACK then fails.
    await expect(
      server.dataSource.transaction(async () => {
        db().exec('ROLLBACK');
        throw Object.assign(new Error('disk full'), { code: 'SQLITE_FULL' });
      }),
    ).rejects.toThrow('disk full');
    const skipper = await signedInAgent(server.app, DEMO.skipperA);
    const res = await skipper
      .post('/api/sync/push')
      .send({ deviceId, sentAt: T0, items: batch(400, 3) });
    expect(res.status).toBe(200);
    expect(storedOnDisk()).toBe(before + 3);
  });
});
