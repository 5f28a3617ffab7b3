import { compute, Derivation } from '../core/step.js';
import { limitCheck, type LimitCheck } from '../core/limit-check.js';
import { requireRange } from '../units/parse.js';
import type { Pressure } from '../units/quantities.js';
import { discConstants, type DiscSpring } from './disc.js';
import { fSigmaOM } from './formulas.js';
import { validateDisc } from './validate.js';

/**
 * Static-load limit for |σOM| at flat. From memory, not checked against the standard text: DIN EN
 * 16984 (formerly DIN 2092) guidance for statically or quasi-statically loaded disc springs is
 * that the calculated σOM with the disc pressed flat should not exceed about the tensile strength
 * of the material, ≈ 1600 N/mm² for spring steel. The 0.15–0.75·h0 working band is the rule for
 * fatigue-loaded discs, not this one. The maker's data and the governing standard decide.
 */
export const SIGMA_OM_FLAT_STATIC_LIMIT = {
  value: 1600e6,
  source:
    "from memory: DIN EN 16984 (formerly DIN 2092) guidance for statically loaded disc springs, |σOM| at flat ≲ Rm ≈ 1600 N/mm² for spring steel — check the governing standard and the maker's data",
};

export interface StaticDiscResult {
  /** σOM with the disc pressed flat (s = h0), Pa (negative = compression). */
  sigmaOMFlat: Pressure;
  check: LimitCheck;
}

/**
 * Static check of one disc spring (or every disc of a stack — each disc reaches flat when the
 * stack is tightened flat): σOM = −4E/(1−ν²)·t²/(K1·De²)·K4·(s/t)·3/π at s = h0, and
 * |σOM| ≤ the static limit. This is the check that applies to statically loaded stacks such as a
 * shoe holder or an equaliser set flat then backed off; it replaces the fatigue working band.
 *
 * Source: σOM per DIN EN 16984 (formerly DIN 2092), Almen–László (formulas.ts); limit from memory
 * (SIGMA_OM_FLAT_STATIC_LIMIT) unless the criteria set or maker gives one.
 * @example staticDiscCheck({ De: 0.04, Di: 0.0204, t: 0.0015, l0: 0.00265, E: 206e9, nu: 0.3 })
 *   .sigmaOMFlat // ≈ −1.36e9 Pa
 */
export function staticDiscCheck(
  disc: DiscSpring,
  d?: Derivation,
  limit: { value: number; source: string } = SIGMA_OM_FLAT_STATIC_LIMIT,
  prefix = '',
): StaticDiscResult {
  validateDisc(disc);
  requireRange(limit.value, 'sigmaOMLimit', { min: 0, exclusiveMin: true }, 'Pa');
  const c = discConstants(disc);
  const sigmaOMFlat = compute(
    d,
    fSigmaOM,
    {
      E: disc.E,
      nu: disc.nu,
      t: c.tCalc,
      K1: c.K1,
      K2: c.K2,
      K3: c.K3,
      K4: c.K4,
      De: disc.De,
      h0: c.h0,
      s: c.h0,
      d: c.delta,
    },
    {
      id: `${prefix}sigma-OM-flat`,
      label: 'Stress σOM with the disc pressed flat (s = h₀)',
      symbol: 'σ_OM,c',
    },
  );
  const check = limitCheck({
    id: `${prefix}sigma-om-flat-static`,
    label: 'Disc spring |σOM| at flat ≤ static-load limit',
    value: Math.abs(sigmaOMFlat),
    limit: limit.value,
    dimension: 'pressure',
    kind: 'max',
    source: limit.source,
  });
  return { sigmaOMFlat, check };
}
