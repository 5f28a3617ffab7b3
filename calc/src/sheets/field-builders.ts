import type { Dimension, FieldDefinition } from '../core/types.js';
import { toSI } from '../units/conversion.js';
import { DIMENSIONS } from '../units/unit-table.js';

interface Bounds {
  /** Bounds are given in the default SI display unit of the field and stored in SI. */
  min?: number;
  max?: number;
  exclusiveMin?: boolean;
  help?: string;
}

/**
 * A quantity field. `value` and the bounds are in `unitSI` (e.g. mm); bounds are stored in SI
 * base units as FieldDefinition requires.
 */
export function qty(
  section: string,
  key: string,
  label: string,
  symbol: string,
  dimension: Dimension,
  value: number,
  unitSI: string,
  unitUS: string,
  bounds: Bounds = {},
): FieldDefinition {
  const si = (x: number | undefined) => (x === undefined ? undefined : toSI(x, unitSI, dimension));
  return {
    key,
    section,
    label,
    symbol,
    kind: 'quantity',
    dimension,
    unitSI,
    unitUS,
    default: { value, unit: unitSI },
    min: si(bounds.min),
    max: si(bounds.max),
    exclusiveMin: bounds.exclusiveMin,
    help: bounds.help,
  };
}

/** A plain number (ratio, factor, friction coefficient). */
export function num(
  section: string,
  key: string,
  label: string,
  symbol: string,
  value: number,
  bounds: Bounds = {},
  integer = false,
): FieldDefinition {
  return {
    key,
    section,
    label,
    symbol,
    kind: integer ? 'integer' : 'number',
    dimension: 'dimensionless',
    default: value,
    min: bounds.min,
    max: bounds.max,
    exclusiveMin: bounds.exclusiveMin,
    help: bounds.help,
  };
}

export function choice(
  section: string,
  key: string,
  label: string,
  value: string,
  choices: { value: string; label: string }[],
  help?: string,
): FieldDefinition {
  return { key, section, label, symbol: '', kind: 'choice', default: value, choices, help };
}

export function flag(
  section: string,
  key: string,
  label: string,
  value: boolean,
  help?: string,
): FieldDefinition {
  return { key, section, label, symbol: '', kind: 'boolean', default: value, help };
}

/** SI label of a dimension (for messages). */
export const siLabel = (d: Dimension): string => DIMENSIONS[d].siLabel;

/**
 * Applies realistic [min, max] bounds (in each field's SI display unit, e.g. mm, kW) by key. Every
 * strictly positive field gets a positive lower bound, so no input inside the bounds can underflow
 * or overflow a formula into NaN or Infinity.
 */
export function withBounds(
  fields: FieldDefinition[],
  bounds: Record<string, [number, number]>,
): FieldDefinition[] {
  return fields.map((f) => {
    const b = bounds[f.key];
    if (!b) return f;
    const si = (x: number) =>
      f.kind === 'quantity' && f.dimension && f.unitSI ? toSI(x, f.unitSI, f.dimension) : x;
    return { ...f, min: si(b[0]), max: si(b[1]), exclusiveMin: undefined };
  });
}
