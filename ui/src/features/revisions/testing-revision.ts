import type { Revision } from '@holdfast/shared';

const person = {
  id: '6b1f0c1e-8a52-4c3e-9d7a-2f1e0b9c4a10',
  displayName: 'Erin Vale',
  initials: 'EV',
};

/** A draft revision of the lever-brake test fixture, editable by its author. */
export function makeRevision(overrides: Partial<Revision> = {}): Revision {
  return {
    id: '11111111-1111-4111-8111-111111111111',
    label: 'A',
    state: 'draft',
    author: person,
    checker: null,
    changeNote: 'First issue',
    createdAt: '2026-12-01T08:00:00.000Z',
    submittedAt: null,
    approvedAt: null,
    returnedAt: null,
    sheetId: '22222222-2222-4222-8222-222222222222',
    sheetType: 'hoist-shoe-brake',
    documentNumber: 'HF-0001',
    inputs: {
      requiredTorque: { value: 1000, unit: 'N m' },
      springForce: { value: 2000, unit: 'N' },
      leverRatio: 2,
      drumDiameter: { value: 400, unit: 'mm' },
      mu: 0.4,
    },
    unitSystem: 'SI',
    criteriaSetId: 'test-set',
    criteriaSetVersion: 1,
    evaluation: null,
    coreVersion: null,
    hash: null,
    verificationCode: null,
    justification: null,
    unconfirmed: [],
    approvalNote: null,
    rowVersion: 3,
    supersededBy: null,
    canEdit: true,
    canSubmit: true,
    canCheck: false,
    ...overrides,
  };
}
