import { Injectable, Logger, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { forbidden } from '../common/errors/api-exception.js';
import { AccessVerifier } from './access-verifier.js';
import type { AuthenticatedRequest } from './auth-user.js';
import { policyAdmits, policyOf } from './policy.js';

/**
 * The global guard: deny by default. A route passes only through its declared policy; the user
 * is reloaded from the database on every request so a deactivation or role change applies at once.
 */
@Injectable()
export class AuthGuard implements CanActivate {
  private readonly logger = new Logger('AuthGuard');

  constructor(
    private readonly reflector: Reflector,
    private readonly verifier: AccessVerifier,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const policy = policyOf(this.reflector, context.getHandler(), context.getClass());
    if (!policy) {
      this.logger.error(
        `${context.getClass().name}.${context.getHandler().name} has no access policy`,
      );
      throw forbidden('This route declares no access policy and is closed.');
    }
    if (policy.kind === 'public') return true;

    const request = context.switchToHttp().getRequest<AuthenticatedRequest>();
    const user = await this.verifier.fromHeader(request.headers.authorization);
    request.user = user;

    if (!policyAdmits(policy, user.role)) throw forbidden();
    return true;
  }
}
