import { QueryClient, type DefaultOptions } from '@tanstack/react-query';
import { ApiRequestError } from './api-error';

// Client errors (4xx) will not change on a retry; only network trouble and 5xx are retried.
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiRequestError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export const queryConfig = {
  queries: {
    staleTime: 30_000,
    refetchOnWindowFocus: false,
    retry: shouldRetry,
  },
  mutations: { retry: false },
} satisfies DefaultOptions;

export function createQueryClient(): QueryClient {
  return new QueryClient({ defaultOptions: queryConfig });
}

/** The app's one QueryClient; route loaders use it with `ensureQueryData`. */
export const queryClient = createQueryClient();
