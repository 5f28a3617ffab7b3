import type { FieldCardLayout, FieldCardPlacement } from '../core/types.js';

const spring: FieldCardPlacement = { group: 'spring' };
const thruster: FieldCardPlacement = { group: 'thruster' };
const clearance: FieldCardPlacement = { group: 'clearance' };

/** A disc-spring stack's settings: back-off angle, preload, and the rest beside them. */
function stack(
  name: string,
  keys: { backOff: string; preload: string; others: readonly string[] },
): Record<string, FieldCardPlacement> {
  const s = { group: 'discStack', stack: name } as const;
  return {
    [keys.backOff]: { ...s, role: 'backOff' },
    [keys.preload]: { ...s, role: 'preload' },
    ...Object.fromEntries(keys.others.map((k) => [k, s])),
  };
}

/** Disc-spring stacks of the shoe-brake sheets, as their settings and the card name them. */
export const SHOE_STACK_TITLES = { holder: 'Shoe holder', equaliser: 'Equaliser' } as const;

/** Field card of both shoe-brake sheets (hoist and travel). */
export const SHOE_FIELD_CARD: FieldCardLayout = {
  settings: {
    springLength: spring,
    springForce: spring,
    shoeClearance: clearance,
    workingStroke: thruster,
    reserveStroke: thruster,
    minReserveStroke: thruster,
    wearToReadjust: thruster,
    wearTorqueLost: thruster,
    ...stack(SHOE_STACK_TITLES.holder, {
      backOff: 'holderBackOff',
      preload: 'holderPreload',
      others: ['holderSetLength'],
    }),
    ...stack(SHOE_STACK_TITLES.equaliser, {
      backOff: 'equaliserBackOff',
      preload: 'equaliserPreload',
      others: ['equaliserSetLength'],
    }),
  },
  springTables: ['spring-setting'],
};

export const CALIPER_FIELD_CARD: FieldCardLayout = {
  settings: { clampForce: spring, airGap: clearance, wear: thruster },
  springTables: ['clamp-setting'],
};

const discStack = (k: 'a' | 'b', name: string) =>
  stack(name, {
    backOff: `${k}.backOffAngle`,
    preload: `${k}.preload`,
    others: [`${k}.setLength`, `${k}.angleForRequired`],
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
