import type { Dimension } from '../core/types.js';
import { resolveUnit } from './conversion.js';
import { formatNumber } from './format.js';
import { PRECISION, formatWithPrecision, type Precision } from './precision.js';
import { DIMENSIONS } from './unit-table.js';

export type UnitSystem = 'SI' | 'US';

export interface DisplayValue {
  value: number;
  /** Parser unit text (mathjs syntax), e.g. 'lbf ft'. */
  unit: string;
  /** Printed unit, e.g. 'lbf·ft'. */
  label: string;
  /** Value and label, e.g. '1475 lbf·ft', printed to the dimension's precision (PRECISION). */
  text: string;
  /** The printed number alone, e.g. '1475' (table cells print the unit in the column head). */
  number: string;
}

/**
 * Converts an SI value for presentation in SI or US customary units (N·m↔lbf·ft, kW↔hp,
 * kg·m²↔lb·ft², MPa↔psi, °C↔°F, mm↔in …), or into an explicit `unit` of the same dimension.
 * `precision`: a fixed number of significant figures, or a Precision (the dimension's by default).
 * @example toDisplay(1000, 'torque', 'US').text // '737.6 lbf·ft'
 */
export function toDisplay(
  valueSI: number,
  dimension: Dimension,
  system: UnitSystem,
  unit?: string,
  precision: number | Precision = PRECISION[dimension],
): DisplayValue {
  const info = DIMENSIONS[dimension];
  const target = unit ?? (system === 'US' ? info.displayUS : info.displaySI);
  const c = resolveUnit(target, dimension);
  const value = (valueSI - c.offset) / c.factor;
  const number =
    typeof precision === 'number'
      ? formatNumber(value, precision)
      : formatWithPrecision(value, c.factor, c.label, precision);
  const text = withUnit(number, c.label);
  return { value, unit: c.unit, label: c.label, text, number };
}

/** Default display unit (parser text) of a dimension in a unit system. */
export function displayUnitFor(dimension: Dimension, system: UnitSystem): string {
  const info = DIMENSIONS[dimension];
  return system === 'US' ? info.displayUS : info.displaySI;
}

/**
 * A printed number with its unit label: '12.4 kN', '20 °C', but '60°' — the degree of arc takes
 * no space (SI Brochure, 9th edition, 5.4.3); a number without a label stays bare.
 */
export function withUnit(number: string, label: string): string {
  if (!label) return number;
  return label === '°' ? number + label : `${number} ${label}`;
}
