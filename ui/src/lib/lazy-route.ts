import type { ComponentType } from 'react';
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunction, RouteObject } from 'react-router-dom';
import { queryClient as appQueryClient } from './query-client';
import type { RouteHandle } from './route-handle';

/**
 * What a lazily loaded route module may export. `clientLoader(queryClient)` returns the route's
 * loader, which should prefetch with `queryClient.ensureQueryData(xQueryOptions(...))`.
 */
export interface RouteModule {
  Component?: ComponentType;
  default?: ComponentType;
  clientLoader?: (queryClient: QueryClient) => LoaderFunction;
  ErrorBoundary?: ComponentType;
  handle?: RouteHandle;
}

/** `lazy: lazyRoute(() => import('./routes/sheets/sheet-list'))` — code-split a route module. */
export function lazyRoute(
  load: () => Promise<RouteModule>,
  queryClient: QueryClient = appQueryClient,
): NonNullable<RouteObject['lazy']> {
  return async () => {
    const m = await load();
    const Component = m.Component ?? m.default;
    return {
      ...(Component ? { Component } : {}),
      ...(m.clientLoader ? { loader: m.clientLoader(queryClient) } : {}),
      ...(m.ErrorBoundary ? { ErrorBoundary: m.ErrorBoundary } : {}),
      ...(m.handle ? { handle: m.handle } : {}),
    };
  };
}
