import { caseStep, compute, defineFormula, Derivation, type StepOptions } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type {
  Acceleration,
  AngularSpeed,
  Force,
  Length,
  Mass,
  Ratio,
  Speed,
  Torque,
} from '../units/quantities.js';

export const tenPercentRuleFormula = defineFormula({
  id: 'ten-percent-distance',
  label: 'Allowed stopping distance (10 %-of-speed rule)',
  symbol: 's_max',
  expression: 'k * v * t_min',
  symbols: {
    k: { text: 'k_10', dimension: 'dimensionless' },
    v: { text: 'v', dimension: 'speed' },
    t_min: { text: '60 s/min', dimension: 'time' },
  },
  dimension: 'length',
  reference: REF.tenPercent,
});

export const railBrakingForceFormula = defineFormula({
  id: 'rail-braking-force',
  label:
    'Braking force the braked wheels carry to the rail, including the force that drives the motion (slope, wind)',
  symbol: 'F_rail',
  expression: 'm * a + n_br * M_d * omega / v',
  symbols: {
    m: { text: 'm', dimension: 'mass' },
    a: { text: 'a_L', dimension: 'acceleration' },
    n_br: { text: 'n_br', dimension: 'dimensionless' },
    M_d: { text: 'M_d', dimension: 'torque' },
    omega: { text: 'ω_0', dimension: 'angularSpeed' },
    v: { text: 'v_0', dimension: 'speed' },
  },
  dimension: 'force',
  reference: REF.railForce,
});

export const adhesionNeededFormula = defineFormula({
  id: 'adhesion-needed',
  label: 'Wheel–rail adhesion needed by the stop',
  symbol: 'μ_req',
  expression: 'F / (m * g * n_b / n_w)',
  symbols: {
    F: { text: 'F_rail', dimension: 'force' },
    m: { text: 'm', dimension: 'mass' },
    g: { text: 'g', dimension: 'acceleration' },
    n_b: { text: 'n_braked', dimension: 'dimensionless' },
    n_w: { text: 'n_wheels', dimension: 'dimensionless' },
  },
  dimension: 'dimensionless',
  reference: REF.adhesion,
});

/**
 * Allowed stopping distance by the travel-brake rule "distance in ft = 10 % of full-load speed in
 * ft/min" (29 CFR 1910.179, bridge and trolley brakes). The same numbers hold in SI: metres =
 * 0.1 × speed in m/min, i.e. s_max = 6 s × v.
 * @example tenPercentStoppingDistance(speed(1)) // 6 m (1 m/s = 60 m/min)
 */
export function tenPercentStoppingDistance(v: Speed, d?: Derivation, fraction = 0.1): Length {
  requireRange(v, 'speed', { min: 0 }, 'm/s');
  requireRange(fraction, 'fraction', { min: 0, exclusiveMin: true });
  return compute(d, tenPercentRuleFormula, { k: fraction, v, t_min: 60 });
}

/** What the wheel-adhesion check needs to know about the stop of a travel drive. */
export interface AdhesionInput {
  /** Whole travelling mass m, kg (> 0). */
  mass: Mass;
  /** Net deceleration of the load during braking a_L = α_b·v/ω, m/s² (≥ 0). */
  loadDeceleration: Acceleration;
  /** Torque driving the motion at each brake shaft M_d (slope, wind), N·m (≥ 0). */
  driveTorque: Torque;
  /** Brakes sharing the motion n_br, each taking M_d and its share m/n_br of the mass (≥ 1). */
  brakeCount: number;
  /** Brake-shaft speed ω, rad/s (> 0); with `loadSpeed` it fixes the ratio v/ω. */
  shaftSpeed: AngularSpeed;
  /** Load speed v at shaft speed ω, m/s (> 0). */
  loadSpeed: Speed;
  /** Braked (driven) wheels n_braked, 1 ≤ n_braked ≤ n_wheels. */
  brakedWheels: number;
  /** Wheels carrying the travelling mass n_wheels (≥ 1). */
  wheels: number;
}

/**
 * Braking force the braked wheels carry to the rail during the stop: the force that decelerates
 * the travelling mass plus the external force that keeps driving it (slope, wind),
 * F_rail = m·a_L + F_ext with F_ext = n_br·M_d·ω/v. a_L is the net deceleration
 * (M_b − M_d)/J_eq referred to the load, so m·a_L alone falls as M_d rises although the wheels
 * carry more. Equivalently F_rail = n_br·(M_b − J_rot·α_b)·ω/v, J_rot the rotating inertia at
 * each brake shaft (identity of the stop: J_eq = J_rot + (m/n_br)·(v/ω)²).
 *
 * Gear efficiency: η = 1 both ways. M_d is read as the driving force referred to the brake shaft
 * without back-driving credit, as the stop takes it (η_bd = 1, common practice), so F_ext is not
 * lowered by any η. Gear losses between wheel and brake would raise the rail force for a given
 * brake torque (by up to 1/η); the travel sheet has no efficiency input and, as before, does not
 * count them.
 * @example railBrakingForce({ mass: mass(60_000), loadDeceleration: acceleration(0.5),
 *   driveTorque: torque(5), brakeCount: 2, shaftSpeed: angularSpeed(100), loadSpeed: speed(0.5),
 *   brakedWheels: 2, wheels: 4 }) // 30 000 N + 2 000 N = 32 000 N
 */
export function railBrakingForce(
  input: AdhesionInput,
  d?: Derivation,
  options?: StepOptions,
): Force {
  requireRange(input.mass, 'travelMass', { min: 0, exclusiveMin: true }, 'kg');
  requireRange(input.loadDeceleration, 'loadDeceleration', { min: 0 }, 'm/s²');
  requireRange(input.driveTorque, 'driveTorque', { min: 0 }, 'N·m');
  requireRange(input.brakeCount, 'brakeCount', { min: 1 });
  requireRange(input.shaftSpeed, 'speed', { min: 0, exclusiveMin: true }, 'rad/s');
  requireRange(input.loadSpeed, 'loadSpeed', { min: 0, exclusiveMin: true }, 'm/s');
  return compute(
    d,
    railBrakingForceFormula,
    {
      m: input.mass,
      a: input.loadDeceleration,
      n_br: input.brakeCount,
      M_d: input.driveTorque,
      omega: input.shaftSpeed,
      v: input.loadSpeed,
    },
    options,
  );
}

/**
 * Adhesion needed at the braked wheels (equal wheel loads; rolling resistance neglected,
 * conservative): μ_req = F_rail/(m·g·n_braked/n_wheels), F_rail from `railBrakingForce`, so it
 * rises with the force driving the motion. With M_d = 0 it is m·a_L/(m·g·n_b/n_w), bit for bit.
 * @example adhesionNeeded({ mass: mass(60_000), loadDeceleration: acceleration(0.5),
 *   driveTorque: torque(5), brakeCount: 2, shaftSpeed: angularSpeed(100), loadSpeed: speed(0.5),
 *   brakedWheels: 2, wheels: 4 }) // 32 000 N / 294 199.5 N ≈ 0.1088
 */
export function adhesionNeeded(
  input: AdhesionInput,
  d?: Derivation,
  /** A second case on the same sheet (the unladen one) records its steps under this prefix. */
  stepPrefix = '',
  /** Words for that case, added to its steps' labels. */
  caseWords?: string,
): Ratio {
  const o = (f: { spec: { id: string; label: string } }) =>
    stepPrefix ? caseStep(f, stepPrefix, caseWords) : undefined;
  requireRange(input.wheels, 'wheels', { min: 1 });
  requireRange(input.brakedWheels, 'brakedWheels', { min: 1, max: input.wheels });
  const F = railBrakingForce(input, d, o(railBrakingForceFormula));
  return compute(
    d,
    adhesionNeededFormula,
    { F, m: input.mass, g: 9.80665, n_b: input.brakedWheels, n_w: input.wheels },
    o(adhesionNeededFormula),
  );
}
