import type { Dimension, FieldDefinition } from '../core/types.js';
import { toSI } from '../units/conversion.js';
import type { Q } from '../units/quantities.js';
import { DIMENSIONS } from '../units/unit-table.js';

/** What a field of each kind holds once read (SI number, choice value or flag). */
export interface FieldValueOfKind {
  quantity: number;
  number: number;
  integer: number;
  choice: string;
  boolean: boolean;
}

/** A field definition that remembers its key and kind in its type, so inputs can be typed from it. */
export type TypedField<
  K extends string,
  Kind extends FieldDefinition['kind'],
  D extends Dimension = Dimension,
> = FieldDefinition & {
  readonly key: K;
  readonly kind: Kind;
  readonly dimension?: D;
};

/** A quantity reads as an SI number branded with its dimension (a stiffness is a Stiffness). */
type ValueOf<F extends FieldDefinition> = F['kind'] extends 'quantity'
  ? F extends { readonly dimension?: infer D extends Dimension }
    ? Q<D>
    : number
  : FieldValueOfKind[F['kind']];

/**
 * The inputs of a sheet as its formulas see them: one property per declared field, typed by the
 * field's kind (quantities in SI). Derived from the field list, so a formula cannot read a field
 * the sheet does not declare.
 */
export type InputsOf<Fs extends readonly FieldDefinition[]> = {
  readonly [F in Fs[number] as F['key']]: ValueOf<F>;
};

interface Bounds {
  /** Bounds are given in the default SI display unit of the field and stored in SI. */
  min?: number;
  max?: number;
  exclusiveMin?: boolean;
  help?: string;
  /** Every field is required unless it says otherwise. */
  required?: boolean;
}

/**
 * A quantity field. `demo` and the bounds are in `unitSI` (e.g. mm); bounds are stored in SI
 * base units as FieldDefinition requires.
 */
export function qty<K extends string, D extends Dimension>(
  section: string,
  key: K,
  label: string,
  symbol: string,
  dimension: D,
  demo: number,
  unitSI: string,
  unitUS: string,
  bounds: Bounds = {},
): TypedField<K, 'quantity', D> {
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
    demo: { value: demo, unit: unitSI },
    required: bounds.required ?? true,
    min: si(bounds.min),
    max: si(bounds.max),
    exclusiveMin: bounds.exclusiveMin,
    help: bounds.help,
  };
}

/** A plain number (ratio, factor, friction coefficient). */
export function num<K extends string>(
  section: string,
  key: K,
  label: string,
  symbol: string,
  demo: number,
  bounds: Bounds = {},
  integer = false,
): TypedField<K, 'number' | 'integer'> {
  return {
    key,
    section,
    label,
    symbol,
    kind: integer ? 'integer' : 'number',
    dimension: 'dimensionless',
    demo,
    required: bounds.required ?? true,
    min: bounds.min,
    max: bounds.max,
    exclusiveMin: bounds.exclusiveMin,
    help: bounds.help,
  };
}

export function choice<K extends string>(
  section: string,
  key: K,
  label: string,
  demo: string,
  choices: { value: string; label: string }[],
  help?: string,
): TypedField<K, 'choice'> {
  return { key, section, label, symbol: '', kind: 'choice', demo, required: true, choices, help };
}

export function flag<K extends string>(
  section: string,
  key: K,
  label: string,
  demo: boolean,
  help?: string,
): TypedField<K, 'boolean'> {
  return { key, section, label, symbol: '', kind: 'boolean', demo, required: true, help };
}

/** SI label of a dimension (for messages). */
export const siLabel = (d: Dimension): string => DIMENSIONS[d].siLabel;

/**
 * Applies realistic [min, max] bounds (in each field's SI display unit, e.g. mm, kW) by key. Every
 * strictly positive field gets a positive lower bound, so no input inside the bounds can underflow
 * or overflow a formula into NaN or Infinity.
 */
export function withBounds<const Fs extends readonly FieldDefinition[]>(
  fields: Fs,
  bounds: Record<string, [number, number]>,
): Fs {
  return fields.map((f) => {
    const b = bounds[f.key];
    if (!b) return f;
    const si = (x: number) =>
      f.kind === 'quantity' && f.dimension && f.unitSI ? toSI(x, f.unitSI, f.dimension) : x;
    return { ...f, min: si(b[0]), max: si(b[1]), exclusiveMin: undefined };
  }) as unknown as Fs;
}
