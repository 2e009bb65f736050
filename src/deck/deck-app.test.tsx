import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { db } from '../lib/db';
import { problem, stubFetch } from '../test/fetch-stub';
import { testUser } from '../test/render';
import { clearDevice, store } from '../features/deck/components/deck-test-db';
import { testRun, testVessel, VESSEL_ID } from '../features/deck/test-fixtures';
import { DeckApp } from './deck-app';
import { deckPageFor } from './deck-pages';

const skipper = testUser('skipper', 'Noor Skeg');
const port = testRun('port');

beforeEach(async () => {
  await clearDevice();
  await db.meta.clear();
  window.history.replaceState(null, '', '/deck');
});
afterEach(() => vi.unstubAllGlobals());

describe('the deck app', () => {
  it('opens the vessel list for the signed-in user, with the shared header and Deck marked current', async () => {
    stubFetch({ 'GET /api/auth/me': { status: 200, body: { user: skipper } } });
    await db.runs.put(port);
    await db.vessels.put(testVessel([port]));
    render(<DeckApp />);
    expect(await screen.findByRole('heading', { name: 'On deck' })).toBeInTheDocument();
    expect(screen.getByText(/Noor Skeg/)).toBeInTheDocument();
    const nav = screen.getByRole('navigation', { name: 'Main' });
    expect(
      within(nav)
        .getAllByRole('link')
        .map((l) => l.textContent),
    ).toEqual(['Vessels', 'Deck']);
    expect(within(nav).getByRole('link', { name: 'Deck' })).toHaveAttribute('aria-current', 'page');
  });

  it('moves to a vessel and back within the page (no load), and the browser Back button works', async () => {
    stubFetch({ 'GET /api/auth/me': { status: 200, body: { user: skipper } } });
    await db.runs.put(port);
    await db.vessels.put(testVessel([port]));
    // Past the workshop's dock run, so the skipper has a phase to log and "On deck" is offered.
    await store(port, [{ kind: 'phase-advance', at: Date.now(), phaseId: 'below-half' } as never]);
    const user = userEvent.setup();
    render(<DeckApp />);
    const link = await screen.findByRole('link', { name: /Go on deck with/ });
    const header = screen.getByRole('banner');
    await user.click(link);
    expect(window.location.pathname).toBe(`/deck/${VESSEL_ID}`);
    expect(await screen.findByRole('region', { name: 'Port' })).toBeInTheDocument();
    window.history.back();
    expect(await screen.findByRole('heading', { name: 'On deck' })).toBeInTheDocument();
    // The same header element throughout: the page was never loaded again.
    expect(screen.getByRole('banner')).toBe(header);
  });

  it('opens at sea with no network from the user this device last saw signed in', async () => {
    // First visit online: the server confirms the user, the device remembers them.
    stubFetch({ 'GET /api/auth/me': { status: 200, body: { user: skipper } } });
    const first = render(<DeckApp />);
    expect(await screen.findByRole('heading', { name: 'On deck' })).toBeInTheDocument();
    first.unmount();
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => {
        throw new TypeError('Failed to fetch');
      }),
    );
    render(<DeckApp />);
    expect(await screen.findByRole('heading', { name: 'On deck' })).toBeInTheDocument();
    expect(screen.getByText(/Noor Skeg/)).toBeInTheDocument();
  });

  it('says what is wrong when the server fails and nobody is remembered on the device', async () => {
    stubFetch({
      'GET /api/auth/me': problem(503, 'Service unavailable', 'The database is being moved.'),
    });
    render(<DeckApp />);
    expect(await screen.findByRole('alert')).toHaveTextContent('The server could not answer');
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});

describe('deck addresses', () => {
  it('knows its two pages and nothing else', () => {
    expect(deckPageFor('/deck')).toEqual({ page: 'home' });
    expect(deckPageFor('/deck/')).toEqual({ page: 'home' });
    expect(deckPageFor('/deck/abc')).toEqual({ page: 'vessel', vesselId: 'abc' });
    expect(deckPageFor('/deck/abc/more')).toBeNull();
    expect(deckPageFor('/runs')).toBeNull();
  });
});
