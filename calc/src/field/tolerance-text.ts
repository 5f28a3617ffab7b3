import type { Dimension } from '../core/types.js';
import { toDisplay, type UnitSystem } from '../units/display.js';
import { formatNumber } from '../units/format.js';
import type { FieldTolerance } from './tolerance-types.js';

/**
 * A tolerance band in words, as the field card, the printed record and the record form show it:
 * '± 0.500 mm', '−0 / +15.0°', '± 5 %', '≥ target'; '—' without a tolerance. Bounds of an
 * absolute band are differences, shown in the setting's display unit to 3 significant figures.
 * @example toleranceText(SPRING_LENGTH, 'length') // '± 0.500 mm'
 */
export function toleranceText(
  t: FieldTolerance | null | undefined,
  dimension: Dimension,
  system: UnitSystem = 'SI',
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
      const q = (v: number) => toDisplay(v, dimension, system, undefined, 3).text;
      return b.minus === b.plus ? `± ${q(b.plus)}` : `−${q(b.minus)} / +${q(b.plus)}`;
    }
  }
}
