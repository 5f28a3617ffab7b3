import type { ReactElement, ReactNode } from 'react';
import { MantineProvider } from '@mantine/core';
import { Notifications } from '@mantine/notifications';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import {
  createMemoryRouter,
  MemoryRouter,
  RouterProvider,
  type RouteObject,
} from 'react-router-dom';
import type { User } from '@holdfast/shared';
import { sessionStore } from '../lib/session';
import { theme } from '../theme';

export interface RenderOptions {
  /** Signed in as this user (with a test token), or signed out when omitted. */
  user?: User;
  /** Address the router starts at. */
  route?: string;
  queryClient?: QueryClient;
}

export function createTestQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: { queries: { retry: false, gcTime: Infinity }, mutations: { retry: false } },
  });
}

function Providers({ children, queryClient }: { children: ReactNode; queryClient: QueryClient }) {
  return (
    <MantineProvider theme={theme} env="test">
      <Notifications />
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </MantineProvider>
  );
}

function prepare(options: RenderOptions) {
  if (options.user) sessionStore.reset({ status: 'signed-in', user: options.user }, 'test-token');
  else sessionStore.reset({ status: 'signed-out' });
  return options.queryClient ?? createTestQueryClient();
}

/** Render a component inside Mantine (test env), a fresh QueryClient and a MemoryRouter. */
export function renderWithProviders(ui: ReactElement, options: RenderOptions = {}) {
  const queryClient = prepare(options);
  const user = userEvent.setup({ delay: null });
  const result = render(
    <Providers queryClient={queryClient}>
      <MemoryRouter initialEntries={[options.route ?? '/']}>{ui}</MemoryRouter>
    </Providers>,
  );
  return { ...result, user, queryClient };
}

/** Render route objects in a memory data router, for loaders, handles and redirects. */
export function renderRoutes(routes: RouteObject[], options: RenderOptions = {}) {
  const queryClient = prepare(options);
  const user = userEvent.setup({ delay: null });
  // A pathless root with a fallback keeps the router quiet while the first loaders run.
  const router = createMemoryRouter([{ HydrateFallback: () => null, children: routes }], {
    initialEntries: [options.route ?? '/'],
  });
  const result = render(
    <Providers queryClient={queryClient}>
      <RouterProvider router={router} />
    </Providers>,
  );
  return { ...result, user, queryClient, router };
}
