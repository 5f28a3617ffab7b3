import { criterionSpec } from '@holdfast/calc';
import { presentSI, type UnitSystem } from './units';

/**
 * A stored criterion (SI) in the trade's units, e.g. 2 100 000 Pa·m/s → 2.100 MPa·m/s. A key the
 * catalogue does not know, or a plain ratio, prints as stored.
 */
export function criterionDisplay(
  v: { key: string; value: number; unit: string },
  system: UnitSystem = 'SI',
): { number: string; unit: string } {
  const dimension = criterionSpec(v.key)?.dimension;
  if (!dimension || dimension === 'dimensionless') return { number: String(v.value), unit: v.unit };
  return presentSI(v.value, dimension, system);
}
