import { describe, expect, it } from 'vitest';
import { effectiveRoles, policyAdmits, type RoutePolicy } from './policy.js';

const roles = ['engineer', 'checker', 'viewer', 'admin'] as const;
const admitted = (policy: RoutePolicy) => [null, ...roles].filter((r) => policyAdmits(policy, r));

describe('route policies', () => {
  it('public admits everyone, anonymous included', () => {
    expect(admitted({ kind: 'public' })).toEqual([null, ...roles]);
  });

  it('signed-in admits every role but not anonymous', () => {
    expect(admitted({ kind: 'signed-in' })).toEqual([...roles]);
  });

  it("a checker holds an engineer's powers, nobody else inherits anything", () => {
    expect(effectiveRoles('checker')).toEqual(['checker', 'engineer']);
    expect(admitted({ kind: 'roles', roles: ['engineer'] })).toEqual(['engineer', 'checker']);
    expect(admitted({ kind: 'roles', roles: ['checker'] })).toEqual(['checker']);
    expect(admitted({ kind: 'roles', roles: ['admin'] })).toEqual(['admin']);
    expect(admitted({ kind: 'roles', roles: ['viewer'] })).toEqual(['viewer']);
    expect(admitted({ kind: 'roles', roles: ['engineer', 'viewer'] })).toEqual([
      'engineer',
      'checker',
      'viewer',
    ]);
  });
});
