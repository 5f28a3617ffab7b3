import type { Role } from '@holdfast/shared';
import { policyAdmits, type RoutePolicy } from '../src/auth/policy.js';
import type { RouteInfo } from '../src/common/routes/list-routes.js';

export type Caller = Role | 'anonymous';
export const callers: readonly Caller[] = [
  'anonymous',
  'engineer',
  'checker',
  'viewer',
  'admin',
  'technician',
];

/** A well-formed id that matches no row, for `:param` segments. */
export const NIL_ID = '00000000-0000-4000-8000-000000000000';

export const routeKey = (r: Pick<RouteInfo, 'method' | 'path'>) => `${r.method} ${r.path}`;
export const probePath = (path: string) => path.replace(/:[A-Za-z]\w*/g, NIL_ID);

/**
 * What the access layer alone decides for a caller: 401 for anonymous on a closed route, 403 for
 * a role the policy does not admit, else 'passes' (the handler answers; validation or a missing
 * row then give 400/404, never 401/403 from the guard).
 */
export function guardOutcome(
  policy: RoutePolicy | undefined,
  caller: Caller,
): 401 | 403 | 'passes' {
  if (!policy) return 403;
  if (caller === 'anonymous') return policyAdmits(policy, null) ? 'passes' : 401;
  return policyAdmits(policy, caller) ? 'passes' : 403;
}
