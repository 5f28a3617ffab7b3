import { compute, defineFormula, Derivation } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type { AngularSpeed, Length, Mass, Ratio, Speed, Torque } from '../units/quantities.js';

/** Standard gravity, m/s² (ISO 80000-3). */
export const G_STANDARD = 9.80665;

export const hoistStaticTorqueFormula = defineFormula({
  id: 'hoist-static-torque',
  label: 'Static load torque at the brake shaft (no efficiency)',
  symbol: 'M_L',
  expression: '(m_L + m_H) * g * D / (2 * i_r * i_g)',
  symbols: {
    m_L: { text: 'm_L', dimension: 'mass' },
    m_H: { text: 'm_H', dimension: 'mass' },
    g: { text: 'g', dimension: 'acceleration' },
    D: { text: 'D_drum', dimension: 'length' },
    i_r: { text: 'i_r', dimension: 'dimensionless' },
    i_g: { text: 'i_g', dimension: 'dimensionless' },
  },
  dimension: 'torque',
  reference: REF.hoistLoad,
});

export const hoistingTorqueFormula = defineFormula({
  id: 'hoisting-torque',
  label: 'Rated-load hoisting torque at the brake (M_L/η)',
  symbol: 'M_hoist',
  expression: 'M_L / eta',
  symbols: {
    M_L: { text: 'M_L', dimension: 'torque' },
    eta: { text: 'η', dimension: 'dimensionless' },
  },
  dimension: 'torque',
  reference: REF.efficiency,
});

export const holdingTorqueFormula = defineFormula({
  id: 'holding-torque',
  label: 'Torque held at the brake while lowering (M_L·η)',
  symbol: 'M_hold',
  expression: 'M_L * eta',
  symbols: {
    M_L: { text: 'M_L', dimension: 'torque' },
    eta: { text: 'η', dimension: 'dimensionless' },
  },
  dimension: 'torque',
  reference: REF.efficiency,
});

export const hoistLoadSpeedFormula = defineFormula({
  id: 'hoist-load-speed',
  label: 'Load speed at the hook from the brake-shaft speed',
  symbol: 'v_L',
  expression: 'omega_b * D / (2 * i_r * i_g)',
  symbols: {
    omega_b: { text: 'ω_b', dimension: 'angularSpeed' },
    D: { text: 'D_drum', dimension: 'length' },
    i_r: { text: 'i_r', dimension: 'dimensionless' },
    i_g: { text: 'i_g', dimension: 'dimensionless' },
  },
  dimension: 'speed',
  reference: REF.hoistLoad,
});

export interface HoistLoadInput {
  /** Rated load, kg (≥ 0). */
  load: Mass;
  /** Hook block and rope mass carried with the load, kg (≥ 0). */
  hookBlock: Mass;
  /** Rope drum pitch diameter, m (> 0). */
  drumDiameter: Length;
  /** Reeving ratio i_r = hook load ÷ rope pull at the drum (≥ 1 typical; > 0). */
  reeving: Ratio;
  /** Gear ratio i_g = brake-shaft speed ÷ drum speed (> 0). */
  gearRatio: Ratio;
  /** Overall efficiency of rope reeving and gear train η in (0, 1]. */
  efficiency: Ratio;
}

export interface HoistLoadResult {
  staticTorque: Torque;
  hoistingTorque: Torque;
  holdingTorque: Torque;
}

/**
 * Hoist load torques at the brake shaft: static M_L = (m_L + m_H)·g·D/(2·i_r·i_g); torque to hoist
 * M_L/η; torque held while lowering M_L·η. Codes (29 CFR 1910.179(f)) phrase hoist-brake torque as
 * a percentage of the rated-load hoisting torque, i.e. the larger M_L/η.
 *
 * Source: statics of the rope drive; efficiency treatment common practice.
 * @example hoistLoadTorques({ load: mass(20_000), hookBlock: mass(500), drumDiameter: length(0.5),
 *   reeving: ratio(4), gearRatio: ratio(40), efficiency: ratio(0.9) }).staticTorque // ≈ 314.2 N·m
 */
export function hoistLoadTorques(input: HoistLoadInput, d?: Derivation): HoistLoadResult {
  requireRange(input.load, 'load', { min: 0 }, 'kg');
  requireRange(input.hookBlock, 'hookBlock', { min: 0 }, 'kg');
  requireRange(input.drumDiameter, 'drumDiameter', { min: 0, exclusiveMin: true }, 'm');
  requireRange(input.reeving, 'reeving', { min: 0, exclusiveMin: true });
  requireRange(input.gearRatio, 'gearRatio', { min: 0, exclusiveMin: true });
  requireRange(input.efficiency, 'efficiency', { min: 0, max: 1, exclusiveMin: true });
  const staticTorque = compute(d, hoistStaticTorqueFormula, {
    m_L: input.load,
    m_H: input.hookBlock,
    g: G_STANDARD,
    D: input.drumDiameter,
    i_r: input.reeving,
    i_g: input.gearRatio,
  });
  const hoistingTorque = compute(d, hoistingTorqueFormula, {
    M_L: staticTorque,
    eta: input.efficiency,
  });
  const holdingTorque = compute(d, holdingTorqueFormula, {
    M_L: staticTorque,
    eta: input.efficiency,
  });
  return { staticTorque, hoistingTorque, holdingTorque };
}

/** Hook speed from the brake-shaft speed: v = ω_b·D/(2·i_r·i_g). */
export function hoistLoadSpeed(
  brakeSpeed: AngularSpeed,
  drumDiameter: Length,
  reeving: Ratio,
  gearRatio: Ratio,
  d?: Derivation,
): Speed {
  return compute(d, hoistLoadSpeedFormula, {
    omega_b: brakeSpeed,
    D: drumDiameter,
    i_r: reeving,
    i_g: gearRatio,
  });
}
