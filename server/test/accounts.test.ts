import { createHmac } from 'node:crypto';
import { sql } from 'kysely';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { createSheetsContext, waitFor, type SheetsContext } from './sheets-fixture.js';
import { createTestContext, demoEmail, type TestContext } from './test-context.js';

const STRONG = 'copper lantern orbit meadow';
const cookieOf = (res: { headers: Headers }) =>
  (res.headers.get('set-cookie') ?? '').split(';')[0]!;

/** An HS256 token signed with the app's secret, with exactly the claims given. */
function forge(secret: string, claims: Record<string, unknown>): string {
  const part = (o: object) => Buffer.from(JSON.stringify(o)).toString('base64url');
  const body = `${part({ alg: 'HS256', typ: 'JWT' })}.${part(claims)}`;
  return `${body}.${createHmac('sha256', secret).update(body).digest('base64url')}`;
}

describe('sessions', () => {
  let ctx: TestContext;
  beforeAll(async () => {
    ctx = await createTestContext();
  });
  beforeEach(() => ctx.reset());
  afterAll(() => ctx?.close());

  it('lets two tabs refresh with the same cookie at once, and later reuse still ends every session', async () => {
    const { cookie } = await ctx.signIn('engineer');
    const [a, b] = await Promise.all([
      ctx.request('POST', '/api/auth/refresh', { cookie }),
      ctx.request('POST', '/api/auth/refresh', { cookie }),
    ]);
    expect([a.status, b.status]).toEqual([200, 200]);
    const late = await ctx.request('POST', '/api/auth/refresh', { cookie });
    expect(late.status).toBe(200);

    // Past the grace window the same old cookie is a stolen one.
    await sql`update refresh_tokens set revoked_at = now() - interval '1 minute'
      where revoked_at is not null`.execute(ctx.db);
    const reuse = await ctx.request('POST', '/api/auth/refresh', { cookie });
    expect(reuse.status).toBe(401);
    for (const next of [a, b, late]) {
      expect(
        (await ctx.request('POST', '/api/auth/refresh', { cookie: cookieOf(next) })).status,
      ).toBe(401);
      const me = await ctx.request('GET', '/api/auth/me', { token: next.body.accessToken });
      expect(me.status).toBe(401);
    }
  });

  it('refuses a correctly signed token without exp', async () => {
    const id = await ctx.userId('engineer');
    const secret = ctx.settings.JWT_SECRET;
    const base = { sub: id, role: 'engineer', name: 'Erin Vale', sv: 0 };
    const noExp = await ctx.request('GET', '/api/auth/me', { token: forge(secret, base) });
    expect(noExp.status).toBe(401);
    const withExp = forge(secret, { ...base, exp: Math.floor(Date.now() / 1000) + 60 });
    expect((await ctx.request('GET', '/api/auth/me', { token: withExp })).status).toBe(200);
  });

  it('ends the access token on sign-out, not only the refresh cookie', async () => {
    const { session, cookie } = await ctx.signIn('checker');
    expect((await ctx.request('GET', '/api/auth/me', { token: session.accessToken })).status).toBe(
      200,
    );
    expect((await ctx.request('POST', '/api/auth/sign-out', { cookie })).status).toBe(204);
    const after = await ctx.request('GET', '/api/auth/me', { token: session.accessToken });
    expect(after.status).toBe(401);
  });

  it('changes a password only with the current one and a strong new one; other sessions end', async () => {
    const other = await ctx.signIn('engineer');
    const mine = await ctx.signIn('engineer');
    const change = (body: object) =>
      ctx.request('POST', '/api/auth/password', { token: mine.session.accessToken, body });
    const wrong = await change({ currentPassword: 'not-the-password', newPassword: STRONG });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields).toEqual([
      { path: 'currentPassword', message: 'is not your current password' },
    ]);
    const weak = await change({ currentPassword: 'holdfast-demo', newPassword: 'password1234' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.fields[0].path).toBe('newPassword');
    expect(weak.body.error.fields[0].message).toMatch(/too easy to guess/);

    const ok = await change({ currentPassword: 'holdfast-demo', newPassword: STRONG });
    expect(ok.status).toBe(200);
    expect((await ctx.request('GET', '/api/auth/me', { token: ok.body.accessToken })).status).toBe(
      200,
    );
    expect(
      (await ctx.request('GET', '/api/auth/me', { token: other.session.accessToken })).status,
    ).toBe(401);
    expect((await ctx.request('POST', '/api/auth/refresh', { cookie: other.cookie })).status).toBe(
      401,
    );
    const signIn = (password: string) =>
      ctx.request('POST', '/api/auth/sign-in', {
        body: { email: demoEmail('engineer'), password },
      });
    expect((await signIn('holdfast-demo')).status).toBe(401);
    expect((await signIn(STRONG)).status).toBe(200);
  });

  it('refuses common passwords for new accounts, not only short ones', async () => {
    const res = await ctx.request('POST', '/api/users', {
      as: 'admin',
      body: {
        email: 'weak@holdfast.test',
        displayName: 'Weak Pass',
        initials: 'WP',
        role: 'viewer',
        password: 'qwertyuiop123',
      },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[0].path).toBe('password');
  });
});

describe('admin password reset', () => {
  let ctx: SheetsContext;
  beforeAll(async () => {
    ctx = await createSheetsContext();
  });
  beforeEach(() => ctx.resetAll());
  afterAll(() => ctx?.closeAll());

  it('locks the old password, ends sessions and mails a one-time link through the outbox', async () => {
    const viewer = await ctx.signIn('viewer');
    const id = await ctx.userId('viewer');
    expect(
      (await ctx.request('POST', `/api/users/${id}/password-reset`, { as: 'engineer' })).status,
    ).toBe(403);
    const res = await ctx.request('POST', `/api/users/${id}/password-reset`, { as: 'admin' });
    expect(res.status).toBe(202);
    expect(res.body.sentTo).toBe('viewer@holdfast.test');
    expect(
      (await ctx.request('GET', '/api/auth/me', { token: viewer.session.accessToken })).status,
    ).toBe(401);
    const signIn = (password: string) =>
      ctx.request('POST', '/api/auth/sign-in', { body: { email: demoEmail('viewer'), password } });
    expect((await signIn('holdfast-demo')).status).toBe(401);

    const mail = await waitFor(() =>
      ctx.smtp.mails.find((m) => m.to.includes('viewer@holdfast.test')),
    );
    const token = /reset-password#token=([A-Za-z0-9_-]+)/.exec(mail.raw)?.[1];
    expect(token).toBeTruthy();
    // Once sent, the outbox keeps no working link (the database holds only the token's hash).
    const stored = await waitFor(async () => {
      const rows = await ctx.db.selectFrom('outbox').select(['payload', 'sentAt']).execute();
      const row = rows.find((r) => JSON.stringify(r.payload).includes('Set a new password'));
      return row?.sentAt ? row : undefined;
    });
    expect(JSON.stringify(stored.payload)).not.toContain(token!);
    const weak = await ctx.request('POST', '/api/auth/password-reset', {
      body: { token, newPassword: 'password1234' },
    });
    expect(weak.status).toBe(400);
    const done = await ctx.request('POST', '/api/auth/password-reset', {
      body: { token, newPassword: STRONG },
    });
    expect(done.status).toBe(204);
    expect((await signIn(STRONG)).status).toBe(200);
    const again = await ctx.request('POST', '/api/auth/password-reset', {
      body: { token, newPassword: 'another lantern orbit field' },
    });
    expect(again.status).toBe(400);
    expect(again.body.error.fields[0].path).toBe('token');
  });
});

describe('sign-in throttling and proxies', () => {
  let ctx: TestContext;
  beforeAll(async () => {
    ctx = await createTestContext({
      env: { LOGIN_THROTTLE_IP_LIMIT: '5', TRUST_PROXY: 'loopback', API_DOCS: 'signed-in' },
    });
  });
  afterAll(() => ctx?.close());

  const attempt = (n: number, from: string) =>
    ctx.request('POST', '/api/auth/sign-in', {
      body: { email: `nobody${n}@holdfast.test`, password: 'wrong-password' },
      headers: { 'x-forwarded-for': from },
    });

  it('slows one address trying many e-mails, and tells clients apart behind a trusted proxy', async () => {
    for (let n = 0; n < 5; n++) expect((await attempt(n, '203.0.113.7')).status).toBe(401);
    expect((await attempt(5, '203.0.113.7')).status).toBe(429);
    expect((await attempt(6, '203.0.113.8')).status).toBe(401);
  });

  it('serves the API docs to signed-in users only', async () => {
    expect((await ctx.request('GET', '/api/docs-json')).status).toBe(401);
    expect((await ctx.request('GET', '/api/docs')).status).toBe(401);
    const ok = await ctx.request('GET', '/api/docs-json', { as: 'viewer' });
    expect(ok.status).toBe(200);
    expect(ok.body.info.title).toBe('Holdfast API');
  });
});
