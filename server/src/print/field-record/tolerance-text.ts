import type { Dimension, FieldTolerance } from '@holdfast/calc';
import { formatNumber } from '@holdfast/calc';
import { qty } from '../format.js';
import type { PrintUnitSystem } from '../printable-sheet.js';

/**
 * A tolerance as printed in the Tolerance column: '± 0.5 mm', '−0 / +15°', '± 5 %', '≥ target'.
 * Bounds of an absolute band are differences, printed in the setting's display unit.
 */
export function toleranceText(
  t: FieldTolerance | null | undefined,
  dimension: Dimension,
  system: PrintUnitSystem,
): string {
  if (!t) return '—';
  const b = t.band;
  switch (b.kind) {
    case 'atLeast':
      return '≥ target';
    case 'atMost':
      return '≤ target';
    case 'relative': {
      const pct = (v: number) => `${formatNumber(v * 100, 3)} %`;
      return b.minus === b.plus ? `± ${pct(b.plus)}` : `−${pct(b.minus)} / +${pct(b.plus)}`;
    }
    case 'absolute': {
      const q = (v: number) => qty(v, dimension, system, 3);
      return b.minus === b.plus ? `± ${q(b.plus)}` : `−${q(b.minus)} / +${q(b.plus)}`;
    }
  }
}
