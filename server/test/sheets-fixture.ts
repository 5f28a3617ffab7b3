// Shared set-up of the sheets e2e suites: SMTP capture, embedded S3, the register and helpers.
import { SMTPServer } from 'smtp-server';
import { afterAll, beforeAll, beforeEach, expect } from 'vitest';
import { CriteriaService } from '../src/criteria/criteria.service.js';
import { seedDemoScenario } from '../src/demo/seed-demo.js';
import { JobQueue, MAIL_QUEUE } from '../src/outbox/job-queue.js';
import { createTestContext, type DemoLogin, type TestContext } from './test-context.js';

export interface CapturedMail {
  to: string[];
  raw: string;
}

export interface SmtpFake {
  port: number;
  mails: CapturedMail[];
  stop(): Promise<void>;
  start(): Promise<void>;
}

/** smtp-server on 127.0.0.1 capturing every message; stop/start keep the same port. */
export async function startSmtpFake(port = 0): Promise<SmtpFake> {
  const mails: CapturedMail[] = [];
  type Smtp = {
    server: import('node:net').Server;
    listen(port: number, host: string, cb: () => void): void;
    close(cb: () => void): void;
  };
  let server: Smtp | undefined;
  let bound = port;
  const start = async () => {
    server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      logger: false,
      onData(
        stream: NodeJS.ReadableStream,
        session: { envelope: { rcptTo: { address: string }[] } },
        cb: () => void,
      ) {
        const chunks: Buffer[] = [];
        stream.on('data', (c: Buffer) => chunks.push(c));
        stream.on('end', () => {
          mails.push({
            to: session.envelope.rcptTo.map((r) => r.address),
            // Undo quoted-printable soft breaks and escapes so tests can search the text.
            raw: Buffer.concat(chunks)
              .toString('utf8')
              .replace(/=\r?\n/g, '')
              .replace(/=([0-9A-F]{2})/g, (_m, h: string) => String.fromCharCode(parseInt(h, 16))),
          });
          cb();
        });
      },
    });
    await new Promise<void>((resolve, reject) => {
      const s = server as Smtp;
      s.listen(bound, '127.0.0.1', () => resolve());
      s.server.once('error', reject);
    });
    bound = (
      (server as unknown as { server: import('node:net').Server }).server.address() as {
        port: number;
      }
    ).port;
  };
  await start();
  return {
    get port() {
      return bound;
    },
    mails,
    start,
    stop: () =>
      new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve())),
  };
}

export interface SheetsContext extends TestContext {
  smtp: SmtpFake;
  /** reset() plus the shipped criteria sets again. */
  resetAll(): Promise<void>;
  closeAll(): Promise<void>;
}

/** The real app with embedded S3 (random port) and mail to a capturing SMTP fake. */
export async function createSheetsContext(
  extraEnv: Record<string, string> = {},
): Promise<SheetsContext> {
  const smtp = await startSmtpFake();
  Object.assign(process.env, {
    S3_EMBEDDED: '1',
    S3_PORT: '0',
    S3_BUCKET: 'holdfast-test',
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(smtp.port),
    MAIL_EMBEDDED: '0',
    MAIL_RETRY_DELAY_SECONDS: '1',
    MAIL_RETRY_LIMIT: '20',
    OUTBOX_POLL_SECONDS: '0.5',
    PUBLIC_URL: 'http://holdfast.test',
    ...extraEnv,
  });
  const ctx = await createTestContext({ env: { PUBLIC_URL: 'http://holdfast.test', ...extraEnv } });
  const criteria = ctx.app.get(CriteriaService);
  await criteria.onModuleInit();
  return Object.assign(ctx, {
    smtp,
    async resetAll() {
      await ctx.reset();
      // Jobs left queued by earlier files point at truncated outbox rows; the worker would
      // spend one poll on each before reaching this test's mail.
      await ctx.app.get(JobQueue).boss.purgeQueue(MAIL_QUEUE);
      await criteria.onModuleInit();
      smtp.mails.length = 0;
    },
    async closeAll() {
      await ctx.close();
      await smtp.stop();
    },
  });
}

/**
 * The usual suite: one app for the file, every table emptied and a fresh register before each
 * test. Read `suite.ctx` and `suite.reg` inside the tests (they are set by the hooks).
 */
export function sheetsSuite(): { ctx: SheetsContext; reg: Register } {
  const suite = {} as { ctx: SheetsContext; reg: Register };
  beforeAll(async () => {
    suite.ctx = await createSheetsContext();
  });
  beforeEach(async () => {
    await suite.ctx.resetAll();
    suite.reg = await makeRegister(suite.ctx);
  });
  afterAll(() => suite.ctx?.closeAll());
  return suite;
}

/**
 * A suite over the demo scenario: one app for the file, every table emptied once and the demo
 * made through the services before the first test. Read `suite.ctx` inside the tests.
 */
export function demoSuite(): { ctx: SheetsContext } {
  const suite = {} as { ctx: SheetsContext };
  beforeAll(async () => {
    suite.ctx = await createSheetsContext();
    await suite.ctx.resetAll();
    expect(await seedDemoScenario(suite.ctx.app)).toBe(true);
  }, 120_000);
  afterAll(() => suite.ctx?.closeAll());
  return suite;
}

export interface Register {
  siteId: string;
  machineId: string;
  positionId: string;
}

export async function makeRegister(ctx: TestContext, code = 'TST'): Promise<Register> {
  const site = await ctx.request('POST', '/api/register/sites', {
    as: 'engineer',
    body: { code, name: 'Test works' },
  });
  expect(site.status, site.text).toBe(201);
  const machine = await ctx.request('POST', '/api/register/machines', {
    as: 'engineer',
    body: { siteId: site.body.id, tag: 'CR-01', name: 'Ladle crane', kind: 'crane' },
  });
  expect(machine.status, machine.text).toBe(201);
  const position = await ctx.request('POST', '/api/register/positions', {
    as: 'engineer',
    body: {
      machineId: machine.body.id,
      tag: 'MH-B1',
      description: 'Main hoist brake 1',
      motion: 'hoist',
    },
  });
  expect(position.status, position.text).toBe(201);
  return { siteId: site.body.id, machineId: machine.body.id, positionId: position.body.id };
}

/**
 * A new sheet on the example duty. Its values come marked as unconfirmed; unless `confirm` is
 * false the author then confirms them all in one save (as the editor's "I have checked all"
 * does), so a test can submit straight away.
 */
export async function createSheet(
  ctx: TestContext,
  reg: Register,
  opts: { as?: DemoLogin; sheetType?: string; title?: string; confirm?: boolean } = {},
) {
  const as = opts.as ?? 'engineer';
  const res = await ctx.request('POST', '/api/sheets', {
    as,
    body: {
      title: opts.title ?? 'Main hoist brake',
      positionId: reg.positionId,
      sheetType: opts.sheetType ?? process.env.TEST_SHEET_TYPE ?? 'hoist-shoe-brake',
      start: { kind: 'example' },
    },
  });
  expect(res.status, res.text).toBe(201);
  if (opts.confirm !== false) await confirmAll(ctx, res.body.revisions[0].id, as);
  return res.body as {
    id: string;
    documentNumber: string;
    revisions: { id: string; label: string; state: string }[];
  };
}

/** The author confirms every value still marked on a draft, changing none. */
export async function confirmAll(ctx: TestContext, id: string, as: DemoLogin = 'engineer') {
  const rev = await getRevision(ctx, id, as);
  const res = await ctx.request('PUT', `/api/revisions/${id}`, {
    as,
    body: {
      inputs: rev.inputs,
      unitSystem: rev.unitSystem,
      changeNote: rev.changeNote ?? '',
      unconfirmed: [],
      rowVersion: rev.rowVersion,
    },
  });
  expect(res.status, res.text).toBe(200);
}

export async function getRevision(ctx: TestContext, id: string, as: DemoLogin = 'engineer') {
  const res = await ctx.request('GET', `/api/revisions/${id}`, { as });
  expect(res.status, res.text).toBe(200);
  return res.body;
}

/** Submit with a justification when checks fail, so flows do not depend on the defaults passing. */
export async function submit(ctx: TestContext, id: string, as: DemoLogin = 'engineer') {
  const rev = await getRevision(ctx, id, as);
  const res = await ctx.request('POST', `/api/revisions/${id}/submit`, {
    as,
    body: { rowVersion: rev.rowVersion, justification: 'Test justification.' },
  });
  expect(res.status, res.text).toBe(200);
  return res.body;
}

export async function approve(
  ctx: TestContext,
  id: string,
  as: DemoLogin = 'checker',
  note?: string,
) {
  const rev = await getRevision(ctx, id, as);
  // Like submit: a revision with failing checks is approved with a note saying why.
  const said = note ?? (rev.evaluation?.pass === false ? 'Test approval with checks failing.' : '');
  const res = await ctx.request('POST', `/api/revisions/${id}/approve`, {
    as,
    body: { rowVersion: rev.rowVersion, ...(said ? { note: said } : {}) },
  });
  expect(res.status, res.text).toBe(200);
  return res.body;
}

/** Polls `fn` (sync or async) until it gives a truthy value; throws after `timeoutMs`. */
export async function waitFor<T>(
  fn: () => T | undefined | false | Promise<T | undefined | false>,
  timeoutMs = 15000,
  stepMs = 100,
): Promise<T> {
  const start = Date.now();
  for (;;) {
    const v = await fn();
    if (v) return v;
    if (Date.now() - start > timeoutMs) throw new Error('timed out waiting');
    await new Promise((r) => setTimeout(r, stepMs));
  }
}
