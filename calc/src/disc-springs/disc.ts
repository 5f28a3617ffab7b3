import { diameterRatio, k1, k2, k3, k4 } from './factors.js';

/**
 * One disc spring in SI units (m, Pa). `tReduced` is the reduced thickness t′ of a group 3 disc
 * with contact flats (DIN EN 16983 / DIN 2093 list it beside the nominal t); leave it undefined
 * for groups 1 and 2.
 */
export interface DiscSpring {
  /** Outer diameter De, m. */
  De: number;
  /** Inner diameter Di, m (0 < Di < De). */
  Di: number;
  /** Nominal thickness t, m. */
  t: number;
  /** Free overall height l0 (thickness plus cone height), m (> t). */
  l0: number;
  /** Reduced thickness t′ of a group 3 disc with contact flats, m (< t). */
  tReduced?: number;
  /** Young's modulus E, Pa (tables: 206 000 N/mm²). */
  E: number;
  /** Poisson's ratio ν (tables: 0.3). */
  nu: number;
}

/** Derived constants of a disc, computed once and reused for every deflection. */
export interface DiscConstants {
  delta: number;
  K1: number;
  K2: number;
  K3: number;
  K4: number;
  /** Thickness used in the relations: t′ for group 3, otherwise t. */
  tCalc: number;
  /** Cone height used in the relations and the deflection to flat: l0 − t′ (group 3) or l0 − t. */
  h0: number;
  /** 4E/(1−ν²), Pa. */
  modulusTerm: number;
  /** Group per DIN EN 16983 by nominal thickness: 1 (t < 1.25 mm), 2 (≤ 6 mm), 3 (> 6 mm). */
  group: 1 | 2 | 3;
}

/** Steel values used by the DIN 2093 / DIN EN 16983 tables. */
export const TABLE_STEEL = { E: 206e9, nu: 0.3 } as const;

/** Computes δ, K1…K4, the effective thickness and cone height of a disc. */
export function discConstants(d: DiscSpring): DiscConstants {
  const delta = diameterRatio(d.De, d.Di);
  const reduced = d.tReduced !== undefined && d.tReduced < d.t;
  const tCalc = reduced ? (d.tReduced as number) : d.t;
  const group = d.t < 1.25e-3 ? 1 : d.t <= 6e-3 ? 2 : 3;
  return {
    delta,
    K1: k1(delta),
    K2: k2(delta),
    K3: k3(delta),
    K4: reduced ? k4(d.t, tCalc, d.l0) : 1,
    tCalc,
    h0: d.l0 - tCalc,
    modulusTerm: (4 * d.E) / (1 - d.nu * d.nu),
    group,
  };
}

/**
 * Force of one disc at deflection s (DIN EN 16984, Almen–László):
 * F = 4E/(1−ν²) · t⁴/(K1·De²) · K4² · (s/t) · [K4²·(h0/t − s/t)·(h0/t − s/(2t)) + 1]
 * with t → t′ and h0 → l0 − t′ for group 3.
 * @param s deflection of the disc, m (0 ≤ s ≤ h0)
 * @returns force, N
 */
export function discForce(d: DiscSpring, s: number, c: DiscConstants = discConstants(d)): number {
  const t = c.tCalc;
  const k44 = c.K4 * c.K4;
  return almenLaszlo((c.modulusTerm * t ** 4) / (c.K1 * d.De * d.De), k44, c.h0 / t, s / t);
}

/**
 * discForce as a function of s alone, with the factors that do not depend on s worked out once:
 * for searches and curves that evaluate the force of one disc hundreds of times. Same doubles
 * as discForce (the same operations in the same order).
 */
export function discForceAt(
  d: DiscSpring,
  c: DiscConstants = discConstants(d),
): (s: number) => number {
  const t = c.tCalc;
  const k44 = c.K4 * c.K4;
  const scale = (c.modulusTerm * t ** 4) / (c.K1 * d.De * d.De);
  const ht = c.h0 / t;
  return (s) => almenLaszlo(scale, k44, ht, s / t);
}

/** F from its parts: scale = 4E/(1−ν²)·t⁴/(K1·De²), ht = h0/t, st = s/t. */
function almenLaszlo(scale: number, k44: number, ht: number, st: number): number {
  return scale * k44 * st * (k44 * (ht - st) * (ht - st / 2) + 1);
}

/** Flat load F_c = F(h0), N. */
export function discFlatForce(d: DiscSpring, c: DiscConstants = discConstants(d)): number {
  return discForce(d, c.h0, c);
}

/**
 * Stiffness dF/ds of one disc at s (derivative of the force relation), N/m.
 * Negative beyond the force maximum of discs with K4·h0/t > √2.
 */
export function discStiffness(
  d: DiscSpring,
  s: number,
  c: DiscConstants = discConstants(d),
): number {
  const t = c.tCalc;
  const ht = c.h0 / t;
  const st = s / t;
  const k44 = c.K4 * c.K4;
  const pre = ((c.modulusTerm * t ** 3) / (c.K1 * d.De * d.De)) * k44;
  return pre * (k44 * (ht * ht - 3 * ht * st + 1.5 * st * st) + 1);
}

/** Calculated stresses of one disc at deflection s, Pa (negative = compression). */
export interface DiscStresses {
  sigmaOM: number;
  sigmaI: number;
  sigmaII: number;
  sigmaIII: number;
  sigmaIV: number;
}

/**
 * Stresses at the points OM, I, II, III, IV (DIN EN 16984):
 * B = 4E/(1−ν²)·t²/(K1·De²)·K4·s/t, m = h0/t − s/(2t);
 * σOM = −B·3/π; σI = −B·(K4·K2·m + K3); σII = −B·(K4·K2·m − K3);
 * σIII = −(B/δ)·(K4·(K2 − 2K3)·m − K3); σIV = −(B/δ)·(K4·(K2 − 2K3)·m + K3).
 */
export function discStresses(
  d: DiscSpring,
  s: number,
  c: DiscConstants = discConstants(d),
): DiscStresses {
  const t = c.tCalc;
  const B = ((c.modulusTerm * t * t) / (c.K1 * d.De * d.De)) * c.K4 * (s / t);
  const m = c.h0 / t - s / (2 * t);
  const k = c.K2 - 2 * c.K3;
  return {
    sigmaOM: (-B * 3) / Math.PI,
    sigmaI: -B * (c.K4 * c.K2 * m + c.K3),
    sigmaII: -B * (c.K4 * c.K2 * m - c.K3),
    sigmaIII: (-B / c.delta) * (c.K4 * k * m - c.K3),
    sigmaIV: (-B / c.delta) * (c.K4 * k * m + c.K3),
  };
}
