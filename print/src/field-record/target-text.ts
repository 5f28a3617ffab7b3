import type { Dimension } from '@holdfast/calc';
import { settingPrecision } from '@holdfast/calc';
import { qty } from '../format.js';
import type { PrintUnitSystem } from '../printable-sheet.js';

/** A target as printed in the Target column: as the field card prints it, to the step it is set by. */
export function targetText(
  m: { settingKey: string; dimension: string; target: number | null },
  system: PrintUnitSystem,
): string {
  if (m.target === null) return '—';
  const dimension = m.dimension as Dimension;
  return qty(m.target, dimension, system, settingPrecision(m.settingKey, dimension));
}
