import { compute, defineFormula, Derivation } from '../core/step.js';
import { limitCheck, type LimitCheck } from '../core/limit-check.js';
import { REF } from '../core/references.js';
import { rubbingSpeedFormula } from '../shoe-brake/lining-duty.js';
import { requireRange } from '../units/parse.js';
import type {
  AngularAcceleration,
  AngularSpeed,
  Length,
  Ratio,
  Speed,
  Time,
} from '../units/quantities.js';

export const motorSpeedAtSetFormula = defineFormula({
  id: 'motor-speed-at-set',
  label: 'Motor speed when the brake sets',
  symbol: 'ω_mot,set',
  expression: 'omega_set * i_m',
  symbols: {
    omega_set: { text: 'ω_set', dimension: 'angularSpeed' },
    i_m: { text: 'i_m', dimension: 'dimensionless' },
  },
  dimension: 'angularSpeed',
  reference: REF.kinematics,
});

export const ropeDrumSpeedAtSetFormula = defineFormula({
  id: 'rope-drum-speed-at-set',
  label: 'Rope drum speed when the brake sets',
  symbol: 'ω_rd,set',
  expression: 'omega_set / i_g',
  symbols: {
    omega_set: { text: 'ω_set', dimension: 'angularSpeed' },
    i_g: { text: 'i_g', dimension: 'dimensionless' },
  },
  dimension: 'angularSpeed',
  reference: REF.kinematics,
});

export const maxSetDelayFormula = defineFormula({
  id: 'max-set-delay',
  label: 'Longest set delay before the speed limit is reached',
  symbol: 't_d,max',
  expression: '(omega_max - omega_0) / alpha_d',
  symbols: {
    omega_max: { text: 'ω_max', dimension: 'angularSpeed' },
    omega_0: { text: 'ω_0', dimension: 'angularSpeed' },
    alpha_d: { text: 'α_d', dimension: 'angularAcceleration' },
  },
  dimension: 'time',
  reference: 'rigid-body dynamics at constant acceleration (textbook identity)',
});

export interface OverspeedInput {
  /** Brake-shaft speed when the brake sets (the highest of the stop, from speedAtSet), rad/s (> 0). */
  setSpeed: AngularSpeed;
  /** Motor speed ÷ brake-shaft speed (1 when the brake sits on the motor shaft), > 0. */
  motorRatio: Ratio;
  /** Motor maker's maximum permissible speed, rad/s (> 0). */
  motorMaxSpeed: AngularSpeed;
  /**
   * Brake drum diameter (or disc outer diameter), m (> 0), with the drum (disc) maker's peripheral
   * speed rating, m/s (> 0). Optional: a sheet that already checks the rubbing speed at set
   * against the same rating leaves them out.
   */
  drumDiameter?: Length;
  drumMaxPeripheralSpeed?: Speed;
  /** Optional rope drum: brake-shaft ÷ rope-drum speed ratio and the drum's maximum speed. */
  ropeDrum?: { gearRatio: Ratio; maxSpeed: AngularSpeed };
}

export interface OverspeedResult {
  motorSpeed: AngularSpeed;
  drumPeripheralSpeed?: Speed;
  ropeDrumSpeed?: AngularSpeed;
  checks: LimitCheck[];
}

/**
 * Overspeed of the rotating parts at the highest speed of a stop — the speed when the brake sets:
 * motor ω_mot = ω_set·i_m against the motor's maximum speed; drum peripheral speed ω_set·D/2
 * against the drum rating; optionally the rope drum ω_set/i_g against its maximum speed. A long
 * set delay on a lowering hoist can take the shaft far past its rating while every torque check
 * still passes; this makes that a failed check.
 *
 * Limits are equipment data (the motor, drum and gearbox makers'); no published default is given.
 * Source: kinematics (definition); limits from the makers.
 * @example overspeedChecks({ setSpeed: rpm(1203), motorRatio: ratio(1), motorMaxSpeed: rpm(2000),
 *   drumDiameter: length(0.4), drumMaxPeripheralSpeed: speed(30) }).checks.every((c) => c.pass) // true
 */
export function overspeedChecks(input: OverspeedInput, d?: Derivation): OverspeedResult {
  requireRange(input.setSpeed, 'setSpeed', { min: 0, exclusiveMin: true }, 'rad/s');
  requireRange(input.motorRatio, 'motorRatio', { min: 0, exclusiveMin: true });
  requireRange(input.motorMaxSpeed, 'motorMaxSpeed', { min: 0, exclusiveMin: true }, 'rad/s');
  const drum =
    input.drumDiameter !== undefined && input.drumMaxPeripheralSpeed !== undefined
      ? { D: input.drumDiameter, max: input.drumMaxPeripheralSpeed }
      : undefined;
  if (drum) {
    requireRange(drum.D, 'drumDiameter', { min: 0, exclusiveMin: true }, 'm');
    requireRange(drum.max, 'drumMaxPeripheralSpeed', { min: 0, exclusiveMin: true }, 'm/s');
  }
  if (input.ropeDrum) {
    requireRange(input.ropeDrum.gearRatio, 'ropeDrum.gearRatio', { min: 0, exclusiveMin: true });
    requireRange(
      input.ropeDrum.maxSpeed,
      'ropeDrum.maxSpeed',
      { min: 0, exclusiveMin: true },
      'rad/s',
    );
  }
  const motorSpeed = compute(d, motorSpeedAtSetFormula, {
    omega_set: input.setSpeed,
    i_m: input.motorRatio,
  });
  const checks: LimitCheck[] = [
    limitCheck({
      id: 'motor-overspeed',
      label: 'Motor speed when the brake sets ≤ motor maximum speed',
      value: motorSpeed,
      limit: input.motorMaxSpeed,
      dimension: 'angularSpeed',
      kind: 'max',
      source: "equipment data (user input): motor maker's maximum permissible speed",
    }),
  ];
  let drumPeripheralSpeed: Speed | undefined;
  if (drum) {
    drumPeripheralSpeed = compute(
      d,
      rubbingSpeedFormula,
      { omega: input.setSpeed, D: drum.D },
      {
        id: 'drum-peripheral-speed-at-set',
        label: 'Brake drum (disc) peripheral speed when the brake sets',
        symbol: 'v_D,set',
      },
    );
    checks.push(
      limitCheck({
        id: 'drum-overspeed',
        label: 'Brake drum peripheral speed when the brake sets ≤ drum rating',
        value: drumPeripheralSpeed,
        limit: drum.max,
        dimension: 'speed',
        kind: 'max',
        source: "equipment data (user input): drum maker's peripheral speed rating",
      }),
    );
  }
  let ropeDrumSpeed: AngularSpeed | undefined;
  if (input.ropeDrum) {
    ropeDrumSpeed = compute(d, ropeDrumSpeedAtSetFormula, {
      omega_set: input.setSpeed,
      i_g: input.ropeDrum.gearRatio,
    });
    checks.push(
      limitCheck({
        id: 'rope-drum-overspeed',
        label: 'Rope drum speed when the brake sets ≤ its maximum speed',
        value: ropeDrumSpeed,
        limit: input.ropeDrum.maxSpeed,
        dimension: 'angularSpeed',
        kind: 'max',
        source: "equipment data (user input): hoist maker's maximum rope drum speed",
      }),
    );
  }
  return { motorSpeed, drumPeripheralSpeed, ropeDrumSpeed, checks };
}

/**
 * Longest set delay before a speed limit ω_max is reached while the load accelerates at α_d:
 * t_d,max = (ω_max − ω_0)/α_d, to print beside the set-delay input. Negative when the shaft is
 * already above the limit at power off. α_d must be > 0: with no driving torque there is no such
 * limit and the caller skips the step.
 */
export function maxSetDelay(
  speed: AngularSpeed,
  maxSpeed: AngularSpeed,
  delayAcceleration: AngularAcceleration,
  d?: Derivation,
): Time {
  requireRange(speed, 'speed', { min: 0, exclusiveMin: true }, 'rad/s');
  requireRange(maxSpeed, 'maxSpeed', { min: 0, exclusiveMin: true }, 'rad/s');
  requireRange(delayAcceleration, 'delayAcceleration', { min: 0, exclusiveMin: true }, 'rad/s²');
  return compute(d, maxSetDelayFormula, {
    omega_max: maxSpeed,
    omega_0: speed,
    alpha_d: delayAcceleration,
  });
}
