import type { CheckResult, CriteriaSet } from '../core/types.js';
import type { StackSetResult } from '../disc-springs/stack-derivation.js';
import { makeCheck } from './checks.js';
import { fmtDeg, workingBandChecks } from './disc-stack-band-checks.js';
import { sigmaOMFlatCheck } from './disc-spring-stack-output.js';

export interface StackCheckInput {
  key: 'a' | 'b';
  section: string;
  title: string;
  /** Required preload, N (0: none asked). */
  required: number;
  /** Back-off tolerance, rad: the fitter may turn this much further, never back. */
  tolerance: number;
  /** The stack at the set angle. */
  r: StackSetResult;
  /** The stack backed off by the whole tolerance more: least deflection, least preload. */
  past: StackSetResult;
  /** The stack backed off by the tolerance less (margin for reading the angle): most deflection. */
  short: StackSetResult;
}

/** The checks of one stack: σOM at flat, the working band at both ends, the preload. */
export function stackChecks(x: StackCheckInput, criteria: CriteriaSet): CheckResult[] {
  const { key, section, title, r, past } = x;
  const plus = `+${fmtDeg(x.tolerance)}°`;
  const checks = [
    sigmaOMFlatCheck(
      key,
      section,
      r.sigmaOMFlat,
      criteria,
      `${title}: stress |σOM| at flat (static load; DIN EN 16983/16984)`,
    ),
    ...workingBandChecks({
      prefix: key,
      section,
      title,
      tolerance: x.tolerance,
      set: r.setRatio,
      short: x.short.setRatio,
      past: past.setRatio,
    }),
  ];
  if (x.required > 0) {
    const preload = (id: string, label: string, value: number) =>
      makeCheck({
        id,
        section,
        label,
        value,
        limit: x.required,
        kind: 'min',
        dimension: 'force',
        source: 'sheet input (required preload)',
        failHint: 'Back off less, or use stiffer discs.',
      });
    // Both ends: a disc with K4·h0/t > √2 gives more force a little off flat than at flat, so
    // backing off further does not always leave less preload.
    checks.push(
      preload(`${key}-preload`, `${title}: preload after back-off ≥ required`, r.stackUnloading),
      preload(
        `${key}-preload-past`,
        `${title}: preload backed off past (${plus}) ≥ required`,
        past.stackUnloading,
      ),
    );
  }
  return checks;
}
