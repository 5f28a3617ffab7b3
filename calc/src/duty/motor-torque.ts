import { compute, defineFormula, Derivation } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type { AngularSpeed, Power, Torque } from '../units/quantities.js';

export const motorTorqueFormula = defineFormula({
  id: 'motor-torque',
  label: 'Motor rated torque',
  symbol: 'M_mot',
  expression: 'P / omega',
  symbols: {
    P: { text: 'P', dimension: 'power' },
    omega: { text: 'ω_mot', dimension: 'angularSpeed' },
  },
  dimension: 'torque',
  reference: REF.motorTorque,
});

/**
 * Motor rated torque from rated power and speed: M = P/ω. In trade units this is the identity
 * M[N·m] = 9550·P[kW]/n[rpm] (9549.3 exactly = 60 000/2π).
 *
 * @param power rated power P, W (> 0)
 * @param speed rated speed ω, rad/s (> 0)
 * @returns rated torque, N·m
 * Source: definition of power of a rotating shaft.
 * @example motorRatedTorque(power(55_000), rpm(1480)) // ≈ 354.9 N·m (9550·55/1480 = 354.9)
 */
export function motorRatedTorque(power: Power, speed: AngularSpeed, d?: Derivation): Torque {
  requireRange(power, 'power', { min: 0, exclusiveMin: true }, 'W');
  requireRange(speed, 'speed', { min: 0, exclusiveMin: true }, 'rad/s');
  return compute(d, motorTorqueFormula, { P: power, omega: speed });
}
