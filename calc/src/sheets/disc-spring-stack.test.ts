import { demoInputs } from './registry.js';
import { describe, expect, it } from 'vitest';
import { isCalcInputError } from '../core/errors.js';
import type { CriteriaSet, SheetInputs } from '../core/types.js';
import { backOffPreload } from '../disc-springs/back-off.js';
import { TABLE_STEEL } from '../disc-springs/disc.js';
import { discSpringStackSheet as sheet } from './disc-spring-stack.js';

const criteria: CriteriaSet = { id: 'test', version: 1, name: 'test', description: '', values: [] };
const result = (e: ReturnType<typeof sheet.evaluate>, key: string) => {
  const r = e.results.find((x) => x.key === key);
  if (!r) throw new Error(`no result ${key}`);
  return r.value;
};
const fieldsOf = (inputs: SheetInputs) => {
  try {
    sheet.evaluate({ ...demoInputs(sheet), ...inputs }, criteria);
  } catch (e) {
    if (isCalcInputError(e)) return e.fields.map((f) => f.field);
    throw e;
  }
  return [];
};

describe('disc-spring-stack sheet', () => {
  it('evaluates the demo: shoe-holder disc backed off 60°, equaliser stack of three backed off 180°', () => {
    const e = sheet.evaluate(demoInputs(sheet), criteria);
    // A 40 on M20×2.5, 60°: Δ = 0.4167 mm, s = 0.9 − 0.4167 mm.
    expect(result(e, 'a.release')).toBeCloseTo(2.5e-3 / 6, 12);
    expect(result(e, 'a.setDeflection')).toBeCloseTo(0.9e-3 - 2.5e-3 / 6, 12);
    const a40 = { De: 0.04, Di: 0.0204, t: 2.25e-3, l0: 3.15e-3, ...TABLE_STEEL };
    const ref = backOffPreload(
      { disc: a40, seriesCount: 1, parallelCount: 1, frictionCone: 0.02, frictionEdge: 0.03 },
      2.5e-3,
      60,
    );
    expect(result(e, 'a.preload')).toBeCloseTo(ref.forces.unloading, 6);
    // three B 50 on M24×3, 180°: Δ = 1.5 mm shared by 3 → s = 1.4 − 0.5 mm.
    expect(result(e, 'b.setDeflection')).toBeCloseTo(0.9e-3, 12);
    expect(e.pass).toBe(true);
    expect(e.charts).toHaveLength(2);
    expect(e.charts[0].markers?.[0].y).toBeCloseTo(result(e, 'a.preload'), 6);
    expect(e.fieldSettings.map((f) => f.key)).toContain('b.backOffAngle');
    expect(e.tables[0].rows[0].preload).toBeGreaterThan(e.tables[0].rows[2].preload);
    expect(e.derivation.some((s) => s.id === 'b-preload' && s.section === 'stackB')).toBe(true);
    const perStack = (k: string) =>
      [
        'sigma-om-flat',
        'set-deflection-min',
        'set-deflection-max',
        'band-short',
        'band-past',
        'preload',
        'preload-past',
      ].map((id) => `${k}-${id}`);
    expect(e.checks.map((c) => c.id)).toEqual([...perStack('a'), ...perStack('b')]);
    expect(e.pass).toBe(e.checks.every((c) => c.pass));
    for (const r of e.results) expect(Number.isFinite(r.value)).toBe(true);
  });

  it('accepts US customary inputs and gives the same preload', () => {
    const si = sheet.evaluate({ ...demoInputs(sheet), bEnabled: false }, criteria);
    const us = sheet.evaluate(
      {
        ...demoInputs(sheet),
        bEnabled: false,
        aDe: '1.574803 in',
        aDi: { value: 20.4 / 25.4, unit: 'in' },
        aPitch: { value: 2.5 / 25.4, unit: 'in' },
        aRequiredPreload: '674.4 lbf',
      },
      criteria,
    );
    expect(result(us, 'a.preload') / result(si, 'a.preload')).toBeCloseTo(1, 5);
  });

  it('fails the preload check when the required preload is not reached', () => {
    const e = sheet.evaluate(
      { ...demoInputs(sheet), bEnabled: false, aRequiredPreload: '50 kN' },
      criteria,
    );
    const c = e.checks.find((x) => x.id === 'a-preload');
    expect(c?.pass).toBe(false);
    expect(e.pass).toBe(false);
    expect(e.results.find((r) => r.key === 'a.angleForRequired')).toBeUndefined();
  });

  it('uses the σOM limit of the criteria set when it has one', () => {
    const strict: CriteriaSet = {
      ...criteria,
      values: [
        {
          key: 'discSpring.sigmaOMFlatMax',
          label: 'x',
          value: 1e6,
          unit: 'Pa',
          source: 'test source',
          confidence: 'memory',
        },
      ],
    };
    const c = sheet
      .evaluate(demoInputs(sheet), strict)
      .checks.find((x) => x.id === 'a-sigma-om-flat');
    expect(c?.pass).toBe(false);
    expect(c?.source).toBe('test source');
  });

  it('fails the band check outside the working band, without repeating it as a warning, and warns when backed off past flat travel', () => {
    const near = sheet.evaluate(
      { ...demoInputs(sheet), bEnabled: false, aBackOff: '10 deg' },
      criteria,
    );
    expect(near.checks.find((c) => c.id === 'a-set-deflection-max')?.pass).toBe(false);
    expect(near.warnings.join(' ')).not.toMatch(/h0|75 %/);
    const loose = sheet.evaluate(
      { ...demoInputs(sheet), bEnabled: false, aBackOff: '180 deg', aRequiredPreload: '0 N' },
      criteria,
    );
    expect(loose.warnings.join(' ')).toMatch(/loose/);
    expect(loose.warnings.join(' ')).not.toMatch(/below the usual/);
    expect(loose.checks.find((c) => c.id === 'a-set-deflection-min')?.pass).toBe(false);
    expect(result(loose, 'a.preload')).toBe(0);
  });

  it('takes the geometry of a chosen standard size, including t′ of a group 3 disc', () => {
    const e = sheet.evaluate(
      { ...demoInputs(sheet), bEnabled: false, aSize: 'A 125', aPitch: '4 mm', aBackOff: '90 deg' },
      criteria,
    );
    expect(e.derivation.some((s) => s.id === 'a-K4')).toBe(true);
    // h0 = l0 − t′ = 10.6 − 7.5 mm; Δ = 1 mm
    expect(result(e, 'a.setDeflection')).toBeCloseTo(3.1e-3 - 1e-3, 12);
    expect(e.warnings.join(' ')).toMatch(/standard size A 125 .*confidence: memory/);
    expect(fieldsOf({ aSize: 'A 999' })).toEqual(['aSize']);
  });

  it('rejects bad input naming the sheet field', () => {
    expect(fieldsOf({ aDi: '45 mm' })).toEqual(['aDi']);
    expect(fieldsOf({ bt: '0 mm' })).toEqual(['bt']);
    expect(fieldsOf({ bl0: '2 mm' })).toEqual(['bl0']);
    expect(fieldsOf({ aSeries: 1.5 })).toEqual(['aSeries']);
    expect(fieldsOf({ aPitch: '3 kN' })).toEqual(['aPitch']);
    expect(fieldsOf({ aEnabled: false, bEnabled: false })).toEqual(['aEnabled']);
    expect(fieldsOf({ E: '-1 MPa', aDe: 'abc' })).toEqual(expect.arrayContaining(['E', 'aDe']));
  });
});
