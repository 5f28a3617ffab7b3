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
