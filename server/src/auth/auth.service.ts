import { createHash, randomBytes } from 'node:crypto';
import { Injectable, Logger } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { hashPassword, verifyPassword, type UserRow } from '@holdfast/db';
import type { ChangePasswordInput, Session, SignInInput } from '@holdfast/shared';
import { AppConfig } from '../config/app-config.js';
import { badRequest, unauthenticated } from '../common/errors/api-exception.js';
import { UnitOfWork, type Tx } from '../database/unit-of-work.js';
import { UsersRepository } from '../users/users.repository.js';
import { assertStrongPassword, toUser } from '../users/users.service.js';
import { ACCESS_TOKEN_SECONDS, type AccessTokenClaims } from './access-token.js';
import { RefreshTokensRepository } from './refresh-tokens.repository.js';

export interface IssuedSession {
  session: Session;
  /** Opaque refresh token for the httpOnly cookie; only its SHA-256 is stored. */
  refreshToken: string;
  refreshExpiresAt: Date;
}

export const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

@Injectable()
export class AuthService {
  private readonly logger = new Logger('AuthService');
  /** Verified against when the e-mail is unknown, so both failures take the same time. */
  private readonly dummyHash = hashPassword('not-a-real-password-000');

  constructor(
    private readonly config: AppConfig,
    private readonly units: UnitOfWork,
    private readonly jwt: JwtService,
    private readonly users: UsersRepository,
    private readonly tokens: RefreshTokensRepository,
  ) {}

  async signIn(input: SignInInput): Promise<IssuedSession> {
    const user = await this.users.findByEmail(input.email);
    const ok = await verifyPassword(user?.passwordHash ?? (await this.dummyHash), input.password);
    if (!user || !ok) throw unauthenticated('The e-mail address or password is not right.');
    if (!user.active) throw unauthenticated('This account has been deactivated.');
    return this.issue(user);
  }

  /**
   * Exchanges a live refresh token for a new session and a new refresh token (rotation). A token
   * rotated less than REFRESH_GRACE_SECONDS ago is a second tab refreshing at the same moment: it
   * gets a session of its own. Presented later, a rotated token means it leaked, and every
   * session of the user ends.
   */
  async refresh(token: string | undefined): Promise<IssuedSession> {
    const denied = () => unauthenticated('Your session has ended. Sign in again.');
    if (!token) throw denied();
    const row = await this.tokens.findByHash(hashToken(token));
    if (!row) throw denied();
    if (row.revokedAt) {
      if (!(await this.tokens.wasRotated(row.id))) throw denied();
      if (this.inGrace(row.revokedAt)) return this.issueFor(row.userId, row.id, denied);
      this.logger.warn(`refresh token reuse for user ${row.userId}; all sessions revoked`);
      await this.tokens.revokeAllForUser(row.userId);
      await this.users.endAccessTokens(row.userId);
      throw denied();
    }
    if (row.expiresAt.getTime() <= Date.now()) throw denied();
    const user = await this.users.findById(row.userId);
    if (!user?.active) {
      await this.tokens.revokeAllForUser(row.userId);
      throw denied();
    }
    // Revoke and insert the successor in one transaction: a concurrent refresh of the same
    // token waits on the row, then finds it rotated (not merely revoked) and gets the grace.
    const rotated = await this.units.run(async (tx) =>
      (await this.tokens.revokeIfLive(row.id, tx)) ? this.issue(user, row.id, tx) : undefined,
    );
    if (rotated) return rotated;
    if (await this.tokens.wasRotated(row.id)) return this.issueFor(row.userId, row.id, denied);
    throw denied();
  }

  /** Ends this refresh token and every access token of its user (other devices renew theirs). */
  async signOut(token: string | undefined): Promise<void> {
    if (!token) return;
    const row = await this.tokens.findByHash(hashToken(token));
    if (!row) return;
    await this.tokens.revokeIfLive(row.id);
    await this.users.endAccessTokens(row.userId);
  }

  /** A signed-in user's own password change; every other session of the user ends. */
  async changePassword(userId: string, input: ChangePasswordInput): Promise<IssuedSession> {
    const user = await this.users.findById(userId);
    if (!user?.active) throw unauthenticated('Your account is not active.');
    if (!(await verifyPassword(user.passwordHash, input.currentPassword))) {
      throw badRequest('Some fields are not valid.', [
        { path: 'currentPassword', message: 'is not your current password' },
      ]);
    }
    if (input.newPassword === input.currentPassword) {
      throw badRequest('Some fields are not valid.', [
        { path: 'newPassword', message: 'must differ from the current password' },
      ]);
    }
    assertStrongPassword('newPassword', input.newPassword, [user.email, user.displayName]);
    await this.users.setPassword(userId, await hashPassword(input.newPassword));
    this.logger.log(`user ${userId} changed their password; other sessions ended`);
    return this.issue((await this.users.findById(userId))!);
  }

  private inGrace(revokedAt: Date): boolean {
    return Date.now() - revokedAt.getTime() <= this.config.settings.REFRESH_GRACE_SECONDS * 1000;
  }

  private async issueFor(
    userId: string,
    rotatedFrom: string,
    denied: () => Error,
  ): Promise<IssuedSession> {
    const user = await this.users.findById(userId);
    if (!user?.active) throw denied();
    return this.issue(user, rotatedFrom);
  }

  private async issue(user: UserRow, rotatedFrom?: string, tx?: Tx): Promise<IssuedSession> {
    const claims: AccessTokenClaims = {
      sub: user.id,
      role: user.role,
      name: user.displayName,
      sv: user.sessionVersion,
    };
    const accessToken = await this.jwt.signAsync(claims, { expiresIn: ACCESS_TOKEN_SECONDS });
    const refreshToken = randomBytes(32).toString('base64url');
    const days = this.config.settings.REFRESH_TTL_DAYS;
    const refreshExpiresAt = new Date(Date.now() + days * 24 * 3600 * 1000);
    await this.tokens.insert(
      {
        userId: user.id,
        tokenHash: hashToken(refreshToken),
        expiresAt: refreshExpiresAt,
        ...(rotatedFrom ? { rotatedFrom } : {}),
      },
      tx,
    );
    return {
      session: { accessToken, expiresIn: ACCESS_TOKEN_SECONDS, user: toUser(user) },
      refreshToken,
      refreshExpiresAt,
    };
  }
}
