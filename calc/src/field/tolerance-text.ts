import type { Dimension } from '../core/types.js';
import { toDisplay, withUnit, type UnitSystem } from '../units/display.js';
import { formatWithPrecision, readingPrecision, type Precision } from '../units/precision.js';
import { notAbove } from '../units/printed-number.js';
import type { FieldTolerance } from './tolerance-types.js';

/** A band's bounds: 3 significant figures at most (trailing zeros dropped after: ± 0.5 mm). */
const BAND: Precision = { digits: 3 };

/** '0.500' → '0.5', '5.00' → '5', '30' → '30'. */
const trimmed = (t: string) => (t.includes('.') ? t.replace(/0+$/, '').replace(/\.$/, '') : t);

/**
 * One side of an absolute band in the display unit, cut back to the step a fitter reads the
 * setting to (0.01 mm for a stack length or a clearance, 0.1 mm for a spring length): ± 0.104 mm
 * prints ± 0.1 mm, which nobody can read finer, and never wider than the band it stands for.
 * Undefined for a setting read by its dimension's precision, or a side smaller than one step.
 */
function sideInReadingSteps(
  v: number,
  dimension: Dimension,
  system: UnitSystem,
  key: string,
): string | undefined {
  const finest = readingPrecision(key, dimension).finest;
  if (finest === undefined || v === 0) return undefined;
  const zero = toDisplay(0, dimension, system).value;
  const perSI = toDisplay(1, dimension, system).value - zero;
  const shown = toDisplay(v, dimension, system).value - zero;
  const decimals = Math.max(0, Math.ceil(-Math.log10(finest * perSI) - 1e-9));
  const scale = 10 ** decimals;
  const cut = Math.floor(shown * scale + 1e-9) / scale;
  if (cut <= 0) return undefined;
  return withUnit(trimmed(cut.toFixed(decimals)), toDisplay(v, dimension, system).label);
}

/** One side of an absolute band to three figures, never printed wider than it is. */
function bandSide(v: number, dimension: Dimension, system: UnitSystem): string {
  const d = toDisplay(v, dimension, system, undefined, BAND);
  const exact = d.value - toDisplay(0, dimension, system).value;
  return withUnit(trimmed(notAbove(d.number, exact, BAND.digits)), d.label);
}

/**
 * A tolerance band in words, as the field card, the printed record and the record form show it:
 * '± 0.5 mm', '−0 / +15°', '± 5 %', '≥ target'; '—' without a tolerance. Bounds of an
 * absolute band are differences, shown in the setting's display unit to 3 significant figures (to
 * the reading's step with the setting's key), cut down where rounding would print them wider.
 * @example toleranceText(SPRING_LENGTH, 'length') // '± 0.5 mm'
 */
export function toleranceText(
  t: FieldTolerance | null | undefined,
  dimension: Dimension,
  system: UnitSystem = 'SI',
  /** The setting's key: its sides then print to the step a fitter reads it to. */
  key?: string,
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
      const pct = (v: number) => `${trimmed(formatWithPrecision(v * 100, 1, '%', BAND))} %`;
      return b.minus === b.plus ? `± ${pct(b.plus)}` : `−${pct(b.minus)} / +${pct(b.plus)}`;
    }
    case 'absolute': {
      const q = (v: number) =>
        (key === undefined ? undefined : sideInReadingSteps(v, dimension, system, key)) ??
        bandSide(v, dimension, system);
      return b.minus === b.plus ? `± ${q(b.plus)}` : `−${q(b.minus)} / +${q(b.plus)}`;
    }
  }
}
