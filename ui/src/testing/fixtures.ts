import type { SheetEvaluation } from '@holdfast/calc';
import type {
  FieldTarget,
  Position,
  Register,
  RevisionSummary,
  Session,
  User,
} from '@holdfast/shared';

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

export type InForce = Position['inForce'][number];
export const registerPositionId = '0b1c2d3e-4f50-4617-8293-a4b5c6d7e8f9';

/** An approved revision in force at a position. */
export const inForceSheet = (
  revisionId: string,
  documentNumber: string,
  sheetType: string,
): InForce => ({
  sheetId: '5e6f7081-92a3-4ebf-8031-4c5d6e7f8091',
  documentNumber,
  revisionId,
  revisionLabel: 'B',
  sheetType,
});

/** A register of one site, one crane and one brake position (registerPositionId, MH-B1). */
export function makeRegister(inForce: InForce[]): Register {
  return {
    sites: [
      {
        id: '3c4d5e6f-7081-4c9d-8e1f-2a3b4c5d6e7f',
        code: 'XS',
        name: 'Example site',
        machines: [
          {
            id: '4d5e6f70-8192-4dae-9f20-3b4c5d6e7f80',
            tag: 'C-1',
            name: 'Crane 1',
            kind: 'crane',
            positions: [
              {
                id: registerPositionId,
                tag: 'MH-B1',
                description: 'Main hoist brake',
                motion: 'hoist',
                brakeKind: '',
                thruster: '',
                lining: '',
                currentApproved: null,
                inForce,
                openSheets: [],
              },
            ],
          },
        ],
      },
    ],
  };
}

/** A main-spring length on the field card: ± 0.5 mm, common practice (calc's tolerance table). */
export function springTarget(value: number, label = 'Spring length'): FieldTarget {
  return {
    settingKey: 'springLength',
    label,
    value,
    unit: 'm',
    dimension: 'length',
    group: 'spring',
    tolerance: {
      band: { kind: 'absolute', minus: 0.0005, plus: 0.0005 },
      source: 'common practice',
      confidence: 'common practice',
    },
  };
}

/** A revision of a sheet as its page lists it, by label (its id follows from the label). */
export function revisionSummary(label: string, state: RevisionSummary['state']): RevisionSummary {
  return {
    id: `00000000-0000-4000-8000-00000000000${label.charCodeAt(0) - 64}`,
    label,
    state,
    author: { id: testUsers.engineer.id, displayName: 'Erin Vale', initials: 'EV' },
    checker: null,
    changeNote: '',
    createdAt: '2026-12-01T08:00:00.000Z',
    submittedAt: null,
    approvedAt: null,
    returnedAt: null,
  };
}
