import { defineFormula } from '../core/step.js';

/**
 * Disc-spring relations as step-builder formulas (SI values): the same relations as
 * disc.ts (stack-derivation.test.ts checks both agree); stack relations are in formulas-stack.ts.
 * Method: DIN EN 16984 (formerly DIN 2092), Almen–László; K4 and stack friction recalled from
 * memory of DIN 2092:2006 (see factors.ts, stack.ts).
 */
const REF = 'DIN EN 16984 (formerly DIN 2092), single disc spring, Almen–László';
const REF_K4 =
  'DIN EN 16984 (formerly DIN 2092), group 3 with contact flats (K4 recalled from memory)';
const L = { dimension: 'length' } as const;
const R = { dimension: 'dimensionless' } as const;
const P = { dimension: 'pressure' } as const;

export const fDelta = defineFormula({
  id: 'delta',
  label: 'Diameter ratio',
  symbol: 'δ',
  expression: 'De / Di',
  symbols: { De: { text: 'D_e', ...L }, Di: { text: 'D_i', ...L } },
  dimension: 'dimensionless',
  reference: REF,
});

export const fK1 = defineFormula({
  id: 'K1',
  label: 'Factor K1',
  symbol: 'K₁',
  expression: '(1 / pi) * ((d - 1) / d)^2 / ((d + 1) / (d - 1) - 2 / log(d))',
  symbols: { d: { text: 'δ', ...R } },
  dimension: 'dimensionless',
  reference: REF,
});

export const fK2 = defineFormula({
  id: 'K2',
  label: 'Factor K2',
  symbol: 'K₂',
  expression: '(6 / pi) * ((d - 1) / log(d) - 1) / log(d)',
  symbols: { d: { text: 'δ', ...R } },
  dimension: 'dimensionless',
  reference: REF,
});

export const fK3 = defineFormula({
  id: 'K3',
  label: 'Factor K3',
  symbol: 'K₃',
  expression: '(3 / pi) * (d - 1) / log(d)',
  symbols: { d: { text: 'δ', ...R } },
  dimension: 'dimensionless',
  reference: REF,
});

export const fC1 = defineFormula({
  id: 'C1',
  label: 'Group 3 constant C1',
  symbol: 'C₁',
  expression:
    '(tr / t)^2 / ((l0 / (4 * t) - tr / t + 3 / 4) * (5 * l0 / (8 * t) - tr / t + 3 / 8))',
  symbols: { tr: { text: 't′', ...L }, t: { text: 't', ...L }, l0: { text: 'l₀', ...L } },
  dimension: 'dimensionless',
  reference: REF_K4,
});

export const fC2 = defineFormula({
  id: 'C2',
  label: 'Group 3 constant C2',
  symbol: 'C₂',
  expression: 'C1 / (tr / t)^3 * (5 / 32 * (l0 / t - 1)^2 + 1)',
  symbols: {
    C1: { text: 'C₁', ...R },
    tr: { text: 't′', ...L },
    t: { text: 't', ...L },
    l0: { text: 'l₀', ...L },
  },
  dimension: 'dimensionless',
  reference: REF_K4,
});

export const fK4 = defineFormula({
  id: 'K4',
  label: 'Factor K4 (contact flats)',
  symbol: 'K₄',
  expression: 'sqrt(-C1 / 2 + sqrt((C1 / 2)^2 + C2))',
  symbols: { C1: { text: 'C₁', ...R }, C2: { text: 'C₂', ...R } },
  dimension: 'dimensionless',
  reference: REF_K4,
});

export const fH0 = defineFormula({
  id: 'h0',
  label: 'Cone height (travel to flat)',
  symbol: 'h₀',
  expression: 'l0 - t',
  symbols: { l0: { text: 'l₀', ...L }, t: { text: 't', ...L } },
  dimension: 'length',
  reference: REF,
});

const forceSymbols = {
  E: { text: 'E', ...P },
  nu: { text: 'ν', ...R },
  t: { text: 't', ...L },
  K1: { text: 'K₁', ...R },
  K4: { text: 'K₄', ...R },
  De: { text: 'D_e', ...L },
  h0: { text: 'h₀', ...L },
  s: { text: 's', ...L },
};

export const fDiscForce = defineFormula({
  id: 'disc-force',
  label: 'Force of one disc',
  symbol: 'F',
  expression:
    '4 * E / (1 - nu^2) * t^4 / (K1 * De^2) * K4^2 * (s / t) * (K4^2 * (h0 / t - s / t) * (h0 / t - s / (2 * t)) + 1)',
  symbols: forceSymbols,
  dimension: 'force',
  reference: REF,
});

const stressSymbols = {
  E: { text: 'E', ...P },
  nu: { text: 'ν', ...R },
  t: { text: 't', ...L },
  K1: { text: 'K₁', ...R },
  K2: { text: 'K₂', ...R },
  K3: { text: 'K₃', ...R },
  K4: { text: 'K₄', ...R },
  De: { text: 'D_e', ...L },
  h0: { text: 'h₀', ...L },
  s: { text: 's', ...L },
  d: { text: 'δ', ...R },
};
const B = '4 * E / (1 - nu^2) * t^2 / (K1 * De^2) * K4 * (s / t)';
const m = '(h0 / t - s / (2 * t))';
const stress = (id: string, label: string, symbol: string, expression: string) =>
  defineFormula({
    id,
    label,
    symbol,
    expression,
    symbols: stressSymbols,
    dimension: 'pressure',
    reference: REF,
  });

export const fSigmaOM = stress(
  'sigma-OM',
  'Stress at the upper inner edge OM',
  'σ_OM',
  `-(${B}) * 3 / pi`,
);
export const fSigmaI = stress(
  'sigma-I',
  'Stress at point I',
  'σ_I',
  `-(${B}) * (K4 * K2 * ${m} + K3)`,
);
export const fSigmaII = stress(
  'sigma-II',
  'Stress at point II',
  'σ_II',
  `-(${B}) * (K4 * K2 * ${m} - K3)`,
);
export const fSigmaIII = stress(
  'sigma-III',
  'Stress at point III',
  'σ_III',
  `-(${B}) / d * (K4 * (K2 - 2 * K3) * ${m} - K3)`,
);
export const fSigmaIV = stress(
  'sigma-IV',
  'Stress at point IV',
  'σ_IV',
  `-(${B}) / d * (K4 * (K2 - 2 * K3) * ${m} + K3)`,
);
