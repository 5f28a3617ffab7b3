import { compute, type Derivation, type StepOptions } from '../core/step.js';
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
/** With `d` undefined only the values are computed (no derivation text: a tolerance end). */
export function deriveStackSet(
  input: StackSetInput,
  d: Derivation | undefined,
  prefix = '',
): StackSetResult {
  validateStack(input.stack);
  const { stack, lead, angle } = input;
  const disc = stack.disc;
  const o = stackStepOptions(prefix);
  const delta = compute(d, f.fDelta, { De: disc.De, Di: disc.Di }, o.delta);
  const K1 = compute(d, f.fK1, { d: delta }, o.K1);
  const K2 = compute(d, f.fK2, { d: delta }, o.K2);
  const K3 = compute(d, f.fK3, { d: delta }, o.K3);
  const c = discConstants(disc);
  let K4 = 1;
  if (c.K4 !== 1) {
    const C1 = compute(d, f.fC1, { tr: c.tCalc, t: disc.t, l0: disc.l0 }, o.C1);
    const C2 = compute(d, f.fC2, { C1, tr: c.tCalc, t: disc.t, l0: disc.l0 }, o.C2);
    K4 = compute(d, f.fK4, { C1, C2 }, o.K4);
  }
  const t = c.tCalc;
  const h0 = compute(d, f.fH0, { l0: disc.l0, t }, o.h0);
  const turns = compute(d, f.fTurns, { theta: angle }, o.turns);
  const release = compute(d, f.fRelease, { Pt: lead, n: turns }, o.release);
  const i = stack.seriesCount;
  const n = stack.parallelCount;
  const s = compute(d, f.fSetDeflection, { h0, D: release, i }, o.setDeflection);
  const setRatio = compute(d, f.fRatio, { s, h0 }, o.setRatio);
  // The value objects below are written out in full rather than spread from a shared base
  // ({ ...base, s }): spreading was a visible share of a sheet's evaluation time.
  const { E, nu, De } = disc;
  const F1 = compute(d, f.fDiscForce, { E, nu, t, K1, K4, De, h0, s }, o.discForce);
  const Fc = compute(d, f.fDiscForce, { E, nu, t, K1, K4, De, h0, s: h0 }, o.flatForce);
  const Fn = compute(d, f.fStackNominal, { n, F1 }, o.stackForce);
  const wM = stack.frictionCone;
  const wR = stack.frictionEdge;
  const fr = { Fn, wM, wR, n };
  const Fload = compute(d, f.fStackLoading, fr, o.stackForceLoading);
  const Funload = compute(d, f.fStackUnloading, fr, o.preload);
  const flatNominal = n * Fc;
  const flatStackLoading = compute(
    d,
    f.fStackLoading,
    { Fn: flatNominal, wM, wR, n },
    o.flatStackForce,
  );
  const sv = { E, nu, t, K1, K4, De, h0, K2, K3, d: delta, s };
  const OM = compute(d, f.fSigmaOM, sv, o.sigmaOM);
  const I = compute(d, f.fSigmaI, sv, o.sigmaI);
  const II = compute(d, f.fSigmaII, sv, o.sigmaII);
  const III = compute(d, f.fSigmaIII, sv, o.sigmaIII);
  const IV = compute(d, f.fSigmaIV, sv, o.sigmaIV);
  const sigmaOMFlat = compute(
    d,
    f.fSigmaOM,
    { E, nu, t, K1, K4, De, h0, K2, K3, d: delta, s: h0 },
    o.sigmaOMFlat,
  );
  const L0 = compute(d, f.fFreeLength, { i, n, l0: disc.l0, t }, o.freeLength);
  const Lc = compute(d, f.fFlatLength, { i, n, t }, o.flatLength);
  const L1 = compute(d, f.fSetLength, { L0, i, s }, o.setLength);
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

/** Step ids (prefixed) and label overrides of a stack set's derivation. */
function stepOptionsFor(prefix: string) {
  const o = (id: string, label?: string, symbol?: string): StepOptions =>
    label === undefined ? { id: prefix + id } : { id: prefix + id, label, symbol };
  return {
    delta: o('delta'),
    K1: o('K1'),
    K2: o('K2'),
    K3: o('K3'),
    C1: o('C1'),
    C2: o('C2'),
    K4: o('K4'),
    h0: o('h0'),
    turns: o('turns'),
    release: o('release'),
    setDeflection: o('set-deflection'),
    setRatio: o('set-ratio'),
    discForce: o('disc-force'),
    flatForce: o('flat-force', 'Flat load of one disc (s = h₀)', 'F_c'),
    stackForce: o('stack-force'),
    stackForceLoading: o('stack-force-loading'),
    preload: o('preload', 'Preload after back-off (stack unloading, with friction)', 'F_V'),
    flatStackForce: o('flat-stack-force', 'Stack force at flat while tightening', 'F_c,load'),
    sigmaOM: o('sigma-OM'),
    sigmaI: o('sigma-I'),
    sigmaII: o('sigma-II'),
    sigmaIII: o('sigma-III'),
    sigmaIV: o('sigma-IV'),
    sigmaOMFlat: o('sigma-OM-flat', 'Stress OM at flat (s = h₀)', 'σ_OM,c'),
    freeLength: o('free-length'),
    flatLength: o('flat-length'),
    setLength: o('set-length'),
  };
}

/**
 * The step options depend only on the prefix, and a program uses a handful of prefixes
 * ('holder-', 'a-', …), so they are built once per prefix instead of on every evaluation (which
 * also hands the derivation the same id strings each time, already hashed for its id index).
 */
const optionsByPrefix = new Map<string, ReturnType<typeof stepOptionsFor>>();
function stackStepOptions(prefix: string): ReturnType<typeof stepOptionsFor> {
  let o = optionsByPrefix.get(prefix);
  if (!o) {
    o = stepOptionsFor(prefix);
    optionsByPrefix.set(prefix, o);
  }
  return o;
}
