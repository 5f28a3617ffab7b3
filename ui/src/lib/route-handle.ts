import { useMatches } from 'react-router-dom';

/**
 * What a route tells the app frame through its `handle`.
 * - `caution`: show the standard safety caution in the frame footer (every calculation page).
 * - `title`: the page title shown in the browser tab ("… · Holdfast").
 * - `wide`: let the page use the full width instead of the reading width.
 * - `compactNav`: the side navigation starts collapsed here (the user's own choice wins).
 */
export interface RouteHandle {
  caution?: boolean;
  title?: string;
  wide?: boolean;
  compactNav?: boolean;
}

function handles(matches: ReturnType<typeof useMatches>): RouteHandle[] {
  return matches.map((m) => (m.handle ?? {}) as RouteHandle);
}

/** The merged handle of the current route chain: the deepest route that says something wins. */
export function useRouteHandle(): RouteHandle {
  const merged: RouteHandle = {};
  for (const h of handles(useMatches())) {
    if (h.caution !== undefined) merged.caution = h.caution;
    if (h.title !== undefined) merged.title = h.title;
    if (h.wide !== undefined) merged.wide = h.wide;
    if (h.compactNav !== undefined) merged.compactNav = h.compactNav;
  }
  return merged;
}
