import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { listRoutes } from '../src/common/routes/list-routes.js';
import { NIL_ID, routeKey, type Caller } from './route-matrix.js';
import { createSheetsContext, type SheetsContext } from './sheets-fixture.js';
import { roleLogins } from './test-context.js';

// The technician's column is walked by route-policy.test.ts (every route × every caller).
type Row = { method: string; path: string; body?: unknown } & Record<
  Exclude<Caller, 'technician'>,
  number
>;
const N = NIL_ID;
const rev = { inputs: {}, unitSystem: 'SI', changeNote: '', rowVersion: 0 };

// Exact statuses of the sheets feature routes for each caller. Ids match nothing, so a caller the
// policy admits reaches validation (400) or a missing row (404); the rest get 401/403.
const matrix: Row[] = [
  {
    method: 'GET',
    path: '/api/register',
    anonymous: 401,
    engineer: 200,
    checker: 200,
    viewer: 200,
    admin: 200,
  },
  {
    method: 'POST',
    path: '/api/register/sites',
    body: {},
    anonymous: 401,
    engineer: 400,
    checker: 400,
    viewer: 403,
    admin: 400,
  },
  {
    method: 'POST',
    path: '/api/register/machines',
    body: {},
    anonymous: 401,
    engineer: 400,
    checker: 400,
    viewer: 403,
    admin: 400,
  },
  {
    method: 'POST',
    path: '/api/register/positions',
    body: {},
    anonymous: 401,
    engineer: 400,
    checker: 400,
    viewer: 403,
    admin: 400,
  },
  {
    method: 'GET',
    path: '/api/sheets',
    anonymous: 401,
    engineer: 200,
    checker: 200,
    viewer: 200,
    admin: 200,
  },
  {
    method: 'POST',
    path: '/api/sheets',
    body: {},
    anonymous: 401,
    engineer: 400,
    checker: 400,
    viewer: 403,
    admin: 403,
  },
  {
    method: 'GET',
    path: `/api/sheets/${N}`,
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 404,
    admin: 404,
  },
  {
    method: 'POST',
    path: `/api/sheets/${N}/revisions`,
    body: { changeNote: 'x' },
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 403,
    admin: 403,
  },
  {
    method: 'GET',
    path: `/api/sheets/${N}/compare?from=${N}&to=${N}`,
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 404,
    admin: 404,
  },
  {
    method: 'GET',
    path: `/api/sheets/${N}/audit`,
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 404,
    admin: 404,
  },
  {
    method: 'GET',
    path: `/api/revisions/${N}`,
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 404,
    admin: 404,
  },
  {
    method: 'PUT',
    path: `/api/revisions/${N}`,
    body: rev,
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 403,
    admin: 403,
  },
  {
    method: 'POST',
    path: `/api/revisions/${N}/submit`,
    body: { rowVersion: 0 },
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 403,
    admin: 403,
  },
  {
    method: 'POST',
    path: `/api/revisions/${N}/approve`,
    body: { rowVersion: 0 },
    anonymous: 401,
    engineer: 403,
    checker: 404,
    viewer: 403,
    admin: 403,
  },
  {
    method: 'POST',
    path: `/api/revisions/${N}/return`,
    body: { rowVersion: 0, comment: 'x' },
    anonymous: 401,
    engineer: 403,
    checker: 404,
    viewer: 403,
    admin: 403,
  },
  {
    method: 'GET',
    path: `/api/revisions/${N}/changes`,
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 404,
    admin: 404,
  },
  {
    method: 'PATCH',
    path: `/api/register/sites/${N}`,
    body: { name: 'Renamed works' },
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 403,
    admin: 404,
  },
  {
    method: 'PATCH',
    path: `/api/register/machines/${N}`,
    body: { name: 'Renamed crane' },
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 403,
    admin: 404,
  },
  {
    method: 'PATCH',
    path: `/api/register/positions/${N}`,
    body: { lining: 'woven' },
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 403,
    admin: 404,
  },
  {
    method: 'POST',
    path: '/api/print/safety-file',
    body: { revisionIds: [N] },
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 404,
    admin: 404,
  },
  {
    method: 'POST',
    path: `/api/revisions/${N}/drift`,
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 404,
    admin: 404,
  },
  {
    method: 'GET',
    path: `/api/revisions/${N}/comments`,
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 404,
    admin: 404,
  },
  {
    method: 'POST',
    path: `/api/revisions/${N}/comments`,
    body: { body: 'x' },
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 403,
    admin: 403,
  },
  {
    method: 'PATCH',
    path: `/api/comments/${N}`,
    body: { resolved: true },
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 403,
    admin: 403,
  },
  {
    method: 'GET',
    path: `/api/revisions/${N}/attachments`,
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 404,
    admin: 404,
  },
  {
    method: 'POST',
    path: `/api/revisions/${N}/attachments`,
    body: {},
    anonymous: 401,
    engineer: 400,
    checker: 400,
    viewer: 403,
    admin: 403,
  },
  {
    method: 'GET',
    path: `/api/attachments/${N}/download`,
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 404,
    admin: 404,
  },
  {
    method: 'GET',
    path: '/api/criteria-sets',
    anonymous: 401,
    engineer: 200,
    checker: 200,
    viewer: 200,
    admin: 200,
  },
  {
    method: 'GET',
    path: `/api/criteria-sets/${N}`,
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 404,
    admin: 404,
  },
  {
    method: 'POST',
    path: `/api/criteria-sets/${N}/versions`,
    body: {},
    anonymous: 401,
    engineer: 403,
    checker: 403,
    viewer: 403,
    admin: 400,
  },
  {
    method: 'POST',
    path: '/api/criteria-sets',
    body: {},
    anonymous: 401,
    engineer: 403,
    checker: 403,
    viewer: 403,
    admin: 400,
  },
  {
    method: 'POST',
    path: `/api/criteria-sets/${N}/versions/1/confirmations`,
    body: {},
    anonymous: 401,
    engineer: 403,
    checker: 400,
    viewer: 403,
    admin: 400,
  },
  {
    method: 'GET',
    path: `/api/criteria-sets/${N}/impact`,
    anonymous: 401,
    engineer: 403,
    checker: 404,
    viewer: 403,
    admin: 404,
  },
  {
    method: 'GET',
    path: `/api/revisions/${N}/pdf`,
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 404,
    admin: 404,
  },
  {
    method: 'GET',
    path: `/api/revisions/${N}/field-card`,
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 404,
    admin: 404,
  },
  {
    method: 'GET',
    path: '/api/work-queue',
    anonymous: 401,
    engineer: 200,
    checker: 200,
    viewer: 200,
    admin: 200,
  },
  {
    method: 'GET',
    path: `/api/revisions/${N}/criteria-review`,
    anonymous: 401,
    engineer: 404,
    checker: 404,
    viewer: 404,
    admin: 404,
  },
  {
    method: 'POST',
    path: `/api/revisions/${N}/criteria-review/disposition`,
    body: {},
    anonymous: 401,
    engineer: 403,
    checker: 400,
    viewer: 403,
    admin: 403,
  },
  {
    method: 'GET',
    path: '/api/work-queue/under-review',
    anonymous: 401,
    engineer: 200,
    checker: 200,
    viewer: 200,
    admin: 200,
  },
  {
    method: 'GET',
    path: '/api/verify/AAAAAAAAAA',
    anonymous: 404,
    engineer: 404,
    checker: 404,
    viewer: 404,
    admin: 404,
  },
];
const callers: Exclude<Caller, 'technician'>[] = [
  'anonymous',
  'engineer',
  'checker',
  'viewer',
  'admin',
];
const controllers = [
  'RegisterController',
  'SheetsController',
  'RevisionsController',
  'CommentsController',
  'AttachmentsController',
  'CriteriaController',
  'WorkQueueController',
  'VerifyController',
  'PrintController',
  'ReviewsController',
  'SafetyFileController',
];

describe('sheets feature routes × roles', () => {
  let ctx: SheetsContext;
  beforeAll(async () => {
    ctx = await createSheetsContext();
  });
  beforeEach(() => ctx.resetAll());
  afterAll(() => ctx?.closeAll());

  it('covers every route of the sheets controllers', () => {
    const routes = listRoutes(ctx.app).filter((r) => controllers.includes(r.controller));
    const covered = new Set(
      matrix.map(
        (r) =>
          `${r.method} ${r.path.split('?')[0].replaceAll(N, ':id').replace('AAAAAAAAAA', ':code').replace('/versions/1/', '/versions/:version/')}`,
      ),
    );
    expect(routes.map(routeKey).filter((k) => !covered.has(k))).toEqual([]);
  });

  for (const row of matrix) {
    it(`${row.method} ${row.path.replaceAll(N, ':id')}`, async () => {
      const got: Record<string, number> = {};
      for (const caller of callers) {
        const res = await ctx.request(row.method, row.path, {
          ...(caller === 'anonymous' ? {} : { as: roleLogins[caller] }),
          ...(row.body !== undefined ? { body: row.body } : {}),
        });
        got[caller] = res.status;
        if (res.status >= 400) expect(res.body?.error?.code, `${caller} ${res.text}`).toBeTruthy();
      }
      expect(got).toEqual(Object.fromEntries(callers.map((c) => [c, row[c]])));
    });
  }
});
