import { defineFormula } from '../core/step.js';

/**
 * Stack, back-off and length relations as step-builder formulas (SI values); the same relations
 * as stack.ts and back-off.ts (stack-derivation.test.ts checks they agree).
 */
const REF = 'DIN EN 16984 (formerly DIN 2092), single disc spring, Almen–László';
const REF_STACK =
  'DIN EN 16984 (formerly DIN 2092), stacks with friction (form recalled from memory)';
const REF_BACKOFF =
  'thread geometry Δ = P·θ/360° (ISO 261 pitch); flat-then-back-off is common practice, no published source';

const L = { dimension: 'length' } as const;
const R = { dimension: 'dimensionless' } as const;
const F = { dimension: 'force' } as const;

/** The back-off in turns of the nut: what the fitter counts, and what the lead multiplies. */
export const fTurns = defineFormula({
  id: 'turns',
  label: 'Back-off in turns of the nut',
  symbol: 'n_θ',
  expression: 'theta / (2 * pi)',
  symbols: { theta: { text: 'θ', dimension: 'angle' } },
  dimension: 'dimensionless',
  reference: REF_BACKOFF,
});

export const fRelease = defineFormula({
  id: 'release',
  label: 'Axial release of the back-off',
  symbol: 'Δ',
  expression: 'Pt * n',
  symbols: { Pt: { text: 'P', ...L }, n: { text: 'n_θ', dimension: 'dimensionless' } },
  dimension: 'length',
  reference: REF_BACKOFF,
});

export const fSetDeflection = defineFormula({
  id: 'set-deflection',
  label: 'Deflection of each set after back-off',
  symbol: 's',
  expression: 'max(h0 - D / i, 0)',
  symbols: { h0: { text: 'h₀', ...L }, D: { text: 'Δ', ...L }, i: { text: 'i', ...R } },
  dimension: 'length',
  reference: REF_BACKOFF + '; rigid bolt, nut and frame assumed',
});

export const fStackNominal = defineFormula({
  id: 'stack-force',
  label: 'Stack force without friction',
  symbol: 'F_ges',
  expression: 'n * F1',
  symbols: { n: { text: 'n', ...R }, F1: { text: 'F', ...F } },
  dimension: 'force',
  reference: REF + '; parallel discs add force',
});

const frictionSymbols = {
  Fn: { text: 'F_ges', ...F },
  wM: { text: 'w_M', ...R },
  wR: { text: 'w_R', ...R },
  n: { text: 'n', ...R },
};

export const fStackLoading = defineFormula({
  id: 'stack-force-loading',
  label: 'Stack force while loading (friction)',
  symbol: 'F_R,load',
  expression: 'Fn / (1 - (wM * (n - 1) + wR))',
  symbols: frictionSymbols,
  dimension: 'force',
  reference: REF_STACK,
});

export const fStackUnloading = defineFormula({
  id: 'stack-force-unloading',
  label: 'Stack force while unloading (friction)',
  symbol: 'F_R,unload',
  expression: 'Fn / (1 + wM * (n - 1) + wR)',
  symbols: frictionSymbols,
  dimension: 'force',
  reference: REF_STACK,
});

export const fFreeLength = defineFormula({
  id: 'free-length',
  label: 'Free length of the stack',
  symbol: 'L₀',
  expression: 'i * (l0 + (n - 1) * t)',
  symbols: {
    i: { text: 'i', ...R },
    n: { text: 'n', ...R },
    l0: { text: 'l₀', ...L },
    t: { text: 't', ...L },
  },
  dimension: 'length',
  reference: REF,
});

export const fFlatLength = defineFormula({
  id: 'flat-length',
  label: 'Flat (solid) length of the stack',
  symbol: 'L_c',
  expression: 'i * n * t',
  symbols: { i: { text: 'i', ...R }, n: { text: 'n', ...R }, t: { text: 't', ...L } },
  dimension: 'length',
  reference: REF,
});

export const fSetLength = defineFormula({
  id: 'set-length',
  label: 'Stack length at the set point',
  symbol: 'L₁',
  expression: 'L0 - i * s',
  symbols: { L0: { text: 'L₀', ...L }, i: { text: 'i', ...R }, s: { text: 's', ...L } },
  dimension: 'length',
  reference: 'geometry',
});

export const fRatio = defineFormula({
  id: 'set-ratio',
  label: 'Set deflection as a fraction of h0',
  symbol: 's/h₀',
  expression: 's / h0',
  symbols: { s: { text: 's', ...L }, h0: { text: 'h₀', ...L } },
  dimension: 'dimensionless',
  reference: 'definition',
});
