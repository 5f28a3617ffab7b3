import type { Dimension } from '../core/types.js';
import { PRECISION, formatWithPrecision } from './precision.js';

const POW10: number[] = [];
for (let k = -30; k <= 30; k++) POW10[k + 30] = 10 ** k;

/**
 * Formats a number to `digits` significant figures without exponent for everyday magnitudes
 * (1e-3 ≤ |x| < 1e9), e.g. 12.4 → '12.40', −0.35 → '−0.3500'. Hand-rolled because
 * Number#toPrecision costs ~0.6 µs and a sheet prints several hundred numbers.
 */
/**
 * ⌊log10(abs)⌋ for 1e-30 ≤ abs < 1e30, by comparison with a table of powers of ten:
 * Math.floor(Math.log10(abs)) was a third of the time of a number printed. The table gives the
 * exact exponent of every double; log10 may round across a power of ten within a few ulps of it,
 * and up to 12 digits the carry in placeDigits then lands on the same digits.
 */
export function decimalExponent(abs: number): number {
  let e = 0;
  // Within the stated range every index is in the table (outside it a miss compares false and
  // the loop stops at the table's edge).
  if (abs >= 1) {
    while (abs >= POW10[e + 31]!) e++;
  } else {
    do e--;
    while (abs < POW10[e + 30]!);
  }
  return e;
}

const SUPERSCRIPT: Record<string, string> = {
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
  '-': '⁻',
};

/** Ten to an integer power as engineers write it: 10⁻⁴, 10⁹ (not 10^-4, which reads as code). */
export function powerOfTen(exponent: number): string {
  return `10${String(exponent).replace(/[-\d]/g, (c) => SUPERSCRIPT[c]!)}`;
}

export function formatNumber(value: number, digits = 4): string {
  if (value === 0) return '0';
  if (!Number.isFinite(value)) return String(value);
  const abs = Math.abs(value);
  const sign = value < 0 ? '−' : '';
  if (abs < 1e-3 || abs >= 1e9 || digits < 1 || digits > 15) {
    const [mantissa, exponent] = value.toExponential(Math.max(0, digits - 1)).split('e');
    // toExponential of a finite number always has a mantissa.
    return `${mantissa!.replace('-', '−')}×${powerOfTen(Number(exponent))}`;
  }
  // Beyond 12 digits the few ulps by which log10 may miss show in the last digit: keep it there.
  const e = digits <= 12 ? decimalExponent(abs) : Math.floor(Math.log10(abs));
  return placeDigits(abs, sign, digits, e);
}

/**
 * `abs` rounded to `digits` significant figures and written out with its decimal point, given an
 * estimate `e` of its decimal exponent (a rounding carry into the next power of ten corrects it).
 * Exported for the test that compares exponent estimates; use formatNumber.
 */
export function placeDigits(abs: number, sign: string, digits: number, e: number): string {
  // In the table: formatNumber passes digits 1 to 15 and e near −3 to 8 (1e-3 ≤ abs < 1e9).
  let m = Math.round(abs * POW10[digits - 1 - e + 30]!);
  if (m >= POW10[digits + 30]!) {
    m = Math.round(m / 10);
    e += 1;
  }
  const s = String(m);
  if (e >= digits - 1) return sign + s + (e > digits - 1 ? '0'.repeat(e - digits + 1) : '');
  if (e >= 0) return `${sign}${s.slice(0, e + 1)}.${s.slice(e + 1)}`;
  return `${sign}0.${'0'.repeat(-e - 1)}${s}`;
}

export interface PrintUnit {
  label: string;
  /** ' ' + label, or '' without a label: appended to the number in one concatenation. */
  suffix: string;
  factor: number;
  offset: number;
  /** Use this unit when |SI value| is below this bound (first match wins). */
  below: number;
  /** Whose precision it prints with (PRECISION, looked up when printing: no import cycle). */
  dimension: Dimension;
}

/** The print units of one dimension, smallest first. */
export type PrintUnits = readonly PrintUnit[];

type UnitSpec = Omit<PrintUnit, 'dimension'>;

const p = (label: string, factor: number, below = Infinity, offset = 0): UnitSpec => ({
  label,
  suffix: label ? ` ${label}` : '',
  factor,
  below,
  offset,
});

/**
 * Units used to print values inside derivation substitutions, chosen by magnitude. One unit
 * per dimension where a step could otherwise switch (pressures in MPa only, not kPa then MPa).
 */
const UNIT_SPECS: Record<Dimension, UnitSpec[]> = {
  length: [p('mm', 1e-3, 1), p('m', 1)],
  force: [p('N', 1, 1e4), p('kN', 1e3)],
  torque: [p('N·m', 1, 1e4), p('kN·m', 1e3)],
  power: [p('W', 1, 1e4), p('kW', 1e3)],
  speed: [p('m/s', 1)],
  angularSpeed: [p('rad/s', 1)],
  angularAcceleration: [p('rad/s²', 1)],
  mass: [p('kg', 1)],
  inertia: [p('kg·m²', 1)],
  pressure: [p('MPa', 1e6)],
  pv: [p('MPa·m/s', 1e6)],
  energy: [p('J', 1, 1e4), p('kJ', 1e3, 1e7), p('MJ', 1e6)],
  temperature: [p('°C', 1, Infinity, 273.15)],
  temperatureDifference: [p('K', 1)],
  // An hour prints as 1.00 h beside stops/h, not as 3600 s.
  time: [p('s', 1, 3600), p('h', 3600)],
  angle: [p('rad', 1)],
  acceleration: [p('m/s²', 1)],
  stiffness: [p('N/mm', 1e3)],
  specificHeat: [p('J/(kg·K)', 1)],
  heatTransferCoefficient: [p('W/(m²·K)', 1)],
  area: [p('mm²', 1e-6, 1e-2), p('m²', 1)],
  // The only frequency on a sheet is how often the brake stops.
  frequency: [p('stops/h', 1 / 3600)],
  dimensionless: [p('', 1)],
};

const PRINT_UNITS = Object.fromEntries(
  Object.entries(UNIT_SPECS).map(([dimension, units]) => [
    dimension,
    units.map((u) => ({ ...u, dimension: dimension as Dimension })),
  ]),
) as Record<Dimension, PrintUnit[]>;

/**
 * Prints an SI value with a readable unit for a derivation, e.g. 12400 N → '12.4 kN', to the
 * dimension's precision (PRECISION) unless `digits` asks for a fixed number of figures.
 */
export function formatForDerivation(
  valueSI: number,
  dimension: Dimension,
  digits?: number,
): string {
  return formatInPrintUnits(valueSI, PRINT_UNITS[dimension], digits);
}

/**
 * The print units of a dimension, for code that prints many values of it: a formula looks its
 * symbols' units up once when defined instead of once per printed value.
 */
export function printUnitsOf(dimension: Dimension): PrintUnits {
  return PRINT_UNITS[dimension];
}

/** formatForDerivation with the dimension's print units already looked up (printUnitsOf). */
export function formatInPrintUnits(valueSI: number, units: PrintUnits, digits?: number): string {
  return formatInUnit(valueSI, pickPrintUnit(units, valueSI), digits);
}

/** The print unit for a magnitude: the first whose bound it is below, else the largest. */
export function pickPrintUnit(units: PrintUnits, valueSI: number): PrintUnit {
  // k stays below units.length, and every dimension has at least one print unit (UNIT_SPECS).
  for (let k = 0; k < units.length - 1; k++) {
    if (Math.abs(valueSI) < units[k]!.below) return units[k]!;
  }
  return units[units.length - 1]!;
}

/** An SI value in one given print unit, to its dimension's precision or to `digits` figures. */
export function formatInUnit(valueSI: number, unit: PrintUnit, digits?: number): string {
  const value = (valueSI - unit.offset) / unit.factor;
  const text =
    digits === undefined
      ? formatWithPrecision(value, unit.factor, unit.label, PRECISION[unit.dimension])
      : formatNumber(value, digits);
  return text + unit.suffix;
}
