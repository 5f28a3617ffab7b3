import { describe, expect, it } from 'vitest';
import type { SheetEvaluation } from '../core/types.js';
import { CalcInputError } from '../core/errors.js';
import { getCriteriaSet } from '../criteria/lookup.js';
import { nearlyEqual } from '../testing/expect-close.js';
import { demoInputs, getSheetType, sheetTypes } from './registry.js';

const crane = getCriteriaSet('crane-hoist')!;
const general = getCriteriaSet('general-industry')!;
const travel = getCriteriaSet('travel-drive')!;
const hoist = getSheetType('hoist-shoe-brake')!;
const trav = getSheetType('travel-shoe-brake')!;
const caliper = getSheetType('caliper-disc-brake')!;

function allNumbers(e: SheetEvaluation): number[] {
  return [
    ...e.results.map((r) => r.value),
    ...e.checks.flatMap((c) => [c.value, c.limit, c.utilisation]),
    ...e.derivation.map((s) => s.value),
    ...e.charts.flatMap((c) => c.series.flatMap((s) => s.points.flatMap((p) => [p.x, p.y]))),
    ...e.fieldSettings.map((f) => f.value),
    ...e.tables.flatMap((t) => t.rows.flatMap((r) => Object.values(r))),
  ];
}

function fieldsOf(fn: () => unknown): string[] {
  try {
    fn();
  } catch (e) {
    if (e instanceof CalcInputError) return e.fields.map((f) => f.field);
    throw e;
  }
  throw new Error('no error thrown');
}

describe('sheet registry', () => {
  it('registers the five sheet types with unique field keys and defaults in range', () => {
    expect(sheetTypes.map((s) => s.id)).toEqual([
      'hoist-shoe-brake',
      'travel-shoe-brake',
      'drive-shoe-brake',
      'caliper-disc-brake',
      'disc-spring-stack',
    ]);
    for (const s of sheetTypes) {
      const keys = s.fields.map((f) => f.key);
      expect(new Set(keys).size).toBe(keys.length);
      for (const f of s.fields) expect(s.sections.map((x) => x.id)).toContain(f.section);
    }
  });

  it('gives two inputs of one section the same symbol only for the same quantity of two stacks', () => {
    // 'holderPitch' and 'equaliserPitch' are both P, each under its stack's title.
    const quantity = (key: string) => key.replace(/^(holder|equaliser|a|b)(?=[A-Z])/, '');
    for (const s of sheetTypes) {
      const seen = new Map<string, string>();
      for (const f of s.fields) {
        if (!f.symbol) continue;
        const at = `${f.section} ${f.symbol}`;
        const other = seen.get(at);
        if (other !== undefined)
          expect(quantity(f.key), `${s.id}: ${other} and ${f.key}`).toBe(quantity(other));
        else seen.set(at, f.key);
      }
    }
  });
});

describe.each([
  ['hoist-shoe-brake', hoist, crane],
  ['travel-shoe-brake', trav, travel],
  ['caliper-disc-brake', caliper, general],
] as const)('%s', (_id, sheet, criteria) => {
  const e = sheet.evaluate(demoInputs(sheet), criteria);

  it('passes with its demo defaults and returns only finite numbers', () => {
    expect(e.checks.filter((c) => !c.pass).map((c) => c.message)).toEqual([]);
    expect(e.pass).toBe(true);
    expect(allNumbers(e).every(Number.isFinite)).toBe(true);
  });

  it('records a derivation with unique ids, formula text and substitution for every step', () => {
    const ids = e.derivation.map((s) => s.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const s of e.derivation) {
      expect(s.formula).toMatch(/=/);
      expect(s.substituted.startsWith(s.formula.split(' = ')[0])).toBe(true);
      expect(s.reference.length).toBeGreaterThan(5);
    }
  });

  it('checks torque at μ min, at worn lining and at μ max, each with a source', () => {
    const ids = e.checks.map((c) => c.id);
    expect(ids).toEqual(
      expect.arrayContaining([
        'torque-nominal',
        'torque-min-friction',
        'torque-worn-min-friction',
        'torque-max-friction',
      ]),
    );
    for (const c of e.checks) expect(c.source.length).toBeGreaterThan(5);
    const byId = Object.fromEntries(e.checks.map((c) => [c.id, c.value]));
    expect(byId['torque-worn-min-friction']).toBeLessThan(byId['torque-min-friction']);
    expect(byId['torque-min-friction']).toBeLessThan(byId['torque-nominal']);
    expect(byId['torque-nominal']).toBeLessThan(byId['torque-max-friction']);
  });

  it('gives the charts for stopping, wear, friction band and temperature, and field settings', () => {
    expect(e.charts.map((c) => c.id).sort()).toEqual([
      'drum-temperature',
      'stopping',
      'torque-friction',
      'torque-wear',
    ]);
    expect(e.fieldSettings.length).toBeGreaterThan(2);
    expect(e.tables[0].rows.length).toBe(11);
  });

  it('gives the same results for US customary inputs', () => {
    const us = Object.fromEntries(
      sheet.fields.map((f) => {
        const d = f.demo as { value: number; unit: string };
        if (f.kind !== 'quantity' || !f.unitUS || f.unitUS === f.unitSI) return [f.key, f.demo];
        return [f.key, `${convert(d.value, d.unit, f.unitUS, f.dimension!)} ${f.unitUS}`];
      }),
    );
    const r = sheet.evaluate(us, criteria);
    for (const c of e.checks) {
      const other = r.checks.find((x) => x.id === c.id)!;
      expect(nearlyEqual(other.value, c.value, 1e-9, 1e-9), c.id).toBe(true);
    }
  });
});

import { fromSI, toSI } from '../units/conversion.js';
import type { Dimension } from '../core/types.js';
function convert(v: number, from: string, to: string, dim: Dimension): string {
  return String(fromSI(toSI(v, from, dim), to, dim));
}

describe('invalid input', () => {
  it('reports every bad field at once', () => {
    const fields = fieldsOf(() =>
      hoist.evaluate(
        {
          ...demoInputs(hoist),
          load: '10 kN',
          drumDiameter: { value: -1, unit: 'mm' },
          muNominal: Number.NaN,
          reeving: '4 m',
        },
        crane,
      ),
    );
    expect(fields).toEqual(
      expect.arrayContaining(['load', 'drumDiameter', 'muNominal', 'reeving']),
    );
  });
  it('rejects inconsistent friction band and spring range', () => {
    expect(fieldsOf(() => hoist.evaluate({ ...demoInputs(hoist), muMin: 0.5 }, crane))).toContain(
      'muMin',
    );
    expect(
      fieldsOf(() => trav.evaluate({ ...demoInputs(trav), springForceMax: '100 N' }, travel)),
    ).toContain('springForceMax');
    expect(
      fieldsOf(() =>
        caliper.evaluate({ ...demoInputs(caliper), padInnerRadius: '600 mm' }, general),
      ),
    ).toContain('padInnerRadius');
    expect(
      fieldsOf(() => trav.evaluate({ ...demoInputs(trav), brakedWheels: 9 }, travel)),
    ).toContain('brakedWheels');
  });
  it('maps disc-spring errors to the sheet fields', () => {
    expect(
      fieldsOf(() => hoist.evaluate({ ...demoInputs(hoist), holderDi: '50 mm' }, crane)).some((f) =>
        f.startsWith('holder'),
      ),
    ).toBe(true);
  });
});

describe('physics of the sheets', () => {
  it('a brake too weak to stop the lowering load is a failed check with a message, not an exception', () => {
    const e = hoist.evaluate(
      { ...demoInputs(hoist), springForce: '550 N', springForceMin: '100 N', load: '30 t' },
      crane,
    );
    const stop = e.checks.find((c) => c.id === 'stops-load')!;
    expect(stop.pass).toBe(false);
    expect(stop.message).toMatch(/never stopped/);
    expect(e.pass).toBe(false);
    expect(e.warnings.join(' ')).toMatch(/never stopped/);
    expect(allNumbers(e).every(Number.isFinite)).toBe(true);
  });
  it('crane-hoist asks 1.25 × hoisting torque; general-industry 1.5 ×', () => {
    const one = { ...demoInputs(hoist), brakeArrangement: 'single', hotMetal: false };
    const a = hoist.evaluate(one, crane).results.find((r) => r.key === 'required-torque')!.value;
    const b = hoist.evaluate(one, general).results.find((r) => r.key === 'required-torque')!.value;
    const h = hoist
      .evaluate(demoInputs(hoist), crane)
      .results.find((r) => r.key === 'hoisting-torque')!.value;
    expect(nearlyEqual(a, 1.25 * h, 1e-12)).toBe(true);
    expect(nearlyEqual(b, 1.5 * h, 1e-12)).toBe(true);
  });
  it('a reserve stroke at or below the minimum is refused on the reserve-stroke field', () => {
    expect(() => hoist.evaluate({ ...demoInputs(hoist), reserveStroke: '5 mm' }, crane)).toThrow(
      /reserveStroke: must exceed the minimum reserve stroke/,
    );
  });
  it('a travel brake that is too strong fails the adhesion check', () => {
    const e = trav.evaluate({ ...demoInputs(trav), springForce: '780 N', torqueFactor: 1 }, travel);
    expect(e.checks.find((c) => c.id === 'wheel-adhesion')!.pass).toBe(false);
  });
});

describe('energy bookkeeping', () => {
  it('kinetic energy plus the driving load’s work equals the brake work per stop', () => {
    for (const [sheet, criteria] of [
      [hoist, crane],
      [trav, travel],
      [caliper, general],
    ] as const) {
      const e = sheet.evaluate(demoInputs(sheet), criteria);
      const v = (id: string) => e.derivation.find((s) => s.id === id)!.value;
      expect(nearlyEqual(v('energy-kinetic') + v('energy-load-work'), v('brake-work'), 1e-12)).toBe(
        true,
      );
    }
  });
});

describe('temperature checks', () => {
  it('report the used share of the allowed rise above ambient', () => {
    const e = hoist.evaluate(demoInputs(hoist), crane);
    const c = e.checks.find((x) => x.id === 'temperature-steady')!;
    const Tamb = 30 + 273.15;
    expect(nearlyEqual(c.utilisation, (c.value - Tamb) / (c.limit - Tamb), 1e-12)).toBe(true);
  });
});
