import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { problem, stubFetch } from '../../../test/fetch-stub';
import { renderPage } from '../../../test/render';
import { InviteForm } from './invite-form';

afterEach(() => {
  vi.unstubAllGlobals();
});

const vesselId = '3f2b8c1e-2d4a-4c6b-9e8f-1a2b3c4d5e6f';

describe('InviteForm', () => {
  it('sends the invite and shows the link to pass on', async () => {
    const { calls } = stubFetch({
      'POST /api/invites': {
        status: 201,
        body: {
          invite: {
            id: 'inv-1',
            email: 'crew@example.com',
            role: 'skipper',
            expiresAt: '2026-06-01T12:00:00Z',
          },
          link: '/invite/tok_0123456789abcdefghij',
        },
      },
      'GET /api/users': { status: 200, body: { users: [], invites: [] } },
    });
    const user = userEvent.setup();
    renderPage(<InviteForm vessels={[{ id: vesselId, name: 'Kittiwake' }]} />);

    await user.type(screen.getByLabelText('E-mail'), 'Crew@Example.com');
    await user.click(screen.getByRole('checkbox', { name: 'Kittiwake' }));
    await user.click(screen.getByRole('button', { name: 'Send invite' }));

    expect(await screen.findByLabelText('Invite link')).toHaveValue(
      'http://localhost:3000/invite/tok_0123456789abcdefghij',
    );
    expect(calls[0].body).toEqual({
      email: 'crew@example.com',
      role: 'skipper',
      vesselIds: [vesselId],
    });
    expect(screen.getByLabelText('E-mail')).toHaveValue('');
  });

  it('links no vessels when inviting staff', async () => {
    const { calls } = stubFetch({
      'POST /api/invites': problem(409, 'Conflict', 'That person already belongs to the workshop.'),
    });
    const user = userEvent.setup();
    renderPage(<InviteForm vessels={[{ id: vesselId, name: 'Kittiwake' }]} />);

    await user.type(screen.getByLabelText('E-mail'), 'mech@example.com');
    await user.selectOptions(screen.getByLabelText('Role'), 'technician');
    expect(screen.queryByRole('checkbox', { name: 'Kittiwake' })).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Send invite' }));

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'That person already belongs to the workshop.',
    );
    expect(calls[0].body).toEqual({ email: 'mech@example.com', role: 'technician', vesselIds: [] });
  });

  it('names the e-mail field when it is not an address', async () => {
    const { fetchMock } = stubFetch({});
    const user = userEvent.setup();
    renderPage(<InviteForm />);

    await user.type(screen.getByLabelText('E-mail'), 'not-an-address');
    await user.click(screen.getByRole('button', { name: 'Send invite' }));

    expect(
      await screen.findByText('Enter a valid e-mail address, like name@example.com.'),
    ).toBeInTheDocument();
    expect(fetchMock).not.toHaveBeenCalled();
  });
});
