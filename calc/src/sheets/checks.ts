import type { CheckResult, Dimension } from '../core/types.js';
import { checkOutcome, type LimitCheck } from '../core/limit-check.js';
import { formatForDerivation } from '../units/format.js';
import { DIMENSIONS } from '../units/unit-table.js';

export interface CheckSpec {
  id: string;
  section: string;
  label: string;
  value: number;
  limit: number;
  dimension: Dimension;
  /** 'min': value must be ≥ limit; 'max': value must be ≤ limit. */
  kind: 'min' | 'max';
  source: string;
  /** Extra words for a failed check (what it means, what to do). */
  failHint?: string;
  /**
   * Reference the utilisation is measured from (e.g. ambient temperature: utilisation is then the
   * used share of the allowed rise, not a ratio of absolute temperatures). Default 0.
   */
  base?: number;
  /** Strict comparison (value must exceed the limit), e.g. brake torque over a driving torque. */
  strict?: boolean;
}

/** Builds a check with utilisation (1.0 at the limit, > 1 fails) and a plain message. */
export function makeCheck(spec: CheckSpec): CheckResult {
  const { value, limit, kind } = spec;
  const { utilisation, pass } = checkOutcome(value, limit, kind, spec.strict, spec.base);
  const check = {
    id: spec.id,
    section: spec.section,
    label: spec.label,
    value,
    limit,
    unit: DIMENSIONS[spec.dimension].siUnit,
    dimension: spec.dimension,
    kind,
    utilisation,
    pass,
    source: spec.source,
    [PENDING]: { spec, text: undefined } as PendingMessage,
  } as unknown as CheckResult;
  Object.defineProperty(check, 'message', MESSAGE);
  return check;
}

interface PendingMessage {
  spec: CheckSpec;
  text: string | undefined;
}

// Symbol-keyed, so JSON.stringify and structured clone leave it out.
const PENDING = Symbol('pending check message');

/**
 * The message is written when first read, like a derivation step's substituted line (see
 * core/step.ts): a sheet makes ~45 checks per keystroke and the editor shows a few messages.
 */
const MESSAGE: PropertyDescriptor = {
  enumerable: true,
  configurable: true,
  get(this: CheckResult & { [PENDING]: PendingMessage }): string {
    const p = this[PENDING];
    if (p.text !== undefined) return p.text;
    const text = checkMessage(p.spec, this.utilisation, this.pass);
    // A caller that deep-freezes an evaluation freezes this record too: then write it each time.
    if (!Object.isFrozen(p)) p.text = text;
    return text;
  },
};

function checkMessage(spec: CheckSpec, utilisation: number, pass: boolean): string {
  const { value, limit, kind } = spec;
  let v = formatForDerivation(value, spec.dimension);
  let l = formatForDerivation(limit, spec.dimension);
  // Printed to the same text but not equal: more figures, so the verdict can be read off.
  if (v === l && value !== limit) {
    v = formatForDerivation(value, spec.dimension, 6);
    l = formatForDerivation(limit, spec.dimension, 6);
  }
  const rel = kind === 'max' ? (spec.strict ? '<' : '≤') : spec.strict ? '>' : '≥';
  return pass
    ? `${spec.label}: ${v} ${rel} ${l} — pass (utilisation ${(utilisation * 100).toFixed(0)} %).`
    : `${spec.label}: ${v} is not ${rel} ${l} — FAIL.${spec.failHint ? ` ${spec.failHint}` : ''}`;
}

/**
 * What a failed check's message adds to its label, value and limit: the advice written after
 * "— FAIL." (null when there is none, or the check passed).
 */
export function failAdvice(message: string | undefined): string | null {
  const advice = message?.split(' — FAIL.')[1]?.trim();
  return advice ? advice : null;
}

/** A check from a formula function (LimitCheck) placed in a sheet section, with optional advice. */
export function sheetCheck(lc: LimitCheck, section: string, failHint?: string): CheckResult {
  return makeCheck({
    id: lc.id,
    section,
    label: lc.label,
    value: lc.value,
    limit: lc.limit,
    dimension: lc.dimension,
    kind: lc.kind,
    strict: lc.strict,
    source: lc.source,
    failHint,
  });
}
