import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { unauthenticated } from '../common/errors/api-exception.js';
import { SignedInUsers } from '../users/signed-in-users.js';
import { UsersRepository } from '../users/users.repository.js';
import { toUser } from '../users/users.service.js';
import type { AccessTokenClaims } from './access-token.js';
import type { AuthUser } from './auth-user.js';

/**
 * Turns a bearer token into the signed-in user, or refuses it: bad signature, no `exp`, expired,
 * account inactive, or issued before the user's last sign-out or password change.
 */
@Injectable()
export class AccessVerifier {
  constructor(
    private readonly jwt: JwtService,
    private readonly users: UsersRepository,
    private readonly signedIn: SignedInUsers,
  ) {}

  async verify(token: string): Promise<AuthUser> {
    let claims: AccessTokenClaims;
    try {
      claims = await this.jwt.verifyAsync<AccessTokenClaims & object>(token);
    } catch {
      throw unauthenticated('Your session has expired or is not valid. Sign in again.');
    }
    // jsonwebtoken accepts a token without exp as never expiring; Holdfast never issues one.
    if (typeof claims.exp !== 'number' || typeof claims.sv !== 'number') {
      throw unauthenticated('Your session has expired or is not valid. Sign in again.');
    }
    const row = await this.user(claims.sub);
    if (!row?.active) throw unauthenticated('Your account is not active.');
    if (row.sessionVersion !== claims.sv)
      throw unauthenticated('You have signed out. Sign in again.');
    return toUser(row);
  }

  /** The users row, from memory while this process hears every change to users (SignedInUsers). */
  private async user(id: string) {
    const known = this.signedIn.get(id);
    if (known) return known;
    const ticket = this.signedIn.ticket();
    const row = await this.users.findById(id);
    if (row) this.signedIn.keep(row, ticket);
    return row;
  }

  /** The user behind an `Authorization: Bearer …` header value. */
  async fromHeader(header: string | undefined): Promise<AuthUser> {
    const [scheme, token] = (header ?? '').split(' ');
    if (scheme !== 'Bearer' || !token) throw unauthenticated();
    return this.verify(token);
  }
}
