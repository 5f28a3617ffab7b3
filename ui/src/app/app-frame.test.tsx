import { describe, expect, it } from 'vitest';
import { act, screen, within } from '@testing-library/react';
import type { RouteObject } from 'react-router-dom';
import { RouteErrorBoundary } from '../components/errors/route-error-boundary';
import { sessionStore } from '../lib/session';
import { testUsers } from '../testing/fixtures';
import { mockFetch } from '../testing/mock-fetch';
import { renderRoutes } from '../testing/render';
import { AppFrame } from './app-frame';
import { requireSession } from './router';
import { Component as NotFound } from './routes/not-found';

const routes: RouteObject[] = [
  { path: '/sign-in', element: <h1>Sign in</h1> },
  {
    Component: AppFrame,
    loader: requireSession,
    children: [
      {
        ErrorBoundary: RouteErrorBoundary,
        children: [
          { index: true, handle: { title: 'Work queue' }, element: <h1>Queue</h1> },
          { path: 'calc', handle: { caution: true, title: 'Sheet' }, element: <h1>Calc</h1> },
          {
            path: 'boom',
            loader: () => {
              throw new Error('The sheet could not be read.');
            },
            element: <h1>never</h1>,
          },
          { path: '*', Component: NotFound },
        ],
      },
    ],
  },
];

describe('app frame', () => {
  it('shows the user, the workbench links, and Users only to admins', async () => {
    renderRoutes(routes, { user: testUsers.engineer, route: '/' });
    expect(await screen.findByRole('heading', { name: 'Queue' })).toBeInTheDocument();
    expect(screen.getByTestId('current-user-name')).toHaveTextContent('Erin Vale');
    const nav = screen.getByRole('navigation', { name: 'Main' });
    for (const label of ['Work queue', 'Sheets', 'Equipment', 'Criteria sets'])
      expect(within(nav).getByRole('link', { name: label })).toBeInTheDocument();
    expect(within(nav).queryByRole('link', { name: 'Users' })).toBeNull();
    expect(within(nav).getByRole('link', { name: 'Work queue' })).toHaveAttribute(
      'aria-current',
      'page',
    );
    expect(document.title).toBe('Work queue · Holdfast');
  });

  it('gives admins the Users link', async () => {
    renderRoutes(routes, { user: testUsers.admin, route: '/' });
    const nav = await screen.findByRole('navigation', { name: 'Main' });
    expect(within(nav).getByRole('link', { name: 'Users' })).toHaveAttribute(
      'href',
      '/admin/users',
    );
  });

  it('shows the safety caution only on pages that ask for it', async () => {
    const { router } = renderRoutes(routes, { user: testUsers.engineer, route: '/' });
    await screen.findByRole('heading', { name: 'Queue' });
    expect(screen.queryByRole('note', { name: 'Safety caution' })).toBeNull();
    await act(() => router.navigate('/calc'));
    expect(await screen.findByRole('note', { name: 'Safety caution' })).toHaveTextContent(
      /competent engineer/,
    );
  });

  it('keeps the frame around page errors and unknown addresses', async () => {
    const { router } = renderRoutes(routes, { user: testUsers.engineer, route: '/boom' });
    expect(await screen.findByText('The sheet could not be read.')).toBeInTheDocument();
    expect(screen.getByRole('navigation', { name: 'Main' })).toBeInTheDocument();
    await act(() => router.navigate('/no/such/page'));
    expect(await screen.findByRole('heading', { name: 'Not found' })).toBeInTheDocument();
    expect(screen.getByTestId('current-user-name')).toBeInTheDocument();
  });

  it('sends signed-out visitors to sign-in with the way back', async () => {
    const { router } = renderRoutes(routes, { route: '/calc?tab=inputs' });
    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.search).toBe('?next=%2Fcalc%3Ftab%3Dinputs');
  });

  it('signs out from the user menu', async () => {
    const mock = mockFetch({ 'POST /api/auth/sign-out': { status: 204 } });
    const { user } = renderRoutes(routes, { user: testUsers.engineer, route: '/' });
    await user.click(await screen.findByRole('button', { name: 'User menu for Erin Vale' }));
    await user.click(await screen.findByRole('menuitem', { name: 'Sign out' }));
    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(mock.callsTo('POST /api/auth/sign-out')).toHaveLength(1);
    expect(sessionStore.getState()).toMatchObject({
      status: 'signed-out',
      endReason: 'signed-out',
    });
  });

  it('saves the unit system preference from the user menu', async () => {
    const mock = mockFetch({
      'PATCH /api/auth/me': (req) => ({
        body: { ...testUsers.engineer, ...(req.body as object) },
      }),
    });
    const { user } = renderRoutes(routes, { user: testUsers.engineer, route: '/' });
    await user.click(await screen.findByRole('button', { name: 'User menu for Erin Vale' }));
    await user.click(await screen.findByText('US'));
    await act(async () => {
      await new Promise((r) => setTimeout(r, 50));
    });
    expect(mock.callsTo('PATCH /api/auth/me')[0]?.body).toEqual({ unitSystem: 'US' });
    expect(sessionStore.getState().user?.unitSystem).toBe('US');
  });
});
