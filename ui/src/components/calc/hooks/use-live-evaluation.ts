import { useMemo, useRef } from 'react';
import {
  isCalcInputError,
  type CriteriaSet,
  type FieldError,
  type SheetEvaluation,
  type SheetInputs,
  type SheetTypeDefinition,
} from '@holdfast/calc';

export interface LiveEvaluation {
  /** The evaluation of the current inputs, or null when they are invalid. */
  evaluation: SheetEvaluation | null;
  /** The last evaluation that succeeded, shown dimmed while the inputs are invalid. */
  lastGood: SheetEvaluation | null;
  /** Field errors of the current inputs, keyed by field. */
  fieldErrors: Record<string, string>;
  /** A failure that is not a field error (a fault in the core), in words. */
  failure: string | null;
  /** Time the last recalculation took, in milliseconds. */
  durationMs: number;
  /** Slowest recalculation seen in this editor, in milliseconds. */
  worstMs: number;
  runs: number;
}

export interface EvaluateOutcome {
  evaluation: SheetEvaluation | null;
  fieldErrors: Record<string, string>;
  failure: string | null;
  durationMs: number;
}

/** Runs the sheet type's evaluate once and times it; never throws. */
export function evaluateTimed(
  sheetType: SheetTypeDefinition,
  inputs: SheetInputs,
  criteria: CriteriaSet,
): EvaluateOutcome {
  const start = performance.now();
  try {
    const evaluation = sheetType.evaluate(inputs, criteria);
    return { evaluation, fieldErrors: {}, failure: null, durationMs: performance.now() - start };
  } catch (e) {
    const durationMs = performance.now() - start;
    if (isCalcInputError(e)) {
      return { evaluation: null, fieldErrors: toFieldMap(e.fields), failure: null, durationMs };
    }
    return {
      evaluation: null,
      fieldErrors: {},
      failure: e instanceof Error ? e.message : String(e),
      durationMs,
    };
  }
}

/** First message per field; field paths like 'inputs.springForce' or 'springForce.unit' map to the key. */
export function toFieldMap(fields: readonly FieldError[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const f of fields) {
    const key = f.field.replace(/^inputs\./, '').split('.')[0];
    if (!(key in out)) out[key] = f.message;
  }
  return out;
}

/**
 * Recalculates the sheet in the browser with the same calc core the server uses, on every change
 * of inputs or criteria. Synchronous on purpose: one evaluation takes a few milliseconds, and a
 * result that lags behind its inputs would mislead.
 */
export function useLiveEvaluation(
  sheetType: SheetTypeDefinition | undefined,
  inputs: SheetInputs,
  criteria: CriteriaSet | undefined,
): LiveEvaluation {
  const lastGood = useRef<SheetEvaluation | null>(null);
  const stats = useRef({ worstMs: 0, runs: 0 });
  return useMemo(() => {
    if (!sheetType || !criteria) {
      return {
        evaluation: null,
        lastGood: lastGood.current,
        fieldErrors: {},
        failure: null,
        durationMs: 0,
        worstMs: stats.current.worstMs,
        runs: stats.current.runs,
      };
    }
    const outcome = evaluateTimed(sheetType, inputs, criteria);
    stats.current.runs += 1;
    stats.current.worstMs = Math.max(stats.current.worstMs, outcome.durationMs);
    if (outcome.evaluation) lastGood.current = outcome.evaluation;
    return {
      ...outcome,
      lastGood: lastGood.current,
      worstMs: stats.current.worstMs,
      runs: stats.current.runs,
    };
  }, [sheetType, inputs, criteria]);
}
