import { Injectable, Logger, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import { CompiledQuery, type Kysely } from 'kysely';
import PgBoss from 'pg-boss';
import type pg from 'pg';
import { createPool, type DB } from '@holdfast/db';
import { AppConfig } from '../config/app-config.js';
import type { Tx } from '../database/unit-of-work.js';
import { loadMailSettings } from '../mail/mail-settings.js';

export const MAIL_QUEUE = 'mail';
/** The hourly inspection-reminder pass (server/src/field-records/inspection-reminders.job.ts). */
export const REMINDER_QUEUE = 'inspection-reminders';

const QUERY_GRACE_MS = 2_000;

/**
 * pg-boss 10 on the application's database (schema `pgboss`). Jobs are inserted inside the
 * caller's transaction, so a job exists exactly when the state change that caused it committed.
 */
@Injectable()
export class JobQueue implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger('JobQueue');
  private readonly settings = loadMailSettings();
  readonly boss: PgBoss;
  private readonly pool: pg.Pool;
  /**
   * How long shutdown waits for a running job before pg-boss marks it failed (to run again).
   * A mail may take nodemailer's socket timeout (mailer.ts: 10 s).
   */
  stopTimeoutMs = 12_000;
  private closed = false;

  constructor(config: AppConfig) {
    // pg-boss runs on a pool of ours, so its connections get the same error handling as the
    // application's (a lost connection is logged, never an unhandled 'error' event).
    this.pool = createPool({
      connectionString: config.settings.DATABASE_URL,
      max: 3,
      onIdleError: (e) => this.logger.warn(`job queue connection lost: ${e.message}`),
    });
    const db = {
      executeSql: (text: string, values?: unknown[]) =>
        // pg-boss marks a job complete or failed without awaiting it. Should a handler outlive
        // shutdown, that late query would reject unhandled on the ended pool; it is dropped
        // instead (a promise that never settles holds nothing open). The job stays active,
        // expires and runs again, and the outbox row keeps a mail from going out twice.
        this.closed ? new Promise<never>(() => undefined) : this.pool.query(text, values),
    };
    this.boss = new PgBoss({ db, schema: 'pgboss' });
    this.boss.on('error', (e: Error) => this.logger.error(`pg-boss: ${e.message}`));
  }

  async onModuleInit(): Promise<void> {
    await this.boss.start();
    await this.boss.createQueue(MAIL_QUEUE, {
      name: MAIL_QUEUE,
      retryLimit: this.settings.MAIL_RETRY_LIMIT,
      retryDelay: this.settings.MAIL_RETRY_DELAY_SECONDS,
      retryBackoff: true,
    });
  }

  async onModuleDestroy(): Promise<void> {
    await this.boss.stop({ graceful: true, wait: true, timeout: this.stopTimeoutMs });
    // pg-boss sends a finished job's complete/fail query and stops at once; let it land before
    // the pool closes (a query still queued would never be served).
    await new Promise((resolve) => setImmediate(resolve));
    const deadline = Date.now() + QUERY_GRACE_MS;
    while (this.pool.waitingCount + this.pool.totalCount - this.pool.idleCount > 0) {
      if (Date.now() > deadline) break;
      await new Promise((resolve) => setTimeout(resolve, 10));
    }
    this.closed = true;
    await this.pool.end();
  }

  /**
   * Enqueue inside the caller's open transaction. Infrastructure, not a repository: pg-boss writes
   * its own SQL, and this runs it on the transaction's connection so the job commits with the
   * change. A `Tx` is the Kysely transaction underneath (unit-of-work.ts).
   */
  async sendIn(tx: Tx, queue: string, data: object): Promise<void> {
    const trx = tx as unknown as Kysely<DB>;
    const db = {
      executeSql: async (text: string, values: unknown[]) => {
        const result = await trx.executeQuery(CompiledQuery.raw(text, values));
        return { rows: result.rows as unknown[] };
      },
    };
    await this.boss.send(queue, data, {
      db,
      retryLimit: this.settings.MAIL_RETRY_LIMIT,
      retryDelay: this.settings.MAIL_RETRY_DELAY_SECONDS,
      retryBackoff: true,
    });
  }

  async work<T extends object>(queue: string, handler: (data: T) => Promise<void>): Promise<void> {
    await this.boss.work<T>(
      queue,
      { pollingIntervalSeconds: this.settings.OUTBOX_POLL_SECONDS },
      async (jobs) => {
        for (const job of jobs) await handler(job.data);
      },
    );
  }
}
