import { describe, expect, it } from 'vitest';
import { act, screen } from '@testing-library/react';
import { sessionStore } from '../../../lib/session';
import { makeSession, testUsers } from '../../../testing/fixtures';
import { mockFetch } from '../../../testing/mock-fetch';
import { renderRoutes } from '../../../testing/render';
import { Component as SignInPage, safeNext } from './sign-in';

describe('safeNext', () => {
  it('keeps same-site paths and drops anything that could leave the site', () => {
    expect(safeNext('/sheets/42?tab=inputs')).toBe('/sheets/42?tab=inputs');
    expect(safeNext(null)).toBe('/');
    expect(safeNext('https://example.org/')).toBe('/');
    expect(safeNext('//example.org/')).toBe('/');
    expect(safeNext('/\\example.org')).toBe('/');
  });
});

describe('sign-in page', () => {
  it('goes to the page named in ?next after signing in', async () => {
    mockFetch({ 'POST /api/auth/sign-in': { body: makeSession(testUsers.viewer) } });
    const { user } = renderRoutes(
      [
        { path: '/sign-in', Component: SignInPage },
        { path: '/sheets', element: <h1>Sheets list</h1> },
      ],
      { route: '/sign-in?next=%2Fsheets' },
    );
    await user.type(screen.getByLabelText(/e-mail/i), 'viewer@holdfast.test');
    await user.type(screen.getByLabelText(/^password/i), 'holdfast-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByRole('heading', { name: 'Sheets list' })).toBeInTheDocument();
  });

  it('tells the user when the previous session expired', async () => {
    renderRoutes([{ path: '/sign-in', Component: SignInPage }], { route: '/sign-in' });
    expect(screen.queryByText(/session has ended/i)).not.toBeInTheDocument();
    act(() => sessionStore.end('expired'));
    expect(await screen.findByText(/session has ended/i)).toBeInTheDocument();
  });
});
