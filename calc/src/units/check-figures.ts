import type { Dimension } from '../core/types.js';
import { toDisplay, type UnitSystem } from './display.js';

/** Significant figures a check's value and limit get when they would otherwise print alike. */
const FINE = { digits: 6 };

/**
 * A check's value and limit as text in a unit system, the way the printed sheet and the screen
 * both show them: to the dimension's printing precision, and with six figures when the two would
 * print alike but differ, so the verdict can always be read from the figures (2.098 against a
 * limit of 2.1 must not read "2.10 ≤ 2.10" and fail). A value that is not finite prints '—'.
 */
export function checkFigures(
  c: { value: number; limit: number; dimension: Dimension },
  system: UnitSystem,
): { value: string; limit: string } {
  const show = (x: number, fine: boolean) =>
    Number.isFinite(x)
      ? toDisplay(x, c.dimension, system, undefined, fine ? FINE : undefined).text
      : '—';
  const value = show(c.value, false);
  const limit = show(c.limit, false);
  if (value !== limit || c.value === c.limit) return { value, limit };
  return { value: show(c.value, true), limit: show(c.limit, true) };
}
