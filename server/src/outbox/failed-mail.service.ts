import { Injectable, Logger } from '@nestjs/common';
import type { FailedMail } from '@holdfast/shared';
import { notFound } from '../common/errors/api-exception.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { loadMailSettings } from '../mail/mail-settings.js';
import type { MailMessage } from '../mail/mailer.js';
import { JobQueue, MAIL_QUEUE } from './job-queue.js';
import { OutboxRepository } from './outbox.repository.js';

/**
 * Mail that failed for good: the outbox row is unsent after the first try plus every retry
 * (MAIL_RETRY_LIMIT). pg-boss has given up on its job, so without this list nobody would see it.
 */
@Injectable()
export class FailedMailService {
  private readonly logger = new Logger('FailedMail');
  private readonly retryLimit = loadMailSettings().MAIL_RETRY_LIMIT;

  constructor(
    private readonly repo: OutboxRepository,
    private readonly units: UnitOfWork,
    private readonly queue: JobQueue,
  ) {}

  async list(): Promise<FailedMail[]> {
    const rows = await this.repo.failed(this.retryLimit);
    return rows.map((r) => {
      const message = r.payload as MailMessage;
      return {
        id: r.id,
        to: message.to,
        subject: message.subject,
        attempts: r.attempts,
        lastError: r.lastError,
        createdAt: r.createdAt.toISOString(),
      };
    });
  }

  /** Queue a failed mail again with a fresh set of retries. */
  async resend(id: string, adminId: string): Promise<void> {
    await this.units.run(async (tx) => {
      if (!(await this.repo.resetFailed(id, this.retryLimit, tx)))
        throw notFound('No failed mail with this id.');
      await this.queue.sendIn(tx, MAIL_QUEUE, { outboxId: id });
    });
    this.logger.log(`mail ${id} queued again by admin ${adminId}`);
  }
}
