/**
 * Student's t distribution: the cumulative probability and its inverse, for the confidence and
 * prediction intervals of a straight-line fit. Pure numerics, no units.
 *
 * Method: P(T ≤ t) = ½ + ½·I_y(½, ν/2) with y = t²/(ν + t²) for t ≥ 0, where I_x is the regularised
 * incomplete beta function evaluated by its continued fraction (modified Lentz; Press et al.,
 * Numerical Recipes, 3rd ed., §6.4) and ln Γ by Stirling's series (Abramowitz & Stegun 6.1.40);
 * both recalled from memory and checked in the tests against closed forms. The quantile is found by bisection on the CDF, which is
 * monotone, so it cannot fail to converge.
 */

/** ln Γ(z) for z > 0: Stirling's series after shifting z above 10 (Γ(z + 1) = z·Γ(z)). */
export function lnGamma(z: number): number {
  let shift = 0;
  while (z < 10) {
    shift += Math.log(z);
    z += 1;
  }
  const z2 = 1 / (z * z);
  // Stirling series to the z⁻⁹ term; the next term is below 1e-17 for z ≥ 10.
  const series =
    (1 / z) * (1 / 12 - z2 * (1 / 360 - z2 * (1 / 1260 - z2 * (1 / 1680 - z2 / 1188))));
  return (z - 0.5) * Math.log(z) - z + 0.5 * Math.log(2 * Math.PI) + series - shift;
}

/** Continued fraction of the incomplete beta function (modified Lentz). */
function betaContinuedFraction(a: number, b: number, x: number): number {
  const tiny = 1e-300;
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  if (Math.abs(d) < tiny) d = tiny;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= 300; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((a + m2 - 1) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + m2 + 1));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < 1e-15) break;
  }
  return h;
}

/** Regularised incomplete beta function I_x(a, b), 0 ≤ x ≤ 1. */
export function regularisedBeta(x: number, a: number, b: number): number {
  if (x <= 0) return 0;
  if (x >= 1) return 1;
  const front = Math.exp(
    lnGamma(a + b) - lnGamma(a) - lnGamma(b) + a * Math.log(x) + b * Math.log(1 - x),
  );
  // The continued fraction converges fast only on one side of the mean; use the symmetry otherwise.
  if (x < (a + 1) / (a + b + 2)) return (front * betaContinuedFraction(a, b, x)) / a;
  return 1 - (front * betaContinuedFraction(b, a, 1 - x)) / b;
}

/** P(T ≤ t) for Student's t with ν degrees of freedom. */
export function studentTCdf(t: number, dof: number): number {
  // P(|T| ≤ t) = I_y(½, ν/2) with y = t²/(ν + t²); computing y directly (not 1 − ν/(ν + t²))
  // keeps small t accurate.
  const y = (t * t) / (dof + t * t);
  const central = 0.5 * regularisedBeta(y, 0.5, dof / 2);
  return t >= 0 ? 0.5 + central : 0.5 - central;
}

/** The t with P(T ≤ t) = p, for 0.5 ≤ p < 1 and ν ≥ 1 degrees of freedom. */
export function studentTQuantile(p: number, dof: number): number {
  if (!(p >= 0.5 && p < 1) || !(dof >= 1)) {
    throw new RangeError(`t quantile needs 0.5 ≤ p < 1 and ν ≥ 1 (got p = ${p}, ν = ${dof})`);
  }
  let lo = 0;
  let hi = 1;
  while (studentTCdf(hi, dof) < p) hi *= 2;
  for (let i = 0; i < 200 && hi - lo > 1e-13 * hi; i++) {
    const mid = (lo + hi) / 2;
    if (studentTCdf(mid, dof) < p) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}
