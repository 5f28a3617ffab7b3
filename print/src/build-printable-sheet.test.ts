import type { Dimension } from '@holdfast/calc';
import { describe, expect, it } from 'vitest';
import { compareLabels } from './build-printable-sheet.js';
import { enteredText } from './format.js';
import { markingText } from './parts/marking.js';
import { collectReferences } from './parts/references.js';
import { niceTicks, tickLabel } from './parts/ticks.js';
import { hoistPrintable } from './testing/hoist-fixture.js';
import { realPrintable } from './testing/real-sheet.js';

describe('buildPrintableSheet', () => {
  it('keeps inputs as typed and converts them to the sheet unit system', () => {
    const si = hoistPrintable({ state: 'approved' });
    const width = si.inputs.find((i) => i.field.key === 'liningWidth')!;
    expect(width.entered).toBe('7.48 in');
    expect(width.converted).toBe('190.0 mm');
    const us = hoistPrintable({ state: 'approved', unitSystem: 'US' });
    const force = us.inputs.find((i) => i.field.key === 'springForce')!;
    expect(force.entered).toBe('12.4 kN');
    // 12 400 N / 4.448 222 N/lbf = 2787.6 lbf
    // Forces print to 3 significant figures (calc's PRECISION table).
    expect(force.converted).toBe('2790 lbf');
    expect(us.inputs.find((i) => i.field.key === 'hotMetal')!.entered).toBe('Yes');
    // Units print as the unit table labels them, not in the parser's spelling.
    const field = (dimension: Dimension) => ({ ...width.field, dimension });
    expect(enteredText({ value: 30, unit: 'degC' }, field('temperature'))).toBe('30 °C');
    expect(enteredText({ value: 20, unit: 'W/(m^2 K)' }, field('heatTransferCoefficient'))).toBe(
      '20 W/(m²·K)',
    );
    expect(enteredText({ value: 1.2, unit: 'kg m^2' }, field('inertia'))).toBe('1.2 kg·m²');
    expect(us.inputs.find((i) => i.field.key === 'torqueReference')!.entered).toBe(
      'Motor rated torque',
    );
  });

  it('lists the criteria values the evaluation read, in the set order; the whole set when it did not say', () => {
    const used = hoistPrintable({ state: 'approved', criteriaUsed: ['pMax'] });
    expect(used.criteria.listed).toBe('used');
    expect(used.criteria.values.map((v) => v.key)).toEqual(['pMax']);
    const none = hoistPrintable({ state: 'approved', criteriaUsed: [] });
    expect(none.criteria).toMatchObject({ listed: 'used', values: [] });
    const before = hoistPrintable({ state: 'approved' });
    expect(before.criteria.listed).toBe('whole set');
    expect(before.criteria.values.map((v) => v.key)).toEqual(['torqueFactor', 'pMax']);
  });

  it('prints the history up to the printed revision only, in label order', () => {
    const sheet = hoistPrintable({ state: 'approved' });
    expect(sheet.history.map((h) => h.label)).toEqual(['A', 'B']);
    expect(sheet.history[1].date.slice(0, 10)).toBe('2026-11-04');
  });

  it('builds the verify URL from the base URL and the code', () => {
    const sheet = hoistPrintable({ state: 'approved' });
    expect(sheet.verification).toEqual({
      code: 'HF7K-2QX9',
      url: 'https://holdfast.example.test/verify/HF7K-2QX9',
    });
    expect(hoistPrintable({ state: 'draft' }).verification).toBeNull();
  });

  it('records approvals only once they happened', () => {
    const draft = hoistPrintable({ state: 'draft' });
    expect(draft.approvals).toHaveLength(1);
    expect(draft.approvals[0]).toMatchObject({ role: 'Prepared', at: null });
    const approved = hoistPrintable({ state: 'approved' });
    expect(approved.approvals.map((a) => [a.role, a.person.initials, a.at?.slice(0, 10)])).toEqual([
      ['Prepared', 'AD', '2026-11-03'],
      ['Checked and approved', 'BC', '2026-11-04'],
    ]);
  });

  it('describes the torque reference and the efficiencies from the inputs', () => {
    const sheet = hoistPrintable({ state: 'approved' });
    expect(sheet.designBasis.torqueReference).toBe('Torque reference: Motor rated torque');
    expect(sheet.designBasis.efficiencyTreatment).toContain('η_g = 0.94');
  });

  it('names the fixed reference of a sheet type that offers no choice of it', () => {
    const travel = realPrintable({ sheetTypeId: 'travel-shoe-brake', state: 'approved' });
    expect(travel.designBasis.torqueReference).toBe(
      'Motor rated (full-load) torque (fixed for this sheet type)',
    );
    const stack = realPrintable({ sheetTypeId: 'disc-spring-stack', state: 'approved' });
    expect(stack.designBasis.torqueReference).toBe('Not applicable to this sheet type');
  });
});

describe('printout helpers', () => {
  it('orders revision labels A … Z, AA', () => {
    expect(['AA', 'C', 'A', 'Z', 'B'].sort(compareLabels)).toEqual(['A', 'B', 'C', 'Z', 'AA']);
  });

  it('marks every state except approved', () => {
    expect(markingText(hoistPrintable({ state: 'draft' }))).toBe('NOT FOR USE — DRAFT');
    expect(markingText(hoistPrintable({ state: 'in_check' }))).toBe('NOT FOR USE — IN CHECK');
    expect(markingText(hoistPrintable({ state: 'returned' }))).toBe('NOT FOR USE — RETURNED');
    expect(markingText(hoistPrintable({ state: 'superseded' }))).toBe(
      'SUPERSEDED by rev C on 2026-11-20',
    );
    expect(markingText(hoistPrintable({ state: 'approved' }))).toBeNull();
  });

  it('lists each reference once, without "definition"', () => {
    const refs = collectReferences(hoistPrintable({ state: 'approved' }));
    expect(refs).not.toContain('definition');
    expect(new Set(refs).size).toBe(refs.length);
    expect(refs).toContain('common practice');
  });

  it('makes round axis ticks that cover the data', () => {
    const t = niceTicks(0, 5360);
    expect(t.step).toBe(1000);
    expect(t.min).toBe(0);
    expect(t.max).toBe(6000);
    expect(t.ticks).toEqual([0, 1000, 2000, 3000, 4000, 5000, 6000]);
    const small = niceTicks(0.0001, 0.0039);
    expect(small.min).toBeLessThanOrEqual(0.0001);
    expect(small.max).toBeGreaterThanOrEqual(0.0039);
    expect(tickLabel(0.0005, 0.0005)).toBe('0.0005');
    expect(tickLabel(-2, 1)).toBe('−2');
    // A flat series still gets a usable axis.
    const flat = niceTicks(7, 7);
    expect(flat.max).toBeGreaterThan(flat.min);
  });
});
