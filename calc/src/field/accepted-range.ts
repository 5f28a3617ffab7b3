import type { Dimension } from '../core/types.js';
import { toDisplay, withUnit, type UnitSystem } from '../units/display.js';
import { toSI } from '../units/conversion.js';
import { readingPrecision } from '../units/precision.js';
import { lastPlace, numberOf } from '../units/printed-number.js';
import { toleranceBounds } from './evaluate-tolerance.js';
import type { FieldTolerance } from './tolerance-types.js';

/** The accepted values of a two-sided tolerance, as printed: '220.8 to 221.7 mm'. */
export interface AcceptedRange {
  lower: string;
  upper: string;
  /** Both ends with the unit once: '220.8 to 221.7 mm', '1120 to 1170 N'. */
  text: string;
}

/**
 * The values a two-sided tolerance accepts, printed to the reading's precision and rounded inward,
 * so every printed value between the ends is judged in. Rounded to the nearest, 221.25 ± 0.5 mm
 * would print "220.8 to 221.8 mm" and a fitter reading 221.8 mm would be judged out. A fitter sets
 * to the ends more surely than to "± 0.5 mm" around a target printed to the nearest 0.5 mm
 * (221.5 mm for 221.25 mm). Undefined for a one-sided tolerance or none, and for a band narrower
 * than the reading's step.
 * @example acceptedRange(0.22125, SPRING_LENGTH, 'springLength', 'length')?.text // '220.8 to 221.7 mm'
 */
export function acceptedRange(
  value: number,
  tolerance: FieldTolerance | null | undefined,
  key: string,
  dimension: Dimension,
  system: UnitSystem = 'SI',
): AcceptedRange | undefined {
  if (!tolerance) return undefined;
  const { lower, upper } = toleranceBounds(value, tolerance);
  if (lower === null || upper === null) return undefined;
  const precision = readingPrecision(key, dimension);
  const end = (si: number, side: 'lower' | 'upper') => {
    const shown = toDisplay(si, dimension, system, undefined, precision);
    const printed = numberOf(shown.number);
    // Exponent notation (never for a setting's reading) is left as printed.
    if (!Number.isFinite(printed)) return shown;
    const slack = 1e-9 * Math.max(Math.abs(printed), Math.abs(shown.value));
    const outside =
      side === 'lower' ? printed < shown.value - slack : printed > shown.value + slack;
    if (!outside) return shown;
    const step = lastPlace(shown.number, precision.digits);
    const inward = side === 'lower' ? printed + step : printed - step;
    // Back to SI in the printed unit: the same toDisplay prints it exactly.
    return toDisplay(toSI(inward, shown.unit, dimension), dimension, system, undefined, precision);
  };
  const lo = end(lower, 'lower');
  const hi = end(upper, 'upper');
  // A band narrower than the reading's step: the inward ends cross, and no printed value is safe.
  if (numberOf(lo.number) > numberOf(hi.number)) return undefined;
  return {
    lower: lo.number,
    upper: hi.number,
    text: withUnit(`${lo.number} to ${hi.number}`, lo.label),
  };
}
