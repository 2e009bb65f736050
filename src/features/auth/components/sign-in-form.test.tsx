import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { problem, stubFetch } from '../../../test/fetch-stub';
import { renderPage, testUser } from '../../../test/render';
import { SignInForm } from './sign-in-form';

afterEach(() => {
  vi.unstubAllGlobals();
});

function setup() {
  const onSignedIn = vi.fn();
  renderPage(<SignInForm onSignedIn={onSignedIn} />);
  return { onSignedIn, user: userEvent.setup() };
}

describe('SignInForm', () => {
  it('names both empty fields and does not ask the server', async () => {
    const { fetchMock } = stubFetch({});
    const { user, onSignedIn } = setup();

    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    const email = screen.getByLabelText('E-mail');
    // The form checks its fields asynchronously: wait for the marks rather than race them.
    await vi.waitFor(() => expect(email).toHaveAttribute('aria-invalid', 'true'));
    expect(email).toHaveAccessibleDescription(/e-mail address/i);
    expect(screen.getByLabelText('Password')).toHaveAccessibleDescription('Enter your password.');
    expect(fetchMock).not.toHaveBeenCalled();
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it('rejects an invalid e-mail address without calling the server', async () => {
    const { fetchMock } = stubFetch({});
    const { user } = setup();

    await user.type(screen.getByLabelText('E-mail'), 'skipper.example.com');
    await user.type(screen.getByLabelText('Password'), 'long enough password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(
      await screen.findByText('Enter a valid e-mail address, like name@example.com.'),
    ).toBeInTheDocument();
    expect(screen.getByLabelText('Password')).toHaveAttribute('aria-invalid', 'false');
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it("shows the server's reason when the e-mail or password is wrong", async () => {
    stubFetch({
      'POST /api/auth/sign-in': problem(
        401,
        'Unauthorized',
        'That e-mail and password do not match an account.',
      ),
    });
    const { user, onSignedIn } = setup();

    await user.type(screen.getByLabelText('E-mail'), 'skipper@example.com');
    await user.type(screen.getByLabelText('Password'), 'not the password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'That e-mail and password do not match an account.',
    );
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it('puts server field errors on the field they name', async () => {
    stubFetch({
      'POST /api/auth/sign-in': problem(400, 'Bad request', 'Check the highlighted fields.', [
        { field: 'email', message: 'This e-mail address is not allowed here.' },
      ]),
    });
    const { user } = setup();

    await user.type(screen.getByLabelText('E-mail'), 'skipper@example.com');
    await user.type(screen.getByLabelText('Password'), 'whatever');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('This e-mail address is not allowed here.')).toBeInTheDocument();
    expect(screen.getByLabelText('E-mail')).toHaveAttribute('aria-invalid', 'true');
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('sends the normalised e-mail and reports the signed-in user', async () => {
    const skipper = testUser('skipper');
    const { calls } = stubFetch({
      'POST /api/auth/sign-in': { status: 200, body: { user: skipper } },
    });
    const { user, onSignedIn } = setup();

    await user.type(screen.getByLabelText('E-mail'), '  Skipper@Example.com ');
    await user.type(screen.getByLabelText('Password'), 'correct horse');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    await vi.waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(skipper));
    expect(calls[0].body).toEqual({ email: 'skipper@example.com', password: 'correct horse' });
  });
});
