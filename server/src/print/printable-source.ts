import type { SheetEvaluation, SheetInputs } from '@holdfast/calc';
import type { RevisionRow } from '@holdfast/db';
import type {
  PrintPerson,
  PrintRevisionSource,
  PrintRevisionState,
  PrintRevisionSummarySource,
  PrintSheetSource,
  PrintUnitSystem,
} from '@holdfast/print';
import type { SheetSummaryRow } from '../sheets/sheets.repository.js';

/** Display name and initials by user id, as `UsersRepository.people` returns them. */
export type People = Map<string, { displayName: string; initials: string }>;

/** A user as printed; a deleted account prints as unknown rather than failing the print. */
function person(people: People, id: string): PrintPerson {
  const p = people.get(id);
  return p
    ? { name: p.displayName, initials: p.initials }
    : { name: 'Unknown user', initials: '??' };
}

/** One revision row as the sheet's history prints it. */
export function historyEntry(r: RevisionRow, people: People): PrintRevisionSummarySource {
  return {
    label: r.label,
    state: r.state as PrintRevisionState,
    author: person(people, r.authorId),
    checker: r.checkerId ? person(people, r.checkerId) : null,
    changeNote: r.changeNote,
    createdAt: r.createdAt,
    approvedAt: r.approvedAt,
  };
}

/**
 * The printed revision from its row. `verificationCode` is the code the printout carries: the
 * revision's own, or a field record's when the record is printed.
 */
export function revisionSource(
  r: RevisionRow,
  people: People,
  o: { supersededByLabel: string | undefined; verificationCode: string | null },
): PrintRevisionSource {
  return {
    ...historyEntry(r, people),
    submittedAt: r.submittedAt,
    inputs: r.inputs as SheetInputs,
    unitSystem: r.unitSystem as PrintUnitSystem,
    evaluation: (r.evaluation ?? null) as SheetEvaluation | null,
    coreVersion: r.coreVersion,
    verificationCode: o.verificationCode,
    justification: r.justification,
    approvalNote: r.checkNote,
    supersededBy:
      r.supersededById && r.supersededAt
        ? { label: o.supersededByLabel ?? '?', at: r.supersededAt }
        : null,
  };
}

/** The sheet, where its brake sits, and its revisions (in order). */
export function sheetSource(
  s: SheetSummaryRow,
  revisions: RevisionRow[],
  people: People,
): PrintSheetSource {
  return {
    documentNumber: s.documentNumber,
    title: s.title,
    site: { code: s.siteCode, name: s.siteName },
    equipment: { tag: s.machineTag, name: s.machineName },
    position: { tag: s.positionTag, description: s.positionDescription },
    revisions: revisions.map((r) => historyEntry(r, people)),
  };
}
