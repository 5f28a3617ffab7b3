import type { CheckResult } from '../core/types.js';
import { WORKING_BAND } from '../disc-springs/curve.js';
import { makeCheck } from './checks.js';

/** Whole degrees of an angle in rad, as the band checks' labels print a tolerance. */
export const fmtDeg = (rad: number) => String(Math.round((rad * 180) / Math.PI));

export interface WorkingBandInput {
  /** Check id prefix: the stack's key on its sheet ('holder', 'a', …). */
  prefix: string;
  section: string;
  title: string;
  /** s/h0 at the set angle. */
  set: number;
  /** s/h0 at the end of the tolerance nearest flat, and the words naming that end. */
  short: { ratio: number; end: string };
  /** s/h0 at the end furthest from flat (least preload), and the words naming it. */
  past: { ratio: number; end: string };
}

/**
 * s/h0 against the working band at the set angle and at both ends of the back-off tolerance.
 * The shoe sheets and the disc-spring stack sheet both build them here, so the two print the
 * same limits, words and sources. s/h0 falls as the nut is backed off, so only the upper limit
 * can fail at the short end and only the lower at the past end.
 */
export function workingBandChecks(x: WorkingBandInput): CheckResult[] {
  const { prefix, section, title } = x;
  const band = (end: 'min' | 'max', value: number, what: string) =>
    makeCheck({
      id: `${prefix}-band-${end === 'max' ? 'short' : 'past'}`,
      section,
      label: `${title}: set deflection ÷ h0 ${what}, ${end === 'max' ? 'at most' : 'at least'}`,
      value,
      limit: WORKING_BAND[end],
      kind: end,
      dimension: 'dimensionless',
      source: `band: from memory of DIN 2093 (now DIN EN 16983); tolerance: common practice (declared input)`,
      failHint: 'Change the back-off angle so both ends of its tolerance stay in the band.',
    });
  return [
    makeCheck({
      id: `${prefix}-set-deflection-min`,
      section,
      label: `${title}: set deflection ÷ h0, at least`,
      value: x.set,
      limit: WORKING_BAND.min,
      kind: 'min',
      dimension: 'dimensionless',
      source:
        'from memory of DIN 2093 (now DIN EN 16983): minimum initial deflection about 0.15–0.20·h0 — check the governing standard',
      failHint: 'Back off less: the stack is nearly free and preload is uncertain.',
    }),
    makeCheck({
      id: `${prefix}-set-deflection-max`,
      section,
      label: `${title}: set deflection ÷ h0, at most`,
      value: x.set,
      limit: WORKING_BAND.max,
      kind: 'max',
      dimension: 'dimensionless',
      source:
        'from memory of DIN 2093: working deflection usually ≤ 0.75·h0 — check the governing standard',
      failHint: 'Back off more: little travel is left before the stack goes solid.',
    }),
    band('max', x.short.ratio, x.short.end),
    band('min', x.past.ratio, x.past.end),
  ];
}
