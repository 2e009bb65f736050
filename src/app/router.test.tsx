import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { SessionUser } from '../../shared/auth/auth.schema';
import { problem, stubFetch } from '../test/fetch-stub';
import { createTestQueryClient, renderRoutes, testUser } from '../test/render';
import type { VesselView } from '../../shared/vessels/vessel-view';
import { createRoutes } from './router';

beforeEach(() => {
  // ScrollRestoration scrolls on navigation; jsdom has no layout to scroll.
  vi.spyOn(window, 'scrollTo').mockImplementation(() => {});
});

afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

const vessel: VesselView = {
  id: 'vessel-1',
  name: 'Kittiwake',
  hin: 'QMW12345A626',
  type: 'runabout',
  lengthM: 6.4,
  homePort: 'Port Ellen',
  skippers: [{ id: 'user-skipper', name: 'Ada Harbour' }],
  engines: [
    {
      id: 'engine-1',
      vesselId: 'vessel-1',
      position: 'single',
      installation: 'outboard',
      maker: 'Acme',
      model: 'F115',
      serialNumber: 'SN-0042',
      ratedPowerKw: 85,
      fuel: 'petrol',
      cycle: 'four-stroke',
      ratedRpmMin: 5000,
      ratedRpmMax: 6000,
      gearRatio: null,
      propBlades: null,
      propDiameterIn: null,
      propPitchIn: null,
      tachSource: 'none',
      poles: null,
      pulleyRatio: null,
      hourMeterAtCommissioning: 0.4,
      commissionedOn: '2026-05-12',
      createdAt: '2026-05-12T09:00:00Z',
      updatedAt: '2026-05-12T09:00:00Z',
    },
  ],
  archivedAt: null,
  updatedAt: '2026-05-12T09:00:00Z',
};

function renderApp(
  at: string,
  me: SessionUser | null,
  extra: Parameters<typeof stubFetch>[0] = {},
) {
  const fetch = stubFetch({
    'GET /api/auth/me': me
      ? { status: 200, body: { user: me } }
      : problem(401, 'Unauthorized', 'Sign in first.'),
    'GET /api/vessels': { status: 200, body: { vessels: [vessel] } },
    ...extra,
  });
  const queryClient = createTestQueryClient();
  return { ...renderRoutes(createRoutes(queryClient), { at, queryClient }), ...fetch };
}

describe('app routes', () => {
  it('sends a visitor who is not signed in to the sign-in page', async () => {
    const { router } = renderApp('/', null);
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Sign in to Ringseat' }),
    ).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
  });

  it('returns to the page asked for after signing in', async () => {
    const manager = testUser('manager');
    const { router } = renderApp('/team', null, {
      'POST /api/auth/sign-in': { status: 200, body: { user: manager } },
      'GET /api/users': {
        status: 200,
        body: { users: [{ ...manager, createdAt: '2026-01-05T10:00:00Z' }], invites: [] },
      },
      'GET /api/mail/outgoing': { status: 200, body: { mail: [] } },
    });
    const user = userEvent.setup();

    await screen.findByRole('heading', { name: 'Sign in to Ringseat' });
    expect(router.state.location.search).toBe('?next=%2Fteam');
    await user.type(screen.getByLabelText('E-mail'), manager.email);
    await user.type(screen.getByLabelText('Password'), 'correct horse battery');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Team' })).toBeInTheDocument();
    expect(await screen.findByText('No invites are waiting.')).toBeInTheDocument();
    expect(await screen.findByText('No e-mail has gone out yet.')).toBeInTheDocument();
  });

  it('shows a skipper their vessels, engines and the running caution', async () => {
    renderApp('/', testUser('skipper'));

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Your vessels' }),
    ).toBeInTheDocument();
    const card = (await screen.findByRole('heading', { name: 'Kittiwake' })).closest('section')!;
    expect(within(card).getByText('5000–6000 RPM')).toHaveClass('figures');
    expect(within(card).getByText('SN-0042')).toBeInTheDocument();
    expect(within(card).getByRole('heading', { name: 'Single · Acme F115' })).toBeInTheDocument();
    const caution = screen.getByRole('note', { name: /caution/i });
    expect(caution).toHaveTextContent(/kill-switch lanyard/i);
    expect(caution).toHaveTextContent(/carbon monoxide/i);
    expect(caution).toHaveTextContent(
      /maker’s manual, local rules and your licensed technician come first/i,
    );
  });

  it('gives workshop staff the workshop overview', async () => {
    renderApp('/', testUser('technician'));
    expect(await screen.findByRole('heading', { level: 1, name: 'Workshop' })).toBeInTheDocument();
    expect(
      await screen.findByRole('table', { name: 'Vessels and engines of the workshop' }),
    ).toBeInTheDocument();
  });

  it('tells a technician that Team is for managers', async () => {
    renderApp('/team', testUser('technician'));
    expect(await screen.findByText(/Only the workshop’s managers/)).toBeInTheDocument();
  });

  it('answers an unknown address with a page inside the app and a way back', async () => {
    renderApp('/harbour/nowhere', testUser('skipper'));
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Page not found' }),
    ).toBeInTheDocument();
    expect(screen.getByText('/harbour/nowhere')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Go to your vessels' })).toHaveAttribute('href', '/');
    expect(screen.getByRole('button', { name: 'Sign out' })).toBeInTheDocument();
  });

  it('shows an error with a way back when the session check fails', async () => {
    renderApp('/', null, {
      'GET /api/auth/me': problem(500, 'Internal Server Error', 'The database is not answering.'),
    });
    expect(
      await screen.findByRole('heading', { name: 'The server could not answer' }),
    ).toBeInTheDocument();
    expect(screen.getByText('The database is not answering.')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Back to the start' })).toBeInTheDocument();
  });

  it('goes to sign-in when a request finds the session has expired', async () => {
    const { router } = renderApp('/', testUser('skipper'), {
      'GET /api/vessels': problem(401, 'Unauthorized', 'Sign in again.'),
    });
    expect(await screen.findByRole('heading', { name: 'Sign in to Ringseat' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
  });
});
