import { compute, defineFormula, Derivation } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type {
  AngularAcceleration,
  AngularSpeed,
  Inertia,
  Length,
  PV,
  Power,
  Pressure,
  Ratio,
  Speed,
  Time,
  Torque,
} from '../units/quantities.js';
import { pvFormula, rubbingSpeedFormula } from '../shoe-brake/lining-duty.js';
import { delayAccelerationFormula, speedAfterDelayFormula } from './stopping.js';

const REF_SET =
  'rigid-body dynamics (textbook identity): with the drive off and the brake not yet set, the load torque back-driven through the drive train accelerates J_eq for t_d';
export const backDrivenTorqueFormula = defineFormula({
  id: 'set-drive-torque',
  label: 'Load torque back-driving the brake shaft during the set delay',
  symbol: 'M_d',
  expression: 'M_L * eta_bd',
  symbols: {
    M_L: { text: 'M_L', dimension: 'torque' },
    eta_bd: { text: 'η_bd', dimension: 'dimensionless' },
  },
  dimension: 'torque',
  reference: REF.backDriving,
});

export const setSpeedRatioFormula = defineFormula({
  id: 'set-speed-ratio',
  label: 'Shaft speed at set ÷ speed at power off',
  symbol: 'k_set',
  expression: 'omega_set / omega_0',
  symbols: {
    omega_set: { text: 'ω_set', dimension: 'angularSpeed' },
    omega_0: { text: 'ω_0', dimension: 'angularSpeed' },
  },
  dimension: 'dimensionless',
  reference: 'definition',
});

export const frictionPowerAtSetFormula = defineFormula({
  id: 'friction-power-at-set',
  label:
    'Friction power at the start of braking, with the torque this stop is worked with (its highest heat input)',
  symbol: 'P_set',
  expression: 'M_b * omega_set',
  symbols: {
    M_b: { text: 'M_b', dimension: 'torque' },
    omega_set: { text: 'ω_set', dimension: 'angularSpeed' },
  },
  dimension: 'power',
  reference:
    "power = torque × angular speed (SI identity); heat input to the rubbing path, Shigley's MED 8th ed., §16-9/16-10",
});

export interface SpeedAtSetInput {
  /** Inertia referred to the brake shaft J_eq, kg·m² (> 0). */
  inertia: Inertia;
  /** Brake-shaft speed when the drive is switched off (highest lowering speed), rad/s (> 0). */
  speed: AngularSpeed;
  /** Static load torque at the brake shaft, no efficiency (M_L), N·m (≥ 0). */
  loadTorque: Torque;
  /**
   * Efficiency of the drive train driven backwards by the load, η_bd in (0, 1]. State it: 1 is
   * the conservative value for an emergency stop (no credit for gear losses).
   */
  backDrivingEfficiency: Ratio;
  /** Set delay t_d: power off to full brake torque (the release's slowest set time), s (≥ 0). */
  setDelay: Time;
  /** Friction radius: drum radius D/2 for a shoe brake, effective radius for a disc brake, m (> 0). */
  frictionRadius: Length;
  /** Mean lining or pad pressure, Pa (≥ 0). */
  pressure: Pressure;
  /** Brake torque once set (for the friction power), N·m (≥ 0). */
  brakeTorque: Torque;
}

export interface SpeedAtSetResult {
  driveTorque: Torque;
  delayAcceleration: AngularAcceleration;
  /** Highest brake-shaft speed of the stop: the speed when the brake sets. */
  setSpeed: AngularSpeed;
  /** ω_set/ω_0 (1.23 = 23 % faster than at power off). */
  speedRatio: Ratio;
  rubbingSpeed: Speed;
  pv: PV;
  frictionPower: Power;
}

/**
 * Speed, rubbing speed, p·v and friction power at the moment the brake sets while lowering.
 * During the set delay the drive is off and the brake not yet acting, so the load back-drives the
 * train: M_d = M_L·η_bd, α_d = M_d/J_eq, ω_set = ω_0 + α_d·t_d (constant torque). The brake then
 * starts rubbing at ω_set, the highest speed of the stop: v_set = ω_set·r_f, pv_set = p·v_set,
 * P_set = M_b·ω_set. (The stop energy of stopping() already uses ω_set.)
 *
 * Validity: constant load torque; motor torque zero during t_d (no dynamic braking credit);
 * brake torque zero until t_d, then full (a linear torque rise is less severe).
 * Source: rigid-body dynamics (textbook identity); η_bd treatment common practice.
 * @example speedAtSet({ inertia: inertia(2), speed: angularSpeed(100), loadTorque: torque(400),
 *   backDrivingEfficiency: ratio(1), setDelay: time(0.25), frictionRadius: length(0.2),
 *   pressure: pressure(1e5), brakeTorque: torque(600) }).setSpeed // 150 rad/s
 */
export function speedAtSet(input: SpeedAtSetInput, d?: Derivation, prefix = ''): SpeedAtSetResult {
  requireRange(input.inertia, 'inertia', { min: 0, exclusiveMin: true }, 'kg·m²');
  requireRange(input.speed, 'speed', { min: 0, exclusiveMin: true }, 'rad/s');
  requireRange(input.loadTorque, 'loadTorque', { min: 0 }, 'N·m');
  requireRange(input.backDrivingEfficiency, 'backDrivingEfficiency', {
    min: 0,
    exclusiveMin: true,
    max: 1,
  });
  requireRange(input.setDelay, 'setDelay', { min: 0 }, 's');
  requireRange(input.frictionRadius, 'frictionRadius', { min: 0, exclusiveMin: true }, 'm');
  requireRange(input.pressure, 'pressure', { min: 0 }, 'Pa');
  requireRange(input.brakeTorque, 'brakeTorque', { min: 0 }, 'N·m');
  const id = (s: string) => ({ id: prefix + s });
  const driveTorque = compute(
    d,
    backDrivenTorqueFormula,
    { M_L: input.loadTorque, eta_bd: input.backDrivingEfficiency },
    id('set-drive-torque'),
  );
  const delayAcceleration = compute(
    d,
    delayAccelerationFormula,
    { M_d: driveTorque, J: input.inertia },
    {
      ...id('set-delay-acceleration'),
      label: 'Acceleration of the lowering load during the set delay',
    },
  );
  const setSpeed = compute(
    d,
    speedAfterDelayFormula,
    { omega_0: input.speed, alpha_d: delayAcceleration, t_d: input.setDelay },
    {
      ...id('set-speed'),
      label: 'Brake-shaft speed when the brake sets (highest of the stop)',
      symbol: 'ω_set',
      reference: REF_SET,
    },
  );
  const atSet = dutyAtSet(
    {
      setSpeed,
      speed: input.speed,
      frictionRadius: input.frictionRadius,
      pressure: input.pressure,
      brakeTorque: input.brakeTorque,
    },
    d,
    prefix,
  );
  return { driveTorque, delayAcceleration, setSpeed, ...atSet };
}

export interface DutyAtSetInput {
  /** Brake-shaft speed when the brake sets (ω_set, e.g. stopping()'s speedAfterDelay), rad/s. */
  setSpeed: AngularSpeed;
  /** Brake-shaft speed at power off, rad/s (> 0). */
  speed: AngularSpeed;
  /** Friction radius: drum radius D/2, or the disc's effective or outer radius, m (> 0). */
  frictionRadius: Length;
  /** Mean lining or pad pressure, Pa (≥ 0). */
  pressure: Pressure;
  /** Brake torque once set, N·m (≥ 0). */
  brakeTorque: Torque;
}

/**
 * Lining duty at the speed the brake sets with: k_set = ω_set/ω_0, rubbing speed v = ω_set·r_f
 * (the lining-duty formula v = ω·D/2 with D = 2·r_f), p·v at that speed and the friction power
 * M_b·ω_set. A sheet that has already run stopping() passes its ω_set here, so the speed is
 * computed once.
 */
export function dutyAtSet(
  input: DutyAtSetInput,
  d?: Derivation,
  prefix = '',
): Omit<SpeedAtSetResult, 'driveTorque' | 'delayAcceleration' | 'setSpeed'> {
  requireRange(input.setSpeed, 'setSpeed', { min: 0 }, 'rad/s');
  requireRange(input.speed, 'speed', { min: 0, exclusiveMin: true }, 'rad/s');
  requireRange(input.frictionRadius, 'frictionRadius', { min: 0, exclusiveMin: true }, 'm');
  requireRange(input.pressure, 'pressure', { min: 0 }, 'Pa');
  requireRange(input.brakeTorque, 'brakeTorque', { min: 0 }, 'N·m');
  const id = (s: string) => ({ id: prefix + s });
  const speedRatio = compute(
    d,
    setSpeedRatioFormula,
    { omega_set: input.setSpeed, omega_0: input.speed },
    id('set-speed-ratio'),
  );
  const rubbingSpeed = compute(
    d,
    rubbingSpeedFormula,
    { omega: input.setSpeed, D: 2 * input.frictionRadius },
    {
      ...id('rubbing-speed-at-set'),
      label: 'Rubbing speed when the brake sets (highest of the stop)',
      symbol: 'v_r,set',
    },
  );
  const pv = compute(
    d,
    pvFormula,
    { p_m: input.pressure, v_r: rubbingSpeed },
    {
      ...id('pv-at-set'),
      label: 'Pressure–velocity product when the brake sets',
      symbol: 'pv_set',
    },
  );
  const frictionPower = compute(
    d,
    frictionPowerAtSetFormula,
    { M_b: input.brakeTorque, omega_set: input.setSpeed },
    id('friction-power-at-set'),
  );
  return { speedRatio, rubbingSpeed, pv, frictionPower };
}
