import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { User } from '@holdfast/shared';
import type { Request } from 'express';

/** The signed-in user as the AuthGuard loaded it from the database for this request. */
export type AuthUser = User;

export interface AuthenticatedRequest extends Request {
  user?: AuthUser;
}

/** `@CurrentUser() user: AuthUser` in a handler behind `@SignedIn()` or `@Roles(...)`. */
export const CurrentUser = createParamDecorator((_: unknown, ctx: ExecutionContext): AuthUser => {
  const user = ctx.switchToHttp().getRequest<AuthenticatedRequest>().user;
  if (!user) throw new Error('CurrentUser used on a route without a signed-in policy');
  return user;
});
