import type { Dimension } from '../core/types.js';
import { toDisplay, type UnitSystem } from './display.js';
import { formatInUnit, pickPrintUnit, printUnitsOf } from './format.js';
import { formatWithPrecision } from './precision.js';

/** Significant figures a check's value and limit get when they would otherwise print alike. */
const FINE = { digits: 6 };

/**
 * Dimensions whose derivation units are a ladder of one unit (N, kN; N·m, kN·m; mm, m; W, kW;
 * J, kJ, MJ): in SI a check prints its value and limit in the unit the derivation gives the larger
 * of them, so the summary and the steps agree ("13.86 kN·m", not "13860 N·m" on page 1 and
 * "13.86 kN·m" in the derivation). Speeds in rpm and the rest keep their display unit.
 */
const LADDERED: ReadonlySet<Dimension> = new Set(['force', 'torque', 'length', 'power', 'energy']);

function derivationUnit(c: { value: number; limit: number; dimension: Dimension }) {
  const larger = Math.max(0, ...[c.value, c.limit].filter(Number.isFinite).map(Math.abs));
  return pickPrintUnit(printUnitsOf(c.dimension), larger);
}

/** A deviation printed as a share: 0.739 %, 5 % (three figures, no trailing zeros). */
const SHARE = { digits: 3, trim: true };

/**
 * Whether a check compares a deviation (a fraction, limit 0.05 = 5 %): those read as percentages,
 * "0.739 % ≤ 5 %", where a fraction against a label in % ("0.007387 ≤ 0.05") does not.
 */
function isDeviation(c: { dimension: Dimension; label?: string }): boolean {
  return c.dimension === 'dimensionless' && /deviation/i.test(c.label ?? '');
}

/**
 * A check's value and limit as text in a unit system, the way the printed sheet and the screen
 * both show them: to the dimension's printing precision (a deviation as a percentage), and with
 * six figures when the two would print alike but differ, so the verdict can always be read from
 * the figures (2.098 against a limit of 2.1 must not read "2.10 ≤ 2.10" and fail). A value that
 * is not finite prints '—'.
 */
export function checkFigures(
  c: { value: number; limit: number; dimension: Dimension; label?: string },
  system: UnitSystem,
): { value: string; limit: string } {
  const share = isDeviation(c);
  const unit = system === 'SI' && LADDERED.has(c.dimension) ? derivationUnit(c) : undefined;
  const show = (x: number, fine: boolean) => {
    if (!Number.isFinite(x)) return '—';
    if (share) return `${formatWithPrecision(x * 100, 1, '%', fine ? FINE : SHARE)} %`;
    if (unit) return formatInUnit(x, unit, fine ? FINE.digits : undefined);
    return toDisplay(x, c.dimension, system, undefined, fine ? FINE : undefined).text;
  };
  const value = show(c.value, false);
  const limit = show(c.limit, false);
  if (value !== limit || c.value === c.limit) return { value, limit };
  return { value: show(c.value, true), limit: show(c.limit, true) };
}
