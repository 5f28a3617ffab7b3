/**
 * Geometry factors of the Almen–László disc-spring relations as standardised in DIN EN 16984
 * (formerly DIN 2092), clause "Calculation of single disc springs". δ = De/Di.
 *
 * K1 = (1/π)·((δ−1)/δ)² / ((δ+1)/(δ−1) − 2/ln δ)
 * K2 = (6/π)·((δ−1)/ln δ − 1)/ln δ
 * K3 = (3/π)·(δ−1)/ln δ
 *
 * Group 3 (contact flats, reduced thickness t′), per the same standard:
 * C1 = (t′/t)² / [(¼·l0/t − t′/t + ¾)·(⅝·l0/t − t′/t + ⅜)]
 * C2 = C1/(t′/t)³ · [5/32·(l0/t − 1)² + 1]
 * K4 = √(−C1/2 + √((C1/2)² + C2))
 * The K4 relation is recalled from memory of DIN 2092:2006 (confidence: memory, medium); it is
 * checked against the published group-3 rows of DIN 2093 in verification/cases/disc-springs.
 */

/** Diameter ratio δ = De/Di (dimensionless, > 1). */
export function diameterRatio(De: number, Di: number): number {
  return De / Di;
}

/** K1 for δ > 1. @example k1(2) ≈ 0.6943332 */
export function k1(delta: number): number {
  const a = (delta - 1) / delta;
  return ((1 / Math.PI) * a * a) / ((delta + 1) / (delta - 1) - 2 / Math.log(delta));
}

/** K2 for δ > 1. */
export function k2(delta: number): number {
  const L = Math.log(delta);
  return ((6 / Math.PI) * ((delta - 1) / L - 1)) / L;
}

/** K3 for δ > 1. */
export function k3(delta: number): number {
  return ((3 / Math.PI) * (delta - 1)) / Math.log(delta);
}

/**
 * K4 for group 3 discs with contact flats (t′ < t); 1 for groups 1 and 2 (t′ = t gives K4 = 1
 * only approximately, so callers pass K4 = 1 explicitly for groups 1 and 2).
 * @param t nominal thickness, m
 * @param tReduced reduced thickness t′, m
 * @param l0 free overall height of the disc, m
 */
export function k4(t: number, tReduced: number, l0: number): number {
  const r = tReduced / t;
  const lt = l0 / t;
  const c1 = (r * r) / ((0.25 * lt - r + 0.75) * ((5 / 8) * lt - r + 3 / 8));
  const c2 = (c1 / (r * r * r)) * ((5 / 32) * (lt - 1) * (lt - 1) + 1);
  return Math.sqrt(-c1 / 2 + Math.sqrt((c1 / 2) * (c1 / 2) + c2));
}
