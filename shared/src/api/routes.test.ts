// Type-level checks of apiPath live in shared/test-types/routes.test-d.ts.
import { describe, expect, it } from 'vitest';
import { allApiRoutes, apiPath, apiRoutes } from './routes.js';

describe('the shared route table', () => {
  it('fills and encodes path parameters', () => {
    expect(apiPath(apiRoutes.revisions.submit, { id: 'a b/c' })).toBe(
      '/revisions/a%20b%2Fc/submit',
    );
    expect(apiPath(apiRoutes.criteria.confirm, { id: 'hoist', version: 3 })).toBe(
      '/criteria-sets/hoist/versions/3/confirmations',
    );
    expect(apiPath(apiRoutes.sheets.list)).toBe('/sheets');
  });

  it('refuses an empty parameter at run time', () => {
    expect(() => apiPath(apiRoutes.sheets.detail, { id: '' })).toThrow(/needs "id"/);
  });

  it('names each method and path pair once', () => {
    const keys = allApiRoutes().map((r) => `${r.method} ${r.path}`);
    expect(new Set(keys).size).toBe(keys.length);
    expect(keys.length).toBeGreaterThan(50);
    for (const r of allApiRoutes()) expect(r.path.startsWith('/')).toBe(false);
  });
});
