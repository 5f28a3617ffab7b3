import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import type { Tx } from '../database/unit-of-work.js';
import { Mailer, type MailMessage } from '../mail/mailer.js';
import { JobQueue, MAIL_QUEUE } from './job-queue.js';
import { OutboxRepository } from './outbox.repository.js';

interface MailJob {
  outboxId: string;
}

/** What an outbox row holds: the message, and whether its text must not outlive delivery. */
type StoredMail = MailMessage & { secret?: boolean };

/** Stands in for the text of a sent mail that carried a one-time link. */
export const SENT_SECRET_TEXT = '(text removed after sending: it held a one-time link)';

/**
 * Notifications leave through the outbox: the message row and its delivery job are written in
 * the same transaction as the state change, and a pg-boss worker sends them with retries and
 * backoff. A mail outage therefore never blocks a workflow step and loses no message.
 */
@Injectable()
export class OutboxService implements OnApplicationBootstrap {
  private readonly logger = new Logger('Outbox');

  constructor(
    private readonly repo: OutboxRepository,
    private readonly queue: JobQueue,
    private readonly mailer: Mailer,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    await this.queue.work<MailJob>(MAIL_QUEUE, (job) => this.deliver(job.outboxId));
  }

  /**
   * Queue a mail inside the caller's transaction. No recipients: nothing is queued. A `secret`
   * mail (it carries a one-time link) has its text blanked once it is sent, so the database and
   * its backups never keep a working link longer than delivery needs.
   */
  async enqueueMail(trx: Tx, message: MailMessage, opts: { secret?: boolean } = {}): Promise<void> {
    if (message.to.length === 0) return;
    const payload: StoredMail = opts.secret ? { ...message, secret: true } : message;
    const outboxId = await this.repo.insertMail(JSON.stringify(payload), trx);
    await this.queue.sendIn(trx, MAIL_QUEUE, { outboxId } satisfies MailJob);
  }

  /** Send one outbox message; throws (so pg-boss retries) when SMTP fails. */
  async deliver(outboxId: string): Promise<void> {
    const row = await this.repo.find(outboxId);
    if (!row || row.sentAt) return;
    const { secret, ...message } = row.payload as StoredMail;
    try {
      await this.mailer.send(message);
    } catch (e) {
      const reason = e instanceof Error ? e.message : String(e);
      await this.repo.recordFailure(outboxId, reason);
      this.logger.warn(`mail ${outboxId} not sent yet (${reason}); will retry`);
      throw e;
    }
    await this.repo.recordSent(
      outboxId,
      secret ? JSON.stringify({ ...message, text: SENT_SECRET_TEXT }) : undefined,
    );
  }
}
