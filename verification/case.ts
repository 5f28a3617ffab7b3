/**
 * A verification case: a published (or clearly labelled) worked example, the inputs with units,
 * the expected values with tolerances the source's rounding justifies, and a run() that calls the
 * calculation core and returns the same quantities in the same units.
 */
export type Family =
  | 'duty'
  | 'shoe-brake'
  | 'pivoted-shoe'
  | 'caliper'
  | 'band-brake'
  | 'energy-heat'
  | 'stopping'
  | 'release-stroke'
  | 'disc-springs'
  | 'thread-back-off'
  | 'spring-setting'
  | 'helical-spring'
  | 'levers';

export const FAMILIES: readonly Family[] = [
  'duty',
  'shoe-brake',
  'pivoted-shoe',
  'caliper',
  'band-brake',
  'energy-heat',
  'stopping',
  'release-stroke',
  'disc-springs',
  'thread-back-off',
  'spring-setting',
  'helical-spring',
  'levers',
];

/** published: printed in the source; secondary: a copy or derived source; derived: computed by us from a published formula; memory: recalled. */
export type Confidence = 'published' | 'secondary' | 'derived' | 'memory';

export interface ExpectedValue {
  key: string;
  label: string;
  value: number;
  /** Unit of `value` and of the value run() returns for this key (plain text, e.g. 'lbf·in'). */
  unit: string;
  /** Relative tolerance (0.005 = ±0.5 %). */
  rel?: number;
  /** Absolute tolerance in `unit`. */
  abs?: number;
}

export interface VerificationCase {
  id: string;
  family: Family;
  title: string;
  /** Book + edition + example/problem/table number, or standard + clause, and how we read it. */
  source: string;
  confidence: Confidence;
  /** Inputs as the source states them, with units. */
  inputs: Record<string, string | number>;
  expected: ExpectedValue[];
  /** Why the tolerance is what it is (the source's rounding, a known model difference…). */
  toleranceNote: string;
  /** Calls the calculation core; returns every expected key in the expected unit. */
  run(): Record<string, number>;
}

export interface CaseRow {
  key: string;
  label: string;
  unit: string;
  expected: number;
  got: number;
  /** (got − expected)/|expected|, or got − expected when expected is 0. */
  deviation: number;
  tolerance: string;
  pass: boolean;
}

export interface CaseOutcome {
  case: VerificationCase;
  rows: CaseRow[];
  error?: string;
  pass: boolean;
}

/** Runs a case and compares every expected value with its tolerance. */
export function checkCase(c: VerificationCase): CaseOutcome {
  let got: Record<string, number>;
  try {
    got = c.run();
  } catch (e) {
    return {
      case: c,
      rows: [],
      error: e instanceof Error ? `${e.name}: ${e.message}` : String(e),
      pass: false,
    };
  }
  const rows = c.expected.map((x): CaseRow => {
    const g = got[x.key];
    const diff = g - x.value;
    const deviation = x.value !== 0 ? diff / Math.abs(x.value) : diff;
    const okRel = x.rel !== undefined && Math.abs(diff) <= x.rel * Math.abs(x.value);
    const okAbs = x.abs !== undefined && Math.abs(diff) <= x.abs;
    const tol = [
      x.rel !== undefined ? `±${+(x.rel * 100).toPrecision(3)} %` : '',
      x.abs !== undefined ? `±${x.abs} ${x.unit}` : '',
    ]
      .filter(Boolean)
      .join(' or ');
    return {
      key: x.key,
      label: x.label,
      unit: x.unit,
      expected: x.value,
      got: g,
      deviation,
      tolerance: tol,
      pass: Number.isFinite(g) && (okRel || okAbs),
    };
  });
  return { case: c, rows, pass: rows.length > 0 && rows.every((r) => r.pass) };
}

/** Identity helper that keeps case literals typed. */
export function defineCase(c: VerificationCase): VerificationCase {
  return c;
}
