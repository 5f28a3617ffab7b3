import { Injectable, Logger } from '@nestjs/common';
import type { FailedMail } from '@holdfast/shared';
import { notFound } from '../common/errors/api-exception.js';
import { Database } from '../database/database.js';
import { loadMailSettings } from '../mail/mail-settings.js';
import type { MailMessage } from '../mail/mailer.js';
import { JobQueue, MAIL_QUEUE } from './job-queue.js';

/**
 * Mail that failed for good: the outbox row is unsent after the first try plus every retry
 * (MAIL_RETRY_LIMIT). pg-boss has given up on its job, so without this list nobody would see it.
 */
@Injectable()
export class FailedMailService {
  private readonly logger = new Logger('FailedMail');
  private readonly retryLimit = loadMailSettings().MAIL_RETRY_LIMIT;

  constructor(
    private readonly db: Database,
    private readonly queue: JobQueue,
  ) {}

  async list(): Promise<FailedMail[]> {
    const rows = await this.db
      .selectFrom('outbox')
      .selectAll()
      .where('sentAt', 'is', null)
      .where('attempts', '>', this.retryLimit)
      .orderBy('createdAt', 'desc')
      .limit(200)
      .execute();
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
    await this.db.transaction().execute(async (trx) => {
      const reset = await trx
        .updateTable('outbox')
        .set({ attempts: 0, lastError: null })
        .where('id', '=', id)
        .where('sentAt', 'is', null)
        .where('attempts', '>', this.retryLimit)
        .executeTakeFirst();
      if (reset.numUpdatedRows === 0n) throw notFound('No failed mail with this id.');
      await this.queue.sendIn(trx, MAIL_QUEUE, { outboxId: id });
    });
    this.logger.log(`mail ${id} queued again by admin ${adminId}`);
  }
}
