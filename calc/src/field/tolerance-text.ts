import type { Dimension } from '../core/types.js';
import { toDisplay, type UnitSystem } from '../units/display.js';
import { formatWithPrecision, type Precision } from '../units/precision.js';
import type { FieldTolerance } from './tolerance-types.js';

/** A band's bounds: 3 significant figures at most, no trailing zeros (± 0.5 mm, not ± 0.500 mm). */
const BAND: Precision = { digits: 3, trim: true };

/**
 * A tolerance band in words, as the field card, the printed record and the record form show it:
 * '± 0.5 mm', '−0 / +15°', '± 5 %', '≥ target'; '—' without a tolerance. Bounds of an
 * absolute band are differences, shown in the setting's display unit to 3 significant figures.
 * @example toleranceText(SPRING_LENGTH, 'length') // '± 0.5 mm'
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
      // 5 %, not 5.00 %: no trailing zeros a band of whole or half percent does not have.
      const pct = (v: number) => `${formatWithPrecision(v * 100, 1, '%', BAND)} %`;
      return b.minus === b.plus ? `± ${pct(b.plus)}` : `−${pct(b.minus)} / +${pct(b.plus)}`;
    }
    case 'absolute': {
      const q = (v: number) => toDisplay(v, dimension, system, undefined, BAND).text;
      return b.minus === b.plus ? `± ${q(b.plus)}` : `−${q(b.minus)} / +${q(b.plus)}`;
    }
  }
}
