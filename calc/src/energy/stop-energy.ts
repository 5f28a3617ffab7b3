import { compute, defineFormula, Derivation } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type { AngularSpeed, Energy, Inertia, Mass, Speed, Length } from '../units/quantities.js';

export const rotatingEnergyFormula = defineFormula({
  id: 'energy-rotating',
  label: 'Kinetic energy of the rotating parts',
  symbol: 'E_rot',
  expression: 'J * omega^2 / 2',
  symbols: {
    J: { text: 'J', dimension: 'inertia' },
    omega: { text: 'ω', dimension: 'angularSpeed' },
  },
  dimension: 'energy',
  reference: REF.energy,
});

export const linearEnergyFormula = defineFormula({
  id: 'energy-linear',
  label: 'Kinetic energy of the moving load',
  symbol: 'E_lin',
  expression: 'm * v^2 / 2',
  symbols: {
    m: { text: 'm', dimension: 'mass' },
    v: { text: 'v', dimension: 'speed' },
  },
  dimension: 'energy',
  reference: REF.energy,
});

export const potentialEnergyFormula = defineFormula({
  id: 'energy-potential',
  label: 'Potential energy released by the lowering load',
  symbol: 'E_pot',
  expression: 'm * g * h',
  symbols: {
    m: { text: 'm', dimension: 'mass' },
    g: { text: 'g', dimension: 'acceleration' },
    h: { text: 'h', dimension: 'length' },
  },
  dimension: 'energy',
  reference: REF.energy,
});

/**
 * Kinetic energy of a rotating mass, E = ½·J·ω².
 * Source: Shigley's MED 8th ed., §16-9; Bhandari, Design of Machine Elements, Ex. 12.1 (steel disc
 * D 1 m × 0.2 m, ρ 7200 kg/m³, 350 rpm: E = 94 956.72 J).
 * @example rotatingEnergy(inertia(141.3717), rpm(350)) // ≈ 94 956.7 J
 */
export function rotatingEnergy(J: Inertia, omega: AngularSpeed, d?: Derivation): Energy {
  requireRange(J, 'inertia', { min: 0 }, 'kg·m²');
  return compute(d, rotatingEnergyFormula, { J, omega });
}

/** Kinetic energy of a moving mass, E = ½·m·v². */
export function linearEnergy(m: Mass, v: Speed, d?: Derivation): Energy {
  requireRange(m, 'mass', { min: 0 }, 'kg');
  return compute(d, linearEnergyFormula, { m, v });
}

/**
 * Potential energy released when a mass descends h: E = m·g·h (g given, default standard gravity).
 * Source: OpenStax College Physics, Example 14.2 (10 000 kg truck, 75 m, g 9.80).
 */
export function potentialEnergy(m: Mass, h: Length, g = 9.80665, d?: Derivation): Energy {
  requireRange(m, 'mass', { min: 0 }, 'kg');
  return compute(d, potentialEnergyFormula, { m, g, h });
}

export const loadWorkFormula = defineFormula({
  id: 'energy-load-work',
  label: 'Work of the driving load during braking (potential energy released, after gear losses)',
  symbol: 'E_load',
  expression: 'M_d * omega_1 * t_b / 2',
  symbols: {
    M_d: { text: 'M_d', dimension: 'torque' },
    omega_1: { text: 'ω_1', dimension: 'angularSpeed' },
    t_b: { text: 't_b', dimension: 'time' },
  },
  dimension: 'energy',
  reference: REF.energy,
});

/**
 * The brake's work per stop split into its parts: kinetic energy of everything moving when the
 * brake sets, E_kin = ½·J·ω₁², and the work of a load that keeps driving while braking,
 * E_load = M_d·φ_b (φ_b = ω₁·t_b/2); for a lowering load that is m·g·h·η. Their sum equals
 * M_b·φ_b.
 */
export function stopEnergyParts(
  J: Inertia,
  omega1: AngularSpeed,
  driveTorque: number,
  brakingTime: number,
  d?: Derivation,
): { kinetic: Energy; load: Energy } {
  const kinetic = compute(
    d,
    rotatingEnergyFormula,
    { J, omega: omega1 },
    {
      id: 'energy-kinetic',
      label: 'Kinetic energy when the brake sets (all parts, referred)',
      symbol: 'E_kin',
    },
  );
  const load = compute(d, loadWorkFormula, { M_d: driveTorque, omega_1: omega1, t_b: brakingTime });
  return { kinetic, load };
}
