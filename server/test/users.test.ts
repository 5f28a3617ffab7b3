import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { userListSchema, userSchema } from '@holdfast/shared';
import { createTestContext, type TestContext } from './test-context.js';

const newUser = {
  email: 'New.Person@Holdfast.test',
  displayName: 'Noa Berg',
  initials: 'NB',
  role: 'engineer',
  password: 'a-long-enough-password',
};

describe('users admin API', () => {
  let ctx: TestContext;
  beforeAll(async () => {
    ctx = await createTestContext();
  });
  beforeEach(() => ctx.reset());
  afterAll(() => ctx?.close());

  it('lists every user for an admin, without password hashes', async () => {
    const res = await ctx.request('GET', '/api/users', { as: 'admin' });
    expect(res.status).toBe(200);
    const list = userListSchema.parse(res.body);
    expect(list.items.map((u) => u.email).sort()).toEqual([
      'admin@holdfast.test',
      'checker2@holdfast.test',
      'checker@holdfast.test',
      'engineer2@holdfast.test',
      'engineer@holdfast.test',
      'technician@holdfast.test',
      'viewer@holdfast.test',
    ]);
    expect(res.text).not.toMatch(/argon2|password/i);
  });

  it('creates a user (e-mail lower-cased) who can then sign in', async () => {
    const res = await ctx.request('POST', '/api/users', { as: 'admin', body: newUser });
    expect(res.status).toBe(201);
    expect(userSchema.parse(res.body)).toMatchObject({
      email: 'new.person@holdfast.test',
      role: 'engineer',
      active: true,
      unitSystem: 'SI',
    });
    const signIn = await ctx.request('POST', '/api/auth/sign-in', {
      body: { email: 'new.person@holdfast.test', password: newUser.password },
    });
    expect(signIn.status).toBe(200);
  });

  it('answers 409 for a duplicate e-mail, whatever its case', async () => {
    const res = await ctx.request('POST', '/api/users', {
      as: 'admin',
      body: { ...newUser, email: 'ENGINEER@holdfast.test' },
    });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('conflict');
  });

  it('validates the body field by field and rejects unknown fields', async () => {
    const res = await ctx.request('POST', '/api/users', {
      as: 'admin',
      body: {
        email: 'bad',
        displayName: 'X',
        initials: 'abc',
        role: 'boss',
        password: 'short',
        isAdmin: true,
      },
    });
    expect(res.status).toBe(400);
    const paths = (res.body.error.fields as { path: string }[]).map((f) => f.path).sort();
    expect(paths).toEqual(['displayName', 'email', 'initials', 'isAdmin', 'password', 'role']);
  });

  it('changes role and deactivates another user; deactivation ends their sessions', async () => {
    const id = await ctx.userId('engineer2');
    const { cookie } = await ctx.signIn('engineer2');
    const promoted = await ctx.request('PATCH', `/api/users/${id}`, {
      as: 'admin',
      body: { role: 'checker' },
    });
    expect(promoted.status).toBe(200);
    expect(promoted.body.role).toBe('checker');
    const off = await ctx.request('PATCH', `/api/users/${id}`, {
      as: 'admin',
      body: { active: false },
    });
    expect(off.status).toBe(200);
    expect(off.body.active).toBe(false);
    expect((await ctx.request('POST', '/api/auth/refresh', { cookie })).status).toBe(401);
    const signIn = await ctx.request('POST', '/api/auth/sign-in', {
      body: { email: 'engineer2@holdfast.test', password: 'holdfast-demo' },
    });
    expect(signIn.status).toBe(401);
  });

  it('a role change applies to the next request of a signed-in user', async () => {
    const token = await ctx.signIn('viewer').then((s) => s.session.accessToken);
    expect((await ctx.request('GET', '/api/users', { token })).status).toBe(403);
    await ctx.request('PATCH', `/api/users/${await ctx.userId('viewer')}`, {
      as: 'admin',
      body: { role: 'admin' },
    });
    expect((await ctx.request('GET', '/api/users', { token })).status).toBe(200);
  });

  it('an admin cannot deactivate or demote themselves (409), but may edit their own name', async () => {
    const self = await ctx.userId('admin');
    for (const body of [{ active: false }, { role: 'engineer' }]) {
      const res = await ctx.request('PATCH', `/api/users/${self}`, { as: 'admin', body });
      expect(res.status).toBe(409);
      expect(res.body.error.code).toBe('conflict');
    }
    const renamed = await ctx.request('PATCH', `/api/users/${self}`, {
      as: 'admin',
      body: { displayName: 'Sam Ortiz-Lee', role: 'admin' },
    });
    expect(renamed.status).toBe(200);
    expect(renamed.body).toMatchObject({
      displayName: 'Sam Ortiz-Lee',
      role: 'admin',
      active: true,
    });
  });

  it('answers 404 for an unknown user id and 400 for a malformed one', async () => {
    const missing = await ctx.request('PATCH', '/api/users/00000000-0000-4000-8000-000000000000', {
      as: 'admin',
      body: { displayName: 'Nobody Here' },
    });
    expect(missing.status).toBe(404);
    expect(missing.body.error.code).toBe('not_found');
    const malformed = await ctx.request('PATCH', '/api/users/not-a-uuid', {
      as: 'admin',
      body: {},
    });
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.fields).toEqual([{ path: 'id', message: 'must be a UUID' }]);
  });
});
