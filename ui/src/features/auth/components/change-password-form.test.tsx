import { describe, expect, it } from 'vitest';
import { screen, waitFor } from '@testing-library/react';
import { sessionStore } from '../../../lib/session';
import { makeSession, testUsers } from '../../../testing/fixtures';
import { jsonError, mockFetch } from '../../../testing/mock-fetch';
import { renderWithProviders } from '../../../testing/render';
import { tokenFromHash } from '../../../app/routes/auth/reset-password';
import { ChangePasswordForm } from './change-password-form';

async function fill(
  user: ReturnType<typeof renderWithProviders>['user'],
  current: string,
  next: string,
  repeat = next,
) {
  if (current) await user.type(screen.getByLabelText(/current password/i), current);
  if (next) await user.type(screen.getByLabelText(/^new password/i), next);
  if (repeat) await user.type(screen.getByLabelText(/repeat the new password/i), repeat);
  await user.click(screen.getByRole('button', { name: 'Change password' }));
}

describe('ChangePasswordForm', () => {
  it('checks length and the repeat before sending anything', async () => {
    const api = mockFetch({});
    const { user } = renderWithProviders(<ChangePasswordForm />);
    await fill(user, 'holdfast-demo', 'short', 'other');
    expect(await screen.findByText('At least 12 characters')).toBeInTheDocument();
    expect(screen.getByText('The two entries differ')).toBeInTheDocument();
    expect(api.fn).not.toHaveBeenCalled();
  });

  it("puts the server's refusal of a guessable password on its field", async () => {
    mockFetch({
      'POST /api/auth/password': jsonError(400, 'validation_failed', 'Some fields are not valid.', [
        { path: 'newPassword', message: 'too easy to guess' },
      ]),
    });
    const { user } = renderWithProviders(<ChangePasswordForm />);
    await fill(user, 'holdfast-demo', 'password1234');
    expect(await screen.findByText('too easy to guess')).toBeInTheDocument();
  });

  it('carries on with the new session the server answers with', async () => {
    const api = mockFetch({
      'POST /api/auth/password': { status: 200, body: makeSession(testUsers.engineer, 'tok-new') },
    });
    const { user } = renderWithProviders(<ChangePasswordForm />);
    await fill(user, 'holdfast-demo', 'copper lantern orbit meadow');
    await waitFor(() => expect(sessionStore.getAccessToken()).toBe('tok-new'));
    const [call] = api.callsTo('POST /api/auth/password');
    expect(call?.body).toEqual({
      currentPassword: 'holdfast-demo',
      newPassword: 'copper lantern orbit meadow',
    });
  });
});

describe('reset link', () => {
  it('reads the token from the fragment only', () => {
    expect(tokenFromHash('#token=abc_DEF-123')).toBe('abc_DEF-123');
    expect(tokenFromHash('')).toBe('');
  });
});
