import type { Dimension } from '../core/types.js';
import { decimalExponent, formatNumber } from './format.js';

/**
 * How finely a quantity is printed: significant figures, and optionally no finer than a step
 * (what can be measured or matters). Only printing uses it; results keep full precision.
 */
export interface Precision {
  /** Significant figures at most. */
  digits: number;
  /** The finest step worth printing, in SI (0.01 mm = 1e-5 m); a 5 × 10ⁿ step rounds to it. */
  finest?: number;
  /** The finest step in a named display unit, by its printed label (1 for '°'). */
  finestIn?: Readonly<Record<string, number>>;
  /** Drop trailing zeros after the decimal point (0.95, not 0.9500). */
  trim?: boolean;
}

/**
 * The printing precision of every dimension: the one table derivations, sheets and cards print
 * by. Pressures 3 s.f. (0.0806 MPa); temperatures to 1 °C; forces 3 s.f.; lengths to 0.01 mm;
 * powers 4 s.f., as motor data gives them (23.76 kW).
 */
export const PRECISION: Readonly<Record<Dimension, Precision>> = {
  length: { digits: 4, finest: 1e-5 },
  force: { digits: 3 },
  torque: { digits: 4 },
  power: { digits: 4 },
  speed: { digits: 3 },
  angularSpeed: { digits: 4 },
  angularAcceleration: { digits: 3 },
  mass: { digits: 4 },
  inertia: { digits: 3 },
  pressure: { digits: 3 },
  pv: { digits: 3 },
  energy: { digits: 3 },
  temperature: { digits: 4, finest: 1 },
  temperatureDifference: { digits: 3, finest: 0.01 },
  time: { digits: 3 },
  // Radians stay at 4 s.f. inside formulas (sin(0.6109 rad)); degrees print to 1°.
  angle: { digits: 4, finestIn: { '°': 1 } },
  acceleration: { digits: 3 },
  stiffness: { digits: 3 },
  specificHeat: { digits: 3 },
  heatTransferCoefficient: { digits: 3 },
  area: { digits: 3 },
  frequency: { digits: 3 },
  dimensionless: { digits: 4, trim: true },
};

/**
 * Field settings printed to what a fitter can measure, by setting key (first match wins;
 * common practice, no published source). A setting not listed prints by its dimension.
 */
export const SETTING_PRECISION: readonly { match: RegExp; finest: number; why: string }[] = [
  {
    match: /clearance|airGap/i,
    finest: 5e-5,
    why: 'feeler-gauge leaves step by 0.05 mm',
  },
  {
    match: /setLength$/i,
    finest: 5e-5,
    why: 'a disc-spring stack is measured with a caliper, read to 0.05 mm; its whole set deflection is under 1 mm, so 0.1 mm would be too coarse',
  },
  {
    // Before the steel-rule rule: 'wearTorqueLost' must not print 0.80 mm as 1.0 mm.
    match: /wear/i,
    finest: 5e-5,
    why: 'lining wear is read off the lining thickness with a caliper, to 0.05 mm; the wear allowances are under a millimetre, so 0.5 mm steps would print 0.60 mm as 0.5 mm',
  },
  {
    match: /springLength|stroke/i,
    finest: 5e-4,
    why: 'spring length over its cups and thruster strokes are measured with a steel rule, to 0.5 mm',
  },
];

/** The precision a field setting prints with: its dimension's, to a measurable step. */
export function settingPrecision(key: string, dimension: Dimension): Precision {
  const base = PRECISION[dimension];
  const rule = dimension === 'length' ? SETTING_PRECISION.find((r) => r.match.test(key)) : null;
  return rule ? { ...base, finest: rule.finest } : base;
}

/**
 * How a fitter's reading of a setting prints (as found, as left): to a tenth of the step the
 * setting is set by (a steel-rule length to 0.1 mm, a feeler-gauge clearance to 0.01 mm), never
 * snapped to the step itself. A reading of 222.6 mm stays 222.6 mm, so the printed value always
 * agrees with its within/OUT verdict, and 17 mm does not print as 17.00 mm.
 */
export function readingPrecision(key: string, dimension: Dimension): Precision {
  const base = PRECISION[dimension];
  const rule = dimension === 'length' ? SETTING_PRECISION.find((r) => r.match.test(key)) : null;
  // The steps are 5 × 10ⁿ: a fifth of one is the tenth of its unit (0.5 mm → 0.1 mm).
  return rule ? { ...base, finest: rule.finest / 5 } : base;
}

/**
 * Prints `value` (already in a display unit of `factor` SI units, printed as `label`) to the
 * precision given: at most `digits` significant figures, and no finer than the finest step.
 * @example formatWithPrecision(0.8, 1e-3, 'mm', PRECISION.length) // '0.80'
 */
export function formatWithPrecision(
  value: number,
  factor: number,
  label: string,
  p: Precision,
): string {
  if (value === 0 || !Number.isFinite(value)) return formatNumber(value, p.digits);
  const plan = stepPlan(p, factor, label);
  let text: string;
  if (plan === null) {
    text = formatNumber(value, p.digits);
  } else {
    const snapped = plan.snap ? Math.round(value / plan.step) * plan.step : value;
    if (Math.abs(snapped) < plan.unit / 2) return '0';
    const e = decimalExponent(Math.abs(snapped));
    text = formatNumber(snapped, Math.max(1, Math.min(p.digits, e + 1 + plan.decimals)));
  }
  return p.trim && text.includes('.') && !text.includes('·')
    ? text.replace(/0+$/, '').replace(/\.$/, '')
    : text;
}

/** What a precision's finest step means in one display unit, worked out once per unit. */
interface StepPlan {
  step: number;
  /** Decimals the step allows, and the value of the last one (0.01 for 2). */
  decimals: number;
  unit: number;
  /** A 5 × 10ⁿ or 2 × 10ⁿ step snaps the value to it (0.05 mm feeler steps); a 1 × 10ⁿ step or
   * an odd one (a step converted to inches) only limits the decimals printed. */
  snap: boolean;
}

// Every printed number of every step comes through here: the plan depends only on the
// precision and the unit, so it is made once (a log10 and a few divisions per number before).
const plans = new WeakMap<Precision, Map<string, StepPlan | null>>();

function stepPlan(p: Precision, factor: number, label: string): StepPlan | null {
  let byUnit = plans.get(p);
  if (!byUnit) plans.set(p, (byUnit = new Map()));
  const key = label || String(factor);
  let plan = byUnit.get(key);
  if (plan === undefined) {
    const step = p.finestIn?.[label] ?? (p.finest === undefined ? undefined : p.finest / factor);
    if (step === undefined) plan = null;
    else {
      const decimals = Math.max(0, Math.ceil(-Math.log10(step) - 1e-9));
      const unit = 10 ** -decimals;
      const mantissa = Math.round(step / unit);
      const snap = Math.abs(step / unit - mantissa) < 1e-9 && mantissa > 1;
      plan = { step, decimals, unit, snap };
    }
    byUnit.set(key, plan);
  }
  return plan;
}
