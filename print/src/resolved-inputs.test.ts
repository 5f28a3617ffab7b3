import { demoInputs, getSheetType, resolveInputs, type SheetInputs } from '@holdfast/calc';
import { describe, expect, it } from 'vitest';
import { buildPrintableSheet } from './build-printable-sheet.js';
import { realPrintable } from './testing/real-sheet.js';

describe('printed inputs of a frozen revision', () => {
  it('are exactly the inputs the core used, not the stored keys', () => {
    const hoist = getSheetType('hoist-shoe-brake')!;
    const used: SheetInputs = { ...demoInputs(hoist), load: { value: 8, unit: 't' } };
    const base = realPrintable({ sheetTypeId: hoist.id, state: 'approved', inputs: used });
    const resolved = resolveInputs(hoist.fields, used);
    // A stored record may hold a key no field has (old data); the printout follows the core.
    const stored = { ...used, bogusField: 1, load: { value: 99, unit: 't' } };
    const sheet = buildPrintableSheet({
      sheet: {
        documentNumber: base.documentNumber,
        title: base.title,
        site: { code: 'S', name: 'Site' },
        equipment: { tag: 'M', name: 'Machine' },
        position: { tag: 'P', description: 'Position' },
        revisions: [],
      },
      revision: {
        label: 'A',
        state: 'approved',
        author: { name: 'Dana Demo', initials: 'DD' },
        checker: null,
        changeNote: null,
        createdAt: '2026-11-10T08:00:00Z',
        submittedAt: '2026-11-11T08:00:00Z',
        inputs: stored,
        unitSystem: 'SI',
        evaluation: { ...base.evaluation!, resolvedInputs: resolved },
        coreVersion: base.coreVersion,
        verificationCode: null,
        justification: null,
        supersededBy: null,
      },
      sheetType: hoist,
      criteriaSet: { id: 'x', version: 1, name: 'x', description: '', values: [] },
      verifyBaseUrl: 'https://holdfast.test',
    });
    expect(sheet.inputs.map((i) => i.field.key)).toEqual(resolved.map((r) => r.key));
    expect(sheet.inputs.find((i) => i.field.key === 'load')!.entered).toBe('8 t');
  });
});
