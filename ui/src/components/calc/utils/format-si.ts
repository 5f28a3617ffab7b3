import { DIMENSION_IDS, formatNumber, type Dimension } from '@holdfast/calc';
import { presentSI, type UnitSystem } from './units';

const KNOWN = new Set<string>(DIMENSION_IDS);

/** A dimension name from the API, if the calc core knows it. */
export function asDimension(d: string | undefined): Dimension | undefined {
  return d && KNOWN.has(d) ? (d as Dimension) : undefined;
}

/**
 * An SI value as an engineer writes it: in the user's unit system, 4 significant figures, with
 * its unit (0.2716 m → '271.6 mm'; 2.1e6 Pa·m/s → '2.100 MPa·m/s'; 413.6 K → '140.5 °C').
 * Without a dimension it falls back to the number and the given SI unit.
 */
export function formatSI(
  valueSI: number,
  dimension: string | undefined,
  system: UnitSystem,
  siUnit = '',
  digits = 4,
): string {
  const d = asDimension(dimension);
  if (!d || d === 'dimensionless') {
    const n = formatNumber(valueSI, digits);
    return siUnit ? `${n} ${siUnit}` : n;
  }
  return presentSI(valueSI, d, system, digits).text;
}

/**
 * The change between two SI values, with its unit: a temperature change is a difference
 * (kelvin, or °F-difference in US units), never a percent of an absolute temperature.
 */
export function formatChange(
  from: number,
  to: number,
  dimension: string | undefined,
  system: UnitSystem,
  siUnit = '',
): string {
  const d = asDimension(dimension) === 'temperature' ? 'temperatureDifference' : dimension;
  const delta = to - from;
  const text = formatSI(Math.abs(delta), d, system, siUnit, 3);
  return `${delta > 0 ? '+' : delta < 0 ? '−' : ''}${text}`;
}
