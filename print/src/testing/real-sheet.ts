import {
  CRANE_HOIST,
  GENERAL_INDUSTRY,
  TRAVEL_DRIVE,
  demoInputs,
  getSheetType,
  settingBands,
  type CriteriaSet,
  type SheetInputs,
} from '@holdfast/calc';
import { buildPrintableSheet, type PrintRevisionSource } from '../build-printable-sheet.js';
import type {
  Paper,
  PrintableSheet,
  PrintRevisionState,
  PrintUnitSystem,
} from '../printable-sheet.js';

/** The shipped criteria set a sheet type is normally checked against. */
export function criteriaFor(sheetTypeId: string): CriteriaSet {
  if (sheetTypeId.startsWith('hoist')) return CRANE_HOIST;
  if (sheetTypeId.startsWith('travel')) return TRAVEL_DRIVE;
  return GENERAL_INDUSTRY;
}

/**
 * A printable sheet from a real calc evaluation of a sheet type's default inputs, in an
 * invented demo setting (no real site, person or company).
 */
export function realPrintable(o: {
  sheetTypeId: string;
  state: PrintRevisionState;
  paper?: Paper;
  unitSystem?: PrintUnitSystem;
  inputs?: SheetInputs;
}): PrintableSheet {
  const type = getSheetType(o.sheetTypeId);
  if (!type) throw new Error(`unknown sheet type ${o.sheetTypeId}`);
  const criteriaSet = criteriaFor(type.id);
  const inputs = o.inputs ?? demoInputs(type);
  const evaluation = type.evaluate(inputs, criteriaSet);
  // As the server stores it: the setting tables checked row by row against the whole sheet.
  evaluation.settingBands = settingBands(type, inputs, criteriaSet, evaluation);
  const approvedLike = o.state === 'approved' || o.state === 'superseded';
  const author = { name: 'Dana Demo', initials: 'DD' };
  const checker = { name: 'Chris Checkwell', initials: 'CC' };
  const revision: PrintRevisionSource = {
    label: 'A',
    state: o.state,
    author,
    checker: approvedLike ? checker : null,
    changeNote: 'First issue.',
    createdAt: '2026-11-10T08:00:00Z',
    submittedAt: o.state === 'draft' ? null : '2026-11-11T08:00:00Z',
    approvedAt: approvedLike ? '2026-11-12T08:00:00Z' : null,
    inputs,
    unitSystem: o.unitSystem ?? 'SI',
    evaluation,
    coreVersion: evaluation.coreVersion,
    verificationCode: approvedLike ? 'K3M9QZ7TXA' : null,
    justification: evaluation.pass ? null : 'Demo: accepted by the checker for the test printout.',
    supersededBy: o.state === 'superseded' ? { label: 'B', at: '2026-11-20T08:00:00Z' } : null,
  };
  return buildPrintableSheet({
    sheet: {
      documentNumber: `HF-DEMO-${type.id.split('-')[0]!.toUpperCase()}-001`,
      title: `${type.title} — demo`,
      site: { code: 'DEMO', name: 'Demo Works (invented)' },
      equipment: { tag: 'CR-1', name: 'Demo crane' },
      position: { tag: 'BR-1', description: 'brake 1' },
      revisions: [revision],
    },
    revision,
    sheetType: type,
    criteriaSet,
    verifyBaseUrl: 'https://holdfast.example.test',
    paper: o.paper ?? 'A4',
    generatedAt: new Date('2026-12-01T12:00:00Z'),
  });
}

/**
 * Approved hoist sheets that differ in their numbers (load and spring force), so a benchmark
 * that renders one after another shapes new strings each time, as real prints do.
 */
export function hoistRevisionVariants(count: number): PrintableSheet[] {
  const type = getSheetType('hoist-shoe-brake')!;
  return Array.from({ length: count }, (_, k) =>
    realPrintable({
      sheetTypeId: type.id,
      state: 'approved',
      inputs: {
        ...demoInputs(type),
        load: { value: 9000 + 137 * k, unit: 'kg' },
        springForce: { value: 1050 + 31 * k, unit: 'N' },
      },
    }),
  );
}
