import { criterionText } from '@holdfast/calc';
import type { UnitSystem } from './units';

/**
 * A stored criterion in the trade's units, as the printed sheet shows it (calc's criterionText):
 * 2 100 000 Pa·m/s → 2.10 MPa·m/s; a value stored in another unit (the travel rule's 0.1 min) or
 * a plain ratio prints as stored.
 */
export function criterionDisplay(
  v: { key: string; value: number; unit: string },
  system: UnitSystem = 'SI',
): { number: string; unit: string } {
  const t = criterionText(v.value, v.unit, system);
  return { number: t.number, unit: t.unit };
}
