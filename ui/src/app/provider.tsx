import { useEffect, type ReactNode } from 'react';
import { MantineProvider } from '@mantine/core';
import { Notifications } from '@mantine/notifications';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { PageLoader } from '../components/page-loader';
import { restoreSession } from '../lib/api-client';
import { queryClient as appQueryClient } from '../lib/query-client';
import { sessionStore, useSession } from '../lib/session';
import { cssVariablesResolver, theme } from '../theme';

let restoreStarted = false;

/** Holds the app back until the refresh cookie has been tried, so loaders know who is signed in. */
function SessionGate({ children, queryClient }: { children: ReactNode; queryClient: QueryClient }) {
  const { status } = useSession();
  useEffect(() => {
    if (!restoreStarted) {
      restoreStarted = true;
      void restoreSession();
    }
  }, []);
  useEffect(
    () =>
      sessionStore.subscribe(() => {
        // A session that ended (signed out or refused) takes its cached data with it.
        if (sessionStore.getState().status === 'signed-out') queryClient.clear();
      }),
    [queryClient],
  );
  if (status === 'restoring') return <PageLoader fullScreen label="Opening Holdfast…" />;
  return <>{children}</>;
}

export function AppProvider({
  children,
  queryClient = appQueryClient,
}: {
  children: ReactNode;
  queryClient?: QueryClient;
}) {
  return (
    <MantineProvider
      theme={theme}
      cssVariablesResolver={cssVariablesResolver}
      defaultColorScheme="light"
    >
      <Notifications position="top-right" limit={4} />
      <QueryClientProvider client={queryClient}>
        <SessionGate queryClient={queryClient}>{children}</SessionGate>
      </QueryClientProvider>
    </MantineProvider>
  );
}
