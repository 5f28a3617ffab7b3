import { defineFormula } from '../core/step.js';

/**
 * Strength relations for the levers, pins and base bolts of a spring-set brake, as step-builder
 * formulas in SI values. Sources: bending of a rectangular section σ = M/W with W = b·h²/6, a pin
 * in double shear τ = F/(2·π·d²/4) and bearing pressure p = F/(d·l): Budynas & Nisbett, Shigley's
 * MED 10th ed., §3-10 (bending), §3-8 (direct shear) and Table A-18 (section properties), from
 * memory; the same relations are worked in Bhandari, Design of Machine Elements, Example 4.16
 * (bell-crank lever: fulcrum pin and lever section). The base-bolt couple is statics (common
 * practice).
 */
const SH = "Budynas & Nisbett, Shigley's MED 10th ed.";
const L = { dimension: 'length' } as const;
const F = { dimension: 'force' } as const;
const R = { dimension: 'dimensionless' } as const;

export const leverMomentFormula = defineFormula({
  id: 'lever-bending-moment',
  label: 'Bending moment in the spring lever at its critical section',
  symbol: 'M_l',
  expression: 'F * a',
  symbols: { F: { text: 'F', ...F }, a: { text: 'a_l', ...L } },
  dimension: 'torque',
  reference: 'statics: force times its distance from the section',
});

export const rectBendingStressFormula = defineFormula({
  id: 'lever-bending-stress',
  label: 'Bending stress at the critical section (rectangle b × h, W = b·h²/6)',
  symbol: 'σ_b',
  expression: '6 * M / (b * h^2)',
  symbols: {
    M: { text: 'M_l', dimension: 'torque' },
    b: { text: 'b_l', ...L },
    h: { text: 'h_l', ...L },
  },
  dimension: 'pressure',
  reference: `${SH}, §3-10 σ = M·c/I and Table A-18 (rectangle), from memory`,
});

export const shoePinLoadFormula = defineFormula({
  id: 'shoe-pin-load',
  label: 'Load on the shoe pin: normal and friction force of one shoe',
  symbol: 'F_p',
  expression: 'i * F * sqrt(1 + mu^2)',
  symbols: {
    i: { text: 'i', ...R },
    F: { text: 'F', ...F },
    mu: { text: 'μ_max', ...R },
  },
  dimension: 'force',
  reference:
    'statics: shoe normal force i·F (ideal lever ratio, linkage losses left out) and friction μ·N at right angles',
});

export const pinDoubleShearFormula = defineFormula({
  id: 'pin-shear-stress',
  label: 'Shear stress in the pin (double shear)',
  symbol: 'τ_p',
  expression: 'F / (2 * pi * d^2 / 4)',
  symbols: { F: { text: 'F_p', ...F }, d: { text: 'd_p', ...L } },
  dimension: 'pressure',
  reference: `${SH}, §3-8 direct shear τ = F/A over two shear planes, from memory`,
});

export const pinBearingFormula = defineFormula({
  id: 'pin-bearing-pressure',
  label: 'Bearing pressure on the pin (projected area d × l)',
  symbol: 'p_p',
  expression: 'F / (d * l)',
  symbols: { F: { text: 'F_p', ...F }, d: { text: 'd_p', ...L }, l: { text: 'l_p', ...L } },
  dimension: 'pressure',
  reference: 'Bhandari, Design of Machine Elements, Example 4.16: p = R/(d·l) on the fulcrum pin',
});

export const baseBoltTensionFormula = defineFormula({
  id: 'base-bolt-tension',
  label: 'Tension per base bolt from the brake torque reaction',
  symbol: 'F_bolt',
  expression: 'M / (s * n)',
  symbols: {
    M: { text: 'M_b,max,adj', dimension: 'torque' },
    s: { text: 's_b', ...L },
    n: { text: 'n_b', ...R },
  },
  dimension: 'force',
  reference:
    'statics (common practice): the torque reaction as a couple over the bolt-row spacing, shared by the bolts of the row in tension; preload and prying left out',
});
