import { discConstants, type DiscConstants } from './disc.js';
import { stackForces, stackUnloadingAt, type DiscStack } from './stack.js';

/**
 * "Tighten until flat, then back off θ" on a single-start thread of lead P (common practice for
 * disc springs under castle nuts and on equaliser shafts; no published source). The axial release
 * Δ = P·θ/360° is shared equally among the i sets in series; bolt, nut and frame are taken as
 * rigid, so each set ends at s = h0 − Δ/i. The stack arrives there while releasing, so the preload
 * is the unloading force with friction.
 */
export interface BackOffResult {
  /** Axial release Δ, m. */
  release: number;
  /** Per-set deflection after backing off, m (0 when the release exceeds the travel to flat). */
  setDeflection: number;
  /** Stack deflection i·s, m. */
  stackDeflection: number;
  forces: ReturnType<typeof stackForces>;
  /** True when Δ ≥ i·h0: the stack is free and carries no preload. */
  slack: boolean;
}

/** Axial release of a single-start thread, Δ = P·θ/360°. @param angleDeg θ in degrees. */
export function threadRelease(lead: number, angleDeg: number): number {
  return (lead * angleDeg) / 360;
}

/** Preload after tightening flat and backing off `angleDeg` on a thread of lead `lead` (m). */
export function backOffPreload(
  st: DiscStack,
  lead: number,
  angleDeg: number,
  c: DiscConstants = discConstants(st.disc),
): BackOffResult {
  const release = threadRelease(lead, angleDeg);
  const raw = c.h0 - release / st.seriesCount;
  const slack = raw <= 0;
  const setDeflection = slack ? 0 : raw;
  return {
    release,
    setDeflection,
    stackDeflection: setDeflection * st.seriesCount,
    forces: stackForces(st, setDeflection, c),
    slack,
  };
}

/**
 * Inverse of {@link backOffPreload}: the back-off angle (degrees) that leaves the stack at the
 * target unloading force. Searches the per-set deflection from flat downward and returns the
 * first crossing, i.e. the smallest angle; for discs with K4·h0/t > √2 the force first rises when
 * backing off from flat, which this handles. Returns undefined when no deflection in [0, h0]
 * gives the target.
 */
export function backOffAngleForPreload(
  st: DiscStack,
  lead: number,
  targetForce: number,
  c: DiscConstants = discConstants(st.disc),
): number | undefined {
  const unloading = stackUnloadingAt(st, c);
  const f = (s: number) => unloading(s) - targetForce;
  const steps = 200;
  let hi = c.h0;
  let fHi = f(hi);
  if (Math.abs(fHi) <= 1e-9 * Math.max(1, targetForce)) return 0;
  for (let k = steps - 1; k >= 0; k--) {
    const lo = (c.h0 * k) / steps;
    const fLo = f(lo);
    if (Math.sign(fLo) !== Math.sign(fHi) || fLo === 0) {
      let a = lo;
      let b = hi;
      let fa = fLo;
      for (let it = 0; it < 80; it++) {
        const m = (a + b) / 2;
        const fm = f(m);
        if (Math.sign(fm) === Math.sign(fa) && fm !== 0) {
          a = m;
          fa = fm;
        } else {
          b = m;
        }
      }
      const s = (a + b) / 2;
      return (360 * st.seriesCount * (c.h0 - s)) / lead;
    }
    hi = lo;
    fHi = fLo;
  }
  return undefined;
}
