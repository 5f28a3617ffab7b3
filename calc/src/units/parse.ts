import type { Dimension, InputValue, Quantity } from '../core/types.js';
import { CalcInputError } from '../core/errors.js';
import type { Q } from './quantities.js';
import { describe, resolveUnit } from './conversion.js';

const NUMBER_WITH_UNIT = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*(.*?)\s*$/;

/** Splits "1500 lbf" or "11.8in" into a Quantity; throws a field error when no number leads. */
export function parseQuantityText(text: string, field = 'value'): Quantity {
  const match = NUMBER_WITH_UNIT.exec(text);
  if (!match) {
    throw new CalcInputError([{ field, message: `"${text}" is not a number with a unit` }]);
  }
  // Both groups always take part in a match (the second may be empty).
  return { value: Number(match[1]), unit: match[2]! };
}

function isQuantity(v: unknown): v is Quantity {
  return typeof v === 'object' && v !== null && 'value' in v && 'unit' in v;
}

/**
 * Parses an input (a `{ value, unit }`, a string like "12 kN", or a plain number for a
 * dimensionless field) into SI for the required dimension.
 *
 * Throws CalcInputError naming `field` when the value is missing, not finite, has no unit or a
 * unit of another dimension.
 * @example parseQuantity('1500 lbf', 'force') // ≈ 6672.33 (N)
 */
export function parseQuantity<D extends Dimension>(
  input: InputValue | undefined | null,
  dimension: D,
  field = 'value',
): Q<D> {
  if (input === undefined || input === null || input === '') {
    throw new CalcInputError([{ field, message: 'a value is required' }]);
  }
  let quantity: Quantity;
  if (typeof input === 'number') {
    if (dimension !== 'dimensionless') {
      throw new CalcInputError([
        {
          field,
          message: `a unit is required for this ${describe(dimension)} (e.g. { value: ${input}, unit: '…' })`,
        },
      ]);
    }
    quantity = { value: input, unit: '' };
  } else if (typeof input === 'string') {
    quantity = parseQuantityText(input, field);
  } else if (isQuantity(input)) {
    quantity = input;
  } else {
    throw new CalcInputError([{ field, message: `expected a quantity, got ${typeof input}` }]);
  }
  const value = typeof quantity.value === 'string' ? Number(quantity.value) : quantity.value;
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new CalcInputError([{ field, message: 'the value must be a finite number' }]);
  }
  const unit = typeof quantity.unit === 'string' ? quantity.unit : '';
  if (unit === '' && dimension !== 'dimensionless') {
    throw new CalcInputError([
      { field, message: `a unit is required for this ${describe(dimension)}` },
    ]);
  }
  const c = resolveUnit(unit, dimension, field);
  const si = value * c.factor + c.offset;
  // 1e308 t is a finite number but not a finite mass in kg: say so rather than quote Infinity.
  if (!Number.isFinite(si)) {
    throw new CalcInputError([{ field, message: `${value} ${unit} is too large to work with` }]);
  }
  if (dimension === 'temperature' && si < 0) {
    throw new CalcInputError([{ field, message: 'temperature is below absolute zero' }]);
  }
  return si as Q<D>;
}

/** Bounds check on an SI value; messages quote the bounds in SI. */
export function requireRange(
  value: number,
  field: string,
  bounds: { min?: number; max?: number; exclusiveMin?: boolean; exclusiveMax?: boolean },
  unitLabel = '',
): void {
  const { min, max, exclusiveMin, exclusiveMax } = bounds;
  if (min !== undefined && (exclusiveMin ? !(value > min) : !(value >= min))) {
    const u = unitLabel ? ` ${unitLabel}` : '';
    throw new CalcInputError([
      {
        field,
        message: `must be ${exclusiveMin ? 'greater than' : 'at least'} ${min}${u} (got ${round(value)}${u})`,
      },
    ]);
  }
  if (max !== undefined && (exclusiveMax ? !(value < max) : !(value <= max))) {
    const u = unitLabel ? ` ${unitLabel}` : '';
    throw new CalcInputError([
      {
        field,
        message: `must be ${exclusiveMax ? 'less than' : 'at most'} ${max}${u} (got ${round(value)}${u})`,
      },
    ]);
  }
}

function round(v: number): string {
  return Number.isFinite(v) ? String(Number(v.toPrecision(6))) : String(v);
}
