import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { apiErrorSchema, sessionSchema, userSchema } from '@holdfast/shared';
import { createTestContext, demoEmail, type TestContext } from './test-context.js';

const decodeClaims = (jwt: string) =>
  JSON.parse(Buffer.from(jwt.split('.')[1] ?? '', 'base64url').toString('utf8')) as Record<
    string,
    unknown
  >;

describe('auth: sign-in, me, refresh, sign-out', () => {
  let ctx: TestContext;
  beforeAll(async () => {
    ctx = await createTestContext();
  });
  beforeEach(() => ctx.reset());
  afterAll(() => ctx?.close());

  it('signs in a demo user: session body, JWT claims and a strict httpOnly refresh cookie', async () => {
    const res = await ctx.request('POST', '/api/auth/sign-in', {
      body: { email: 'Checker@Holdfast.test ', password: 'holdfast-demo' },
    });
    expect(res.status).toBe(200);
    const session = sessionSchema.parse(res.body);
    expect(session.user).toMatchObject({
      email: 'checker@holdfast.test',
      displayName: 'Mara Lind',
      initials: 'ML',
      role: 'checker',
    });
    expect(session.expiresIn).toBe(900);
    const claims = decodeClaims(session.accessToken);
    expect(claims).toMatchObject({ sub: session.user.id, role: 'checker', name: 'Mara Lind' });
    expect(Number(claims.exp) - Number(claims.iat)).toBe(900);
    const cookie = res.headers.get('set-cookie') ?? '';
    expect(cookie).toMatch(/^hf_refresh=[\w-]{40,};/);
    expect(cookie).toContain('HttpOnly');
    expect(cookie).toContain('SameSite=Strict');
    expect(cookie).toContain('Path=/api/auth');
    expect(JSON.stringify(res.body)).not.toContain(
      cookie.split(';')[0]!.slice('hf_refresh='.length),
    );
  });

  it('rejects a wrong password and an unknown e-mail with the same 401', async () => {
    const wrong = await ctx.request('POST', '/api/auth/sign-in', {
      body: { email: demoEmail('engineer'), password: 'nope-nope-nope' },
    });
    const unknown = await ctx.request('POST', '/api/auth/sign-in', {
      body: { email: 'nobody@holdfast.test', password: 'holdfast-demo' },
    });
    for (const res of [wrong, unknown]) {
      expect(res.status).toBe(401);
      expect(apiErrorSchema.parse(res.body).error.code).toBe('unauthenticated');
      expect(res.headers.get('set-cookie')).toBeNull();
    }
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
  });

  it('rejects a malformed sign-in body with field errors and unknown fields', async () => {
    const res = await ctx.request('POST', '/api/auth/sign-in', {
      body: { email: 'not-an-email', remember: true },
    });
    expect(res.status).toBe(400);
    const paths = apiErrorSchema.parse(res.body).error.fields?.map((f) => f.path);
    expect(paths).toEqual(expect.arrayContaining(['email', 'password', 'remember']));
  });

  it('refuses an inactive user at sign-in', async () => {
    await ctx.db
      .updateTable('users')
      .set({ active: false })
      .where('email', '=', demoEmail('viewer'))
      .execute();
    const res = await ctx.request('POST', '/api/auth/sign-in', {
      body: { email: demoEmail('viewer'), password: 'holdfast-demo' },
    });
    expect(res.status).toBe(401);
  });

  it('GET /api/auth/me returns the signed-in user; 401 without or with a bad token', async () => {
    const me = await ctx.request('GET', '/api/auth/me', { as: 'engineer2' });
    expect(me.status).toBe(200);
    expect(userSchema.parse(me.body)).toMatchObject({
      email: 'engineer2@holdfast.test',
      initials: 'TR',
      role: 'engineer',
      unitSystem: 'SI',
    });
    expect(me.body).not.toHaveProperty('passwordHash');
    expect((await ctx.request('GET', '/api/auth/me')).status).toBe(401);
    const token = await ctx.token('engineer2');
    const tampered = token.slice(0, -3) + (token.endsWith('aaa') ? 'bbb' : 'aaa');
    const bad = await ctx.request('GET', '/api/auth/me', { token: tampered });
    expect(bad.status).toBe(401);
    expect(bad.body.error.code).toBe('unauthenticated');
  });

  it('a deactivated user loses access at once, even with a live access token', async () => {
    const token = await ctx.token('viewer');
    await ctx.db
      .updateTable('users')
      .set({ active: false })
      .where('email', '=', demoEmail('viewer'))
      .execute();
    expect((await ctx.request('GET', '/api/auth/me', { token })).status).toBe(401);
  });

  it('ends a remembered user at once when another process changes the row (change notice)', async () => {
    const token = await ctx.token('checker2');
    // Read twice: the second answer comes from the memory of signed-in users.
    for (let i = 0; i < 2; i++)
      expect((await ctx.request('GET', '/api/auth/me', { token })).status).toBe(200);
    // As another server process would sign the user out: straight in the database.
    await ctx.db
      .updateTable('users')
      .set((eb) => ({ sessionVersion: eb('sessionVersion', '+', 1) }))
      .where('email', '=', demoEmail('checker2'))
      .execute();
    let status = 0;
    const deadline = Date.now() + 2000;
    while (Date.now() < deadline && status !== 401) {
      status = (await ctx.request('GET', '/api/auth/me', { token })).status;
      if (status !== 401) await new Promise((r) => setTimeout(r, 20));
    }
    expect(status).toBe(401);
  });

  it('PATCH /api/auth/me changes only the unit system preference', async () => {
    const res = await ctx.request('PATCH', '/api/auth/me', {
      as: 'viewer',
      body: { unitSystem: 'US' },
    });
    expect(res.status).toBe(200);
    expect(res.body.unitSystem).toBe('US');
    expect((await ctx.request('GET', '/api/auth/me', { as: 'viewer' })).body.unitSystem).toBe('US');
    const bad = await ctx.request('PATCH', '/api/auth/me', {
      as: 'viewer',
      body: { unitSystem: 'imperial' },
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0].path).toBe('unitSystem');
    const sneaky = await ctx.request('PATCH', '/api/auth/me', {
      as: 'viewer',
      body: { unitSystem: 'SI', role: 'admin' },
    });
    expect(sneaky.status).toBe(400);
    expect(sneaky.body.error.fields).toContainEqual({
      path: 'role',
      message: 'is not a known field',
    });
    expect((await ctx.request('GET', '/api/auth/me', { as: 'viewer' })).body.role).toBe('viewer');
  });

  it('PATCH /api/auth/me sets the number format on its own and keeps the unit system', async () => {
    const before = await ctx.request('GET', '/api/auth/me', { as: 'engineer2' });
    expect(before.body.numberFormat).toBe('point');
    const res = await ctx.request('PATCH', '/api/auth/me', {
      as: 'engineer2',
      body: { numberFormat: 'comma' },
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ numberFormat: 'comma', unitSystem: before.body.unitSystem });
    const again = await ctx.request('GET', '/api/auth/me', { as: 'engineer2' });
    expect(again.body.numberFormat).toBe('comma');
    const bad = await ctx.request('PATCH', '/api/auth/me', {
      as: 'engineer2',
      body: { numberFormat: 'dot' },
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0].path).toBe('numberFormat');
    await ctx.request('PATCH', '/api/auth/me', {
      as: 'engineer2',
      body: { numberFormat: 'point' },
    });
  });

  it('refresh rotates the cookie: the new one works, the old one is refused and ends the family', async () => {
    const { cookie } = await ctx.signIn('engineer');
    const first = await ctx.request('POST', '/api/auth/refresh', { cookie });
    expect(first.status).toBe(200);
    const session = sessionSchema.parse(first.body);
    expect(session.user.email).toBe('engineer@holdfast.test');
    const rotated = (first.headers.get('set-cookie') ?? '').split(';')[0]!;
    expect(rotated).toMatch(/^hf_refresh=/);
    expect(rotated).not.toBe(cookie);
    expect((await ctx.request('GET', '/api/auth/me', { token: session.accessToken })).status).toBe(
      200,
    );

    // Presenting the old token again after the grace window (REFRESH_GRACE_SECONDS) for a
    // second tab looks like theft: refused, and the new one dies too.
    await ctx.db
      .updateTable('refreshTokens')
      .set({ revokedAt: new Date(Date.now() - 60_000) })
      .where('revokedAt', 'is not', null)
      .execute();
    expect((await ctx.request('POST', '/api/auth/refresh', { cookie })).status).toBe(401);
    expect((await ctx.request('POST', '/api/auth/refresh', { cookie: rotated })).status).toBe(401);
  });

  it('refresh answers 401 without a cookie, with an unknown one, and for an expired one', async () => {
    expect((await ctx.request('POST', '/api/auth/refresh')).status).toBe(401);
    expect(
      (await ctx.request('POST', '/api/auth/refresh', { cookie: 'hf_refresh=made-up' })).status,
    ).toBe(401);
    const { cookie } = await ctx.signIn('checker2');
    await ctx.db
      .updateTable('refreshTokens')
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .execute();
    const expired = await ctx.request('POST', '/api/auth/refresh', { cookie });
    expect(expired.status).toBe(401);
    expect(expired.body.error.code).toBe('unauthenticated');
  });

  it('refresh is refused once the user has been deactivated', async () => {
    const { cookie } = await ctx.signIn('engineer2');
    await ctx.db
      .updateTable('users')
      .set({ active: false })
      .where('email', '=', demoEmail('engineer2'))
      .execute();
    expect((await ctx.request('POST', '/api/auth/refresh', { cookie })).status).toBe(401);
  });

  it('sign-out revokes the refresh token and clears the cookie', async () => {
    const { cookie } = await ctx.signIn('admin');
    const out = await ctx.request('POST', '/api/auth/sign-out', { cookie });
    expect(out.status).toBe(204);
    expect(out.headers.get('set-cookie')).toMatch(/^hf_refresh=;.*Expires=Thu, 01 Jan 1970/);
    expect((await ctx.request('POST', '/api/auth/refresh', { cookie })).status).toBe(401);
    const live = await ctx.db
      .selectFrom('refreshTokens')
      .select('id')
      .where('revokedAt', 'is', null)
      .execute();
    expect(live).toHaveLength(0);
    // Signing out without a session is harmless.
    expect((await ctx.request('POST', '/api/auth/sign-out')).status).toBe(204);
  });

  it('stores only a hash of the refresh token and an argon2id hash of the password', async () => {
    const { cookie } = await ctx.signIn('engineer');
    const token = cookie.slice('hf_refresh='.length);
    const rows = await ctx.db.selectFrom('refreshTokens').select('tokenHash').execute();
    expect(rows).toHaveLength(1);
    expect(rows[0]!.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(rows[0]!.tokenHash).not.toContain(token);
    const user = await ctx.db
      .selectFrom('users')
      .select('passwordHash')
      .where('email', '=', demoEmail('engineer'))
      .executeTakeFirstOrThrow();
    expect(user.passwordHash).toMatch(/^\$argon2id\$/);
  });
});

describe('auth: sign-in throttling', () => {
  let ctx: TestContext;
  beforeAll(async () => {
    ctx = await createTestContext({
      env: { LOGIN_THROTTLE_LIMIT: '3', LOGIN_THROTTLE_TTL_SECONDS: '60' },
    });
  });
  afterAll(() => ctx?.close());

  it('answers 429 after the limit for one address and e-mail, and keeps other e-mails open', async () => {
    const attempt = (email: string, password = 'wrong-password') =>
      ctx.request('POST', '/api/auth/sign-in', { body: { email, password } });
    const statuses = [];
    for (let i = 0; i < 4; i++) statuses.push((await attempt(demoEmail('engineer'))).status);
    expect(statuses).toEqual([401, 401, 401, 429]);
    const blocked = await attempt(demoEmail('engineer'), 'holdfast-demo');
    expect(blocked.status).toBe(429);
    expect(apiErrorSchema.parse(blocked.body).error.code).toBe('too_many_requests');
    expect(
      blocked.headers.get('retry-after-login') ?? blocked.headers.get('retry-after'),
    ).toBeTruthy();
    expect((await attempt(demoEmail('checker'), 'holdfast-demo')).status).toBe(200);
  });
});
