import type { CriteriaSet, SheetEvaluation } from '../core/types.js';
import { CalcInputError, isCalcInputError } from '../core/errors.js';
import type { Derivation } from '../core/step.js';
import { deriveStackSet } from '../disc-springs/stack-derivation.js';
import { workingBandWarning } from '../disc-springs/curve.js';
import type { DiscStack } from '../disc-springs/stack.js';
import { makeCheck } from './checks.js';
import {
  declaredBackOffTolerance,
  stackLengthTolerance,
  fmtDeg,
  slotNote,
  workingBandChecks,
} from './disc-stack-band-checks.js';
import { sigmaOMFlatCheck } from './disc-spring-stack-output.js';
import { SHOE_STACK_TITLES } from './field-card-layouts.js';
import type { ShoeInputs } from './shoe-brake-fields.js';

const SECTION = 'discSprings';
const FIELD_MAP: Record<string, string> = {
  De: 'De',
  Di: 'Di',
  t: 'T',
  l0: 'L0',
  seriesCount: 'Series',
  parallelCount: 'Parallel',
};
const TITLES = SHOE_STACK_TITLES;
/** Disc-spring inputs shared by both stacks. */
const SHARED_FIELD: Record<string, string> = {
  E: 'discE',
  nu: 'discNu',
  frictionCone: 'discFrictionCone',
  frictionEdge: 'discFrictionEdge',
};
const PRACTICE = {
  holder:
    'common practice, no published source: a disc spring under a castle nut on a shoe holder is tightened flat, then backed off about 60°',
  equaliser:
    'common practice, no published source: a stack of disc springs on an equaliser shaft is tightened flat, then backed off by the angle given (at least about half a turn)',
} as const;

function stackOf(v: ShoeInputs, p: 'holder' | 'equaliser'): DiscStack {
  return {
    disc: {
      De: v[`${p}De`],
      Di: v[`${p}Di`],
      t: v[`${p}T`],
      l0: v[`${p}L0`],
      E: v.discE,
      nu: v.discNu,
    },
    seriesCount: v[`${p}Series`],
    parallelCount: v[`${p}Parallel`],
    frictionCone: v.discFrictionCone,
    frictionEdge: v.discFrictionEdge,
  };
}

/**
 * Back-off preload of the optional shoe-holder and equaliser disc-spring stacks, computed by the
 * disc-spring core (DIN EN 16984 relations) and recorded in the sheet's derivation.
 */
export function evaluateShoeDiscSprings(
  v: ShoeInputs,
  criteria: CriteriaSet,
  d: Derivation,
  out: SheetEvaluation,
): void {
  for (const p of ['holder', 'equaliser'] as const) {
    if (!v[`${p}Enabled`]) continue;
    d.section = SECTION;
    const stack = stackOf(v, p);
    const lead = v[`${p}Pitch`];
    const theta = v[`${p}BackOff`];
    const tol = v[`${p}BackOffTolerance`];
    const r = inSheetFields(p, () => deriveStackSet({ stack, lead, angle: theta }, d, `${p}-`));
    // The ends of the back-off tolerance, off the printed derivation: stopping short leaves the
    // stack deeper (nearer flat), running past leaves less preload.
    const at = (angle: number) =>
      inSheetFields(p, () => deriveStackSet({ stack, lead, angle: Math.max(0, angle) }, undefined));
    const short = at(theta - tol);
    const past = at(theta + tol);
    const title = TITLES[p];
    const preload = d.record(`${p}-preload`);
    if (preload) {
      out.results.push({
        key: `${p}Preload`,
        section: SECTION,
        label: `${title}: preload after back-off`,
        symbol: 'F_V',
        value: preload.value,
        unit: 'N',
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
        note: `${PRACTICE[p]}. ${slotNote(tol)}`,
        // The card's band is one-sided: the nut only turns back. The sheet also checks the stack
        // at −tolerance, as margin for reading the angle.
        tolerance: declaredBackOffTolerance(tol),
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
        tolerance: stackLengthTolerance(r.setLength, short.setLength, past.setLength),
      },
    );
    out.checks.push(
      ...workingBandChecks({
        prefix: p,
        section: SECTION,
        title,
        tolerance: tol,
        set: r.setRatio,
        short: short.setRatio,
        past: past.setRatio,
      }),
      sigmaOMFlatCheck(
        p,
        SECTION,
        r.sigmaOMFlat,
        criteria,
        `${title}: stress |σOM| at flat (static load; DIN EN 16983/16984)`,
      ),
    );
    if (p === 'holder') {
      out.checks.push(
        makeCheck({
          id: 'holder-preload-needed',
          section: SECTION,
          label: `${title}: preload backed off past (+${fmtDeg(tol)}°) ≥ the preload the holder needs`,
          value: past.stackUnloading,
          limit: v.holderRequiredPreload,
          kind: 'min',
          dimension: 'force',
          source: "brake maker's data (user input): preload the shoe holder needs",
          failHint: 'Back off less or use a stiffer disc.',
        }),
      );
    }
    const warning = workingBandWarning(r.setRatio);
    if (warning) out.warnings.push(`${title}: ${warning}`);
    if (r.slack)
      out.warnings.push(
        `${title}: the back-off exceeds the travel to flat; the stack is free and gives no preload.`,
      );
  }
}

/** Runs a disc-spring core call and names its field errors as the sheet declares them. */
function inSheetFields<T>(p: 'holder' | 'equaliser', f: () => T): T {
  try {
    return f();
  } catch (e) {
    if (!isCalcInputError(e)) throw e;
    throw new CalcInputError(
      e.fields.map((x) => ({
        field: SHARED_FIELD[x.field] ?? `${p}${FIELD_MAP[x.field] ?? x.field}`,
        message: x.message,
      })),
    );
  }
}
