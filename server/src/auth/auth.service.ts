import { createHash, randomBytes } from 'node:crypto';
import { Injectable, Logger } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { hashPassword, verifyPassword, type UserRow } from '@holdfast/db';
import type { Session, SignInInput } from '@holdfast/shared';
import { AppConfig } from '../config/app-config.js';
import { unauthenticated } from '../common/errors/api-exception.js';
import { UsersRepository } from '../users/users.repository.js';
import { toUser } from '../users/users.service.js';
import { ACCESS_TOKEN_SECONDS, type AccessTokenClaims } from './access-token.js';
import { RefreshTokensRepository } from './refresh-tokens.repository.js';

export interface IssuedSession {
  session: Session;
  /** Opaque refresh token for the httpOnly cookie; only its SHA-256 is stored. */
  refreshToken: string;
  refreshExpiresAt: Date;
}

const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

@Injectable()
export class AuthService {
  private readonly logger = new Logger('AuthService');
  /** Verified against when the e-mail is unknown, so both failures take the same time. */
  private readonly dummyHash = hashPassword('not-a-real-password-000');

  constructor(
    private readonly config: AppConfig,
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

  /** Exchanges a live refresh token for a new session and a new refresh token (rotation). */
  async refresh(token: string | undefined): Promise<IssuedSession> {
    const denied = () => unauthenticated('Your session has ended. Sign in again.');
    if (!token) throw denied();
    const row = await this.tokens.findByHash(hashToken(token));
    if (!row) throw denied();
    if (row.revokedAt) {
      // A rotated token presented again means it leaked: end every session of that user.
      if (await this.tokens.wasRotated(row.id)) {
        this.logger.warn(`refresh token reuse for user ${row.userId}; all sessions revoked`);
        await this.tokens.revokeAllForUser(row.userId);
      }
      throw denied();
    }
    if (row.expiresAt.getTime() <= Date.now()) throw denied();
    const user = await this.users.findById(row.userId);
    if (!user?.active) {
      await this.tokens.revokeAllForUser(row.userId);
      throw denied();
    }
    if (!(await this.tokens.revokeIfLive(row.id))) throw denied();
    return this.issue(user, row.id);
  }

  async signOut(token: string | undefined): Promise<void> {
    if (!token) return;
    const row = await this.tokens.findByHash(hashToken(token));
    if (row) await this.tokens.revokeIfLive(row.id);
  }

  private async issue(user: UserRow, rotatedFrom?: string): Promise<IssuedSession> {
    const claims: AccessTokenClaims = { sub: user.id, role: user.role, name: user.displayName };
    const accessToken = await this.jwt.signAsync(claims, { expiresIn: ACCESS_TOKEN_SECONDS });
    const refreshToken = randomBytes(32).toString('base64url');
    const days = this.config.settings.REFRESH_TTL_DAYS;
    const refreshExpiresAt = new Date(Date.now() + days * 24 * 3600 * 1000);
    await this.tokens.insert({
      userId: user.id,
      tokenHash: hashToken(refreshToken),
      expiresAt: refreshExpiresAt,
      ...(rotatedFrom ? { rotatedFrom } : {}),
    });
    return {
      session: { accessToken, expiresIn: ACCESS_TOKEN_SECONDS, user: toUser(user) },
      refreshToken,
      refreshExpiresAt,
    };
  }
}
