import { Derivation } from '../core/step.js';
import { backOffAngleForPreload } from './back-off.js';
import { discConstants, type DiscConstants } from './disc.js';
import * as fd from './formulas.js';
import * as fs from './formulas-stack.js';

const f = { ...fd, ...fs };
import type { DiscStack } from './stack.js';
import { validateStack } from './validate.js';

/** Everything computed for one stack set by "flat, then back off θ". Values SI. */
export interface StackSetResult {
  constants: DiscConstants;
  h0: number;
  release: number;
  setDeflection: number;
  setRatio: number;
  slack: boolean;
  discForce: number;
  flatForce: number;
  stackNominal: number;
  stackLoading: number;
  stackUnloading: number;
  /** Stack force at flat (loading branch): what the nut sees at the "flat" datum. */
  flatStackLoading: number;
  stresses: { OM: number; I: number; II: number; III: number; IV: number };
  /** σOM at flat (s = h0), the static-load stress check value. */
  sigmaOMFlat: number;
  freeLength: number;
  flatLength: number;
  setLength: number;
  /** Back-off angle (rad) for a required preload, when one is asked and reachable. */
  angleForRequired?: number;
}

export interface StackSetInput {
  stack: DiscStack;
  /** Thread lead P, m. */
  lead: number;
  /** Back-off angle θ, rad. */
  angle: number;
  /** Optional required preload (unloading force), N, for the inverse. */
  requiredPreload?: number;
}

/**
 * Evaluates one stack set by tightening flat and backing off, recording every value as a
 * derivation step (ids prefixed with `prefix`, e.g. 'a-'). Validates first (CalcInputError).
 */
export function deriveStackSet(input: StackSetInput, d: Derivation, prefix = ''): StackSetResult {
  validateStack(input.stack);
  const { stack, lead, angle } = input;
  const disc = stack.disc;
  const o = (id: string) => ({ id: prefix + id });
  const delta = d.step(f.fDelta, { De: disc.De, Di: disc.Di }, o('delta'));
  const K1 = d.step(f.fK1, { d: delta }, o('K1'));
  const K2 = d.step(f.fK2, { d: delta }, o('K2'));
  const K3 = d.step(f.fK3, { d: delta }, o('K3'));
  const c = discConstants(disc);
  let K4 = 1;
  if (c.K4 !== 1) {
    const g = { tr: c.tCalc, t: disc.t, l0: disc.l0 };
    const C1 = d.step(f.fC1, g, o('C1'));
    const C2 = d.step(f.fC2, { C1, ...g }, o('C2'));
    K4 = d.step(f.fK4, { C1, C2 }, o('K4'));
  }
  const t = c.tCalc;
  const h0 = d.step(f.fH0, { l0: disc.l0, t }, o('h0'));
  const release = d.step(f.fRelease, { Pt: lead, theta: angle }, o('release'));
  const i = stack.seriesCount;
  const n = stack.parallelCount;
  const s = d.step(f.fSetDeflection, { h0, D: release, i }, o('set-deflection'));
  const setRatio = d.step(f.fRatio, { s, h0 }, o('set-ratio'));
  const base = { E: disc.E, nu: disc.nu, t, K1, K4, De: disc.De, h0 };
  const F1 = d.step(f.fDiscForce, { ...base, s }, o('disc-force'));
  const Fc = d.step(
    f.fDiscForce,
    { ...base, s: h0 },
    {
      ...o('flat-force'),
      label: 'Flat load of one disc (s = h₀)',
      symbol: 'F_c',
    },
  );
  const Fn = d.step(f.fStackNominal, { n, F1 }, o('stack-force'));
  const fr = { Fn, wM: stack.frictionCone, wR: stack.frictionEdge, n };
  const Fload = d.step(f.fStackLoading, fr, o('stack-force-loading'));
  const Funload = d.step(f.fStackUnloading, fr, {
    ...o('preload'),
    label: 'Preload after back-off (stack unloading, with friction)',
    symbol: 'F_V',
  });
  const flatNominal = n * Fc;
  const flatStackLoading = d.step(
    f.fStackLoading,
    { ...fr, Fn: flatNominal },
    {
      ...o('flat-stack-force'),
      label: 'Stack force at flat while tightening',
      symbol: 'F_c,load',
    },
  );
  const sv = { ...base, K2, K3, d: delta, s };
  const OM = d.step(f.fSigmaOM, sv, o('sigma-OM'));
  const I = d.step(f.fSigmaI, sv, o('sigma-I'));
  const II = d.step(f.fSigmaII, sv, o('sigma-II'));
  const III = d.step(f.fSigmaIII, sv, o('sigma-III'));
  const IV = d.step(f.fSigmaIV, sv, o('sigma-IV'));
  const sigmaOMFlat = d.step(
    f.fSigmaOM,
    { ...sv, s: h0 },
    {
      ...o('sigma-OM-flat'),
      label: 'Stress OM at flat (s = h₀)',
      symbol: 'σ_OM,c',
    },
  );
  const L0 = d.step(f.fFreeLength, { i, n, l0: disc.l0, t }, o('free-length'));
  const Lc = d.step(f.fFlatLength, { i, n, t }, o('flat-length'));
  const L1 = d.step(f.fSetLength, { L0, i, s }, o('set-length'));
  let angleForRequired: number | undefined;
  if (input.requiredPreload !== undefined && input.requiredPreload > 0) {
    const deg = backOffAngleForPreload(stack, lead, input.requiredPreload, c);
    angleForRequired = deg === undefined ? undefined : (deg * Math.PI) / 180;
  }
  return {
    constants: c,
    h0,
    release,
    setDeflection: s,
    setRatio,
    slack: release >= i * h0,
    discForce: F1,
    flatForce: Fc,
    stackNominal: Fn,
    stackLoading: Fload,
    stackUnloading: Funload,
    flatStackLoading,
    stresses: { OM, I, II, III, IV },
    sigmaOMFlat,
    freeLength: L0,
    flatLength: Lc,
    setLength: L1,
    angleForRequired,
  };
}
