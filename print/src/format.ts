import {
  DIMENSIONS,
  toDisplay,
  toSI,
  type Dimension,
  type FieldDefinition,
  type InputValue,
  type Precision,
} from '@holdfast/calc';
import type { PrintRevisionState, PrintUnitSystem } from './printable-sheet.js';

/**
 * An SI value printed in the sheet's unit system with its unit, e.g. '1475 lbf·ft', to the
 * dimension's precision (calc's PRECISION table) unless a setting's precision is given.
 */
export function qty(
  valueSI: number,
  dimension: Dimension,
  system: PrintUnitSystem,
  precision?: Precision,
): string {
  if (!Number.isFinite(valueSI)) return '—';
  return toDisplay(valueSI, dimension, system, undefined, precision).text;
}

/** Just the number of `qty`, and the printed unit label separately (for table columns). */
export function qtyParts(
  valueSI: number,
  dimension: Dimension,
  system: PrintUnitSystem,
  precision?: Precision,
): { value: number; text: string; label: string } {
  const d = toDisplay(valueSI, dimension, system, undefined, precision);
  return { value: d.value, text: d.number, label: d.label };
}

/** Printed unit label of a dimension in a unit system ('' for dimensionless). */
export function unitLabel(dimension: Dimension, system: PrintUnitSystem): string {
  return toDisplay(1, dimension, system).label;
}

/** Utilisation as a percentage, e.g. 0.873 → '87.3 %'. */
export function pct(utilisation: number): string {
  if (!Number.isFinite(utilisation)) return '—';
  return `${(utilisation * 100).toFixed(1)} %`;
}

/** ISO date-time → 'YYYY-MM-DD' (unambiguous in every locale), '—' when absent. */
export function day(iso: string | null | undefined): string {
  if (!iso) return '—';
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : d.toISOString().slice(0, 10);
}

/** ISO date-time → 'YYYY-MM-DD HH:MM UTC'. */
export function stamp(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : `${d.toISOString().slice(0, 16).replace('T', ' ')} UTC`;
}

const STATE_LABELS: Record<PrintRevisionState, string> = {
  draft: 'Draft',
  in_check: 'In check',
  returned: 'Returned',
  approved: 'Approved',
  superseded: 'Superseded',
};

export function stateLabel(state: PrintRevisionState): string {
  return STATE_LABELS[state];
}

/** Prints a stored input value as typed: quantity with its unit, choice label, yes/no. */
export function enteredText(value: InputValue | null | undefined, field: FieldDefinition): string {
  if (value === null || value === undefined) return '—';
  if (typeof value === 'boolean') return value ? 'Yes' : 'No';
  if (typeof value === 'string') {
    return field.choices?.find((c) => c.value === value)?.label ?? value;
  }
  if (typeof value === 'number') return String(value);
  return `${value.value} ${unitText(value.unit, field)}`;
}

/** A typed unit as printed: the unit table's label when the unit is one it lists ('degC' → '°C'). */
function unitText(unit: string, field: FieldDefinition): string {
  const known = field.dimension
    ? DIMENSIONS[field.dimension].units.find((u) => u.unit === unit)
    : undefined;
  if (known?.label) return known.label;
  return unit
    .replace(/\bdegC\b/g, '°C')
    .replace(/\bdegF\b/g, '°F')
    .replace(/ /g, '·')
    .replace(/\^2/g, '²')
    .replace(/\^3/g, '³');
}

/** Prints a stored input in the sheet's unit system (quantities only; others as entered). */
export function convertedText(
  value: InputValue | null | undefined,
  field: FieldDefinition,
  system: PrintUnitSystem,
): string {
  if (value === null || value === undefined) return '—';
  if (typeof value === 'object' && field.dimension) {
    try {
      return qty(toSI(value.value, value.unit, field.dimension), field.dimension, system);
    } catch {
      return `${enteredText(value, field)} (unit not recognised)`;
    }
  }
  if (typeof value === 'number' && field.kind === 'quantity' && field.dimension) {
    // A bare number in a quantity field is stored in SI.
    return qty(value, field.dimension, system);
  }
  return enteredText(value, field);
}
