import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { RunView } from '../../../shared/runs/run-view';
import type { VesselView } from '../../../shared/vessels/vessel-view';
import { RUN_ID, runDetail, runOverview } from '../../features/run-page/test-fixtures';
import { stubFetch } from '../../test/fetch-stub';
import { createTestQueryClient, renderRoutes, testUser } from '../../test/render';
import { createRoutes } from '../router';

// The skipper reaches a run's page from their vessels (demo boat and engine).
beforeEach(() => vi.spyOn(window, 'scrollTo').mockImplementation(() => {}));
afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

const run = runDetail();
const at = run.createdAt;
const vessel: VesselView = {
  id: run.vessel.id,
  name: run.vessel.name,
  hin: 'TST00002A626',
  type: 'runabout',
  lengthM: 5.2,
  homePort: 'Test Quay',
  skippers: [],
  engines: [
    {
      ...run.engine,
      vesselId: run.vessel.id,
      position: 'single',
      installation: 'outboard',
      ratedPowerKw: 44,
      fuel: 'petrol',
      cycle: 'four-stroke',
      gearRatio: null,
      propBlades: null,
      propDiameterIn: null,
      propPitchIn: null,
      tachSource: 'none',
      poles: null,
      pulleyRatio: null,
      hourMeterAtCommissioning: 0.5,
      commissionedOn: '2026-05-01',
      createdAt: at,
      updatedAt: at,
    },
  ],
  archivedAt: null,
  updatedAt: at,
};
const { program: _program, bands: _bands, ...listed } = run;
const cancelled: RunView = {
  ...listed,
  id: '66666666-6666-4666-8666-666666666660',
  state: 'cancelled',
};

describe('the run page route', () => {
  it("leads from the skipper's vessel to the engine's run page", async () => {
    stubFetch({
      'GET /api/auth/me': { status: 200, body: { user: testUser('skipper') } },
      'GET /api/vessels': { status: 200, body: { vessels: [vessel] } },
      'GET /api/runs': { status: 200, body: { runs: [cancelled, listed] } },
      [`GET /api/runs/${RUN_ID}`]: { status: 200, body: { run } },
      [`GET /api/runs/${RUN_ID}/review`]: { status: 200, body: runOverview() },
    });
    const { router } = renderRoutes(createRoutes(createTestQueryClient()), { at: '/' });
    const card = (
      await screen.findByRole('heading', { name: 'Little Auk' }, { timeout: 5000 })
    ).closest('section')!;
    const link = await within(card).findByRole('link', { name: 'Run page' });
    expect(link).toHaveAttribute('href', `/runs/${RUN_ID}`);
    await userEvent.setup().click(link);
    // The run page's code loads on arrival (a lazy route): give it time on a busy machine.
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Little Auk' }, { timeout: 5000 }),
    ).toBeInTheDocument();
    expect(router.state.location.pathname).toBe(`/runs/${RUN_ID}`);
    expect(screen.getByText('Under way')).toBeInTheDocument();
  });

  it('takes a skipper who follows a link to an engine (the service reminder) to its newest run', async () => {
    const engine = {
      ...vessel.engines[0],
      latestRun: { id: RUN_ID, state: 'signed-off' as const },
    };
    stubFetch({
      'GET /api/auth/me': { status: 200, body: { user: testUser('skipper') } },
      'GET /api/vessels': { status: 200, body: { vessels: [{ ...vessel, engines: [engine] }] } },
      [`GET /api/runs/${RUN_ID}`]: { status: 200, body: { run } },
      [`GET /api/runs/${RUN_ID}/review`]: { status: 200, body: runOverview() },
    });
    const { router } = renderRoutes(createRoutes(createTestQueryClient()), {
      at: `/engines/${engine.id}`,
    });
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Little Auk' }, { timeout: 5000 }),
    ).toBeInTheDocument();
    expect(router.state.location.pathname).toBe(`/runs/${RUN_ID}`);
  });
});
