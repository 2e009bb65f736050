import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cachedUser, db } from '../../lib/db';
import { problem, stubFetch } from '../../test/fetch-stub';
import { createTestQueryClient, testUser } from '../../test/render';
import { authQueries } from './api';

const sunniva = testUser('skipper', 'Sunniva Okafor');

beforeEach(async () => {
  await Promise.all([db.meta.clear(), db.vessels.clear()]);
});
afterEach(() => {
  vi.unstubAllGlobals();
});

const askMe = () => createTestQueryClient().fetchQuery(authQueries.me());

describe('the session on a device that goes to sea', () => {
  it('keeps the user the server confirmed', async () => {
    stubFetch({ 'GET /api/auth/me': { status: 200, body: { user: sunniva } } });
    expect(await askMe()).toEqual(sunniva);
    expect(await cachedUser()).toEqual(sunniva);
  });

  it('with no network, opens as the user last confirmed on this device', async () => {
    stubFetch({ 'GET /api/auth/me': { status: 200, body: { user: sunniva } } });
    await askMe();
    vi.stubGlobal('fetch', vi.fn().mockRejectedValue(new TypeError('Failed to fetch')));
    expect(await askMe()).toEqual(sunniva);
  });

  it('with no network and nobody confirmed before, says there is no connection', async () => {
    vi.stubGlobal('fetch', vi.fn().mockRejectedValue(new TypeError('Failed to fetch')));
    await expect(askMe()).rejects.toMatchObject({ isNetworkError: true });
  });

  it('a 401 means signed out: the user and their copies leave the device', async () => {
    stubFetch({ 'GET /api/auth/me': { status: 200, body: { user: sunniva } } });
    await askMe();
    await db.vessels.put({ id: 'v1', name: 'Gannet' } as never);
    stubFetch({ 'GET /api/auth/me': problem(401, 'Unauthorized', 'Sign in again.') });
    expect(await askMe()).toBeNull();
    expect(await cachedUser()).toBeNull();
    expect(await db.vessels.count()).toBe(0);
  });
});
