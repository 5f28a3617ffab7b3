import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AppConfig } from '../src/config/app-config.js';
import { JobQueue } from '../src/outbox/job-queue.js';
import { createTestContext, type TestContext } from './test-context.js';

// A job still running when the server shuts down: pg-boss stops waiting after its timeout and
// then marks the job without awaiting the query. Closing the pool under it left an unhandled
// rejection ("Cannot use a pool after calling end on the pool") that ended a later test file.

const gate = () => {
  let open!: () => void;
  const opened = new Promise<void>((resolve) => (open = resolve));
  return { opened, open };
};

describe('job queue shutdown with a job still running', () => {
  let ctx: TestContext;
  let client: pg.Client;
  const rejections: unknown[] = [];
  const onRejection = (reason: unknown) => rejections.push(reason);

  beforeAll(async () => {
    ctx = await createTestContext();
    client = new pg.Client({ connectionString: ctx.settings.DATABASE_URL });
    await client.connect();
    process.on('unhandledRejection', onRejection);
  });
  afterAll(async () => {
    process.off('unhandledRejection', onRejection);
    await client?.end();
    await ctx?.close();
  });

  const jobState = async (queue: string, id: string) => {
    const { rows } = await client.query<{ state: string }>(
      'select state from pgboss.job where name = $1 and id = $2',
      [queue, id],
    );
    return rows[0]?.state;
  };

  /** A queue of its own with a handler that waits for `release`; returns once it has started. */
  const startBlockedJob = async (queue: string, release: Promise<void>) => {
    const jobs = new JobQueue(new AppConfig(ctx.settings));
    await jobs.onModuleInit();
    await jobs.boss.createQueue(queue);
    const started = gate();
    await jobs.work(queue, async () => {
      started.open();
      await release;
    });
    const id = await jobs.boss.send(queue, {});
    if (!id) throw new Error('job not sent');
    await started.opened;
    return { jobs, id };
  };

  it('waits for a running job and records it complete before the pool closes', async () => {
    const release = gate();
    const { jobs, id } = await startBlockedJob('shutdown-probe-late', release.opened);
    jobs.stopTimeoutMs = 3000;
    setTimeout(release.open, 1200);
    await jobs.onModuleDestroy();
    await new Promise((resolve) => setTimeout(resolve, 200));
    expect(rejections).toEqual([]);
    expect(await jobState('shutdown-probe-late', id)).toBe('completed');
  });

  it('lets a job that outlives the wait finish without an unhandled rejection', async () => {
    const release = gate();
    const { jobs, id } = await startBlockedJob('shutdown-probe-stuck', release.opened);
    jobs.stopTimeoutMs = 1000;
    await jobs.onModuleDestroy();
    // pg-boss marked it failed at the timeout, so it runs again on the next start.
    expect(await jobState('shutdown-probe-stuck', id)).toMatch(/^(retry|failed)$/);
    release.open();
    await new Promise((resolve) => setTimeout(resolve, 300));
    expect(rejections).toEqual([]);
  });
});
