import type { Dimension, FieldTolerance } from '@holdfast/calc';
import { settingPrecision } from '@holdfast/calc';
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
      // 5 %, not 5.00 %: no trailing zeros a band of whole or half percent does not have.
      const pct = (v: number) => `${Number((v * 100).toPrecision(3))} %`;
      return b.minus === b.plus ? `± ${pct(b.plus)}` : `−${pct(b.minus)} / +${pct(b.plus)}`;
    }
    case 'absolute': {
      const q = (v: number) => qty(v, dimension, system, { digits: 3 });
      return b.minus === b.plus ? `± ${q(b.plus)}` : `−${q(b.minus)} / +${q(b.plus)}`;
    }
  }
}

/** A target as printed in the Target column: as the field card prints it, to the step it is set by. */
export function targetText(
  m: { settingKey: string; dimension: string; target: number | null },
  system: PrintUnitSystem,
): string {
  if (m.target === null) return '—';
  const dimension = m.dimension as Dimension;
  return qty(m.target, dimension, system, settingPrecision(m.settingKey, dimension));
}
