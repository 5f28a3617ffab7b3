import type { SheetEvaluation } from '@holdfast/calc';
import type { Session, User } from '@holdfast/shared';

export function makeUser(overrides: Partial<User> = {}): User {
  return {
    id: '6b1f0c1e-8a52-4c3e-9d7a-2f1e0b9c4a10',
    email: 'engineer@holdfast.test',
    displayName: 'Erin Vale',
    initials: 'EV',
    role: 'engineer',
    active: true,
    unitSystem: 'SI',
    numberFormat: 'point',
    ...overrides,
  };
}

export const testUsers = {
  engineer: makeUser(),
  admin: makeUser({
    id: '0d6a3a7e-1c2b-4f5d-8e9a-7b6c5d4e3f21',
    email: 'admin@holdfast.test',
    displayName: 'Sam Ortiz',
    initials: 'SO',
    role: 'admin',
  }),
  viewer: makeUser({
    id: '9c8b7a6d-5e4f-4a3b-8c2d-1e0f9a8b7c65',
    email: 'viewer@holdfast.test',
    displayName: 'Pia Novak',
    initials: 'PN',
    role: 'viewer',
  }),
  technician: makeUser({
    id: '3f2e1d0c-9b8a-4765-8432-10fedcba9876',
    email: 'technician@holdfast.test',
    displayName: 'Teo Marsh',
    initials: 'TM',
    role: 'technician',
  }),
  checker: makeUser({
    id: '5a4b3c2d-1e0f-4a9b-8c7d-6e5f4a3b2c1d',
    email: 'checker@holdfast.test',
    displayName: 'Kit Rowe',
    initials: 'KR',
    role: 'checker',
  }),
} satisfies Record<string, User>;

export function makeSession(user: User = testUsers.engineer, token = 'access-token-1'): Session {
  return { accessToken: token, expiresIn: 900, user };
}

/** An empty evaluation that passes, with the parts a test gives. */
export function makeEvaluation(parts: Partial<SheetEvaluation> = {}): SheetEvaluation {
  return {
    sheetType: 'test',
    coreVersion: 'test',
    criteriaSetId: 'test',
    criteriaSetVersion: 1,
    results: [],
    checks: [],
    derivation: [],
    charts: [],
    fieldSettings: [],
    tables: [],
    warnings: [],
    pass: true,
    ...parts,
  };
}
