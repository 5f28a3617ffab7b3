import { defineFormula } from '../core/step.js';

/**
 * Helical compression spring relations (round wire) as step-builder formulas, SI values.
 * Source: Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., ch. 10. Equation
 * numbers (10-4), (10-5), (10-7), (10-9) and Table 10-1 as used in the 10th-edition solution of
 * Problem 10-3; (10-1), (10-10) to (10-13) and Table 10-2 recalled from memory. EN 13906-1 uses the
 * same correction k = (w + 0.5)/(w − 0.75) (= Bergsträsser) and a buckling relation of the same
 * form (from memory; clause numbers not checked).
 */
const SH = "Budynas & Nisbett, Shigley's MED 10th ed.";
const L = { dimension: 'length' } as const;
const R = { dimension: 'dimensionless' } as const;
const P = { dimension: 'pressure' } as const;

export const springIndexFormula = defineFormula({
  id: 'spring-index',
  label: 'Spring index',
  symbol: 'C',
  expression: 'D / d',
  symbols: { D: { text: 'D', ...L }, d: { text: 'd', ...L } },
  dimension: 'dimensionless',
  reference: `${SH}, Eq. (10-1) (from memory)`,
});

export const bergstrasserFormula = defineFormula({
  id: 'stress-correction',
  label: 'Stress correction factor (Bergsträsser)',
  symbol: 'K_B',
  expression: '(4 * C + 2) / (4 * C - 3)',
  symbols: { C: { text: 'C', ...R } },
  dimension: 'dimensionless',
  reference: `${SH}, Eq. (10-5); EN 13906-1 k = (w + 0.5)/(w − 0.75) is the same factor`,
});

export const wahlFormula = defineFormula({
  id: 'stress-correction-wahl',
  label: 'Stress correction factor (Wahl)',
  symbol: 'K_W',
  expression: '(4 * C - 1) / (4 * C - 4) + 0.615 / C',
  symbols: { C: { text: 'C', ...R } },
  dimension: 'dimensionless',
  reference: `${SH}, Eq. (10-4)`,
});

export const shearStressFormula = defineFormula({
  id: 'spring-shear-stress',
  label: 'Corrected torsional shear stress in the wire',
  symbol: 'τ',
  expression: 'K * 8 * F * D / (pi * d^3)',
  symbols: {
    K: { text: 'K', ...R },
    F: { text: 'F', dimension: 'force' },
    D: { text: 'D', ...L },
    d: { text: 'd', ...L },
  },
  dimension: 'pressure',
  reference: `${SH}, Eq. (10-7)`,
});

export const helicalRateFormula = defineFormula({
  id: 'spring-rate-geometry',
  label: 'Spring rate from wire, coil diameter and active coils',
  symbol: 'k',
  expression: 'd^4 * G / (8 * D^3 * N_a)',
  symbols: {
    d: { text: 'd', ...L },
    G: { text: 'G', ...P },
    D: { text: 'D', ...L },
    N_a: { text: 'N_a', ...R },
  },
  dimension: 'stiffness',
  reference: `${SH}, Eq. (10-9)`,
});

export const totalCoilsFormula = defineFormula({
  id: 'total-coils',
  label: 'Total coils by end type',
  symbol: 'N_t',
  expression: 'N_a + n_e',
  symbols: { N_a: { text: 'N_a', ...R }, n_e: { text: 'N_e', ...R } },
  dimension: 'dimensionless',
  reference: `${SH}, Table 10-1`,
});

export const solidLengthFormula = defineFormula({
  id: 'solid-length',
  label: 'Solid length by end type',
  symbol: 'L_s',
  expression: 'd * (N_t + s_e)',
  symbols: { d: { text: 'd', ...L }, N_t: { text: 'N_t', ...R }, s_e: { text: 'e_s', ...R } },
  dimension: 'length',
  reference: `${SH}, Table 10-1`,
});

export const solidForceFormula = defineFormula({
  id: 'solid-force',
  label: 'Spring force when pressed solid',
  symbol: 'F_solid',
  expression: 'k * (L_0 - L_s)',
  symbols: {
    k: { text: 'k', dimension: 'stiffness' },
    L_0: { text: 'L_0', ...L },
    L_s: { text: 'L_s', ...L },
  },
  dimension: 'force',
  reference: 'linear spring (Hooke) to solid length',
});

const EG = { E: { text: 'E', ...P }, G: { text: 'G', ...P } };

export const criticalFreeLengthFormula = defineFormula({
  id: 'buckling-free-length',
  label: 'Longest free length that is absolutely stable against buckling',
  symbol: 'L_0,cr',
  expression: 'pi * D / alpha * sqrt(2 * (E - G) / (2 * G + E))',
  symbols: { D: { text: 'D', ...L }, alpha: { text: 'α', ...R }, ...EG },
  dimension: 'length',
  reference: `${SH}, Eq. (10-13) (from memory; 2.63·D/α for steels); end constant α Table 10-2`,
});

export const criticalDeflectionFormula = defineFormula({
  id: 'buckling-deflection',
  label: 'Deflection at which the spring buckles',
  symbol: 'y_cr',
  expression:
    'L_0 * E / (2 * (E - G)) * (1 - sqrt(1 - 2 * pi^2 * (E - G) / (2 * G + E) / (alpha * L_0 / D)^2))',
  symbols: {
    L_0: { text: 'L_0', ...L },
    D: { text: 'D', ...L },
    alpha: { text: 'α', ...R },
    ...EG,
  },
  dimension: 'length',
  reference: `${SH}, Eqs. (10-10) to (10-12) (from memory)`,
});
