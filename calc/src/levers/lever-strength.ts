import { compute, type Derivation, type StepOptions } from '../core/step.js';
import { FieldErrorCollector } from '../core/errors.js';
import { limitCheck, type LimitCheck } from '../core/limit-check.js';
import { requireRange } from '../units/parse.js';
import type { Force, Length, Pressure, Ratio, Torque } from '../units/quantities.js';
import {
  baseBoltTensionFormula,
  leverMomentFormula,
  pinBearingFormula,
  pinDoubleShearFormula,
  rectBendingStressFormula,
  shoePinLoadFormula,
} from './formulas.js';

const POS = { min: 0, exclusiveMin: true } as const;

/** Validates every field at once: all bad fields come back in one CalcInputError. */
function validate(
  checks: [number, string, typeof POS | { min: number }, string?][],
  more?: (errors: FieldErrorCollector) => void,
): void {
  const errors = new FieldErrorCollector();
  more?.(errors);
  for (const [value, field, bounds, unit] of checks) {
    // requireRange lets +Infinity through a lower bound; no formula here can take it.
    if (!Number.isFinite(value)) {
      errors.add(field, `must be a finite number (got ${value})`);
      continue;
    }
    errors.capture(() => requireRange(value, field, bounds, unit), undefined);
  }
  errors.throwIfAny();
}

export interface LeverBendingInput {
  /** Force on the lever (the spring force at the top of its range, shoes lifted), N, ≥ 0. */
  force: Force;
  /** Distance from the force's line of action to the critical section, m, > 0. */
  momentArm: Length;
  /** Section width b (plate thickness) and depth h (in the plane of bending), m, > 0. */
  width: Length;
  depth: Length;
  /** Permissible bending stress (material or maker's data), Pa, > 0. */
  allowableStress: Pressure;
}

export interface LeverBendingResult {
  moment: Torque;
  stress: Pressure;
  check: LimitCheck;
}

/**
 * Bending of a lever at its critical section, a solid rectangle b × h: M = F·a, σ = M/W with
 * W = b·h²/6 (Budynas & Nisbett, Shigley's MED 10th ed., §3-10, from memory). Holes, notches and
 * fatigue are not in this static check: take them into the permissible stress. `momentStep`
 * names the force in the printed step (the sheet prints F_s,max,rel).
 * @example leverBending({ force: force(5000), momentArm: length(0.1), width: length(0.01609149),
 *   depth: length(0.04827447), allowableStress: pressure(80e6) }).stress // ≈ 80 MPa
 *   (Bhandari, Design of Machine Elements, Example 4.16)
 */
export function leverBending(
  s: LeverBendingInput,
  dv?: Derivation,
  momentStep?: StepOptions,
): LeverBendingResult {
  validate([
    [s.force, 'force', { min: 0 }, 'N'],
    [s.momentArm, 'momentArm', POS, 'm'],
    [s.width, 'width', POS, 'm'],
    [s.depth, 'depth', POS, 'm'],
    [s.allowableStress, 'allowableStress', POS, 'Pa'],
  ]);
  const moment = compute(dv, leverMomentFormula, { F: s.force, a: s.momentArm }, momentStep);
  const stress = compute(dv, rectBendingStressFormula, { M: moment, b: s.width, h: s.depth });
  return {
    moment,
    stress,
    check: limitCheck({
      id: 'lever-bending',
      label: 'Bending stress in the spring lever ≤ permissible',
      value: stress,
      limit: s.allowableStress,
      dimension: 'pressure',
      kind: 'max',
      source:
        "Budynas & Nisbett, Shigley's MED 10th ed., §3-10 (from memory); limit: material or maker's data (user input)",
    }),
  };
}

export interface ShoePinLoadInput {
  /** Lever ratio i = shoe normal force ÷ spring force (ideal), > 0. */
  leverRatio: Ratio;
  /** Spring force the load is taken from, N, ≥ 0. */
  springForce: Force;
  /** Highest friction coefficient of the lining, ≥ 0. */
  muMax: Ratio;
}

/**
 * Resultant on the pin joining a shoe to its arm: the shoe's normal force N = i·F and its friction
 * force μ·N at right angles, F_p = i·F·√(1 + μ²) (statics). The ideal lever ratio leaves the
 * linkage losses out, which overstates N: the conservative side for a strength check.
 */
export function shoePinLoad(s: ShoePinLoadInput, dv?: Derivation, step?: StepOptions): Force {
  validate([
    [s.leverRatio, 'leverRatio', POS],
    [s.springForce, 'springForce', { min: 0 }, 'N'],
    [s.muMax, 'muMax', { min: 0 }],
  ]);
  return compute(dv, shoePinLoadFormula, { i: s.leverRatio, F: s.springForce, mu: s.muMax }, step);
}

export interface PinStrengthInput {
  /** Load the pin carries, N, ≥ 0. */
  load: Force;
  /** Pin diameter, m, > 0. */
  diameter: Length;
  /** Length of the pin bearing in the middle member (the eye between the two shear planes), m. */
  bearingLength: Length;
  /** Permissible shear stress of the pin and permissible bearing pressure of the joint, Pa. */
  allowableShear: Pressure;
  allowableBearing: Pressure;
}

export interface PinStrengthResult {
  shearStress: Pressure;
  bearingPressure: Pressure;
  checks: LimitCheck[];
}

/**
 * A pin in double shear: τ = F/(2·π·d²/4) (Budynas & Nisbett, Shigley's MED 10th ed., §3-8, from
 * memory) and the bearing pressure of the middle member p = F/(d·l) (Bhandari, Design of Machine
 * Elements, Example 4.16). Pin bending is not checked: a clevis pin with close-fitting eyes is
 * usually governed by bearing (common practice).
 */
export function pinStrength(s: PinStrengthInput, dv?: Derivation): PinStrengthResult {
  validate([
    [s.load, 'load', { min: 0 }, 'N'],
    [s.diameter, 'diameter', POS, 'm'],
    [s.bearingLength, 'bearingLength', POS, 'm'],
    [s.allowableShear, 'allowableShear', POS, 'Pa'],
    [s.allowableBearing, 'allowableBearing', POS, 'Pa'],
  ]);
  const shearStress = compute(dv, pinDoubleShearFormula, { F: s.load, d: s.diameter });
  const bearingPressure = compute(dv, pinBearingFormula, {
    F: s.load,
    d: s.diameter,
    l: s.bearingLength,
  });
  return {
    shearStress,
    bearingPressure,
    checks: [
      limitCheck({
        id: 'pin-shear',
        label: 'Shear stress in the shoe pin (double shear) ≤ permissible',
        value: shearStress,
        limit: s.allowableShear,
        dimension: 'pressure',
        kind: 'max',
        source:
          "Budynas & Nisbett, Shigley's MED 10th ed., §3-8 (from memory); limit: material or maker's data (user input)",
      }),
      limitCheck({
        id: 'pin-bearing',
        label: 'Bearing pressure on the shoe pin ≤ permissible',
        value: bearingPressure,
        limit: s.allowableBearing,
        dimension: 'pressure',
        kind: 'max',
        source:
          "Bhandari, Design of Machine Elements, Example 4.16; limit: bush or maker's data (user input)",
      }),
    ],
  };
}

export interface BaseBoltInput {
  /** Brake torque whose reaction the base carries, N·m, ≥ 0. */
  torque: Torque;
  /** Distance between the bolt row in tension and the opposite row, m, > 0. */
  rowSpacing: Length;
  /** Bolts in one row (they share the row's tension), integer ≥ 1. */
  boltsPerRow: number;
  /** Permissible working tension per bolt (bolt grade and maker's data), N, > 0. */
  allowableLoad: Force;
}

export interface BaseBoltResult {
  tension: Force;
  check: LimitCheck;
}

/**
 * Base bolts under the brake torque reaction: the brake frame takes the torque the shoes put on
 * the drum as a couple; over the bolt-row spacing s it pulls one row with M/s, shared by its n
 * bolts: F = M/(s·n) (statics, common practice). Preload, prying, the brake's weight and a lever
 * arm shorter than the row spacing (a base tipping about its edge) are left out; the permissible
 * load must allow for them.
 */
export function baseBoltTension(s: BaseBoltInput, dv?: Derivation): BaseBoltResult {
  validate(
    [
      [s.torque, 'torque', { min: 0 }, 'N·m'],
      [s.rowSpacing, 'rowSpacing', POS, 'm'],
      [s.allowableLoad, 'allowableLoad', POS, 'N'],
    ],
    (errors) => {
      if (!(Number.isInteger(s.boltsPerRow) && s.boltsPerRow >= 1))
        errors.add('boltsPerRow', `must be a whole number, at least 1 (got ${s.boltsPerRow})`);
    },
  );
  const tension = compute(dv, baseBoltTensionFormula, {
    M: s.torque,
    s: s.rowSpacing,
    n: s.boltsPerRow,
  });
  return {
    tension,
    check: limitCheck({
      id: 'base-bolt-tension',
      label: 'Tension per base bolt from the torque reaction ≤ permissible',
      value: tension,
      limit: s.allowableLoad,
      dimension: 'force',
      kind: 'max',
      source:
        "statics, couple over the bolt-row spacing (common practice); limit: bolt grade and maker's data (user input)",
    }),
  };
}
