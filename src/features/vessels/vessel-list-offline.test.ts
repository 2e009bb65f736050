import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { db } from '../../lib/db';
import { fetchVesselList } from './api';
import type { VesselView } from '../../../shared/vessels/vessel-view';

const vessel = (name: string): VesselView => ({
  id: `id-${name}`,
  name,
  hin: '',
  type: 'workboat',
  lengthM: 6,
  homePort: 'Kestrel Harbour',
  skippers: [],
  engines: [],
  archivedAt: null,
  updatedAt: '2026-05-12T09:00:00Z',
});

beforeEach(async () => {
  await db.delete();
  await db.open();
});
afterEach(() => vi.unstubAllGlobals());

describe('the vessel list with no network', () => {
  it('falls back to the copy kept on this device, in name order', async () => {
    await db.vessels.bulkPut([vessel('Skua'), vessel('Gannet')]);
    vi.stubGlobal('fetch', vi.fn().mockRejectedValue(new TypeError('Failed to fetch')));
    const { vessels } = await fetchVesselList();
    expect(vessels.map((v) => v.name)).toEqual(['Gannet', 'Skua']);
  });

  it('still reports the lost connection when the device holds no copy', async () => {
    vi.stubGlobal('fetch', vi.fn().mockRejectedValue(new TypeError('Failed to fetch')));
    await expect(fetchVesselList()).rejects.toMatchObject({ isNetworkError: true });
  });

  it('never hides a refusal from the server behind the device copy', async () => {
    await db.vessels.bulkPut([vessel('Gannet')]);
    vi.stubGlobal(
      'fetch',
      vi.fn().mockResolvedValue(
        new Response(
          JSON.stringify({
            type: '/problems/unauthenticated',
            title: 'Not signed in',
            status: 401,
          }),
          { status: 401 },
        ),
      ),
    );
    await expect(fetchVesselList()).rejects.toMatchObject({ status: 401 });
  });
});
