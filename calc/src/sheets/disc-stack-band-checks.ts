import type { CheckResult } from '../core/types.js';
import type { FieldTolerance } from '../field/tolerance-types.js';
import { WORKING_BAND } from '../disc-springs/curve.js';
import { BACK_OFF_ANGLE, STACK_SET_LENGTH } from '../field/tolerances.js';
import { makeCheck } from './checks.js';

/** Whole degrees of an angle in rad, as the band checks' labels print a tolerance. */
export const fmtDeg = (rad: number) => String(Math.round((rad * 180) / Math.PI));

/** The field card's back-off band: the sheet's declared tolerance, one-sided (loosen only). */
export function declaredBackOffTolerance(tolerance: number): FieldTolerance {
  return {
    ...BACK_OFF_ANGLE,
    band: { kind: 'absolute', minus: 0, plus: tolerance },
    source: 'declared input (sheet): back-off tolerance; one-sided: common practice',
  };
}

/**
 * The card's tolerance on a stack's measured length, held to the stack lengths at the ends of the
 * back-off band the sheet checks (θ − Δθ to θ + Δθ). The usual ± 0.2 mm (common practice) is wider
 * than a thread releases over the band (a 2.5 mm lead gives 0.10 mm over 15°), and a stack
 * measured 0.2 mm short sits nearer flat than the sheet's working-band check (s/h0) allows.
 * Lengths in m: at the set angle, at θ − Δθ (short, nearer flat) and at θ + Δθ (past).
 */
export function stackLengthTolerance(set: number, short: number, past: number): FieldTolerance {
  const base = STACK_SET_LENGTH.band;
  if (base.kind !== 'absolute') return STACK_SET_LENGTH;
  const minus = Math.min(base.minus, Math.max(0, set - short));
  const plus = Math.min(base.plus, Math.max(0, past - set));
  if (minus === base.minus && plus === base.plus) return STACK_SET_LENGTH;
  return {
    ...STACK_SET_LENGTH,
    band: { kind: 'absolute', minus, plus },
    source:
      'common practice ± 0.2 mm, held to the stack lengths at the ends of the back-off tolerance the sheet checks',
  };
}

/** What the card tells the fitter about the tolerance, after the back-off instruction. */
export const slotNote = (tolerance: number) =>
  `To line up a slot, back off up to ${fmtDeg(tolerance)}° further — never tighten.`;

export interface WorkingBandInput {
  /** Check id prefix: the stack's key on its sheet ('holder', 'a', …). */
  prefix: string;
  section: string;
  title: string;
  /** Back-off tolerance Δθ, rad. */
  tolerance: number;
  /** s/h0 at the set angle θ. */
  set: number;
  /** s/h0 at θ − Δθ, nearest flat (the margin for reading the angle). */
  short: number;
  /** s/h0 at θ + Δθ, furthest from flat (a fitter backing on to the next slot). */
  past: number;
}

const BAND = 'from memory of DIN 2093 (now DIN EN 16983)';

/**
 * s/h0 against the working band at the set angle and at both ends of the back-off tolerance.
 * The shoe sheets and the disc-spring stack sheet both build them here, so the two print the
 * same limits, words and sources. s/h0 falls as the nut is backed off, so only the upper limit
 * can fail at the short end and only the lower at the past end.
 */
export function workingBandChecks(x: WorkingBandInput): CheckResult[] {
  const tol = fmtDeg(x.tolerance);
  const check = (
    id: string,
    where: string,
    value: number,
    end: 'min' | 'max',
    source: string,
    failHint: string,
  ) =>
    makeCheck({
      id: `${x.prefix}-${id}`,
      section: x.section,
      label: `${x.title}: set deflection ÷ h0${where}, ${end === 'max' ? 'at most' : 'at least'}`,
      value,
      limit: WORKING_BAND[end],
      kind: end,
      dimension: 'dimensionless',
      source,
      failHint,
    });
  const ends = `band: ${BAND}; tolerance: common practice (declared input)`;
  const bothEnds = 'Change the back-off angle so both ends of its tolerance stay in the band.';
  return [
    check(
      'set-deflection-min',
      '',
      x.set,
      'min',
      `${BAND}: minimum initial deflection about 0.15–0.20·h0 — check the governing standard`,
      'Back off less: the stack is nearly free and preload is uncertain.',
    ),
    check(
      'set-deflection-max',
      '',
      x.set,
      'max',
      'from memory of DIN 2093: working deflection usually ≤ 0.75·h0 — check the governing standard',
      'Back off more: little travel is left before the stack goes solid.',
    ),
    check('band-short', ` when backed off short (−${tol}°)`, x.short, 'max', ends, bothEnds),
    check('band-past', ` when backed off past (+${tol}°)`, x.past, 'min', ends, bothEnds),
  ];
}
