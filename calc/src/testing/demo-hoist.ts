import { hoistLoadSpeed, hoistLoadTorques } from '../duty/hoist-load.js';
import { inertiaTotal } from '../duty/inertia-sum.js';
import { referLinearMass, referRotatingInertia } from '../duty/referral.js';
import { shoeNormalForce } from '../shoe-brake/shoe-force.js';
import { liningDuty } from '../shoe-brake/lining-duty.js';
import * as q from '../units/quantities.js';

/**
 * The demo hoist shoe brake's default inputs (invented demo data, copied from the hoist sheet's
 * defaults when these tests were written) run through the core's duty and lining functions, so the
 * physics tests can reproduce the figures quoted on the issues without going through a sheet.
 */
export function demoHoist() {
  const omega0 = q.rpm(975);
  const gearRatio = q.ratio(40);
  const drumDiameter = q.length(0.5);
  const reeving = q.ratio(4);
  const load = hoistLoadTorques({
    load: q.mass(10_000),
    hookBlock: q.mass(300),
    drumDiameter,
    reeving,
    gearRatio,
    efficiency: q.ratio(0.88),
  });
  const vL = hoistLoadSpeed(omega0, drumDiameter, reeving, gearRatio);
  const J = inertiaTotal({
    motor: q.inertia(0.45),
    brakeDrum: q.inertia(1.2),
    gear: q.inertia(0.05),
    output: referRotatingInertia(q.inertia(30), q.angularSpeed(omega0 / 40), omega0),
    load: referLinearMass(q.mass(10_300), vL, omega0),
  });
  const N = shoeNormalForce(q.force(1100), q.ratio(2.5), q.ratio(0.95));
  const lining = liningDuty({
    normalForce: N,
    width: q.length(0.15),
    drumDiameter: q.length(0.4),
    contactAngle: q.degrees(70),
    brakeSpeed: omega0,
  });
  return {
    omega0,
    load,
    loadSpeed: vL,
    inertia: J,
    normalForce: N,
    lining,
    drumDiameter: q.length(0.4),
    efficiency: q.ratio(0.88),
    setDelay: q.time(0.3),
    gearRatio,
    /** Pivoted-shoe torque at μ max 0.45 with the set force 1100 N (printed on the demo sheet). */
    torqueMaxAtSetForce: q.torque(499.160612368297),
    springForce: q.force(1100),
    springForceMax: q.force(1600),
    muMax: q.ratio(0.45),
    driveTrainRating: q.torque(1000),
  };
}
