import { Controller, Get, Module } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { roles } from '@holdfast/shared';
import { AppModule } from '../src/app.module.js';
import { listRoutes, type RouteInfo } from '../src/common/routes/list-routes.js';
import { callers, guardOutcome, probePath, routeKey } from './route-matrix.js';
import { createTestContext, roleLogins, type TestContext } from './test-context.js';

describe('route policies', () => {
  let ctx: TestContext;
  let routes: RouteInfo[];
  beforeAll(async () => {
    ctx = await createTestContext();
    routes = listRoutes(ctx.app);
  });
  afterAll(() => ctx?.close());

  it('finds the routes of every controller', () => {
    expect(routes.length).toBeGreaterThanOrEqual(9);
    expect(routes.map(routeKey)).toEqual(
      expect.arrayContaining(['GET /api/health', 'POST /api/auth/sign-in', 'PATCH /api/users/:id']),
    );
  });

  it('every registered route declares @Public(), @SignedIn() or @Roles(...)', () => {
    const missing = routes
      .filter((r) => !r.policy)
      .map((r) => `${routeKey(r)} (${r.controller}.${r.handler})`);
    expect(missing).toEqual([]);
  });

  it('no @Roles() policy is empty or names an unknown role', () => {
    const bad = routes.filter(
      (r) =>
        r.policy?.kind === 'roles' &&
        (r.policy.roles.length === 0 || r.policy.roles.some((x) => !roles.includes(x))),
    );
    expect(bad.map(routeKey)).toEqual([]);
  });

  it('the foundation routes carry the policies the contract gives them', () => {
    const policy = (key: string) => routes.find((r) => routeKey(r) === key)?.policy;
    expect(policy('POST /api/auth/sign-in')).toEqual({ kind: 'public' });
    expect(policy('POST /api/auth/refresh')).toEqual({ kind: 'public' });
    expect(policy('POST /api/auth/sign-out')).toEqual({ kind: 'public' });
    expect(policy('GET /api/health')).toEqual({ kind: 'public' });
    expect(policy('GET /api/auth/me')).toEqual({ kind: 'signed-in' });
    expect(policy('PATCH /api/auth/me')).toEqual({ kind: 'signed-in' });
    for (const key of ['GET /api/users', 'POST /api/users', 'PATCH /api/users/:id']) {
      expect(policy(key)).toEqual({ kind: 'roles', roles: ['admin'] });
    }
  });

  it('every route × every caller: the guard answers 401/403 exactly as the policy says', async () => {
    const failures: string[] = [];
    for (const route of routes) {
      for (const caller of callers) {
        const res = await ctx.request(route.method, probePath(route.path), {
          ...(caller === 'anonymous' ? {} : { as: roleLogins[caller] }),
          ...(['POST', 'PUT', 'PATCH'].includes(route.method) ? { body: {} } : {}),
        });
        const expected = guardOutcome(route.policy, caller);
        const ok =
          expected === 'passes'
            ? ![401, 403].includes(res.status) || isHandlerAnswer(route, res.status, res.body)
            : res.status === expected;
        if (!ok || res.status >= 500) {
          failures.push(`${routeKey(route)} as ${caller}: got ${res.status}, expected ${expected}`);
        }
      }
    }
    expect(failures).toEqual([]);
  });
});

/** A 401 that the handler itself gives (refresh without a cookie) is not the guard's. */
function isHandlerAnswer(
  route: RouteInfo,
  status: number,
  body: { error?: { message?: string } },
): boolean {
  return (
    route.policy?.kind === 'public' &&
    status === 401 &&
    !/^Sign in to continue/.test(body.error?.message ?? '')
  );
}

// Test files are outside the decorator-enabled tsconfig, so decorators are applied by hand.
class ForgottenController {
  open(): string {
    return 'should never be served';
  }
}
const openMethod = Object.getOwnPropertyDescriptor(ForgottenController.prototype, 'open')!;
Get()(ForgottenController.prototype, 'open', openMethod);
Controller('forgotten')(ForgottenController);

describe('deny by default', () => {
  it('a route without a policy is refused with 403 even for an admin', async () => {
    const base = await createTestContext();
    class WithForgotten {}
    Module({ imports: [AppModule.forRoot(base.settings)], controllers: [ForgottenController] })(
      WithForgotten,
    );
    const app = await NestFactory.create(WithForgotten, { logger: false });
    app.setGlobalPrefix('api');
    await app.listen(0, '127.0.0.1');
    try {
      const { port } = app.getHttpServer().address() as { port: number };
      const token = await base.token('admin');
      for (const headers of [{}, { authorization: `Bearer ${token}` }] as Record<
        string,
        string
      >[]) {
        const res = await fetch(`http://127.0.0.1:${port}/api/forgotten`, { headers });
        expect(res.status).toBe(403);
        expect(((await res.json()) as { error: { code: string } }).error.code).toBe('forbidden');
      }
      expect(listRoutes(app).find((r) => r.path === '/api/forgotten')?.policy).toBeUndefined();
    } finally {
      await app.close();
      await base.close();
    }
  });
});
