import { SetMetadata, type CustomDecorator } from '@nestjs/common';
import type { Reflector } from '@nestjs/core';
import type { Role } from '@holdfast/shared';

/**
 * Access policy of a route. Every controller method must carry exactly one, on the method or its
 * class (the method's wins): `@Public()`, `@SignedIn()` or `@Roles(...)`. The global AuthGuard
 * denies any route without one, and server/test/route-policy.test.ts fails the build for it.
 */
export type RoutePolicy =
  { kind: 'public' } | { kind: 'signed-in' } | { kind: 'roles'; roles: readonly Role[] };

export const POLICY_KEY = 'holdfast:route-policy';

/** Anyone, signed in or not (sign-in, refresh, health). */
export const Public = (): CustomDecorator<string> =>
  SetMetadata(POLICY_KEY, { kind: 'public' } satisfies RoutePolicy);

/** Any signed-in, active user whatever the role. */
export const SignedIn = (): CustomDecorator<string> =>
  SetMetadata(POLICY_KEY, { kind: 'signed-in' } satisfies RoutePolicy);

/**
 * Signed-in users holding one of `roles`. A checker also holds an engineer's powers, so
 * `@Roles('engineer')` admits checkers too. Admins manage users and criteria sets only.
 */
export const Roles = (...roles: [Role, ...Role[]]): CustomDecorator<string> =>
  SetMetadata(POLICY_KEY, { kind: 'roles', roles } satisfies RoutePolicy);

/** The roles a user effectively holds (role inheritance lives here and nowhere else). */
export function effectiveRoles(role: Role): readonly Role[] {
  return role === 'checker' ? ['checker', 'engineer'] : [role];
}

/** Whether a user with `role` (or anonymous, `null`) passes `policy`. */
export function policyAdmits(policy: RoutePolicy, role: Role | null): boolean {
  if (policy.kind === 'public') return true;
  if (role === null) return false;
  if (policy.kind === 'signed-in') return true;
  return effectiveRoles(role).some((r) => policy.roles.includes(r));
}

/** The policy declared for a handler, method first then class; undefined when none. */
export function policyOf(
  reflector: Reflector,
  // eslint-disable-next-line @typescript-eslint/no-unsafe-function-type
  handler: Function,
  // eslint-disable-next-line @typescript-eslint/no-unsafe-function-type
  controller: Function,
): RoutePolicy | undefined {
  return reflector.getAllAndOverride<RoutePolicy | undefined>(POLICY_KEY, [handler, controller]);
}
