import { redirect, type RouteObject } from 'react-router-dom';
import type { QueryClient } from '@tanstack/react-query';
import { PageLoader } from '../components/page-loader';
import { RouteErrorBoundary } from '../components/errors/route-error-boundary';
import { paths } from '../config/paths';
import { lazyRoute } from '../lib/lazy-route';
import { sessionStore } from '../lib/session';
import { AppFrame } from './app-frame';
import { RootErrorBoundary } from './routes/root-error';
import { workbenchRoutes } from './workbench-routes';

/**
 * Runs before any child loader's result is used: a redirect from here wins over child loaders'
 * errors, so signed-out visitors go to sign-in instead of seeing 401s.
 */
export function requireSession({ request }: { request: Request }) {
  if (sessionStore.getState().status === 'signed-in') return null;
  const url = new URL(request.url);
  return redirect(paths.signIn.build(url.pathname + url.search));
}

export function createRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      id: 'root',
      ErrorBoundary: RootErrorBoundary,
      HydrateFallback: () => <PageLoader fullScreen />,
      children: [
        {
          path: paths.signIn.path,
          handle: { title: 'Sign in' },
          lazy: lazyRoute(() => import('./routes/auth/sign-in'), queryClient),
        },
        {
          // Public: the one-time link from an admin password reset.
          path: 'reset-password',
          handle: { title: 'Set a new password' },
          lazy: lazyRoute(() => import('./routes/auth/reset-password'), queryClient),
        },
        {
          // Public: checking a printout needs no sign-in.
          path: 'verify/:code?',
          lazy: lazyRoute(() => import('./routes/verify/verify-page'), queryClient),
        },
        {
          id: 'frame',
          Component: AppFrame,
          loader: requireSession,
          children: [
            {
              // Errors inside a page are shown within the frame, navigation still at hand.
              ErrorBoundary: RouteErrorBoundary,
              children: [
                ...workbenchRoutes(queryClient),
                {
                  path: 'admin/users',
                  handle: { title: 'Users' },
                  lazy: lazyRoute(() => import('./routes/admin/users'), queryClient),
                },
                {
                  path: 'admin/mail',
                  handle: { title: 'Undelivered mail' },
                  lazy: lazyRoute(() => import('./routes/admin/mail'), queryClient),
                },
                {
                  path: 'account',
                  handle: { title: 'Your account' },
                  lazy: lazyRoute(() => import('./routes/account/account'), queryClient),
                },
                {
                  path: '*',
                  handle: { title: 'Not found' },
                  lazy: lazyRoute(() => import('./routes/not-found'), queryClient),
                },
              ],
            },
          ],
        },
      ],
    },
  ];
}
