import type { SheetEvaluation, SheetInputs } from '@holdfast/calc';
import type { PersonRef, Revision, RevisionSummary } from '@holdfast/shared';
import type { RevisionRow } from '@holdfast/db';

type People = Map<string, PersonRef>;

const iso = (d: Date | null) => (d ? d.toISOString() : null);

function person(people: People, id: string | null): PersonRef | null {
  if (!id) return null;
  return people.get(id) ?? { id, displayName: 'Unknown user', initials: '??' };
}

export function toRevisionSummary(r: RevisionRow, people: People): RevisionSummary {
  return {
    id: r.id,
    label: r.label,
    state: r.state as RevisionSummary['state'],
    author: person(people, r.authorId)!,
    checker: person(people, r.checkerId),
    changeNote: r.changeNote,
    createdAt: r.createdAt.toISOString(),
    submittedAt: iso(r.submittedAt),
    approvedAt: iso(r.approvedAt),
    returnedAt: iso(r.returnedAt),
  };
}

export function toRevision(
  r: RevisionRow & { sheetType: string; documentNumber: string },
  people: People,
  extra: {
    supersededByLabel?: string;
    canEdit: boolean;
    canSubmit: boolean;
    canCheck: boolean;
  },
): Revision {
  return {
    ...toRevisionSummary(r, people),
    sheetId: r.sheetId,
    sheetType: r.sheetType as Revision['sheetType'],
    documentNumber: r.documentNumber,
    inputs: r.inputs as SheetInputs,
    unitSystem: r.unitSystem as Revision['unitSystem'],
    criteriaSetId: r.criteriaSetId,
    criteriaSetVersion: r.criteriaSetVersion,
    evaluation: (r.evaluation ?? null) as SheetEvaluation | null,
    coreVersion: r.coreVersion,
    hash: r.hash,
    verificationCode: r.verificationCode,
    justification: r.justification,
    unconfirmed: Array.isArray(r.unconfirmed) ? r.unconfirmed : [],
    approvalNote: r.checkNote,
    rowVersion: r.rowVersion,
    supersededBy:
      r.supersededById && r.supersededAt
        ? {
            id: r.supersededById,
            label: extra.supersededByLabel ?? '?',
            at: r.supersededAt.toISOString(),
          }
        : null,
    canEdit: extra.canEdit,
    canSubmit: extra.canSubmit,
    canCheck: extra.canCheck,
  };
}
