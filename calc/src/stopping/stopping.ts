import { caseStep, compute, defineFormula, Derivation } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type {
  Angle,
  AngularSpeed,
  Energy,
  Inertia,
  Length,
  Speed,
  Time,
  Torque,
  Acceleration,
  AngularAcceleration,
} from '../units/quantities.js';

const sym = {
  J: { text: 'J_eq', dimension: 'inertia' },
  M_d: { text: 'M_d', dimension: 'torque' },
  M_b: { text: 'M_b', dimension: 'torque' },
} as const;

export const delayAccelerationFormula = defineFormula({
  id: 'delay-acceleration',
  label: 'Acceleration during the set delay (brake not yet acting)',
  symbol: 'α_d',
  expression: 'M_d / J',
  symbols: { M_d: sym.M_d, J: sym.J },
  dimension: 'angularAcceleration',
  reference: REF.stopping,
});

export const speedAfterDelayFormula = defineFormula({
  id: 'speed-after-delay',
  label: 'Brake-shaft speed when the brake sets',
  symbol: 'ω_1',
  expression: 'omega_0 + alpha_d * t_d',
  symbols: {
    omega_0: { text: 'ω_0', dimension: 'angularSpeed' },
    alpha_d: { text: 'α_d', dimension: 'angularAcceleration' },
    t_d: { text: 't_d', dimension: 'time' },
  },
  dimension: 'angularSpeed',
  reference: REF.stopping,
});

export const decelerationFormula = defineFormula({
  id: 'brake-deceleration',
  label: 'Angular deceleration while braking',
  symbol: 'α_b',
  expression: '(M_b - M_d) / J',
  symbols: { M_b: sym.M_b, M_d: sym.M_d, J: sym.J },
  dimension: 'angularAcceleration',
  reference: REF.stopping,
});

export const brakingTimeFormula = defineFormula({
  id: 'braking-time',
  label: 'Braking time after the brake sets',
  symbol: 't_b',
  expression: 'omega_1 / alpha_b',
  symbols: {
    omega_1: { text: 'ω_1', dimension: 'angularSpeed' },
    alpha_b: { text: 'α_b', dimension: 'angularAcceleration' },
  },
  dimension: 'time',
  reference: REF.stopping,
});

export const stopTimeFormula = defineFormula({
  id: 'stopping-time',
  label: 'Stopping time including the set delay',
  symbol: 't_s',
  expression: 't_d + t_b',
  symbols: { t_d: { text: 't_d', dimension: 'time' }, t_b: { text: 't_b', dimension: 'time' } },
  dimension: 'time',
  reference: REF.stopping,
});

export const stopAngleFormula = defineFormula({
  id: 'stopping-angle',
  label: 'Brake-shaft rotation during the stop',
  symbol: 'φ_s',
  expression: '(omega_0 + omega_1) / 2 * t_d + omega_1 * t_b / 2',
  symbols: {
    omega_0: { text: 'ω_0', dimension: 'angularSpeed' },
    omega_1: { text: 'ω_1', dimension: 'angularSpeed' },
    t_d: { text: 't_d', dimension: 'time' },
    t_b: { text: 't_b', dimension: 'time' },
  },
  dimension: 'angle',
  reference: REF.stopping,
});

export const stopRevolutionsFormula = defineFormula({
  id: 'stopping-revolutions',
  label: 'Brake-shaft revolutions during the stop',
  symbol: 'n_s',
  expression: 'phi_s / (2 * pi)',
  symbols: { phi_s: { text: 'φ_s', dimension: 'angle' } },
  dimension: 'dimensionless',
  reference: 'definition (one revolution is 2π rad)',
});

export const stopDistanceFormula = defineFormula({
  id: 'stopping-distance',
  label: 'Stopping distance at the load',
  symbol: 's_s',
  expression: 'phi_s * v_0 / omega_0',
  symbols: {
    phi_s: { text: 'φ_s', dimension: 'angle' },
    v_0: { text: 'v_0', dimension: 'speed' },
    omega_0: { text: 'ω_0', dimension: 'angularSpeed' },
  },
  dimension: 'length',
  reference: REF.stopping,
});

export const loadDecelerationFormula = defineFormula({
  id: 'load-deceleration',
  label: 'Deceleration at the load',
  symbol: 'a_L',
  expression: 'alpha_b * v_0 / omega_0',
  symbols: {
    alpha_b: { text: 'α_b', dimension: 'angularAcceleration' },
    v_0: { text: 'v_0', dimension: 'speed' },
    omega_0: { text: 'ω_0', dimension: 'angularSpeed' },
  },
  dimension: 'acceleration',
  reference: REF.stopping,
});

export const brakeWorkFormula = defineFormula({
  id: 'brake-work',
  label: 'Energy absorbed by the brake per stop',
  symbol: 'E_stop',
  expression: 'M_b * omega_1 * t_b / 2',
  symbols: {
    M_b: sym.M_b,
    omega_1: { text: 'ω_1', dimension: 'angularSpeed' },
    t_b: { text: 't_b', dimension: 'time' },
  },
  dimension: 'energy',
  reference: `${REF.energy}; W = M_b·φ_b at constant torque`,
});

export interface StoppingInput {
  /** Inertia referred to the brake shaft, kg·m² (> 0). */
  inertia: Inertia;
  /** Brake-shaft speed at the start, rad/s (> 0). */
  speed: AngularSpeed;
  /** Load speed at the start, m/s (> 0), fixing the brake-shaft-to-load ratio. */
  loadSpeed: Speed;
  /** Brake torque acting after the set delay, N·m (≥ 0). */
  brakeTorque: Torque;
  /** Torque that keeps driving the motion at the brake shaft (lowering load M_L·η, downhill), N·m (≥ 0). */
  driveTorque: Torque;
  /** Set delay t_d: time from power off to full brake torque, s (≥ 0). */
  setDelay: Time;
}

export type StoppingResult =
  | {
      stops: true;
      speedAfterDelay: AngularSpeed;
      deceleration: AngularAcceleration;
      brakingTime: Time;
      stoppingTime: Time;
      stoppingAngle: Angle;
      stoppingDistance: Length;
      loadDeceleration: Acceleration;
      /** Work done by the brake: ½·J·ω1² + M_d·φ_b. */
      brakeEnergy: Energy;
      /** Load speed at the moment the brake sets (higher than v0 for a lowering load). */
      loadSpeedAtSet: Speed;
    }
  | { stops: false; speedAfterDelay: AngularSpeed; message: string };

/**
 * Stop of a drive at constant brake torque after a set delay t_d. During t_d the brake is not yet
 * acting and a driving (lowering, downhill) torque accelerates the inertia: ω1 = ω0 + (M_d/J)·t_d.
 * Then α_b = (M_b − M_d)/J, t_b = ω1/α_b; the load travels (φ_d + φ_b)·v0/ω0.
 * A brake torque not above the driving torque never stops the load: returned as `stops: false`
 * with a message (a failed check, not an exception).
 *
 * Source: rigid-body dynamics (textbook identity); US form t = WK²·N/(308·T).
 * @example stopping({ inertia: inertia(2), speed: angularSpeed(150), loadSpeed: speed(0.3),
 *   brakeTorque: torque(700), driveTorque: torque(300), setDelay: time(0.2) })
 *   // ω1 = 180 rad/s, α_b = 200 rad/s², t_b = 0.9 s
 */
export function stopping(
  input: StoppingInput,
  d?: Derivation,
  prefix = '',
  /** Words for a second stop on the same sheet, added to each step's label ('unladen, μ max'). */
  caseWords?: string,
  /**
   * Symbols printed by another name in every step of this stop: a case with only part of the
   * inertia prints J_dr where the formulas say J_eq, so its steps do not claim the whole train.
   */
  names?: Readonly<Record<string, string>>,
): StoppingResult {
  const o = (f: { spec: { id: string; label: string } }) =>
    names ? { ...caseStep(f, prefix, caseWords), names } : caseStep(f, prefix, caseWords);
  requireRange(input.inertia, 'inertia', { min: 0, exclusiveMin: true }, 'kg·m²');
  requireRange(input.speed, 'speed', { min: 0, exclusiveMin: true }, 'rad/s');
  requireRange(input.loadSpeed, 'loadSpeed', { min: 0, exclusiveMin: true }, 'm/s');
  requireRange(input.brakeTorque, 'brakeTorque', { min: 0 }, 'N·m');
  requireRange(input.driveTorque, 'driveTorque', { min: 0 }, 'N·m');
  requireRange(input.setDelay, 'setDelay', { min: 0 }, 's');
  const J = input.inertia;
  const omega_0 = input.speed;
  const alpha_d = compute(
    d,
    delayAccelerationFormula,
    { M_d: input.driveTorque, J },
    o(delayAccelerationFormula),
  );
  const omega_1 = compute(
    d,
    speedAfterDelayFormula,
    { omega_0, alpha_d, t_d: input.setDelay },
    o(speedAfterDelayFormula),
  );
  if (!(input.brakeTorque > input.driveTorque)) {
    return {
      stops: false,
      speedAfterDelay: omega_1,
      message:
        `The brake torque (${input.brakeTorque.toFixed(0)} N·m) does not exceed the torque driving ` +
        `the load (${input.driveTorque.toFixed(0)} N·m): the load keeps accelerating and is never stopped.`,
    };
  }
  const alpha_b = compute(
    d,
    decelerationFormula,
    {
      M_b: input.brakeTorque,
      M_d: input.driveTorque,
      J,
    },
    o(decelerationFormula),
  );
  const t_b = compute(d, brakingTimeFormula, { omega_1, alpha_b }, o(brakingTimeFormula));
  const stoppingTime = compute(
    d,
    stopTimeFormula,
    { t_d: input.setDelay, t_b },
    o(stopTimeFormula),
  );
  const phi_s = compute(
    d,
    stopAngleFormula,
    { omega_0, omega_1, t_d: input.setDelay, t_b },
    o(stopAngleFormula),
  );
  // Not used further: the same rotation in revolutions, which is how it is counted on the shaft.
  compute(d, stopRevolutionsFormula, { phi_s }, o(stopRevolutionsFormula));
  const v_0 = input.loadSpeed;
  const stoppingDistance = compute(
    d,
    stopDistanceFormula,
    { phi_s, v_0, omega_0 },
    o(stopDistanceFormula),
  );
  const loadDeceleration = compute(
    d,
    loadDecelerationFormula,
    { alpha_b, v_0, omega_0 },
    o(loadDecelerationFormula),
  );
  const brakeEnergy = compute(
    d,
    brakeWorkFormula,
    { M_b: input.brakeTorque, omega_1, t_b },
    o(brakeWorkFormula),
  );
  return {
    stops: true,
    speedAfterDelay: omega_1,
    deceleration: alpha_b,
    brakingTime: t_b,
    stoppingTime,
    stoppingAngle: phi_s,
    stoppingDistance,
    loadDeceleration,
    brakeEnergy,
    loadSpeedAtSet: ((omega_1 * v_0) / omega_0) as Speed,
  };
}
