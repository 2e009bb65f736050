import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { SessionUser } from '../../shared/auth/auth.schema';
import { cachedUser, clearUserData, rememberUser, RingseatDb, type EventRecord } from './db';

let database: RingseatDb;
beforeEach(() => {
  database = new RingseatDb(`db-${crypto.randomUUID()}`);
});
afterEach(async () => {
  await database.delete();
});

const user = (id: string): SessionUser => ({
  id,
  email: `${id}@example.com`,
  name: id,
  role: 'skipper',
  workshopId: 'w1',
  workshopName: 'Test Works',
});

const event = (id: string, sync: EventRecord['sync']): EventRecord => ({
  id,
  runId: 'run-1',
  engineId: 'engine-1',
  at: 1,
  kind: 'session-start',
  origin: 'device',
  sync,
  createdAt: 1,
  event: { kind: 'session-start', id, at: 1, engineId: 'engine-1' },
});

async function fill() {
  await database.vessels.put({ id: 'v1' } as never);
  await database.runs.put({ id: 'run-1' } as never);
  await database.events.bulkPut([event('e-sent', 'synced'), event('e-waiting', 'pending')]);
  await database.outings.put({
    id: 'o1',
    vesselId: 'v1',
    runIds: ['run-1'],
    startedAt: 1,
    pausedAt: null,
    endedAt: null,
    cautionsReadAt: 1,
    createdAt: 1,
  });
  await database.meta.bulkPut([
    { key: 'deviceId', value: 'device-1' },
    { key: 'pullCursor', value: 42 },
  ]);
}

describe('who is signed in on this device', () => {
  it('remembers the user the server confirmed, for opening offline', async () => {
    await rememberUser(user('sunniva'), database);
    expect(await cachedUser(database)).toMatchObject({ id: 'sunniva' });
  });

  it('signing out forgets the copies and the user but keeps what waits to be sent', async () => {
    await rememberUser(user('sunniva'), database);
    await fill();
    await clearUserData(database);
    expect(await cachedUser(database)).toBeNull();
    expect(await database.vessels.count()).toBe(0);
    expect(await database.runs.count()).toBe(0);
    expect((await database.events.toArray()).map((e) => e.id)).toEqual(['e-waiting']);
    expect(await database.meta.get('pullCursor')).toBeUndefined();
    expect((await database.meta.get('deviceId'))?.value).toBe('device-1');
    expect((await database.meta.get('outboxOwner'))?.value).toBe('sunniva');
  });

  it('the same person signing in again finds the waiting readings', async () => {
    await rememberUser(user('sunniva'), database);
    await fill();
    await clearUserData(database);
    await rememberUser(user('sunniva'), database);
    expect(await database.events.get('e-waiting')).toBeDefined();
    expect(await database.meta.get('outboxOwner')).toBeUndefined();
  });

  it("someone else signing in never sees or sends the previous user's records", async () => {
    await rememberUser(user('sunniva'), database);
    await fill();
    await clearUserData(database);
    await rememberUser(user('tomas'), database);
    expect(await database.events.count()).toBe(0);
    expect(await database.outings.count()).toBe(0);
    expect(await cachedUser(database)).toMatchObject({ id: 'tomas' });
    expect((await database.meta.get('deviceId'))?.value).toBe('device-1');
  });
});
