import { randomBytes } from 'node:crypto';
import { Injectable, Logger } from '@nestjs/common';
import { hashPassword } from '@holdfast/db';
import type { CompletePasswordResetInput, PasswordResetIssued } from '@holdfast/shared';
import { AppConfig } from '../config/app-config.js';
import { badRequest, notFound } from '../common/errors/api-exception.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { OutboxService } from '../outbox/outbox.service.js';
import { UsersRepository } from '../users/users.repository.js';
import { assertStrongPassword } from '../users/users.service.js';
import { hashToken } from './auth.service.js';
import { PasswordResetsRepository } from './password-resets.repository.js';

/** How long a mailed reset link works. */
export const RESET_LINK_HOURS = 24;

/** Not an argon2 hash: no password verifies against it until the reset link is used. */
const LOCKED_PASSWORD = '!reset-pending';

/**
 * Admin password reset: the account's password stops working at once, every session ends, and
 * the user gets a one-time link (through the outbox) to set a new one. Only the link's SHA-256
 * is kept: the mail's text is blanked in the outbox once it is sent.
 */
@Injectable()
export class PasswordResetService {
  private readonly logger = new Logger('PasswordReset');

  constructor(
    private readonly units: UnitOfWork,
    private readonly resets: PasswordResetsRepository,
    private readonly users: UsersRepository,
    private readonly outbox: OutboxService,
    private readonly config: AppConfig,
  ) {}

  async issue(adminId: string, userId: string): Promise<PasswordResetIssued> {
    const token = randomBytes(32).toString('base64url');
    const expiresAt = new Date(Date.now() + RESET_LINK_HOURS * 3600 * 1000);
    const user = await this.units.run(async (tx) => {
      const row = await this.users.findById(userId, tx);
      if (!row) throw notFound('No such user.');
      await this.resets.closeOpen(userId, tx);
      await this.resets.insert(
        { userId, tokenHash: hashToken(token), requestedBy: adminId, expiresAt },
        tx,
      );
      await this.users.setPassword(userId, LOCKED_PASSWORD, tx);
      const link = `${this.config.settings.PUBLIC_URL.replace(/\/$/, '')}/reset-password#token=${token}`;
      await this.outbox.enqueueMail(
        tx,
        {
          to: [row.email],
          subject: '[Holdfast] Set a new password',
          text: [
            `Hello ${row.displayName},`,
            '',
            'An administrator has reset your Holdfast password. Your old password no longer works.',
            `Set a new one within ${RESET_LINK_HOURS} hours with this link (it works once):`,
            '',
            link,
            '',
            'If you did not expect this, tell your administrator.',
          ].join('\n'),
        },
        { secret: true },
      );
      return row;
    });
    this.logger.log(`password reset for user ${userId} by admin ${adminId}`);
    return { sentTo: user.email, expiresAt: expiresAt.toISOString() };
  }

  async complete(input: CompletePasswordResetInput): Promise<void> {
    const invalid = () =>
      badRequest('Some fields are not valid.', [
        { path: 'token', message: 'this link is not valid or has expired; ask for a new one' },
      ]);
    const reset = await this.resets.findByHash(hashToken(input.token));
    if (!reset || reset.usedAt || reset.expiresAt.getTime() <= Date.now()) throw invalid();
    const user = await this.users.findById(reset.userId);
    if (!user?.active) throw invalid();
    assertStrongPassword('newPassword', input.newPassword, [user.email, user.displayName]);
    const hash = await hashPassword(input.newPassword);
    await this.units.run(async (tx) => {
      if (!(await this.resets.markUsed(reset.id, tx))) throw invalid();
      await this.users.setPassword(user.id, hash, tx);
    });
  }
}
