// A throwaway PostgreSQL cluster of its own, provisioned like `npm start` (owner and app roles,
// migrations and queues as the owner, demo users), and real server processes signed in as the
// app role. Fault tests stop this cluster; the shared test cluster other suites use is untouched.
import type { ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import pg from 'pg';
import { createDatabase, DEMO_PASSWORD, hashPassword, seedDemoUsers } from '@holdfast/db';
// @ts-expect-error plain ESM helper without type declarations
import { startCluster, freePortFrom } from '../../lib/postgres.mjs';
// @ts-expect-error plain ESM helper without type declarations
import { tryStartAppServer, stopChild } from '../../lib/app-server.mjs';
// @ts-expect-error plain ESM helper without type declarations
import { run } from '../../lib/run.mjs';

export const projectDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../..');

export interface Instance {
  url: string;
  child: ChildProcess;
  output(): string;
}

export interface FaultCluster {
  port: number;
  ownerUrl: string;
  appUrl: string;
  /** The cluster's superuser, for looking at what really is in the database. */
  adminUrl: string;
  /** `pg_ctl stop -m immediate`: a crash, not a shutdown. */
  crash(): Promise<void>;
  /** Start it again; resolves when PostgreSQL accepts connections. */
  restart(): Promise<void>;
  /** A server process on a free port, signed in as the app role. */
  startServer(env?: Record<string, string>): Promise<Instance>;
  query<T = Record<string, unknown>>(text: string, values?: unknown[]): Promise<T[]>;
  dispose(): Promise<void>;
}

export async function startFaultCluster(
  label: string,
  ports: { postgres: number; servers: number },
): Promise<FaultCluster> {
  const name = `pg-${label}-${process.pid}`;
  let port = 0;
  // Durable like production: with synchronous_commit off (the shared test cluster's setting) a
  // crash loses commits already acknowledged, which is exactly what these tests look for.
  const open = () => startCluster({ projectDir, name, port, durable: true, throwOnFail: true });
  // A port that looked free can still be taken by the time PostgreSQL binds it (loopback
  // clients use this range for their own ends too): try a few.
  let cluster: any;
  for (let attempt = 0; ; attempt++) {
    port = await freePortFrom(ports.postgres + Math.floor(Math.random() * 40));
    try {
      cluster = await open();
      break;
    } catch (e) {
      if (attempt >= 4) throw e;
    }
  }
  await cluster.ensureDatabase('holdfast');
  const ownerUrl: string = cluster.url('holdfast', 'owner');
  const env = { ...process.env, DATABASE_URL: ownerUrl };
  await run('node', [path.join(projectDir, 'db/dist/src/cli.js'), 'migrate'], { env, quiet: true });
  await run('node', [path.join(projectDir, 'server/dist/outbox/queue-install.js')], {
    env,
    quiet: true,
  });
  const owner = createDatabase({ connectionString: ownerUrl, max: 1 });
  await seedDemoUsers(owner, await hashPassword(DEMO_PASSWORD));
  await owner.destroy();

  const dataDir = mkdtempSync(path.join(tmpdir(), `holdfast-${label}-`));
  const servers: Instance[] = [];
  // Counted before any await: servers started together must not look for a port from the same
  // place (two at once both found the same free port and the second could not listen).
  let started = 0;
  const adminUrl: string = cluster.url('holdfast');
  return {
    port,
    ownerUrl,
    appUrl: cluster.url('holdfast', 'app'),
    adminUrl,
    crash: () => cluster.stop('immediate'),
    restart: async () => {
      for (let attempt = 0; ; attempt++) {
        try {
          await open();
          return;
        } catch (e) {
          if (attempt >= 20) throw e;
          await new Promise((r) => setTimeout(r, 50));
        }
      }
    },
    async startServer(extra = {}) {
      const serverPort: number = await freePortFrom(ports.servers + started++ * 5);
      const server: Instance = await tryStartAppServer(
        projectDir,
        {
          DATABASE_URL: cluster.url('holdfast', 'app'),
          PORT: String(serverPort),
          HOST: '127.0.0.1',
          PUBLIC_URL: 'http://holdfast.test',
          JWT_SECRET: 'fault-test-secret-fault-test-secret-0123456789',
          DATA_DIR: dataDir,
          S3_EMBEDDED: '1',
          S3_PORT: '0',
          MAIL_EMBEDDED: '0',
          LOGIN_THROTTLE_LIMIT: '100000',
          LOG_LEVEL: 'warn',
          NODE_ENV: 'test',
          ...extra,
        },
        { inherit: false, timeoutMs: 90000 },
      );
      servers.push(server);
      return server;
    },
    async query(text, values) {
      const client = new pg.Client({ connectionString: adminUrl });
      await client.connect();
      try {
        return (await client.query(text, values as unknown[])).rows;
      } finally {
        await client.end();
      }
    },
    async dispose() {
      // A process a test killed has exited already: waiting for its exit would wait for ever.
      for (const s of servers)
        if (s.child.exitCode === null && s.child.signalCode === null) await stopChild(s.child);
      await cluster.stop('immediate');
      rmSync(cluster.dataDir, { recursive: true, force: true });
      rmSync(path.join(path.dirname(cluster.dataDir), `${name}.secret`), { force: true });
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

/** fetch with JSON in and out; never throws for HTTP statuses. */
export async function call(
  base: string,
  method: string,
  p: string,
  opts: { token?: string; body?: unknown; cookie?: string; timeoutMs?: number } = {},
): Promise<{ status: number; body: any; headers: Headers }> {
  const headers: Record<string, string> = {};
  if (opts.token) headers.authorization = `Bearer ${opts.token}`;
  if (opts.cookie) headers.cookie = opts.cookie;
  if (opts.body !== undefined) headers['content-type'] = 'application/json';
  const res = await fetch(base + p, {
    method,
    headers,
    body: opts.body === undefined ? undefined : JSON.stringify(opts.body),
    signal: AbortSignal.timeout(opts.timeoutMs ?? 15000),
  });
  const text = await res.text();
  let body: unknown = text;
  if ((res.headers.get('content-type') ?? '').includes('json') && text) body = JSON.parse(text);
  return { status: res.status, body, headers: res.headers };
}

export async function signIn(base: string, who: string) {
  const res = await call(base, 'POST', '/api/auth/sign-in', {
    body: { email: `${who}@holdfast.test`, password: DEMO_PASSWORD },
  });
  if (res.status !== 200)
    throw new Error(`sign-in as ${who}: ${res.status} ${JSON.stringify(res.body)}`);
  return {
    token: res.body.accessToken as string,
    cookie: (res.headers.get('set-cookie') ?? '').split(';')[0] ?? '',
  };
}

/**
 * A site, a crane and its main-hoist brake position, made through the API; returns the position's
 * id. Each step may go to a different server (`bases` in turn), as behind a load balancer.
 */
export async function makeHoistPosition(
  bases: string[],
  token: string,
  site: { code: string; name: string },
): Promise<string> {
  const on = (k: number) => bases[k % bases.length]!;
  const s = await call(on(0), 'POST', '/api/register/sites', { token, body: site });
  const machine = await call(on(1), 'POST', '/api/register/machines', {
    token,
    body: { siteId: s.body.id, tag: 'CR-01', name: 'Ladle crane', kind: 'crane' },
  });
  const position = await call(on(2), 'POST', '/api/register/positions', {
    token,
    body: {
      machineId: machine.body.id,
      tag: 'MH-B1',
      description: 'Main hoist brake 1',
      motion: 'hoist',
    },
  });
  if (position.status !== 201)
    throw new Error(`position not created: ${position.status} ${JSON.stringify(position.body)}`);
  return position.body.id as string;
}

/**
 * A hoist sheet on the example duty, its values confirmed by the author in one save, then sent
 * for check; returns its document number and revision id.
 */
export async function submittedSheet(
  base: string,
  token: string,
  positionId: string,
  title: string,
): Promise<{ documentNumber: string; revisionId: string }> {
  const sheet = await call(base, 'POST', '/api/sheets', {
    token,
    body: { title, positionId, sheetType: 'hoist-shoe-brake', start: { kind: 'example' } },
  });
  if (sheet.status !== 201) throw new Error(`sheet: ${sheet.status} ${JSON.stringify(sheet.body)}`);
  const id = sheet.body.revisions[0].id as string;
  const rev = await call(base, 'GET', `/api/revisions/${id}`, { token });
  const confirmed = await call(base, 'PUT', `/api/revisions/${id}`, {
    token,
    body: {
      inputs: rev.body.inputs,
      unitSystem: rev.body.unitSystem,
      changeNote: 'Example duty confirmed for the test.',
      unconfirmed: [],
      rowVersion: rev.body.rowVersion,
    },
  });
  if (confirmed.status !== 200)
    throw new Error(`confirm: ${confirmed.status} ${JSON.stringify(confirmed.body)}`);
  const sub = await call(base, 'POST', `/api/revisions/${id}/submit`, {
    token,
    body: { rowVersion: confirmed.body.rowVersion, justification: 'Test submission.' },
  });
  if (sub.status !== 200) throw new Error(`submit: ${sub.status} ${JSON.stringify(sub.body)}`);
  return { documentNumber: sheet.body.documentNumber as string, revisionId: id };
}
