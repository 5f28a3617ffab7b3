import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { listRoutes } from '../src/common/routes/list-routes.js';
import { NIL_ID, routeKey, type Caller } from './route-matrix.js';
import { createTestContext, roleLogins, type TestContext } from './test-context.js';

type Row = { method: string; path: string; body?: unknown } & Record<Caller, number>;

// Exact statuses for the foundation routes. Probes use an empty or harmless body and an id that
// matches nothing, so allowed callers reach validation (400), a missing row (404) or success.
const matrix: Row[] = [
  {
    method: 'GET',
    path: '/api/health',
    anonymous: 200,
    engineer: 200,
    checker: 200,
    viewer: 200,
    technician: 200,
    admin: 200,
  },
  {
    method: 'POST',
    path: '/api/auth/sign-in',
    body: {},
    anonymous: 400,
    engineer: 400,
    checker: 400,
    viewer: 400,
    technician: 400,
    admin: 400,
  },
  {
    method: 'POST',
    path: '/api/auth/refresh',
    anonymous: 401,
    engineer: 401,
    checker: 401,
    viewer: 401,
    technician: 401,
    admin: 401,
  },
  {
    method: 'POST',
    path: '/api/auth/sign-out',
    anonymous: 204,
    engineer: 204,
    checker: 204,
    viewer: 204,
    technician: 204,
    admin: 204,
  },
  {
    method: 'GET',
    path: '/api/auth/me',
    anonymous: 401,
    engineer: 200,
    checker: 200,
    viewer: 200,
    technician: 200,
    admin: 200,
  },
  {
    method: 'PATCH',
    path: '/api/auth/me',
    body: { unitSystem: 'SI' },
    anonymous: 401,
    engineer: 200,
    checker: 200,
    viewer: 200,
    technician: 200,
    admin: 200,
  },
  {
    method: 'GET',
    path: '/api/users',
    anonymous: 401,
    engineer: 403,
    checker: 403,
    viewer: 403,
    technician: 403,
    admin: 200,
  },
  {
    method: 'POST',
    path: '/api/users',
    body: {},
    anonymous: 401,
    engineer: 403,
    checker: 403,
    viewer: 403,
    technician: 403,
    admin: 400,
  },
  {
    method: 'PATCH',
    path: `/api/users/${NIL_ID}`,
    body: { displayName: 'Probe User' },
    anonymous: 401,
    engineer: 403,
    checker: 403,
    viewer: 403,
    technician: 403,
    admin: 404,
  },
  {
    method: 'POST',
    path: '/api/auth/password',
    body: {},
    anonymous: 401,
    engineer: 400,
    checker: 400,
    viewer: 400,
    technician: 400,
    admin: 400,
  },
  {
    method: 'POST',
    path: '/api/auth/password-reset',
    body: {},
    anonymous: 400,
    engineer: 400,
    checker: 400,
    viewer: 400,
    technician: 400,
    admin: 400,
  },
  {
    method: 'POST',
    path: `/api/users/${NIL_ID}/password-reset`,
    anonymous: 401,
    engineer: 403,
    checker: 403,
    viewer: 403,
    technician: 403,
    admin: 404,
  },
];
const callers: Caller[] = ['anonymous', 'engineer', 'checker', 'viewer', 'technician', 'admin'];

describe('foundation routes × roles', () => {
  let ctx: TestContext;
  beforeAll(async () => {
    ctx = await createTestContext();
  });
  beforeEach(() => ctx.reset());
  afterAll(() => ctx?.close());

  it('covers every route of the foundation controllers', () => {
    const foundation = listRoutes(ctx.app).filter((r) =>
      ['AuthController', 'UsersController', 'UserPasswordController', 'HealthController'].includes(
        r.controller,
      ),
    );
    const covered = new Set(matrix.map((r) => `${r.method} ${r.path.replace(NIL_ID, ':id')}`));
    expect(foundation.map(routeKey).filter((k) => !covered.has(k))).toEqual([]);
  });

  for (const row of matrix) {
    it(`${row.method} ${row.path.replace(NIL_ID, ':id')}`, async () => {
      const got: Record<string, number> = {};
      for (const caller of callers) {
        const res = await ctx.request(row.method, row.path, {
          ...(caller === 'anonymous' ? {} : { as: roleLogins[caller] }),
          ...(row.body !== undefined ? { body: row.body } : {}),
        });
        got[caller] = res.status;
        expect(res.headers.get('content-type') ?? 'none', `${caller}`).not.toMatch(/html/);
      }
      expect(got).toEqual(Object.fromEntries(callers.map((c) => [c, row[c]])));
    });
  }

  it('an unknown /api route is a 404 in the error shape for everyone', async () => {
    for (const caller of callers) {
      const res = await ctx.request(
        'GET',
        '/api/no-such-thing',
        caller === 'anonymous' ? {} : { as: roleLogins[caller] },
      );
      expect(res.status).toBe(404);
      expect(res.body).toEqual({
        error: { code: 'not_found', message: 'No API route GET /api/no-such-thing.' },
      });
    }
  });
});
