import { compute, defineFormula, Derivation } from '../core/step.js';
import { limitCheck, type LimitCheck } from '../core/limit-check.js';
import { requireRange } from '../units/parse.js';
import { G_STANDARD } from './hoist-load.js';
import type {
  AngularSpeed,
  Inertia,
  Length,
  Mass,
  Ratio,
  Speed,
  Torque,
} from '../units/quantities.js';

const REF_HOIST =
  'statics and kinematics of a hoisted load: M_L = m·g·r_k with r_k = v/ω (the same drum radius, reeving and gear ratio fix both; energy balance ½·m·v² = ½·J_L·ω²)';

export const kinematicRadiusFormula = defineFormula({
  id: 'kinematic-radius',
  label: 'Load travel per radian of the brake shaft',
  symbol: 'r_k',
  expression: 'v_0 / omega_b',
  symbols: {
    v_0: { text: 'v_0', dimension: 'speed' },
    omega_b: { text: 'ω_b', dimension: 'angularSpeed' },
  },
  dimension: 'length',
  reference: REF_HOIST,
});

export const staticTorqueFromLoadFormula = defineFormula({
  id: 'static-torque-from-load',
  label: 'Static load torque at the brake shaft from the hoisted mass',
  symbol: 'M_L',
  expression: 'm * g * r_k',
  symbols: {
    m: { text: 'm', dimension: 'mass' },
    g: { text: 'g', dimension: 'acceleration' },
    r_k: { text: 'r_k', dimension: 'length' },
  },
  dimension: 'torque',
  reference: REF_HOIST,
});

export const impliedLoadMassFormula = defineFormula({
  id: 'implied-load-mass',
  label: 'Hoisted mass implied by the static torque and the load speed',
  symbol: 'm_impl',
  expression: 'M_L / (g * r_k)',
  symbols: {
    M_L: { text: 'M_L', dimension: 'torque' },
    g: { text: 'g', dimension: 'acceleration' },
    r_k: { text: 'r_k', dimension: 'length' },
  },
  dimension: 'mass',
  reference: REF_HOIST,
});

export const loadInertiaFromTorqueFormula = defineFormula({
  id: 'load-inertia-implied',
  label: 'Inertia of the hoisted mass referred to the brake shaft',
  symbol: 'J_L',
  expression: 'M_L * r_k / g',
  symbols: {
    M_L: { text: 'M_L', dimension: 'torque' },
    r_k: { text: 'r_k', dimension: 'length' },
    g: { text: 'g', dimension: 'acceleration' },
  },
  dimension: 'inertia',
  reference: REF_HOIST,
});

export const torqueDeviationFormula = defineFormula({
  id: 'static-torque-deviation',
  label: 'Entered static torque ÷ torque from the hoisted mass − 1',
  symbol: 'Δ_M',
  expression: 'M_L / M_m - 1',
  symbols: {
    M_L: { text: 'M_L', dimension: 'torque' },
    M_m: { text: 'M_L,m', dimension: 'torque' },
  },
  dimension: 'dimensionless',
  reference: 'definition',
});

export interface LoadConsistencyInput {
  /** Static load torque at the brake shaft as entered (no efficiency), N·m (> 0). */
  staticTorque: Torque;
  /** Load speed at the brake-shaft speed below, m/s (> 0). */
  loadSpeed: Speed;
  /** Brake-shaft speed at that load speed, rad/s (> 0). */
  brakeSpeed: AngularSpeed;
  /** Total inertia referred to the brake shaft as entered, kg·m² (> 0). */
  inertia: Inertia;
  /** Hoisted mass (load, hook block, ropes) when known, kg (> 0); then the torque is checked against it. */
  loadMass?: Mass;
  /** Allowed relative deviation of the static torque from m·g·r_k (default 0.02 = 2 %, common practice). */
  tolerance?: Ratio;
}

export interface LoadConsistencyResult {
  kinematicRadius: Length;
  impliedMass: Mass;
  /** Inertia the hoisted mass alone contributes at the brake shaft. */
  loadInertia: Inertia;
  /** Present when loadMass was given. */
  torqueFromMass?: Torque;
  torqueDeviation?: Ratio;
  checks: LimitCheck[];
}

/**
 * Consistency of the three duty numbers a caliper sheet takes as free inputs — static torque,
 * load speed and total inertia — for a hoisted (gravity) load. Speed and torque both follow from
 * the same drive: r_k = v_0/ω_b, M_L = m·g·r_k, so the torque implies the hoisted mass
 * m = M_L/(g·r_k) and that mass alone puts J_L = m·r_k² = M_L·r_k/g on the brake shaft.
 * Checks: J_eq ≥ J_L (the entered inertia must contain the load's own), and, when the mass is
 * known, |M_L/(m·g·r_k) − 1| ≤ tolerance. Then energy and stopping distance describe one machine.
 *
 * Validity: vertical hoisting (static torque from gravity only); not for travel drives.
 * Source: statics and kinematics of the rope drive (textbook identity), as in hoist-load.ts.
 * @example loadConsistency({ staticTorque: torque(6315), loadSpeed: speed(0.16),
 *   brakeSpeed: rpm(975 / 40), inertia: inertia(2800) }).impliedMass // ≈ 10 270 kg
 */
export function loadConsistency(
  input: LoadConsistencyInput,
  d?: Derivation,
): LoadConsistencyResult {
  requireRange(input.staticTorque, 'staticTorque', { min: 0, exclusiveMin: true }, 'N·m');
  requireRange(input.loadSpeed, 'loadSpeed', { min: 0, exclusiveMin: true }, 'm/s');
  requireRange(input.brakeSpeed, 'brakeSpeed', { min: 0, exclusiveMin: true }, 'rad/s');
  requireRange(input.inertia, 'inertia', { min: 0, exclusiveMin: true }, 'kg·m²');
  if (input.loadMass !== undefined)
    requireRange(input.loadMass, 'loadMass', { min: 0, exclusiveMin: true }, 'kg');
  const tol = input.tolerance ?? 0.02;
  requireRange(tol, 'tolerance', { min: 0, max: 0.5 });
  const g = G_STANDARD;
  const r_k = compute(d, kinematicRadiusFormula, {
    v_0: input.loadSpeed,
    omega_b: input.brakeSpeed,
  });
  const impliedMass = compute(d, impliedLoadMassFormula, { M_L: input.staticTorque, g, r_k });
  const loadInertia = compute(d, loadInertiaFromTorqueFormula, { M_L: input.staticTorque, r_k, g });
  const checks: LimitCheck[] = [
    limitCheck({
      id: 'inertia-includes-load',
      label: 'Entered inertia ≥ inertia of the hoisted mass implied by torque and speed',
      value: input.inertia,
      limit: loadInertia,
      dimension: 'inertia',
      kind: 'min',
      source: REF_HOIST,
    }),
  ];
  let torqueFromMass: Torque | undefined;
  let torqueDeviation: Ratio | undefined;
  if (input.loadMass !== undefined) {
    torqueFromMass = compute(d, staticTorqueFromLoadFormula, { m: input.loadMass, g, r_k });
    torqueDeviation = compute(d, torqueDeviationFormula, {
      M_L: input.staticTorque,
      M_m: torqueFromMass,
    });
    checks.push(
      limitCheck({
        id: 'static-torque-consistent',
        label:
          'Static torque agrees with the hoisted mass and the load speed (|deviation| ≤ tolerance)',
        value: Math.abs(torqueDeviation),
        limit: tol,
        dimension: 'dimensionless',
        kind: 'max',
        source: `${REF_HOIST}; tolerance ${(tol * 100).toFixed(1)} % (common practice)`,
      }),
    );
  }
  return {
    kinematicRadius: r_k,
    impliedMass,
    loadInertia,
    torqueFromMass,
    torqueDeviation,
    checks,
  };
}
