import type {
  CriterionValue,
  FieldDefinition,
  InputValue,
  SectionDefinition,
  SheetEvaluation,
} from '@holdfast/calc';

/** Revision states as the sheets API names them. */
export type PrintRevisionState = 'draft' | 'in_check' | 'returned' | 'approved' | 'superseded';
export type PrintUnitSystem = 'SI' | 'US';
export type Paper = 'A4' | 'LETTER';

export interface PrintPerson {
  name: string;
  initials: string;
}

/** One sign-off line: who prepared or checked the revision, and when. */
export interface PrintApproval {
  role: 'Prepared' | 'Checked and approved';
  person: PrintPerson;
  /** ISO date-time, or null while the step has not happened. */
  at: string | null;
  note?: string | null;
}

/** One row of the revision history table. */
export interface PrintHistoryRow {
  label: string;
  state: PrintRevisionState;
  /** Approval date for approved/superseded revisions, otherwise the creation date (ISO). */
  date: string;
  changeNote: string;
  author: PrintPerson;
  checker: PrintPerson | null;
}

/** One input as the engineer typed it and as printed in the sheet's unit system. */
export interface PrintableInput {
  field: FieldDefinition;
  sectionTitle: string;
  /** The stored value exactly as typed. */
  value: InputValue | null;
  /** Printed form of the stored value, e.g. '12 kN', 'Yes', 'Class M5'. */
  entered: string;
  /** Printed form in the sheet's unit system, e.g. '2 698 lbf'; same as entered for non-quantities. */
  converted: string;
}

/** A criteria review of an approved revision: open (no disposition) or disposed by a checker. */
export interface PrintCriteriaReview {
  criteriaSetName: string;
  criteriaSetVersion: number;
  flaggedAt: string;
  /** Labels of the checks that fail under that version. */
  failing: string[];
  disposition: string | null;
  /** 'Name (initials)' of the checker who wrote the disposition. */
  checker: string | null;
  clearedAt: string | null;
}

/** A criteria-set value with its source, printed in the design basis. */
export type PrintCriterion = CriterionValue & {
  /** Confirmed against a document the plant holds: replaces "from memory" on paper. */
  confirmation?: { document: string; clause: string; by: string; at: string };
};

/**
 * Everything the calculation-sheet PDF and the field card need, as plain data. Build it with
 * `buildPrintableSheet()` from a revision, its sheet and the calc sheet type; the renderers do
 * no I/O and read nothing else.
 */
export interface PrintableSheet {
  documentNumber: string;
  title: string;
  /** Purpose and scope; a sentence built from the sheet type and position when not given. */
  purpose: string;
  site: { code: string; name: string };
  equipment: { tag: string; name: string };
  position: { tag: string; description: string };
  sheetType: { id: string; title: string; description: string };
  revision: {
    label: string;
    state: PrintRevisionState;
    createdAt: string;
    submittedAt: string | null;
    approvedAt: string | null;
  };
  author: PrintPerson;
  checker: PrintPerson | null;
  approvals: PrintApproval[];
  history: PrintHistoryRow[];
  changeNote: string;
  /** The author's justification for submitting with failed checks. */
  justification: string | null;
  sections: SectionDefinition[];
  inputs: PrintableInput[];
  /** Null for a draft that was never evaluated. */
  evaluation: SheetEvaluation | null;
  criteria: {
    id: string;
    version: number;
    name: string;
    values: PrintCriterion[];
    /**
     * 'used': `values` are those the evaluation read (its `criteriaUsed`); 'whole set': every
     * value of the set, for a revision evaluated before the core kept which it read.
     */
    listed: 'used' | 'whole set';
  };
  designBasis: {
    /** Which reference torque the required brake torque rests on, e.g. 'Motor rated torque'. */
    torqueReference: string;
    /** How efficiencies enter, e.g. 'η = 0.92 applied against the brake (load side, reversed)'. */
    efficiencyTreatment: string;
  };
  coreVersion: string | null;
  /** Present for revisions that have a verification code (approved and superseded ones). */
  verification: { code: string; url: string } | null;
  supersededBy: { label: string; date: string } | null;
  /** Open flag and dispositions of criteria reviews (approved revisions only). */
  criteriaReviews?: PrintCriteriaReview[];
  unitSystem: PrintUnitSystem;
  paper: Paper;
  /** ISO date-time the PDF was generated. */
  generatedAt: string;
}
