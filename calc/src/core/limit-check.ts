import type { Dimension } from './types.js';

/**
 * A check computed by a pure formula function, before any sheet places it in a section. Its fields
 * match the sheets' check builder (id, label, value, limit, dimension, kind, strict, source), so a
 * sheet can hand it on with its own section and wording; `pass` and `utilisation` are already
 * worked out here so a caller without the sheet layer (CLI, tests, sweeps) can use it as is.
 */
export interface LimitCheck {
  id: string;
  label: string;
  /** Value and limit in SI. */
  value: number;
  limit: number;
  dimension: Dimension;
  /** 'max': value must be ≤ limit (< when strict); 'min': value must be ≥ limit (> when strict). */
  kind: 'max' | 'min';
  strict?: boolean;
  /** value/limit for 'max', limit/value for 'min'; 1 at the limit, > 1 fails. */
  utilisation: number;
  pass: boolean;
  /** Where the limit comes from: standard and clause, equipment data, or "common practice". */
  source: string;
}

/**
 * Pass and utilisation of a value against a limit: the one rule every check uses (the sheets'
 * makeCheck too). Utilisation is value/limit for 'max', limit/value for 'min', both measured from
 * `base` (e.g. ambient for a temperature rise); a zero or negative denominator gives a large
 * finite utilisation.
 */
export function checkOutcome(
  value: number,
  limit: number,
  kind: 'max' | 'min',
  strict = false,
  base = 0,
): { utilisation: number; pass: boolean } {
  const pass =
    kind === 'max'
      ? strict
        ? value < limit
        : value <= limit
      : strict
        ? value > limit
        : value >= limit;
  const num = kind === 'max' ? value - base : limit - base;
  const den = kind === 'max' ? limit - base : value - base;
  let utilisation: number;
  if (den === 0) utilisation = num === 0 ? 0 : 1e9;
  else utilisation = Math.abs(num / den);
  if (!Number.isFinite(utilisation)) utilisation = 1e9;
  return { utilisation, pass };
}

/** Builds a LimitCheck with checkOutcome. */
export function limitCheck(spec: Omit<LimitCheck, 'utilisation' | 'pass'>): LimitCheck {
  const { utilisation, pass } = checkOutcome(spec.value, spec.limit, spec.kind, spec.strict);
  // Written out rather than spread ({ ...spec, ...outcome }): two spreads per check were a
  // visible share of a sheet's evaluation.
  const out: LimitCheck = {
    id: spec.id,
    label: spec.label,
    value: spec.value,
    limit: spec.limit,
    dimension: spec.dimension,
    kind: spec.kind,
    utilisation,
    pass,
    source: spec.source,
  };
  if (spec.strict !== undefined) out.strict = spec.strict;
  return out;
}
