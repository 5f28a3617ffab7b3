import type { FieldTolerance } from './tolerance-types.js';

/**
 * The tolerances the field cards declare. None of these bands is printed in a published standard
 * we can cite: they are the usual workshop bands, marked "common practice". The maker's data and
 * the plant's own instructions govern where they say otherwise.
 */
const COMMON = { source: 'common practice', confidence: 'common practice' } as const;
const MM = 1e-3;
const DEG = Math.PI / 180;

/** Main spring set length: ±0.5 mm, measured between the spring plates. */
export const SPRING_LENGTH: FieldTolerance = {
  band: { kind: 'absolute', minus: 0.5 * MM, plus: 0.5 * MM },
  ...COMMON,
};

/** Spring or clamp force read from a setting table or a force gauge: ±5 %. */
export const SPRING_FORCE: FieldTolerance = {
  band: { kind: 'relative', minus: 0.05, plus: 0.05 },
  ...COMMON,
};

/** Thruster working stroke: ±10 % of the stroke the sheet asks for. */
export const WORKING_STROKE: FieldTolerance = {
  band: { kind: 'relative', minus: 0.1, plus: 0.1 },
  ...COMMON,
};

/**
 * Thruster reserve stroke: at least the target; more only costs release time, less leaves no
 * margin for lining wear before the brake stops setting.
 */
export const RESERVE_STROKE: FieldTolerance = {
  band: { kind: 'absolute', minus: 0, plus: 3 * MM },
  ...COMMON,
  rule: 'Never leave less than the target; re-adjust before the reserve reaches its minimum.',
};

/** Shoe clearance each side when released: −0.1 mm / +0.2 mm, equal on both shoes. */
export const SHOE_CLEARANCE: FieldTolerance = {
  band: { kind: 'absolute', minus: 0.1 * MM, plus: 0.2 * MM },
  ...COMMON,
  rule: 'Measure each shoe separately; the two sides should match.',
};

/** Caliper air gap each side: −0.1 mm / +0.2 mm. */
export const AIR_GAP: FieldTolerance = {
  ...SHOE_CLEARANCE,
  rule: 'Measure each pad separately; the two sides should match.',
};

/**
 * Disc-spring stack back-off angle: tightened flat, then backed off. The nut only ever turns
 * back: tightening to line up a locking slot raises the preload past the set point.
 */
export const BACK_OFF_ANGLE: FieldTolerance = {
  band: { kind: 'absolute', minus: 0, plus: 15 * DEG },
  ...COMMON,
  direction: 'loosen',
  rule: 'Tighten the stack flat, then back off only. Never tighten to align a slot: back off on to the next one.',
};

/** Disc-spring stack set length: ±0.2 mm. */
export const STACK_SET_LENGTH: FieldTolerance = {
  band: { kind: 'absolute', minus: 0.2 * MM, plus: 0.2 * MM },
  ...COMMON,
};
