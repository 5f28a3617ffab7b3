/**
 * The workbench's routes and navigation: the one place where the sheet screens plug into the frame.
 *
 * Owned by the workbench (features/sheets, revisions, register, criteria, queue, review,
 * attachments). Replace each placeholder with a lazy route module, e.g.
 *
 *   { path: 'sheets', lazy: lazyRoute(() => import('../features/sheets/routes/sheet-list')) }
 *
 * A route module exports `Component` (or default), optionally `clientLoader(queryClient)`,
 * `ErrorBoundary` and `handle`. Calculation pages set `handle: { caution: true }` so the frame
 * shows the safety caution in its footer. Paths are relative to the signed-in frame ('/').
 * Errors thrown here land in the frame's nested error boundary, inside the navigation.
 */
import type { RouteObject } from 'react-router-dom';
import {
  IconBuildingFactory2,
  IconFileDescription,
  IconListCheck,
  IconScale,
} from '@tabler/icons-react';
import type { QueryClient } from '@tanstack/react-query';
import { Page } from '../components/layouts/page';
import { PlaceholderPanel } from '../components/placeholder-panel';
import type { NavItem } from '../lib/nav-item';
import type { RouteHandle } from '../lib/route-handle';

/** Links in the frame's "Workbench" navigation group, in order. */
export const workbenchNav: NavItem[] = [
  { label: 'Work queue', to: '/', icon: IconListCheck, end: true },
  { label: 'Sheets', to: '/sheets', icon: IconFileDescription },
  { label: 'Equipment', to: '/equipment', icon: IconBuildingFactory2 },
  { label: 'Criteria sets', to: '/criteria', icon: IconScale },
];

function placeholder(title: string, description: string) {
  return function Placeholder() {
    return (
      <Page title={title} description={description}>
        <PlaceholderPanel />
      </Page>
    );
  };
}

const calc: RouteHandle = { caution: true };

// The query client is passed in for the route modules' clientLoader.
export function workbenchRoutes(_queryClient: QueryClient): RouteObject[] {
  return [
    {
      index: true,
      handle: { title: 'Work queue' } satisfies RouteHandle,
      Component: placeholder(
        'Work queue',
        'Your drafts, sheets returned to you and checks waiting.',
      ),
    },
    {
      path: 'sheets',
      handle: { title: 'Sheets' } satisfies RouteHandle,
      Component: placeholder('Sheets', 'Every calculation sheet, searchable and filterable.'),
    },
    {
      path: 'sheets/:sheetId',
      handle: { ...calc, title: 'Sheet' } satisfies RouteHandle,
      Component: placeholder('Sheet', 'Revisions, inputs, results and review.'),
    },
    {
      path: 'equipment',
      handle: { title: 'Equipment' } satisfies RouteHandle,
      Component: placeholder('Equipment', 'Sites, machines and brake positions.'),
    },
    {
      path: 'criteria',
      handle: { title: 'Criteria sets' } satisfies RouteHandle,
      Component: placeholder('Criteria sets', 'The acceptance limits the checks use.'),
    },
  ];
}
