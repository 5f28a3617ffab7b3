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

/** The usual cautions printed on every brake sheet. */
export const SAFETY_CAUTIONS = [
  "These results support, and never replace, the judgement of a competent engineer; the governing standard, the brake maker's data, local codes and licensed practice decide.",
  'Never work under a suspended load: land the load or lock the drum before brake work, isolate the drive and the thruster supply, adjust one brake at a time, and release stored spring energy with the provided means.',
];

/** An empty evaluation bound to a derivation (its steps are the sheet's derivation). */
export function newEvaluation(
  sheetType: string,
  criteria: CriteriaSet,
  d: Derivation,
): SheetEvaluation {
  return withDerivation(d, {
    sheetType,
    coreVersion: CORE_VERSION,
    criteriaSetId: criteria.id,
    criteriaSetVersion: criteria.version,
    results: [],
    checks: [],
    derivation: [],
    charts: [],
    fieldSettings: [],
    tables: [],
    warnings: [...SAFETY_CAUTIONS],
    pass: true,
  });
}

/**
 * Makes `out.derivation` the derivation's printed steps, built when first read (the derivation
 * view, the printed sheet, JSON when a revision is saved) rather than on every evaluation: live
 * results and sweeps read values and checks only. An own enumerable accessor in the place the
 * literal gave the key, so JSON, spreading and structured clone see the steps where they were;
 * assigning to it replaces it with a plain value.
 */
export function withDerivation(d: Derivation, out: SheetEvaluation): SheetEvaluation {
  Object.defineProperty(out, 'derivation', {
    enumerable: true,
    configurable: true,
    get: () => d.steps,
    set(this: SheetEvaluation, steps: DerivationStep[]) {
      Object.defineProperty(this, 'derivation', {
        value: steps,
        writable: true,
        enumerable: true,
        configurable: true,
      });
    },
  });
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
