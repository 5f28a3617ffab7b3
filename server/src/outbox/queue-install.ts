// node server/dist/outbox/queue-install.js   (reads DATABASE_URL; run as the owner role)
//
// Installs (or upgrades) pg-boss's schema and creates the queues the server uses, then lets the
// app role use them. The server signs in as `holdfast_app`, which may not create tables; pg-boss
// makes one table per queue, so the queues are made here, beside the migrations, by the owner.
// When the server starts, pg-boss finds its schema current and the queues present.
import { pathToFileURL } from 'node:url';
import PgBoss from 'pg-boss';
import { loadMailSettings } from '../mail/mail-settings.js';
import { MAIL_QUEUE, REMINDER_QUEUE } from './job-queue.js';

/** pg-boss's own queue for cron schedules (created by its timekeeper when absent). */
const SCHEDULE_QUEUE = '__pgboss__send-it';
const APP_ROLE = 'holdfast_app';

export async function installQueues(connectionString: string): Promise<void> {
  const settings = loadMailSettings();
  const boss = new PgBoss({
    connectionString,
    schema: 'pgboss',
    max: 1,
    supervise: false,
    schedule: false,
  });
  boss.on('error', (e: Error) => console.error(`pg-boss: ${e.message}`));
  await boss.start();
  try {
    await boss.createQueue(MAIL_QUEUE, {
      name: MAIL_QUEUE,
      retryLimit: settings.MAIL_RETRY_LIMIT,
      retryDelay: settings.MAIL_RETRY_DELAY_SECONDS,
      retryBackoff: true,
    });
    await boss.createQueue(REMINDER_QUEUE, { name: REMINDER_QUEUE });
    await boss.createQueue(SCHEDULE_QUEUE, { name: SCHEDULE_QUEUE });
    const db = boss.getDb() as { executeSql(text: string): Promise<unknown> };
    await db.executeSql(`
      do $$ begin
        if exists (select from pg_roles where rolname = '${APP_ROLE}') then
          grant usage on schema pgboss to ${APP_ROLE};
          grant select, insert, update, delete on all tables in schema pgboss to ${APP_ROLE};
        end if;
      end $$`);
  } finally {
    await boss.stop({ graceful: false, wait: true });
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  const url = process.env.DATABASE_URL;
  if (!url) {
    console.error('queue-install: DATABASE_URL is not set');
    process.exit(1);
  }
  installQueues(url).then(
    () => console.log('job queues ready'),
    (e: unknown) => {
      console.error(`queue-install: ${e instanceof Error ? e.message : String(e)}`);
      process.exitCode = 1;
    },
  );
}
