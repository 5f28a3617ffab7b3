import { recordingCriteriaUsed } from '../criteria/lookup.js';
import type {
  CriteriaSet,
  SheetEvaluation,
  SheetInputs,
  SheetTypeDefinition,
} from '../core/types.js';
import { CalcInputError, FieldErrorCollector, isCalcInputError } from '../core/errors.js';
import { Derivation } from '../core/step.js';
import { newEvaluation } from './sheet-output.js';
import { deriveStackSet } from '../disc-springs/stack-derivation.js';
import { findStandardDisc } from '../disc-springs/standard-sizes.js';
import type { DiscStack } from '../disc-springs/stack.js';
import {
  DISC_STACK_FIELDS,
  DISC_STACK_SECTIONS,
  sectionOf,
  type StackKey,
} from './disc-spring-stack-fields.js';
import { readInputs } from './sheet-inputs.js';
import { stackOutputs } from './disc-spring-stack-output.js';
import { stackChecks } from './disc-spring-stack-checks.js';
import { DISC_STACK_FIELD_CARD, DISC_STACK_TITLES } from './field-card-layouts.js';

const TITLES: Record<StackKey, string> = DISC_STACK_TITLES;

const CAUTIONS = [
  "Disc-spring values follow DIN EN 16984 (formerly DIN 2092); the maker's data and the governing standard decide. Re-check the preload after running-in: discs set slightly in the first cycles.",
  '"Tighten flat, then back off" assumes a rigid bolt, nut and frame and a single-start thread; it is common practice, no published source.',
];

function readStack(v: Record<string, number | boolean | string>, k: StackKey): DiscStack {
  const num = (name: string) => v[`${k}${name}`] as number;
  const size = findStandardDisc(String(v[`${k}Size`]));
  const tr = num('tReduced');
  const mm = 1e-3;
  const geometry = size
    ? {
        De: size.De * mm,
        Di: size.Di * mm,
        t: size.t * mm,
        l0: size.l0 * mm,
        tReduced: size.tReduced === undefined ? undefined : size.tReduced * mm,
      }
    : {
        De: num('De'),
        Di: num('Di'),
        t: num('t'),
        l0: num('l0'),
        tReduced: tr > 0 ? tr : undefined,
      };
  return {
    disc: { ...geometry, E: v.E as number, nu: v.nu as number },
    seriesCount: num('Series'),
    parallelCount: num('Parallel'),
    frictionCone: num('FrictionCone'),
    frictionEdge: num('FrictionEdge'),
  };
}

/** Maps the disc-spring validator's field names to this sheet's field keys. */
function renameFields(e: unknown, k: StackKey): never {
  if (!isCalcInputError(e)) throw e;
  const map: Record<string, string> = {
    De: 'De',
    Di: 'Di',
    t: 't',
    l0: 'l0',
    tReduced: 'tReduced',
    seriesCount: 'Series',
    parallelCount: 'Parallel',
    frictionCone: 'FrictionCone',
    frictionEdge: 'FrictionEdge',
  };
  throw new CalcInputError(
    e.fields.map((f) => ({
      field: f.field === 'E' || f.field === 'nu' ? f.field : `${k}${map[f.field] ?? f.field}`,
      message: f.message,
    })),
  );
}

/** Evaluates the disc-spring stack sheet: one or two stacks set by "flat, then back off θ". */
export function evaluateDiscSpringStack(
  inputs: SheetInputs,
  criteria: CriteriaSet,
): SheetEvaluation {
  const v: Readonly<Record<string, number | boolean | string>> = readInputs(
    DISC_STACK_FIELDS,
    inputs,
  );
  const keys: StackKey[] = (['a', 'b'] as const).filter((k) => v[`${k}Enabled`] === true);
  const errors = new FieldErrorCollector();
  if (keys.length === 0) errors.add('aEnabled', 'include at least one stack');
  errors.throwIfAny();
  const d = new Derivation('stackA');
  const out = newEvaluation('disc-spring-stack', criteria, d, CAUTIONS);
  const computed = keys.map((k) => {
    const stack = readStack(v, k);
    d.section = sectionOf(k);
    const lead = v[`${k}Pitch`] as number;
    const angle = v[`${k}BackOff`] as number;
    const tolerance = v[`${k}BackOffTolerance`] as number;
    const required = v[`${k}RequiredPreload`] as number;
    const r = errors.capture(() => {
      try {
        return deriveStackSet({ stack, lead, angle, requiredPreload: required }, d, `${k}-`);
      } catch (e) {
        return renameFields(e, k);
      }
    }, undefined);
    // The ends of the tolerance, off the printed derivation, as the shoe sheets take them: past
    // (θ + Δθ, a fitter backing on to the next slot) leaves the least preload; short (θ − Δθ) is
    // the margin for reading the angle, where the stack sits deepest.
    const past = r && deriveStackSet({ stack, lead, angle: angle + tolerance }, undefined);
    const short =
      r && deriveStackSet({ stack, lead, angle: Math.max(0, angle - tolerance) }, undefined);
    return { k, stack, lead, angle, tolerance, required, r, past, short };
  });
  errors.throwIfAny();
  for (const c of computed) {
    if (!c.r || !c.past || !c.short) continue;
    const at = { key: c.k, section: sectionOf(c.k), title: TITLES[c.k] };
    const o = stackOutputs({
      ...at,
      stack: c.stack,
      lead: c.lead,
      angle: c.angle,
      tolerance: c.tolerance,
      required: c.required,
      r: c.r,
      short: c.short,
      past: c.past,
    });
    out.results.push(...o.results);
    out.checks.push(
      ...stackChecks(
        {
          ...at,
          required: c.required,
          tolerance: c.tolerance,
          r: c.r,
          past: c.past,
          short: c.short,
        },
        criteria,
      ),
    );
    out.charts.push(o.chart);
    out.fieldSettings.push(...o.fieldSettings);
    out.tables.push(o.table);
    out.warnings.push(...o.warnings);
    const size = findStandardDisc(String(v[`${c.k}Size`]));
    if (size)
      out.warnings.push(
        `${TITLES[c.k]}: geometry of standard size ${size.designation} — ${size.source} (confidence: ${size.confidence}).`,
      );
  }
  out.pass = out.checks.every((c) => c.pass);
  return out;
}

/** The 'disc-spring-stack' sheet type (registered by the sheet-type registry). */
export const discSpringStackSheet: SheetTypeDefinition<'disc-spring-stack'> = {
  id: 'disc-spring-stack',
  title: 'Disc-spring stack',
  description:
    'Disc springs per DIN EN 16984 (formerly DIN 2092): force, stresses σOM and σI–σIV, stacks in series and parallel with friction, and the preload left by tightening flat then backing off an angle. Demo: shoe-holder disc and equaliser stack.',
  sections: DISC_STACK_SECTIONS,
  fields: DISC_STACK_FIELDS,
  fieldCard: DISC_STACK_FIELD_CARD,
  evaluate: recordingCriteriaUsed(evaluateDiscSpringStack),
};
