import type { CheckResult } from '../core/types.js';
import { holdingBrakeRedundancy, type RedundancyBrake } from '../duty/redundancy.js';
import * as q from '../units/quantities.js';
import { flag } from './field-builders.js';
import { makeCheck } from './checks.js';
import { toDisplay } from '../units/display.js';

/** Service inputs that decide how many holding brakes the hoisting unit needs. */
export const HOIST_SERVICE_FIELDS = [
  flag(
    'duty',
    'hotMetal',
    'The hoist handles hot metal (molten material)',
    true,
    '29 CFR 1910.179(f)(2)(vi); California Title 8 §4898(h): at least two holding brakes with power control braking.',
  ),
  flag(
    'duty',
    'powerControlBraking',
    'Lowering speed is controlled by power control braking (regenerative, dynamic, eddy current)',
    true,
  ),
] as const;

export interface HoistRedundancyInput {
  hotMetal: boolean;
  powerControlBraking: boolean;
  /** Holding brakes on this hoisting unit (2 for the arrangement "two"). */
  brakesInstalled: number;
  brake: RedundancyBrake;
  hoistingTorque: number;
  staticTorque: number;
  inertia: number;
  lowerSpeed: number;
  loadSpeed: number;
  setDelay: number;
  stoppingDistanceLimit: number;
  driveTrainRating: number;
}

/**
 * The redundancy checks of the hoist (section 'duty'): brakes installed against what the service
 * requires, and for two brakes each alone and both together. The other brake of a pair is taken
 * as identical to this one (same sheet type, same settings); a different second brake needs its
 * own sheet. The lowering load back-drives the train with no credit for gear losses (η_bd = 1,
 * the conservative value for an emergency stop).
 */
export function hoistRedundancy(r: HoistRedundancyInput): {
  checks: CheckResult[];
  warnings: string[];
} {
  const res = holdingBrakeRedundancy({
    hotMetal: r.hotMetal,
    powerControlBraking: r.powerControlBraking,
    brakes: Array.from({ length: r.brakesInstalled }, () => r.brake),
    hoistingTorque: q.torque(r.hoistingTorque),
    loadTorque: q.torque(r.staticTorque),
    backDrivingEfficiency: q.ratio(1),
    inertia: q.inertia(r.inertia),
    lowerSpeed: q.angularSpeed(r.lowerSpeed),
    loadSpeed: q.speed(r.loadSpeed),
    setDelay: q.time(r.setDelay),
    stoppingDistanceLimit: q.length(r.stoppingDistanceLimit),
    driveTrainRating: q.torque(r.driveTrainRating),
  });
  // With identical brakes the checks of brake 2 repeat those of brake 1: print them once. Both
  // brakes against the drive train is the sheet's own drive-train check (torque-max-friction),
  // made with the higher of the long- and short-shoe torques: not a second, lower figure here.
  const checks = res.checks
    .filter((c) => !c.id.startsWith('brake-2-') || r.brakesInstalled < 2)
    .filter((c) => c.id !== 'brakes-together-drive-train')
    .map((c) =>
      makeCheck({
        ...c,
        id: c.id.replace(/^brake-1-/, 'each-brake-'),
        label: c.label.replace(/^(Stopping distance with )?[Bb]rake 1 alone/, (_m, p?: string) =>
          p ? `${p}one brake alone` : 'Each brake alone',
        ),
        section: 'duty',
        failHint:
          c.id === 'holding-brakes-installed'
            ? 'Set the arrangement to two holding brakes and give each a sheet.'
            : undefined,
      }),
    );
  const warnings =
    res.requiredBrakes === 2
      ? [
          `Governing rules for this service: ${res.rules.join('. ')}. Defer to the governing standard and local code.`,
          'The second holding brake is taken as identical to this one; a different brake needs its own sheet.',
        ]
      : [];
  return { checks, warnings };
}

/** Each brake's stop checks of the redundancy, and the sheet's own stop checks they repeat. */
const SAME_STOP: readonly [each: string, own: string][] = [
  ['each-brake-stops-alone', 'stops-load'],
  ['each-brake-stopping-distance', 'stopping-distance'],
];

/**
 * The redundancy's checks less those the sheet's own stop already makes with the same figures:
 * the sheet works its stop out with this brake alone (its lowest torque in service), so with
 * η_bd = 1 "each brake alone stops the load" is that stop, and printing it twice counted one
 * failure as two. Kept where the figures differ (η_bd below 1 on the sheet's stop).
 */
export function withoutRepeatedStops(
  each: readonly CheckResult[],
  own: readonly CheckResult[],
): { checks: CheckResult[]; notes: string[] } {
  const repeated = new Set<string>();
  for (const [eachId, ownId] of SAME_STOP) {
    const a = each.find((c) => c.id === eachId);
    const b = own.find((c) => c.id === ownId);
    if (a && b && sameFigure(a.value, b.value) && sameFigure(a.limit, b.limit))
      repeated.add(eachId);
  }
  if (repeated.size === 0) return { checks: [...each], notes: [] };
  return {
    checks: each.filter((c) => !repeated.has(c.id)),
    notes: [
      'Each holding brake alone stops the lowering load: the stop on this sheet is worked out with this brake alone (its lowest torque in service, no gear-loss credit), so its checks stand for each brake alone and are not printed twice.',
    ],
  };
}

const sameFigure = (a: number, b: number) => Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(b));

/**
 * The tests the sheet asks for before the brake goes into service, printed with the values of
 * this hoist: the load test (static and dynamic, each brake alone when there are two) and the
 * static torque test after bedding-in.
 */
export function hoistTestRequirements(r: {
  ratedLoad: number;
  requiredTorque: number;
  brakesInstalled: number;
}): string[] {
  // Rounded to 10 kg downwards, so the printed test load never exceeds 125 % of the rated load;
  // the static test torque rounded upwards, so the test never applies less than the required torque.
  const testLoad = Math.floor((1.25 * r.ratedLoad) / 10) * 10;
  const testTorque = Math.ceil(r.requiredTorque);
  // The same figures in US customary units, rounded the same way, for a sheet printed in them
  // (a note is one text for both unit systems).
  const testLoadLb = Math.floor(toDisplay(1.25 * r.ratedLoad, 'mass', 'US', 'lb').value / 10) * 10;
  const testTorqueLbfFt = Math.ceil(toDisplay(r.requiredTorque, 'torque', 'US', 'lbf ft').value);
  const each = r.brakesInstalled > 1 ? ' with each holding brake alone (the other held open)' : '';
  return [
    `Load test before service: test load not more than 125 % of the rated load, here at most ${testLoad} kg (${testLoadLb} lb; 29 CFR 1910.179(k)(2), from memory; ASME B30.2 states the same limit, from memory). Static: hold the test load clear of the ground${each}. Dynamic: stop the rated load lowering at full speed${each} (common practice).`,
    `Static torque test after the linings have bedded in: with the brake set, apply ${testTorque} N·m (${testTorqueLbfFt} lbf·ft; the required torque) at the brake shaft with a torque wrench or lever and weight${each}; the drum must not turn (common practice, no published source).`,
  ];
}
