import { demoInputs } from '../sheets/registry.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isCalcInputError } from '../core/errors.js';
import type { SheetInputs, SheetTypeDefinition } from '../core/types.js';
import { CRITERIA_SETS } from '../criteria/sets.js';
import { sheetTypes } from '../sheets/registry.js';

/** A field scaled up must move a result up ('up') or down ('down'), all else at the defaults. */
interface Rule {
  field: string;
  result: string;
  direction: 'up' | 'down';
  what: string;
}

const RULES: Rule[] = [
  {
    field: 'springForce',
    result: 'torque-nominal',
    direction: 'up',
    what: 'more spring force, more torque',
  },
  {
    field: 'springForce',
    result: 'torque-worn-nominal',
    direction: 'up',
    what: 'more spring force, more worn torque',
  },
  {
    field: 'wear',
    result: 'torque-worn-nominal',
    direction: 'down',
    what: 'more wear, less torque',
  },
  {
    field: 'wear',
    result: 'torque-worn-min',
    direction: 'down',
    what: 'more wear, less torque at μ min',
  },
  {
    field: 'reserveStroke',
    result: 'torque-worn-nominal',
    direction: 'down',
    what: 'more reserve, more wear before re-adjusting, less torque there',
  },
  {
    field: 'minReserveStroke',
    result: 'torque-worn-min',
    direction: 'up',
    what: 'a larger minimum reserve, re-adjust earlier, more torque at μ min there',
  },
  {
    field: 'stopsPerHour',
    result: 'average-heat',
    direction: 'up',
    what: 'more stops per hour, more heat',
  },
  {
    field: 'stopsPerHour',
    result: 'steady-temperature',
    direction: 'up',
    what: 'more stops per hour, hotter drum',
  },
  {
    field: 'clampForce',
    result: 'torque-nominal',
    direction: 'up',
    what: 'more clamp force, more torque',
  },
  {
    field: 'aBackOff',
    result: 'a.preload',
    direction: 'down',
    what: 'backing off further, less disc-spring preload',
  },
  {
    field: 'aPitch',
    result: 'a.preload',
    direction: 'down',
    what: 'coarser thread, less disc-spring preload for the same angle',
  },
];

function resultWith(
  sheet: SheetTypeDefinition,
  key: string,
  value: number,
  result: string,
): number | undefined {
  const f = sheet.fields.find((x) => x.key === key);
  if (!f) return undefined;
  const d = f.demo;
  const input = typeof d === 'object' && d !== null ? { value, unit: d.unit } : value;
  try {
    return sheet
      .evaluate({ ...demoInputs(sheet), [key]: input } as SheetInputs, CRITERIA_SETS[0])
      .results.find((r) => r.key === result)?.value;
  } catch (e) {
    if (isCalcInputError(e)) return undefined;
    throw e;
  }
}

describe.each(sheetTypes.map((s) => [s.id, s] as const))('sheet %s: monotonicity', (_id, sheet) => {
  const reported = new Set(
    sheet.evaluate(demoInputs(sheet), CRITERIA_SETS[0]).results.map((r) => r.key),
  );
  const rules = RULES.filter(
    (r) => sheet.fields.some((f) => f.key === r.field) && reported.has(r.result),
  );
  it('has at least one monotonicity rule', () => expect(rules.length).toBeGreaterThan(0));
  it.each(rules.map((r) => [r.what, r] as const))(
    '%s',
    (_what, rule) => {
      const d = sheet.fields.find((x) => x.key === rule.field)!.demo as { value: number } | number;
      const base = typeof d === 'number' ? d : d.value;
      let compared = 0;
      fc.assert(
        fc.property(
          fc.double({ min: 0.5, max: 1.5, noNaN: true }),
          fc.double({ min: 0.01, max: 0.5, noNaN: true }),
          (k, dk) => {
            const lo = resultWith(sheet, rule.field, base * k, rule.result);
            const hi = resultWith(sheet, rule.field, base * (k + dk), rule.result);
            if (lo === undefined || hi === undefined) return;
            compared++;
            if (rule.direction === 'up') expect(hi).toBeGreaterThanOrEqual(lo);
            else expect(hi).toBeLessThanOrEqual(lo);
          },
        ),
        { numRuns: 40 },
      );
      expect(compared).toBeGreaterThan(0);
    },
    30_000,
  );
});
