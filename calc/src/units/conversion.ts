import convert from 'convert-units';
import type { Dimension } from '../core/types.js';
import { CalcInputError } from '../core/errors.js';
import { math } from './math.js';
import { DIMENSIONS, UNIT_ALIASES, type UnitOption } from './unit-table.js';

/** How one unit maps to SI: si = value · factor + offset. */
export interface UnitConversion {
  unit: string;
  label: string;
  factor: number;
  offset: number;
}

/** Resolved conversions by dimension, then by the unit text as given. */
const cache = new Map<Dimension, Map<string, UnitConversion>>();

/** Normalises typed unit text: '·' and '*' products, superscripts, degree signs, spacing. */
export function normaliseUnitText(text: string): string {
  return text
    .trim()
    .replace(/[·⋅•]/g, ' ')
    .replace(/²/g, '^2')
    .replace(/³/g, '^3')
    .replace(/°\s*C/g, 'degC')
    .replace(/°\s*F/g, 'degF')
    .replace(/°/g, 'deg')
    .replace(/\s+/g, ' ');
}

function siFactorOf(option: UnitOption, dimension: Dimension): { factor: number; offset: number } {
  if (option.factor !== undefined) return { factor: option.factor, offset: 0 };
  const info = DIMENSIONS[dimension];
  if (dimension === 'temperature' && option.cu) {
    // Offset units: convert-units gives factor and offset directly.
    const offset = convert(0).from(option.cu).to('K');
    const factor = convert(1).from(option.cu).to('K') - offset;
    return { factor, offset };
  }
  // Linear units: mathjs carries the exact definitions (convert-units rounds some, e.g. the inch
  // as 1/39.3701 m, which would put a 3e-8 error into every US input).
  const unit = math.unit(1, option.unit);
  return { factor: unit.toNumber(info.siUnit), offset: 0 };
}

function mathjsConversion(text: string, dimension: Dimension): UnitConversion | undefined {
  const info = DIMENSIONS[dimension];
  try {
    const unit = math.unit(1, text);
    const reference = math.unit(1, info.siUnit);
    if (!unit.equalBase(reference)) return undefined;
    return { unit: text, label: text, factor: unit.toNumber(info.siUnit), offset: 0 };
  } catch {
    return undefined;
  }
}

/**
 * The conversion of `unitText` to SI for `dimension`, or a CalcInputError naming `field` when the
 * unit is unknown or belongs to another dimension. Results are cached: parsing stays cheap.
 */
export function resolveUnit(
  unitText: string,
  dimension: Dimension,
  field = 'unit',
): UnitConversion {
  // Two lookups instead of one on a `${dimension}|${unitText}` key: every quantity input of
  // every evaluation comes through here, and the joined key was a new string to hash each time.
  let byText = cache.get(dimension);
  if (!byText) {
    byText = new Map();
    cache.set(dimension, byText);
  }
  const hit = byText.get(unitText);
  if (hit) return hit;
  const info = DIMENSIONS[dimension];
  let text = normaliseUnitText(unitText);
  text = UNIT_ALIASES[dimension]?.[text] ?? text;
  const option = info.units.find((o) => o.unit === text || o.label === unitText.trim());
  let conversion: UnitConversion | undefined;
  if (option) {
    conversion = { unit: option.unit, label: option.label, ...siFactorOf(option, dimension) };
  } else if (
    dimension !== 'dimensionless' &&
    dimension !== 'temperature' &&
    dimension !== 'temperatureDifference'
  ) {
    conversion = mathjsConversion(text, dimension);
  }
  if (!conversion || !Number.isFinite(conversion.factor) || conversion.factor === 0) {
    const offered = info.units.map((o) => o.label || '(none)').join(', ');
    throw new CalcInputError([
      {
        field,
        message: `unit "${unitText}" is not a ${describe(dimension)} unit (use ${offered})`,
      },
    ]);
  }
  byText.set(unitText, conversion);
  return conversion;
}

/** Human name of a dimension for messages. */
export function describe(dimension: Dimension): string {
  return dimension.replace(/([A-Z])/g, ' $1').toLowerCase();
}

/** Converts a value in `unit` to SI. */
export function toSI(value: number, unit: string, dimension: Dimension): number {
  const c = resolveUnit(unit, dimension);
  return value * c.factor + c.offset;
}

/** Converts an SI value to `unit`. */
export function fromSI(valueSI: number, unit: string, dimension: Dimension): number {
  const c = resolveUnit(unit, dimension);
  return (valueSI - c.offset) / c.factor;
}

/** The units a UI may offer for a dimension, optionally only one system's (plus shared ones). */
export function unitsFor(dimension: Dimension, system?: 'SI' | 'US'): UnitOption[] {
  const units = DIMENSIONS[dimension].units;
  return system ? units.filter((o) => o.system === system || o.system === 'both') : [...units];
}
