import { compute, defineFormula, Derivation } from '../core/step.js';
import { CalcInputError } from '../core/errors.js';
import type { DerivationStep } from '../core/types.js';
import type { Length, Speed, Time } from '../units/quantities.js';
import { studentTQuantile } from './student-t.js';

/**
 * Wear trend of a brake from its field records: a least-squares straight line through readings
 * of one length (reserve stroke, lining thickness) against time, the wear rate with its standard
 * error, and the date the line reaches a minimum with a prediction interval.
 *
 * Method (ordinary least squares and inverse prediction, Draper & Smith, Applied Regression
 * Analysis, 3rd ed., 1998, ch. 1 and §3.2 "inverse regression", recalled from memory):
 *   b = S_ty/S_tt, s² = SSE/(n − 2), se(b) = s/√S_tt.
 * The interval for the crossing date t₀ is the set of dates at which a single new reading would
 * lie within the two-sided 95 % prediction band of the line: the roots of
 *   (y_min − ȳ − b·d)² = t_q²·s²·(1 + 1/n + d²/S_tt),  d = t₀ − t̄.
 * It is bounded exactly when |b|/se(b) > t_q, so the same quantile decides "wear trend" and
 * "no wear trend": a rate not significantly positive at one-sided 2.5 % gives no prediction.
 * The sums are written in the derivation through R_t = √S_tt, R_y = √S_yy and the correlation r,
 * so that every step has a physical dimension (b = r·R_y/R_t); SSE, the sum of the squared
 * residuals, is summed from the residuals themselves (1 − r² loses all digits near a perfect fit).
 */

/** One reading: when (seconds from an origin the caller chooses) and the measured length (m). */
export interface WearReading {
  at: Time;
  value: Length;
}

export interface WearTrendInput {
  readings: readonly WearReading[];
  /** The length at which action is due (minimum reserve stroke, minimum lining thickness). */
  minimum?: Length;
  /** Field name for error messages, e.g. 'reserveStroke'. */
  field: string;
  /** Two-sided confidence of the band; 0.95 unless given. */
  confidence?: number;
}

export interface WearTrendFit {
  n: number;
  /** Mean time and mean value of the readings. */
  meanAt: Time;
  meanValue: Length;
  /** Fitted value at time 0 of the caller's origin and the slope (negative while wearing). */
  intercept: Length;
  slope: Speed;
  /** Wear rate = −slope, with its standard error. */
  rate: Speed;
  rateStandardError: Speed;
  /** Residual standard deviation s of the readings about the line. */
  residualStd: Length;
  /** rate / se(rate); Infinity for readings exactly on a line. */
  tStatistic: number;
  /** Student t quantile used for the test and the interval. */
  tQuantile: number;
  confidence: number;
  steps: DerivationStep[];
}

export type WearTrend =
  | (WearTrendFit & {
      kind: 'trend';
      /** When the line reaches the minimum, with the prediction interval; absent without a minimum. */
      crossing?: { at: Time; lower: Time; upper: Time };
    })
  | (WearTrendFit & { kind: 'no-trend'; reason: string });

const L = { dimension: 'length' } as const;
const T = { dimension: 'time' } as const;
const V = { dimension: 'speed' } as const;
const R = { dimension: 'dimensionless' } as const;
const REF_OLS =
  'least squares straight line, Draper & Smith, Applied Regression Analysis, 3rd ed., ch. 1 (from memory)';
const REF_INV =
  'inverse prediction with a 95 % prediction band, Draper & Smith, Applied Regression Analysis, 3rd ed., §3.2 (from memory)';

export const wearSlopeFormula = defineFormula({
  id: 'wear-slope',
  label: 'Slope of the fitted line (b = S_ty/S_tt)',
  symbol: 'b',
  expression: 'r * R_y / R_t',
  symbols: { r: { text: 'r', ...R }, R_y: { text: 'R_y', ...L }, R_t: { text: 'R_t', ...T } },
  dimension: 'speed',
  reference: REF_OLS,
});

export const residualStdFormula = defineFormula({
  id: 'wear-residual-std',
  label: 'Residual standard deviation about the line',
  symbol: 's',
  expression: 'sqrt(Q_e / (n - 2))',
  symbols: { Q_e: { text: 'SSE', dimension: 'area' }, n: { text: 'n', ...R } },
  dimension: 'length',
  reference: REF_OLS,
});

export const rateStandardErrorFormula = defineFormula({
  id: 'wear-rate-se',
  label: 'Standard error of the wear rate',
  symbol: 'se(v_w)',
  expression: 's / R_t',
  symbols: { s: { text: 's', ...L }, R_t: { text: 'R_t', ...T } },
  dimension: 'speed',
  reference: REF_OLS,
});

export const crossingFormula = defineFormula({
  id: 'wear-crossing',
  label: 'Date the fitted line reaches the minimum',
  symbol: 't_0',
  expression: 't_m + (y_min - y_m) / b',
  symbols: {
    t_m: { text: 't̄', ...T },
    y_min: { text: 'y_min', ...L },
    y_m: { text: 'ȳ', ...L },
    b: { text: 'b', ...V },
  },
  dimension: 'time',
  reference: REF_INV,
});

const boundSymbols = {
  t_m: { text: 't̄', ...T },
  b: { text: 'b', ...V },
  c: { text: 'c', ...L },
  tq: { text: 't_q', ...R },
  s: { text: 's', ...L },
  R_t: { text: 'R_t', ...T },
  n: { text: 'n', ...R },
} as const;
const DEN = '(b^2 - tq^2 * s^2 / R_t^2)';
const ROOT = `tq * s * sqrt((1 + 1/n) * ${DEN} + c^2 / R_t^2)`;

export const crossingRootMinusFormula = defineFormula({
  id: 'wear-crossing-root-1',
  label: 'Crossing date, first root of the prediction band',
  symbol: 't_0,1',
  expression: `t_m + (b * c - ${ROOT}) / ${DEN}`,
  symbols: boundSymbols,
  dimension: 'time',
  reference: REF_INV,
});

export const crossingRootPlusFormula = defineFormula({
  id: 'wear-crossing-root-2',
  label: 'Crossing date, second root of the prediction band',
  symbol: 't_0,2',
  expression: `t_m + (b * c + ${ROOT}) / ${DEN}`,
  symbols: boundSymbols,
  dimension: 'time',
  reference: REF_INV,
});

function validate(input: WearTrendInput): void {
  const { readings, field } = input;
  const errors: { field: string; message: string }[] = [];
  readings.forEach((r, i) => {
    if (!Number.isFinite(r.at))
      errors.push({ field: `${field}[${i}].at`, message: 'the date is not a number' });
    if (!Number.isFinite(r.value))
      errors.push({ field: `${field}[${i}].value`, message: 'the reading is not a number' });
  });
  if (input.minimum !== undefined && !Number.isFinite(input.minimum)) {
    errors.push({ field: `${field}.minimum`, message: 'the minimum is not a number' });
  }
  const c = input.confidence ?? 0.95;
  if (!(c > 0 && c < 1))
    errors.push({
      field: `${field}.confidence`,
      message: 'the confidence must lie between 0 and 1',
    });
  if (errors.length > 0) throw new CalcInputError(errors);
  if (readings.length < 3) {
    throw new CalcInputError([
      { field, message: `a wear trend needs at least 3 readings (got ${readings.length})` },
    ]);
  }
  const first = readings[0]!.at; // at least 3 readings, checked above
  if (readings.every((r) => r.at === first)) {
    throw new CalcInputError([
      { field, message: 'all readings have the same date: no spread in time to fit a rate' },
    ]);
  }
}

/** Fits the wear trend; throws CalcInputError naming `input.field` on bad or too few readings. */
export function fitWearTrend(input: WearTrendInput): WearTrend {
  validate(input);
  const { readings } = input;
  const confidence = input.confidence ?? 0.95;
  const n = readings.length;
  // Two passes (means first) keep the sums exact enough with epoch-sized times.
  let st = 0;
  let sy = 0;
  for (const r of readings) {
    st += r.at;
    sy += r.value;
  }
  const tm = st / n;
  const ym = sy / n;
  let stt = 0;
  let syy = 0;
  let sty = 0;
  for (const r of readings) {
    const dt = r.at - tm;
    const dy = r.value - ym;
    stt += dt * dt;
    syy += dy * dy;
    sty += dt * dy;
  }
  const rt = Math.sqrt(stt);
  const ry = Math.sqrt(syy);
  // Readings all equal: the line is flat (r taken as 0), which is "no wear trend" below.
  const r = syy === 0 ? 0 : Math.max(-1, Math.min(1, sty / (rt * ry)));
  const d = new Derivation('wear-trend');
  const slope = compute(d, wearSlopeFormula, { r, R_y: ry, R_t: rt });
  let sse = 0;
  for (const p of readings) {
    const e = p.value - ym - slope * (p.at - tm);
    sse += e * e;
  }
  const s = compute(d, residualStdFormula, { Q_e: sse, n });
  const se = compute(d, rateStandardErrorFormula, { s, R_t: rt });
  const rate = -slope as Speed;
  const tq = studentTQuantile(1 - (1 - confidence) / 2, n - 2);
  const tStatistic = se === 0 ? (rate > 0 ? Infinity : rate < 0 ? -Infinity : 0) : rate / se;
  const fit: WearTrendFit = {
    n,
    meanAt: tm as Time,
    meanValue: ym as Length,
    intercept: (ym - slope * tm) as Length,
    slope,
    rate,
    rateStandardError: se,
    residualStd: s,
    tStatistic,
    tQuantile: tq,
    confidence,
    steps: d.steps,
  };
  if (!(tStatistic > tq)) {
    return {
      ...fit,
      kind: 'no-trend',
      reason:
        rate > 0
          ? `no wear trend: the rate is not significantly above zero (t = ${tStatistic.toFixed(2)} ≤ ${tq.toFixed(2)})`
          : 'no wear trend: the readings do not fall with time',
    };
  }
  if (input.minimum === undefined) return { ...fit, kind: 'trend' };
  const at = compute(d, crossingFormula, { t_m: tm, y_min: input.minimum, y_m: ym, b: slope });
  const values = { t_m: tm, b: slope, c: input.minimum - ym, tq, s, R_t: rt, n };
  const a = compute(d, crossingRootMinusFormula, values);
  const b = compute(d, crossingRootPlusFormula, values);
  return {
    ...fit,
    steps: d.steps,
    kind: 'trend',
    crossing: { at, lower: Math.min(a, b) as Time, upper: Math.max(a, b) as Time },
  };
}
