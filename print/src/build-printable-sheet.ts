import type {
  CriteriaSet,
  SheetEvaluation,
  SheetInputs,
  SheetTypeDefinition,
} from '@holdfast/calc';
import { convertedText, enteredText } from './format.js';
import type {
  Paper,
  PrintApproval,
  PrintHistoryRow,
  PrintPerson,
  PrintRevisionState,
  PrintableInput,
  PrintableSheet,
  PrintUnitSystem,
} from './printable-sheet.js';

type When = string | Date;
/**
 * One revision in the sheet's history, as the server reads it from its rows: print owns this
 * shape, so the API's responses can change without touching the printed sheet.
 */
export interface PrintRevisionSummarySource {
  label: string;
  state: PrintRevisionState;
  author: PrintPerson;
  checker: PrintPerson | null;
  changeNote: string | null;
  createdAt: When;
  approvedAt?: When | null;
}
/** The printed revision: its history entry plus what it holds and how it was signed. */
export interface PrintRevisionSource extends PrintRevisionSummarySource {
  submittedAt: When | null;
  inputs: SheetInputs;
  unitSystem: PrintUnitSystem;
  evaluation: SheetEvaluation | null;
  coreVersion: string | null;
  verificationCode: string | null;
  justification: string | null;
  approvalNote?: string | null;
  supersededBy: { label: string; at: When } | null;
}
/** The sheet and where its brake sits. */
export interface PrintSheetSource {
  documentNumber: string;
  title: string;
  purpose?: string | null;
  site: { code: string; name: string };
  equipment: { tag: string; name: string };
  position: { tag: string; description: string };
  /** Every revision of the sheet; the history prints those up to the printed one. */
  revisions: PrintRevisionSummarySource[];
}
export interface BuildPrintableOptions {
  sheet: PrintSheetSource;
  revision: PrintRevisionSource;
  sheetType: Pick<SheetTypeDefinition, 'id' | 'title' | 'description' | 'sections' | 'fields'>;
  criteriaSet: CriteriaSet;
  /** Public base URL of Holdfast, e.g. 'https://holdfast.example.com'; the code is appended. */
  verifyBaseUrl: string;
  paper?: Paper;
  generatedAt?: Date;
  torqueReference?: string;
  efficiencyTreatment?: string;
}

const iso = (w: When): string => (w instanceof Date ? w.toISOString() : w);
const isoOrNull = (w: When | null | undefined): string | null => (w ? iso(w) : null);
const person = (p: PrintPerson): PrintPerson => ({ name: p.name, initials: p.initials });

/** Orders revision labels A, B, … Z, AA, AB …: shorter first, then alphabetical. */
export function compareLabels(a: string, b: string): number {
  return a.length - b.length || a.localeCompare(b);
}

/** The criteria values the evaluation read, in the set's order; the whole set if it did not say. */
function criteriaToPrint(set: CriteriaSet, used: string[] | undefined): PrintableSheet['criteria'] {
  const head = { id: set.id, version: set.version, name: set.name };
  if (!used) return { ...head, values: set.values, listed: 'whole set' };
  return { ...head, values: set.values.filter((v) => used.includes(v.key)), listed: 'used' };
}

/** Builds the renderers' input from a revision, its sheet, the calc sheet type and criteria set. */
export function buildPrintableSheet(o: BuildPrintableOptions): PrintableSheet {
  const { sheet, revision: r, sheetType } = o;
  const system = r.unitSystem;
  const sectionTitle = new Map(sheetType.sections.map((x) => [x.id, x.title]));
  // A frozen revision prints exactly the inputs the core used (as entered); a record frozen
  // before those were kept, and a draft, print the stored inputs field by field.
  const resolved = r.evaluation?.resolvedInputs;
  const used = resolved ? new Map(resolved.map((x) => [x.key, x.entered])) : null;
  const printed = used ? sheetType.fields.filter((f) => used.has(f.key)) : sheetType.fields;
  const inputs: PrintableInput[] = printed.map((field) => {
    const value = (used ? used.get(field.key) : r.inputs[field.key]) ?? null;
    return {
      field,
      sectionTitle: sectionTitle.get(field.section) ?? field.section,
      value,
      entered: enteredText(value, field),
      converted: convertedText(value, field, system),
    };
  });
  const approvals: PrintApproval[] = [
    { role: 'Prepared', person: person(r.author), at: isoOrNull(r.submittedAt) },
  ];
  if (r.checker) {
    approvals.push({
      role: 'Checked and approved',
      person: person(r.checker),
      at: isoOrNull(r.approvedAt),
      note: r.approvalNote ?? null,
    });
  }
  const history: PrintHistoryRow[] = [...sheet.revisions]
    .filter((x) => compareLabels(x.label, r.label) <= 0)
    .sort((a, b) => compareLabels(a.label, b.label))
    .map((x) => ({
      label: x.label,
      state: x.label === r.label ? r.state : x.state,
      date: iso(x.approvedAt ?? x.createdAt),
      changeNote: x.changeNote ?? '',
      author: person(x.author),
      checker: x.checker ? person(x.checker) : null,
    }));
  const base = o.verifyBaseUrl.replace(/\/+$/, '');
  return {
    documentNumber: sheet.documentNumber,
    title: sheet.title,
    purpose:
      sheet.purpose ??
      `To show that the ${sheetType.title.toLowerCase()} at position ${sheet.position.tag} ` +
        `(${sheet.position.description}) of ${sheet.equipment.tag} ${sheet.equipment.name}, ` +
        `${sheet.site.name}, meets the acceptance criteria of "${o.criteriaSet.name}" ` +
        `version ${o.criteriaSet.version}, and to give the field team its settings.`,
    site: sheet.site,
    equipment: { tag: sheet.equipment.tag, name: sheet.equipment.name },
    position: sheet.position,
    sheetType: { id: sheetType.id, title: sheetType.title, description: sheetType.description },
    revision: {
      label: r.label,
      state: r.state,
      createdAt: iso(r.createdAt),
      submittedAt: isoOrNull(r.submittedAt),
      approvedAt: isoOrNull(r.approvedAt),
    },
    author: person(r.author),
    checker: r.checker ? person(r.checker) : null,
    approvals,
    history,
    changeNote: r.changeNote ?? '',
    justification: r.justification,
    sections: sheetType.sections,
    inputs,
    evaluation: r.evaluation,
    criteria: criteriaToPrint(o.criteriaSet, r.evaluation?.criteriaUsed),
    designBasis: {
      torqueReference:
        o.torqueReference ??
        describeChoice(inputs, /torque.?(ref|basis)|reference/i) ??
        fixedReference(r.evaluation) ??
        'Not applicable to this sheet type',
      efficiencyTreatment: o.efficiencyTreatment ?? describeEfficiencies(inputs),
    },
    coreVersion: r.coreVersion ?? r.evaluation?.coreVersion ?? null,
    verification: r.verificationCode
      ? { code: r.verificationCode, url: `${base}/verify/${r.verificationCode}` }
      : null,
    supersededBy: r.supersededBy
      ? { label: r.supersededBy.label, date: iso(r.supersededBy.at) }
      : null,
    unitSystem: system,
    paper: o.paper ?? 'A4',
    generatedAt: (o.generatedAt ?? new Date()).toISOString(),
  };
}

function describeChoice(inputs: PrintableInput[], key: RegExp): string | undefined {
  const hit = inputs.find((i) => key.test(i.field.key) && i.field.kind === 'choice');
  return hit ? `${hit.field.label}: ${hit.entered}` : undefined;
}

/**
 * A sheet type with no choice of reference (travel, drive) names the one its required torque is
 * worked from, as the result's label says it ("Required brake torque (reference: …)").
 */
function fixedReference(ev: SheetEvaluation | null | undefined): string | undefined {
  const label = ev?.results.find((x) => x.key === 'required-torque')?.label;
  const ref = label ? /\(reference: (.+)\)$/.exec(label)?.[1] : undefined;
  return ref ? `${ref[0]!.toUpperCase()}${ref.slice(1)} (fixed for this sheet type)` : undefined;
}

function describeEfficiencies(inputs: PrintableInput[]): string {
  const etas = inputs.filter((i) => /efficiency$|^eta/i.test(i.field.key));
  if (etas.length === 0) return 'No efficiency enters this sheet type';
  return etas.map((i) => `${i.field.label} ${i.field.symbol} = ${i.entered}`).join('; ');
}
