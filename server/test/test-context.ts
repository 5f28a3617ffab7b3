import 'reflect-metadata';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { sql, type Kysely } from 'kysely';
import {
  createMigrationDatabase,
  DEMO_PASSWORD,
  hashPassword,
  migrateToLatest,
  seedDemoUsers,
  type DB,
  type UserRow,
} from '@holdfast/db';
import type { Role, Session } from '@holdfast/shared';
import { createApp } from '../src/app.js';
import { loadSettings, type AppSettings } from '../src/config/env.js';
import { Database } from '../src/database/database.js';
import { workerDatabaseUrl } from './worker-database.js';

/** The demo sign-ins: the part of the e-mail before @holdfast.test. */
export const demoLogins = [
  'engineer',
  'engineer2',
  'checker',
  'checker2',
  'viewer',
  'admin',
  'technician',
] as const;
export type DemoLogin = (typeof demoLogins)[number];
export const demoEmail = (who: DemoLogin) => `${who}@holdfast.test`;
export const roleOf = (who: DemoLogin): Role => who.replace(/2$/, '') as Role;
/** One login per role, for matrices. */
export const roleLogins: Record<Role, DemoLogin> = {
  engineer: 'engineer',
  checker: 'checker',
  viewer: 'viewer',
  admin: 'admin',
  technician: 'technician',
};

/**
 * Tables that `reset()` leaves alone besides Kysely's own: reference data that migrations insert.
 * Features add theirs with `preservedTables.add('name')` at the top of their test file.
 */
export const preservedTables = new Set<string>(['kysely_migration', 'kysely_migration_lock']);

export interface TestResponse<T = any> {
  status: number;
  body: T;
  text: string;
  headers: Headers;
}

export interface RequestOptions {
  /** Sign in as this demo user (cached) and send the Bearer token. */
  as?: DemoLogin;
  token?: string;
  body?: unknown;
  /** Raw request body (sent as is, with `contentType`). */
  raw?: string | Buffer;
  contentType?: string;
  cookie?: string;
  headers?: Record<string, string>;
}

export interface TestContext {
  app: NestExpressApplication;
  settings: AppSettings;
  baseUrl: string;
  /** The app's own typed Kysely (camelCase). */
  db: Kysely<DB>;
  request<T = any>(
    method: string,
    path: string,
    options?: RequestOptions,
  ): Promise<TestResponse<T>>;
  /** Signs in (uncached) and returns the session and the refresh cookie pair `hf_refresh=...`. */
  signIn(who: DemoLogin, password?: string): Promise<{ session: Session; cookie: string }>;
  /** A cached access token for a demo user. */
  token(who: DemoLogin): Promise<string>;
  /** The demo user's row id. */
  userId(who: DemoLogin): Promise<string>;
  /** Empties every table except preserved ones, then restores the demo users (same ids). */
  reset(): Promise<void>;
  close(): Promise<void>;
}

export interface TestContextOptions {
  /** Extra environment for this instance, e.g. { LOGIN_THROTTLE_LIMIT: '3' }. */
  env?: Record<string, string>;
  /** false: do not migrate or touch the database (for an app pointed at a dead database). */
  database?: boolean;
}

const migrated = new Map<string, Promise<unknown>>();
function migrateOnce(url: string): Promise<unknown> {
  let done = migrated.get(url);
  if (!done) {
    done = (async () => {
      const plain = createMigrationDatabase(url);
      try {
        await migrateToLatest(plain);
      } finally {
        await plain.destroy();
      }
    })();
    migrated.set(url, done);
  }
  return done;
}

/** Demo user rows per database, restored by reset() with the same ids. */
const demoSnapshots = new Map<string, UserRow[]>();

/**
 * Boots the real app on 127.0.0.1:<free port> against a per-worker database next to
 * process.env.DATABASE_URL (see worker-database.ts), migrated to latest and reset.
 */
export async function createTestContext(options: TestContextOptions = {}): Promise<TestContext> {
  const sourceUrl = options.env?.DATABASE_URL ?? process.env.DATABASE_URL;
  if (!sourceUrl)
    throw new Error(
      'DATABASE_URL is not set: export DATABASE_URL=$(node scripts/db-url.mjs holdfast_test --fresh)',
    );
  const useDb = options.database !== false;
  const url = useDb ? await workerDatabaseUrl(sourceUrl) : sourceUrl;
  if (useDb) await migrateOnce(url);

  const settings = loadSettings({
    PORT: '0',
    HOST: '127.0.0.1',
    JWT_SECRET: 'test-secret-test-secret-test-secret-0123456789',
    LOG_LEVEL: (process.env.TEST_LOG_LEVEL as string | undefined) ?? 'silent',
    LOGIN_THROTTLE_LIMIT: '1000',
    UI_DIST: path.join(mkdtempSync(path.join(tmpdir(), 'holdfast-no-ui-')), 'dist'),
    DATA_DIR: mkdtempSync(path.join(tmpdir(), 'holdfast-data-')),
    ...options.env,
    DATABASE_URL: url,
  });
  const { app } = await createApp(settings);
  await app.listen(0, '127.0.0.1');
  const address = app.getHttpServer().address() as { port: number };
  const baseUrl = `http://127.0.0.1:${address.port}`;
  const db = app.get(Database);
  const tokens = new Map<DemoLogin, string>();

  const request = async <T>(
    method: string,
    p: string,
    o: RequestOptions = {},
  ): Promise<TestResponse<T>> => {
    const headers: Record<string, string> = { ...o.headers };
    const token = o.token ?? (o.as ? await ctx.token(o.as) : undefined);
    if (token) headers.authorization = `Bearer ${token}`;
    if (o.cookie) headers.cookie = o.cookie;
    let body: string | Buffer | undefined;
    if (o.raw !== undefined) {
      body = o.raw;
      headers['content-type'] = o.contentType ?? 'application/octet-stream';
    } else if (o.body !== undefined) {
      body = JSON.stringify(o.body);
      headers['content-type'] = 'application/json';
    }
    const res = await fetch(baseUrl + p, { method, headers, body: body as RequestInit['body'] });
    const text = await res.text();
    let parsed: unknown = text;
    if ((res.headers.get('content-type') ?? '').includes('json') && text) parsed = JSON.parse(text);
    return { status: res.status, body: parsed as T, text, headers: res.headers };
  };

  const ctx: TestContext = {
    app,
    settings,
    baseUrl,
    db,
    request,
    async signIn(who, password = DEMO_PASSWORD) {
      const res = await request<Session>('POST', '/api/auth/sign-in', {
        body: { email: demoEmail(who), password },
      });
      if (res.status !== 200) throw new Error(`sign-in as ${who} gave ${res.status}: ${res.text}`);
      const setCookie = res.headers.get('set-cookie') ?? '';
      return { session: res.body, cookie: setCookie.split(';')[0] ?? '' };
    },
    async token(who) {
      const cached = tokens.get(who);
      if (cached) return cached;
      const { session } = await ctx.signIn(who);
      tokens.set(who, session.accessToken);
      return session.accessToken;
    },
    async userId(who) {
      const row = await db
        .selectFrom('users')
        .select('id')
        .where('email', '=', demoEmail(who))
        .executeTakeFirstOrThrow();
      return row.id;
    },
    async reset() {
      const { rows } = await sql<{ tablename: string }>`
        select tablename from pg_tables where schemaname = 'public'`.execute(db);
      const names = rows.map((r) => r.tablename).filter((t) => !preservedTables.has(t));
      if (names.length) {
        // Revisions and the audit trail refuse TRUNCATE (a trigger); tests sign in as the
        // cluster's superuser, which alone may switch triggers off for this transaction.
        await db.transaction().execute(async (tx) => {
          await sql`set local session_replication_role = replica`.execute(tx);
          await sql`truncate table ${sql.join(names.map((n) => sql.id(n)))} restart identity cascade`.execute(
            tx,
          );
        });
      }
      const snapshot = demoSnapshots.get(url);
      if (!snapshot) {
        // One argon2 hash for all demo users keeps resets fast; the password is the demo one.
        await seedDemoUsers(db, await hashPassword(DEMO_PASSWORD));
        demoSnapshots.set(url, await db.selectFrom('users').selectAll().execute());
      } else {
        await db.insertInto('users').values(snapshot).execute();
      }
    },
    async close() {
      await app.close();
    },
  };
  if (useDb) await ctx.reset();
  return ctx;
}
