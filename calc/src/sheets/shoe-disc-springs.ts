import type { SheetEvaluation } from '../core/types.js';
import { CalcInputError, isCalcInputError } from '../core/errors.js';
import type { Derivation } from '../core/step.js';
import { deriveStackSet } from '../disc-springs/stack-derivation.js';
import { TABLE_STEEL } from '../disc-springs/disc.js';
import { WORKING_BAND, workingBandWarning } from '../disc-springs/curve.js';
import type { DiscStack } from '../disc-springs/stack.js';
import { makeCheck } from './checks.js';
import { SHOE_STACK_TITLES } from './field-card-layouts.js';
import type { ShoeInputs } from './shoe-brake-fields.js';

const SECTION = 'discSprings';
// Friction factors for series-stacked discs (recalled from DIN EN 16984's table, memory): only
// the edge friction matters for discs stacked in series.
const FRICTION = { frictionCone: 0.015, frictionEdge: 0.02 };
const FIELD_MAP: Record<string, string> = {
  De: 'De',
  Di: 'Di',
  t: 'T',
  l0: 'L0',
  seriesCount: 'Series',
  parallelCount: 'Parallel',
};
const TITLES = SHOE_STACK_TITLES;
const PRACTICE = {
  holder:
    'common practice, no published source: a disc spring under a castle nut on a shoe holder is tightened flat, then backed off about 60°',
  equaliser:
    'common practice, no published source: a stack of three disc springs on an equaliser shaft is tightened flat, then backed off about 180°',
} as const;

function stackOf(v: ShoeInputs, p: 'holder' | 'equaliser'): DiscStack {
  return {
    disc: {
      De: v[`${p}De`],
      Di: v[`${p}Di`],
      t: v[`${p}T`],
      l0: v[`${p}L0`],
      ...TABLE_STEEL,
    },
    seriesCount: v[`${p}Series`],
    parallelCount: v[`${p}Parallel`],
    ...FRICTION,
  };
}

/**
 * Back-off preload of the optional shoe-holder and equaliser disc-spring stacks, computed by the
 * disc-spring core (DIN EN 16984 relations) and recorded in the sheet's derivation.
 */
export function evaluateShoeDiscSprings(v: ShoeInputs, d: Derivation, out: SheetEvaluation): void {
  for (const p of ['holder', 'equaliser'] as const) {
    if (!v[`${p}Enabled`]) continue;
    d.section = SECTION;
    const stack = stackOf(v, p);
    let r;
    try {
      r = deriveStackSet({ stack, lead: v[`${p}Pitch`], angle: v[`${p}BackOff`] }, d, `${p}-`);
    } catch (e) {
      if (!isCalcInputError(e)) throw e;
      throw new CalcInputError(
        e.fields.map((f) => ({
          field: `${p}${FIELD_MAP[f.field] ?? f.field}`,
          message: f.message,
        })),
      );
    }
    const title = TITLES[p];
    const preload = d.find(`${p}-preload`);
    if (preload) {
      out.results.push({
        key: `${p}Preload`,
        section: SECTION,
        label: `${title}: preload after back-off`,
        symbol: 'F_V',
        value: preload.value,
        unit: preload.unit,
        dimension: 'force',
      });
    }
    out.fieldSettings.push(
      {
        key: `${p}BackOff`,
        label: `${title}: tighten until flat, then back off`,
        value: v[`${p}BackOff`],
        unit: 'rad',
        dimension: 'angle',
        note: PRACTICE[p],
      },
      {
        key: `${p}Preload`,
        label: `${title}: resulting preload`,
        value: r.stackUnloading,
        unit: 'N',
        dimension: 'force',
      },
      {
        key: `${p}SetLength`,
        label: `${title}: stack length when set`,
        value: r.setLength,
        unit: 'm',
        dimension: 'length',
      },
    );
    out.checks.push(
      makeCheck({
        id: `${p}-set-deflection-min`,
        section: SECTION,
        label: `${title}: set deflection ÷ h0, at least`,
        value: r.setRatio,
        limit: WORKING_BAND.min,
        kind: 'min',
        dimension: 'dimensionless',
        source:
          'from memory of DIN 2093 (now DIN EN 16983): minimum initial deflection about 0.15–0.20·h0 — check the governing standard',
        failHint: 'Back off less: the stack is nearly free and preload is uncertain.',
      }),
      makeCheck({
        id: `${p}-set-deflection-max`,
        section: SECTION,
        label: `${title}: set deflection ÷ h0, at most`,
        value: r.setRatio,
        limit: WORKING_BAND.max,
        kind: 'max',
        dimension: 'dimensionless',
        source:
          'from memory of DIN 2093: working deflection usually ≤ 0.75·h0 — check the governing standard',
        failHint: 'Back off more: little travel is left before the stack goes solid.',
      }),
    );
    const warning = workingBandWarning(r.setRatio);
    if (warning) out.warnings.push(`${title}: ${warning}`);
    if (r.slack)
      out.warnings.push(
        `${title}: the back-off exceeds the travel to flat; the stack is free and gives no preload.`,
      );
  }
}
