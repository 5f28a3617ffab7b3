import { defineFormula, type SymbolSpec } from '../core/step.js';
import { REF } from '../core/references.js';

const angle = (text: string): SymbolSpec => ({ text, dimension: 'angle' });
const length = (text: string): SymbolSpec => ({ text, dimension: 'length' });
const plain = (text: string): SymbolSpec => ({ text, dimension: 'dimensionless' });

/** Lining span and hinge geometry shared by the shoe-moment formulas (Shigley's notation). */
const geometry = {
  f: plain('f'),
  b: length('b'),
  r: length('r'),
  a: length('a'),
  theta1: angle('θ₁'),
  theta2: angle('θ₂'),
  theta_a: angle('θ_a'),
};

// The bracketed factors of M_f and M_N per unit p_a, written once and spliced into every formula
// below so the printed text and the computed value come from the same expression.
const FRICTION_ARM = '(r * (cos(theta1) - cos(theta2)) - a / 2 * (sin(theta2)^2 - sin(theta1)^2))';
const NORMAL_ARM = '((theta2 - theta1) / 2 - (sin(2 * theta2) - sin(2 * theta1)) / 4)';

export const maxPressureAngleFormula = defineFormula({
  id: 'theta-a',
  label: 'Angle of maximum pressure (θ_a = θ₂ up to 90°)',
  symbol: 'θ_a',
  expression: 'min(theta2, pi / 2)',
  symbols: { theta2: geometry.theta2 },
  dimension: 'angle',
  reference: REF.generalShoe,
});

const pressureSymbols = {
  F: { text: 'F', dimension: 'force' },
  c: length('c'),
  ...geometry,
} satisfies Record<string, SymbolSpec>;

/** Self-energising shoe: F·c = M_N − M_f (Shigley's MED 8th ed., Eq. 16-4). */
export const selfEnergisingPressureFormula = defineFormula({
  id: 'max-pressure',
  label: 'Maximum lining pressure, self-energising shoe (F·c = M_N − M_f)',
  symbol: 'p_a',
  expression: `F * c * sin(theta_a) / (b * r * (a * ${NORMAL_ARM} - f * ${FRICTION_ARM}))`,
  symbols: pressureSymbols,
  dimension: 'pressure',
  reference: REF.generalShoe,
});

/** Shoe whose friction moment opposes the actuating force: F·c = M_N + M_f (Eq. 16-5). */
export const opposingPressureFormula = defineFormula({
  id: 'max-pressure',
  label: 'Maximum lining pressure, non-energising shoe (F·c = M_N + M_f)',
  symbol: 'p_a',
  expression: `F * c * sin(theta_a) / (b * r * (a * ${NORMAL_ARM} + f * ${FRICTION_ARM}))`,
  symbols: pressureSymbols,
  dimension: 'pressure',
  reference: REF.generalShoe,
});

const momentSymbols = {
  p_a: { text: 'p_a', dimension: 'pressure' },
  ...geometry,
} satisfies Record<string, SymbolSpec>;

export const frictionMomentFormula = defineFormula({
  id: 'friction-moment',
  label: 'Moment of the friction forces about the hinge pin',
  symbol: 'M_f',
  expression: `f * p_a * b * r / sin(theta_a) * ${FRICTION_ARM}`,
  symbols: momentSymbols,
  dimension: 'torque',
  reference: REF.generalShoe,
});

export const normalMomentFormula = defineFormula({
  id: 'normal-moment',
  label: 'Moment of the normal forces about the hinge pin',
  symbol: 'M_N',
  expression: `p_a * b * r * a / sin(theta_a) * ${NORMAL_ARM}`,
  symbols: {
    p_a: momentSymbols.p_a,
    b: geometry.b,
    r: geometry.r,
    a: geometry.a,
    theta1: geometry.theta1,
    theta2: geometry.theta2,
    theta_a: geometry.theta_a,
  },
  dimension: 'torque',
  reference: REF.generalShoe,
});

export const shoeTorqueFormula = defineFormula({
  id: 'shoe-torque',
  label: 'Braking torque of the shoe',
  symbol: 'T',
  expression: 'f * p_a * b * r^2 * (cos(theta1) - cos(theta2)) / sin(theta_a)',
  symbols: {
    p_a: momentSymbols.p_a,
    f: geometry.f,
    b: geometry.b,
    r: geometry.r,
    theta1: geometry.theta1,
    theta2: geometry.theta2,
    theta_a: geometry.theta_a,
  },
  dimension: 'torque',
  reference: REF.generalShoe,
});

const forceSymbols = {
  M_N: { text: 'M_N', dimension: 'torque' },
  M_f: { text: 'M_f', dimension: 'torque' },
  c: length('c'),
} satisfies Record<string, SymbolSpec>;

export const selfEnergisingForceFormula = defineFormula({
  id: 'actuating-force',
  label: 'Actuating force, self-energising shoe',
  symbol: 'F',
  expression: '(M_N - M_f) / c',
  symbols: forceSymbols,
  dimension: 'force',
  reference: REF.generalShoe,
});

export const opposingForceFormula = defineFormula({
  id: 'actuating-force',
  label: 'Actuating force, non-energising shoe',
  symbol: 'F',
  expression: '(M_N + M_f) / c',
  symbols: forceSymbols,
  dimension: 'force',
  reference: REF.generalShoe,
});
