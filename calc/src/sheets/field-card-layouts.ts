import type { FieldCardLayout, FieldCardPlacement } from '../core/types.js';
import type { FieldTolerance } from '../field/tolerance-types.js';
import * as T from '../field/tolerances.js';

const spring: FieldCardPlacement = { group: 'spring' };
const thruster: FieldCardPlacement = { group: 'thruster' };
const clearance: FieldCardPlacement = { group: 'clearance' };
/** A placement with the tolerance the measured value must meet. */
const tol = (p: FieldCardPlacement, tolerance: FieldTolerance): FieldCardPlacement => ({
  ...p,
  tolerance,
});

/** A disc-spring stack's settings: back-off angle, preload, and the rest beside them. */
function stack(
  name: string,
  keys: { backOff: string; preload: string; setLength: string; others: readonly string[] },
): Record<string, FieldCardPlacement> {
  const s = { group: 'discStack', stack: name } as const;
  return {
    [keys.backOff]: { ...s, role: 'backOff', tolerance: T.BACK_OFF_ANGLE },
    // No tolerance: a preload follows from the back-off and nobody measures it on site, so the
    // card gives it as "about" and the record form asks for the stack length instead.
    [keys.preload]: { ...s, role: 'preload' },
    [keys.setLength]: { ...s, tolerance: T.STACK_SET_LENGTH },
    ...Object.fromEntries(keys.others.map((k) => [k, s])),
  };
}

/** Disc-spring stacks of the shoe-brake sheets, as their settings and the card name them. */
export const SHOE_STACK_TITLES = { holder: 'Shoe holder', equaliser: 'Equaliser' } as const;

/** Field card of both shoe-brake sheets (hoist and travel). */
export const SHOE_FIELD_CARD: FieldCardLayout = {
  settings: {
    springLength: tol(spring, T.SPRING_LENGTH),
    springForce: tol(spring, T.SPRING_FORCE),
    shoeClearance: tol(clearance, T.SHOE_CLEARANCE),
    workingStroke: tol(thruster, T.WORKING_STROKE),
    reserveStroke: tol(thruster, T.RESERVE_STROKE),
    minReserveStroke: thruster,
    wearToReadjust: thruster,
    wearTorqueLost: thruster,
    ...stack(SHOE_STACK_TITLES.holder, {
      backOff: 'holderBackOff',
      preload: 'holderPreload',
      setLength: 'holderSetLength',
      others: [],
    }),
    ...stack(SHOE_STACK_TITLES.equaliser, {
      backOff: 'equaliserBackOff',
      preload: 'equaliserPreload',
      setLength: 'equaliserSetLength',
      others: [],
    }),
  },
  springTables: ['spring-setting'],
};

export const CALIPER_FIELD_CARD: FieldCardLayout = {
  settings: {
    clampForce: tol(spring, T.SPRING_FORCE),
    airGap: tol(clearance, T.AIR_GAP),
    wear: thruster,
  },
  springTables: ['clamp-setting'],
};

const discStack = (k: 'a' | 'b', name: string) =>
  stack(name, {
    backOff: `${k}.backOffAngle`,
    preload: `${k}.preload`,
    setLength: `${k}.setLength`,
    others: [`${k}.angleForRequired`],
  });

/** Stack names as the disc-spring-stack sheet titles them. */
export const DISC_STACK_TITLES = {
  a: 'Stack 1 (shoe holder)',
  b: 'Stack 2 (equaliser)',
} as const;

export const DISC_STACK_FIELD_CARD: FieldCardLayout = {
  settings: {
    ...discStack('a', DISC_STACK_TITLES.a),
    ...discStack('b', DISC_STACK_TITLES.b),
  },
  springTables: [],
};
