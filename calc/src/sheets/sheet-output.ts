import type {
  CriteriaSet,
  DerivationStep,
  Dimension,
  ResultValue,
  SheetEvaluation,
} from '../core/types.js';
import type { Derivation } from '../core/step.js';
import { CORE_VERSION } from '../version.js';
import { DIMENSIONS } from '../units/unit-table.js';

const JUDGEMENT =
  "These results support, and never replace, the judgement of a competent engineer; the governing standard, the brake maker's data, local codes and licensed practice decide.";
const WORK =
  'adjust one brake at a time, and release stored spring energy with the provided means.';

/** What holds the load while the brake is open, the one thing the cautions of sheets differ in. */
type LoadHeld = 'hoist' | 'travel' | 'drive' | 'any';

/**
 * How the load is secured before brake work: a hoist's load hangs, a travel drive can be moved by
 * wind or a slope, a loaded incline runs back; the caliper and disc-spring sheets serve any of
 * them (common practice for brake work, no published source). The printed caution block and the
 * evaluation's cautions both start from these words.
 */
const SECURING: Record<LoadHeld, string> = {
  hoist: 'Never work under a suspended load: land the load or lock the drum before brake work',
  travel:
    'Before brake work secure the crane or trolley against moving (rail clamps or wedges, storm pins: wind or a slope moves it with its brakes open)',
  drive:
    'Before brake work make the drive unable to turn (an inclined conveyor under load runs back when its brake opens)',
  any: 'Never work under a suspended load or on a drive that can run back: land the load, secure the machine or lock the disc before brake work',
};

const LOAD_HELD: Record<string, LoadHeld> = {
  'hoist-shoe-brake': 'hoist',
  'travel-shoe-brake': 'travel',
  'drive-shoe-brake': 'drive',
};

/** How a sheet type's load is secured before brake work, as one clause (no final stop). */
export function securingCaution(sheetTypeId: string): string {
  return SECURING[LOAD_HELD[sheetTypeId] ?? 'any'];
}

const cautions = (held: LoadHeld, opener: string) =>
  [JUDGEMENT, `${SECURING[held]}, isolate the drive and the ${opener} supply, ${WORK}`] as const;

/** The usual cautions each brake sheet's evaluation carries. */
export const SHEET_CAUTIONS = {
  hoist: cautions('hoist', 'thruster'),
  travel: cautions('travel', 'thruster'),
  drive: cautions('drive', 'thruster'),
  caliper: cautions('any', 'release unit'),
};

// Every caution an evaluation has carried, stored ones included (before each sheet had its own,
// all carried the hoist's).
const ALL_CAUTIONS = new Set<string>(Object.values(SHEET_CAUTIONS).flat());

/**
 * Whether a warning is one of the usual cautions: the printed sheet gives those once, in its
 * caution block, and lists only the other warnings as notes from the calculation.
 */
export function isSafetyCaution(warning: string): boolean {
  return ALL_CAUTIONS.has(warning);
}

// Symbol-keyed, so JSON.stringify and structured clone leave it out. (A WeakMap from evaluation
// to derivation cost more in garbage collection than it saved.)
const DERIVATION_OF = Symbol('derivation');

/**
 * One descriptor for every evaluation: an accessor pair made per object would give each
 * evaluation a hidden class of its own in V8, and every sheet function that touches `out` would
 * then run on megamorphic property access.
 */
const DERIVATION: PropertyDescriptor = {
  enumerable: true,
  configurable: true,
  get(this: { [DERIVATION_OF]: Derivation }): DerivationStep[] {
    return this[DERIVATION_OF].steps;
  },
  set(this: SheetEvaluation, steps: DerivationStep[]) {
    Object.defineProperty(this, 'derivation', {
      value: steps,
      writable: true,
      enumerable: true,
      configurable: true,
    });
  },
};

/**
 * An empty evaluation bound to a derivation: `derivation` is its printed steps, built when first
 * read (the derivation view, the printed sheet, JSON when a revision is saved) rather than on
 * every evaluation, as live results and sweeps read values and checks only. An own enumerable
 * accessor in the same place as before, so JSON, spreading and structured clone see the steps
 * where they were; assigning to it replaces it with a plain value. It is added as a new property
 * (not by redefining a literal's key, which puts the object in V8's slow dictionary mode).
 */
export function newEvaluation(
  sheetType: string,
  criteria: CriteriaSet,
  d: Derivation,
  cautions: readonly string[],
): SheetEvaluation {
  const out = {
    sheetType,
    coreVersion: CORE_VERSION,
    criteriaSetId: criteria.id,
    criteriaSetVersion: criteria.version,
    results: [],
    checks: [],
    [DERIVATION_OF]: d,
  } as unknown as SheetEvaluation;
  Object.defineProperty(out, 'derivation', DERIVATION);
  out.charts = [];
  out.fieldSettings = [];
  out.tables = [];
  out.warnings = [...cautions];
  out.pass = true;
  return out;
}

/** Publishes recorded derivation steps as named results (key = step id unless renamed). */
export function publishSteps(
  out: SheetEvaluation,
  d: Derivation,
  ids: (string | [string, string])[],
): void {
  for (const entry of ids) {
    const id = typeof entry === 'string' ? entry : entry[0];
    const key = typeof entry === 'string' ? entry : entry[1];
    // The record, not the printed step: publishing a result must not build the derivation.
    const s = d.record(id);
    if (!s) continue;
    const dimension = s.formula.spec.dimension;
    out.results.push({
      key,
      section: s.section,
      label: s.label,
      symbol: s.symbol,
      value: s.value,
      unit: DIMENSIONS[dimension].siUnit,
      dimension,
    });
  }
}

/** A result that is not a derivation step (an input echoed, a choice's consequence). */
export function result(
  key: string,
  section: string,
  label: string,
  symbol: string,
  value: number,
  dimension: Dimension,
): ResultValue {
  return { key, section, label, symbol, value, unit: DIMENSIONS[dimension].siUnit, dimension };
}

/** Final pass flag; call once everything is pushed. */
export function finish(out: SheetEvaluation): SheetEvaluation {
  out.pass = out.checks.length > 0 && out.checks.every((c) => c.pass);
  return out;
}
