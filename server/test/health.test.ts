import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { healthSchema } from '@holdfast/shared';
import { createTestContext, type TestContext } from './test-context.js';

describe('GET /api/health', () => {
  let ctx: TestContext;
  beforeAll(async () => {
    ctx = await createTestContext();
  });
  afterAll(() => ctx?.close());

  it('answers 200 with database ok when PostgreSQL answers', async () => {
    const res = await ctx.request('GET', '/api/health');
    expect(res.status).toBe(200);
    expect(healthSchema.parse(res.body)).toMatchObject({ status: 'ok', database: 'ok' });
    expect(res.body.version).toMatch(/^\d+\.\d+\.\d+/);
    expect(res.headers.get('cache-control')).toBe('no-store');
  });

  it('answers 503 degraded within about a second while the database refuses connections, 200 again after', async () => {
    // The cluster is shared, so instead of stopping it this closes the app's own database:
    // no new connections, existing ones terminated. Other databases are untouched.
    const name = decodeURIComponent(new URL(ctx.settings.DATABASE_URL).pathname.slice(1));
    const admin = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await admin.connect();
    try {
      await admin.query(`alter database "${name}" allow_connections false`);
      await admin.query(
        'select pg_terminate_backend(pid) from pg_stat_activity where datname = $1',
        [name],
      );
      const started = Date.now();
      const res = await ctx.request('GET', '/api/health');
      expect(res.status).toBe(503);
      expect(healthSchema.parse(res.body)).toMatchObject({ status: 'degraded', database: 'down' });
      expect(Date.now() - started).toBeLessThan(2500);
    } finally {
      await admin.query(`alter database "${name}" allow_connections true`);
      await admin.end();
    }
    const back = await ctx.request('GET', '/api/health');
    expect(back.status).toBe(200);
    expect(back.body.database).toBe('ok');
  });

  it('sends security headers and no CORS permission to other origins', async () => {
    const res = await ctx.request('GET', '/api/health', {
      headers: { origin: 'http://elsewhere.test' },
    });
    expect(res.headers.get('content-security-policy')).toContain("script-src 'self'");
    expect(res.headers.get('x-content-type-options')).toBe('nosniff');
    expect(res.headers.get('access-control-allow-origin')).toBeNull();
    expect(res.headers.get('x-powered-by')).toBeNull();
  });
});
