/**
 * The workbench's routes and navigation: the one place where the sheet screens plug into the frame.
 *
 * Each route is a lazy route module under `app/routes/`, e.g.
 *
 *   { path: 'sheets', lazy: lazyRoute(() => import('./routes/sheets/sheet-list')) }
 *
 * A route module exports `Component` (or default), optionally `clientLoader(queryClient)`,
 * `ErrorBoundary` and `handle`. Calculation pages set `handle: { caution: true }` so the frame
 * shows the safety caution in its footer. Paths are relative to the signed-in frame ('/').
 * Errors thrown here land in the frame's nested error boundary, inside the navigation.
 */
import type { RouteObject } from 'react-router-dom';
import {
  IconBuildingFactory2,
  IconClipboardCheck,
  IconFileDescription,
  IconListCheck,
  IconScale,
} from '@tabler/icons-react';
import type { QueryClient } from '@tanstack/react-query';
import { lazyRoute, type RouteModule } from '../lib/lazy-route';
import { fieldRecorders, screenRoutes } from '@holdfast/shared';
import type { NavItem } from '../lib/nav-item';

/** Links in the frame's "Workbench" navigation group, in order. */
export const workbenchNav: NavItem[] = [
  { label: 'Work queue', to: '/', icon: IconListCheck, end: true },
  { label: 'Sheets', to: '/sheets', icon: IconFileDescription },
  { label: 'Equipment', to: '/equipment', icon: IconBuildingFactory2 },
  { label: 'Field work', to: '/field', icon: IconClipboardCheck, roles: fieldRecorders },
  { label: 'Criteria sets', to: '/criteria', icon: IconScale },
];

// The query client is passed in for the route modules' clientLoader.
export function workbenchRoutes(queryClient: QueryClient): RouteObject[] {
  const lazy = (load: () => Promise<RouteModule>) => lazyRoute(load, queryClient);
  return [
    { index: true, lazy: lazy(() => import('./routes/queue/work-queue')) },
    { path: 'sheets', lazy: lazy(() => import('./routes/sheets/sheet-list')) },
    { path: 'sheets/:sheetId', lazy: lazy(() => import('./routes/sheets/sheet-page')) },
    {
      path: screenRoutes.revision,
      lazy: lazy(() => import('./routes/sheets/sheet-page')),
    },
    { path: 'sheets/:sheetId/compare', lazy: lazy(() => import('./routes/sheets/compare-page')) },
    { path: 'sheets/:sheetId/audit', lazy: lazy(() => import('./routes/sheets/audit-page')) },
    { path: 'equipment', lazy: lazy(() => import('./routes/equipment/equipment')) },
    { path: 'criteria', lazy: lazy(() => import('./routes/criteria/criteria')) },
    { path: 'field', lazy: lazy(() => import('./routes/field-records/field-work')) },
    {
      path: 'field-records/new/:revisionId',
      lazy: lazy(() => import('./routes/field-records/record-form')),
    },
    {
      path: screenRoutes.positionField,
      lazy: lazy(() => import('./routes/field-records/position-field')),
    },
  ];
}
