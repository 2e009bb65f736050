import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { problem, stubFetch } from '../../test/fetch-stub';
import { renderRoutes, testUser } from '../../test/render';
import { AcceptInviteRoute } from './accept-invite';

afterEach(() => {
  vi.unstubAllGlobals();
});

const token = 'tok_0123456789abcdefghij';
const preview = {
  email: 'ada@example.com',
  role: 'skipper',
  workshopName: 'Quayside Marine Works',
  expiresAt: '2026-06-01T12:00:00Z',
};

const renderInvite = () =>
  renderRoutes(
    [
      { path: '/invite/:token', element: <AcceptInviteRoute /> },
      { path: '/', element: <h1>Home page</h1> },
      { path: '/sign-in', element: <h1>Sign-in page</h1> },
    ],
    { at: `/invite/${token}` },
  );

describe('accept invite page', () => {
  it('names the workshop and role, checks the password length, then signs in', async () => {
    const { calls } = stubFetch({
      [`GET /api/invites/${token}`]: { status: 200, body: preview },
      'POST /api/auth/accept-invite': { status: 201, body: { user: testUser('skipper') } },
    });
    const user = userEvent.setup();
    renderInvite();

    expect(await screen.findByText('Quayside Marine Works')).toBeInTheDocument();
    expect(screen.getByText('skipper')).toBeInTheDocument();

    await user.type(screen.getByLabelText('Your name'), 'Ada Harbour');
    await user.type(screen.getByLabelText('Password'), 'short');
    await user.click(screen.getByRole('button', { name: 'Set password and sign in' }));
    expect(
      await screen.findByText('Use at least 10 characters for the password.'),
    ).toBeInTheDocument();
    expect(calls.some((c) => c.method === 'POST')).toBe(false);

    await user.clear(screen.getByLabelText('Password'));
    await user.type(screen.getByLabelText('Password'), 'tide turns at noon');
    await user.click(screen.getByRole('button', { name: 'Set password and sign in' }));

    expect(await screen.findByRole('heading', { name: 'Home page' })).toBeInTheDocument();
    expect(calls.at(-1)).toEqual({
      method: 'POST',
      path: '/api/auth/accept-invite',
      body: { token, name: 'Ada Harbour', password: 'tide turns at noon' },
    });
  });

  it('explains an expired, used or withdrawn link in the server’s words', async () => {
    stubFetch({
      [`GET /api/invites/${token}`]: problem(410, 'Gone', 'This invite was already used.'),
    });
    renderInvite();
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('This invite link no longer works');
    expect(alert).toHaveTextContent('This invite was already used.');
    expect(screen.queryByLabelText('Your name')).not.toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Go to sign in' })).toHaveAttribute('href', '/sign-in');
  });

  it('explains an unknown link', async () => {
    stubFetch({ [`GET /api/invites/${token}`]: problem(404, 'Not Found', 'No such invite.') });
    renderInvite();
    expect(await screen.findByRole('alert')).toHaveTextContent('This invite link is not valid');
  });
});
