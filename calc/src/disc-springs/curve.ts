import { discConstants, type DiscConstants } from './disc.js';
import { stackForces, type DiscStack } from './stack.js';

/** One point of a stack's load–deflection curve: stack deflection (m) and forces (N). */
export interface CurvePoint {
  stackDeflection: number;
  nominal: number;
  loading: number;
  unloading: number;
}

/**
 * Load–deflection curve of a stack from free (0) to flat (i·h0) in `intervals` equal steps,
 * with the loading and unloading branches including friction.
 */
export function stackCurve(
  st: DiscStack,
  intervals = 40,
  c: DiscConstants = discConstants(st.disc),
): CurvePoint[] {
  const n = Math.max(1, Math.floor(intervals));
  const out: CurvePoint[] = [];
  for (let k = 0; k <= n; k++) {
    const s = (c.h0 * k) / n;
    const f = stackForces(st, s, c);
    out.push({ stackDeflection: s * st.seriesCount, ...f });
  }
  return out;
}

/**
 * Usual working band of a disc as a fraction of h0: at least about 0.15·h0 preload deflection
 * against cracking at the inner upper edge under fatigue load, at most about 0.75·h0 (the
 * deflection at which the DIN 2093 tables quote forces). From memory of DIN 2093 (confidence:
 * memory, medium); check the governing standard and the maker's data.
 */
export const WORKING_BAND = { min: 0.15, max: 0.75 } as const;

/** Returns a warning text when s/h0 lies outside the usual working band, else undefined. */
export function workingBandWarning(ratio: number): string | undefined {
  if (ratio < WORKING_BAND.min) {
    return (
      `Set deflection is ${(ratio * 100).toFixed(0)} % of h0, below the usual minimum of ` +
      `${WORKING_BAND.min * 100} % for fatigue-loaded discs (from memory of DIN 2093; check the ` +
      `governing standard): low preload and a risk of cracks at the inner edge.`
    );
  }
  if (ratio > WORKING_BAND.max) {
    return (
      `Set deflection is ${(ratio * 100).toFixed(0)} % of h0, above the usual ${WORKING_BAND.max * 100} % ` +
      `(from memory of DIN 2093; check the governing standard): little travel left before the ` +
      `stack goes solid, and higher stresses.`
    );
  }
  return undefined;
}
