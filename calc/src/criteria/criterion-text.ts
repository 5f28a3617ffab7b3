import type { Dimension } from '../core/types.js';
import { toDisplay, type UnitSystem } from '../units/display.js';
import { DIMENSIONS } from '../units/unit-table.js';

/**
 * A criteria value as the sheet and the app show it. A value stored in a dimension's SI unit
 * prints in the unit system's units to the dimension's precision (2.1e6 Pa m/s → 2.10 MPa·m/s);
 * a value stored in another unit prints as stored (the travel rule's 0.1 min is 0.1 min, not
 * 0.1 s); a unit two dimensions share ('K') prints as stored too.
 */
export function criterionText(
  value: number,
  unit: string,
  system: UnitSystem,
): { number: string; unit: string; text: string } {
  if (!unit) return { number: String(value), unit: '', text: String(value) };
  const dims = (Object.keys(DIMENSIONS) as Dimension[]).filter(
    (d) => d !== 'dimensionless' && DIMENSIONS[d].siUnit === unit,
  );
  if (dims.length !== 1) return { number: String(value), unit, text: `${value} ${unit}` };
  const d = toDisplay(value, dims[0]!, system);
  return { number: d.number, unit: d.label, text: d.text };
}
