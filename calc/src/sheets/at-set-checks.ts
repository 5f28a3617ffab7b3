import type { CheckResult, CriteriaSet } from '../core/types.js';
import type { Derivation } from '../core/step.js';
import { criterion } from '../criteria/lookup.js';
import { maxSetDelay, overspeedChecks } from '../stopping/overspeed.js';
import * as q from '../units/quantities.js';
import { makeCheck, sheetCheck } from './checks.js';
import { fasterSetHint, type Releaser } from './set-delay-fields.js';

/** Speeds of a sheet with a set delay, all on the brake shaft except the motor's rating. */
export interface OverspeedAtSetInput {
  /** Brake-shaft speed when the brake sets (the highest of the stop), rad/s. */
  setSpeed: number;
  /** Brake-shaft speed at power off, rad/s. */
  brakeSpeed: number;
  /** Motor speed ÷ brake-shaft speed (1 when the brake sits on the motor shaft). */
  motorRatio: number;
  /** Motor maker's maximum permissible speed, rad/s. */
  motorMaxSpeed: number;
  /** Brake-shaft acceleration during the set delay α_d, rad/s². */
  delayAcceleration: number;
  /** What releases the brake: named in the advice on a failed check. */
  releaser: Releaser;
}

/**
 * Motor overspeed at the speed the brake sets with (section 'stopping'), and the longest set
 * delay before the motor reaches its maximum speed while the load keeps driving. One piece for
 * every sheet with a set delay, so the shoe and caliper sheets print the same steps.
 */
export function overspeedAtSet(input: OverspeedAtSetInput, d: Derivation): CheckResult[] {
  d.section = 'stopping';
  const r = overspeedChecks(
    {
      setSpeed: q.angularSpeed(input.setSpeed),
      motorRatio: q.ratio(input.motorRatio),
      motorMaxSpeed: q.angularSpeed(input.motorMaxSpeed),
    },
    d,
  );
  const alpha = input.delayAcceleration;
  const maxAtBrake = input.motorMaxSpeed / input.motorRatio;
  // A vanishing α_d (no driving torque worth the name) sets no limit on the delay: skip the step
  // rather than print an infinity.
  if (
    alpha > 0 &&
    maxAtBrake > input.brakeSpeed &&
    Number.isFinite((maxAtBrake - input.brakeSpeed) / alpha)
  ) {
    maxSetDelay(
      q.angularSpeed(input.brakeSpeed),
      q.angularSpeed(maxAtBrake),
      q.angularAcceleration(alpha),
      d,
    );
  }
  return r.checks.map((c) => sheetCheck(c, 'stopping', fasterSetHint(input.releaser)));
}

/** p·v at the speed the brake sets with against the criteria set's limit (section 'lining'). */
export function pvAtSetCheck(pv: number, criteria: CriteriaSet): CheckResult {
  const pvLimit = criterion(criteria, 'pvLimit');
  return makeCheck({
    id: 'pv',
    section: 'lining',
    label: 'p·v when the brake sets ≤ limit',
    value: pv,
    limit: pvLimit.value,
    kind: 'max',
    dimension: 'pv',
    source: pvLimit.source,
  });
}
