import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { Role } from '../../../shared/auth/auth.schema';
import { stubFetch } from '../../test/fetch-stub';
import { renderRoutes, testUser } from '../../test/render';
import { AppHeader } from './app-header';

afterEach(() => {
  vi.unstubAllGlobals();
  localStorage.clear();
  document.documentElement.dataset.theme = 'system';
});

function renderHeader(role: Role) {
  const user = testUser(role, 'Noor Skeg');
  return renderRoutes([
    { path: '/', element: <AppHeader user={user} /> },
    { path: '/sign-in', element: <h1>Sign-in page</h1> },
  ]);
}

const navLinkNames = () =>
  screen
    .getAllByRole('link')
    .filter((link) => link.closest('nav'))
    .map((link) => link.textContent);

describe('AppHeader', () => {
  it('shows a manager Workshop and Team', () => {
    renderHeader('manager');
    expect(navLinkNames()).toEqual(['Workshop', 'Vessels', 'Runs', 'Programs', 'Deck', 'Team']);
    expect(screen.getByRole('link', { name: 'Team' })).toHaveAttribute('href', '/team');
  });

  it('shows a technician the workshop but not the team', () => {
    renderHeader('technician');
    expect(navLinkNames()).toEqual(['Workshop', 'Vessels', 'Runs', 'Programs', 'Deck']);
    expect(screen.queryByRole('link', { name: 'Team' })).not.toBeInTheDocument();
  });

  it('shows a skipper their vessels and the deck only', () => {
    renderHeader('skipper');
    expect(navLinkNames()).toEqual(['Vessels', 'Deck']);
    expect(screen.queryByRole('link', { name: 'Team' })).not.toBeInTheDocument();
  });

  it('names the workshop and the user, and marks the current page', () => {
    renderHeader('technician');
    expect(screen.getByText('Quayside Marine Works')).toBeInTheDocument();
    expect(screen.getByText(/Noor Skeg/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Workshop' })).toHaveAttribute('aria-current', 'page');
  });

  it('signs out and goes to the sign-in page', async () => {
    const { calls } = stubFetch({ 'POST /api/auth/sign-out': { status: 204 } });
    renderHeader('skipper');

    await userEvent.click(screen.getByRole('button', { name: 'Sign out' }));

    expect(await screen.findByRole('heading', { name: 'Sign-in page' })).toBeInTheDocument();
    expect(calls).toEqual([{ method: 'POST', path: '/api/auth/sign-out', body: undefined }]);
  });

  it('switches to night mode and keeps the choice on the device', async () => {
    const user = userEvent.setup();
    renderHeader('skipper');

    const toggle = screen.getByRole('button', { name: 'Display mode' });
    await user.click(toggle);
    await user.click(screen.getByRole('button', { name: 'Night' }));

    expect(document.documentElement).toHaveAttribute('data-theme', 'night');
    expect(localStorage.getItem('ringseat.display-mode')).toBe('night');
    expect(toggle).toHaveAttribute('aria-expanded', 'false');
    expect(toggle).toHaveFocus();

    await user.click(toggle);
    expect(screen.getByRole('button', { name: 'Night' })).toHaveAttribute('aria-pressed', 'true');
    await user.keyboard('{Escape}');
    expect(screen.queryByRole('button', { name: 'Night' })).not.toBeInTheDocument();
  });
});
