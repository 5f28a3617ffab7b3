import { describe, expect, it } from 'vitest';
import { screen, waitFor } from '@testing-library/react';
import { sessionStore } from '../../../lib/session';
import { makeSession, testUsers } from '../../../testing/fixtures';
import { jsonError, mockFetch } from '../../../testing/mock-fetch';
import { renderWithProviders } from '../../../testing/render';
import { SignInForm } from './sign-in-form';

async function fillAndSubmit(
  user: ReturnType<typeof renderWithProviders>['user'],
  email: string,
  password: string,
) {
  if (email) await user.type(screen.getByLabelText(/e-mail/i), email);
  if (password) await user.type(screen.getByLabelText(/^password/i), password);
  await user.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('SignInForm', () => {
  it('shows the shared schema errors beside each field and sends nothing', async () => {
    const api = mockFetch({});
    const { user } = renderWithProviders(<SignInForm />);
    await fillAndSubmit(user, 'not-an-address', '');

    expect(await screen.findByText('not a valid e-mail address')).toBeInTheDocument();
    expect(screen.getByText('required')).toBeInTheDocument();
    expect(screen.getByLabelText(/e-mail/i)).toHaveAttribute('aria-invalid', 'true');
    expect(api.fn).not.toHaveBeenCalled();
  });

  it('shows the server message plainly when the credentials are refused', async () => {
    mockFetch({
      'POST /api/auth/sign-in': jsonError(
        401,
        'unauthenticated',
        'E-mail or password is not right.',
      ),
    });
    const { user } = renderWithProviders(<SignInForm />);
    await fillAndSubmit(user, 'engineer@holdfast.test', 'wrong-password');

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('E-mail or password is not right.');
    expect(sessionStore.getState().status).toBe('signed-out');
  });

  it('explains throttling on 429', async () => {
    mockFetch({
      'POST /api/auth/sign-in': jsonError(429, 'too_many_requests', 'ThrottlerException'),
    });
    const { user } = renderWithProviders(<SignInForm />);
    await fillAndSubmit(user, 'engineer@holdfast.test', 'x');

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Too many sign-in attempts');
    expect(alert).toHaveTextContent('Wait a minute');
  });

  it('puts server field errors on their fields', async () => {
    mockFetch({
      'POST /api/auth/sign-in': jsonError(400, 'validation_failed', 'Invalid request', [
        { path: 'email', message: 'unknown domain' },
      ]),
    });
    const { user } = renderWithProviders(<SignInForm />);
    await fillAndSubmit(user, 'engineer@holdfast.test', 'secret');

    expect(await screen.findByText('unknown domain')).toBeInTheDocument();
    expect(screen.getByLabelText(/e-mail/i)).toHaveAttribute('aria-invalid', 'true');
  });

  it('starts the session with the normalised e-mail on success', async () => {
    const api = mockFetch({
      'POST /api/auth/sign-in': { status: 200, body: makeSession(testUsers.engineer, 'tok-42') },
    });
    const { user } = renderWithProviders(<SignInForm />);
    await fillAndSubmit(user, '  Engineer@Holdfast.TEST ', 'holdfast-demo');

    await waitFor(() => expect(sessionStore.getState().status).toBe('signed-in'));
    expect(sessionStore.getState().user?.displayName).toBe('Erin Vale');
    expect(sessionStore.getAccessToken()).toBe('tok-42');
    const [call] = api.callsTo('POST /api/auth/sign-in');
    expect(call?.body).toEqual({ email: 'engineer@holdfast.test', password: 'holdfast-demo' });
    expect(call?.headers.get('Authorization')).toBeNull();
  });
});
