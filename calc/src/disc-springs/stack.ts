import {
  discConstants,
  discForce,
  discForceAt,
  type DiscConstants,
  type DiscSpring,
} from './disc.js';

/**
 * A stack of `seriesCount` sets in series, each set of `parallelCount` discs nested in parallel.
 * Friction coefficients per DIN EN 16984 (stacks with friction): wM at the cone surfaces between
 * nested discs, wR at the load-bearing edges. Typical values (recalled from the standard's
 * table, confidence: memory): series A wM 0.02–0.03, wR 0.03–0.05; series B wM 0.015–0.025,
 * wR 0.02–0.04; series C wM 0.01–0.015, wR 0.01–0.03.
 */
export interface DiscStack {
  disc: DiscSpring;
  /** i: sets in series (≥ 1). */
  seriesCount: number;
  /** n: discs nested in parallel in each set (≥ 1). */
  parallelCount: number;
  /** wM: friction factor between nested discs (0 ≤ wM < 0.2). */
  frictionCone: number;
  /** wR: friction factor at the load edges (0 ≤ wR < 0.2). */
  frictionEdge: number;
}

/** Stack forces at one deflection of each set, N. */
export interface StackForces {
  /** n·F(s) without friction. */
  nominal: number;
  /** n·F(s) / (1 − wM·(n−1) − wR): the force while compressing. */
  loading: number;
  /** n·F(s) / (1 + wM·(n−1) + wR): the force while releasing. */
  unloading: number;
}

/**
 * Forces of a stack at per-set deflection s (DIN EN 16984, stack with friction; memory for the
 * exact form of the denominator). Parallel discs add force; series sets share the travel.
 */
export function stackForces(
  st: DiscStack,
  s: number,
  c: DiscConstants = discConstants(st.disc),
): StackForces {
  const nominal = st.parallelCount * discForce(st.disc, s, c);
  const w = frictionFactor(st);
  return { nominal, loading: nominal / (1 - w), unloading: nominal / (1 + w) };
}

/**
 * The unloading force of stackForces as a function of s alone, for searches that evaluate it
 * hundreds of times (same doubles, without building the three forces at every point).
 */
export function stackUnloadingAt(
  st: DiscStack,
  c: DiscConstants = discConstants(st.disc),
): (s: number) => number {
  const force = discForceAt(st.disc, c);
  const w = frictionFactor(st);
  return (s) => (st.parallelCount * force(s)) / (1 + w);
}

/** wM·(n − 1) + wR: the friction share of the stack force. */
function frictionFactor(st: DiscStack): number {
  return st.frictionCone * (st.parallelCount - 1) + st.frictionEdge;
}

/** Free length L0 = i·(l0 + (n−1)·t), m (t′ for group 3). */
export function stackFreeLength(st: DiscStack, c: DiscConstants = discConstants(st.disc)): number {
  return st.seriesCount * (st.disc.l0 + (st.parallelCount - 1) * c.tCalc);
}

/** Flat (solid) length Lc = i·n·t, m (t′ for group 3). */
export function stackFlatLength(st: DiscStack, c: DiscConstants = discConstants(st.disc)): number {
  return st.seriesCount * st.parallelCount * c.tCalc;
}

/** Total stack travel from free to flat, i·h0, m. */
export function stackTravelToFlat(
  st: DiscStack,
  c: DiscConstants = discConstants(st.disc),
): number {
  return st.seriesCount * c.h0;
}
