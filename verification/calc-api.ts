/**
 * The calculation-core functions the cases call, imported from the calc sources (one module graph,
 * so the branded quantity types agree and no stale dist can be verified by mistake).
 */
export * as discSprings from '../calc/src/disc-springs/index.js';
export { toSI, fromSI } from '../calc/src/units/conversion.js';
export {
  length,
  force,
  torque,
  power,
  speed,
  angularSpeed,
  mass,
  inertia,
  pressure,
  energy,
  time,
  ratio,
  degrees,
  rpm,
  stiffness,
  specificHeat,
  angle,
  angularAcceleration,
  pv,
} from '../calc/src/units/quantities.js';
export { CORE_VERSION } from '../calc/src/version.js';
export {
  shoeMomentCoefficients,
  shoeFromActuatingForce,
  actuatingForce,
} from '../calc/src/shoe-brake/general-shoe.js';
export {
  pivotDistance,
  pivotedNormalForce,
  pivotedShoeTorque,
} from '../calc/src/shoe-brake/pivoted-shoe.js';
export { shortShoeTorque } from '../calc/src/shoe-brake/short-shoe.js';
export {
  caliperTorque,
  uniformWearRadius,
  uniformPressureRadius,
} from '../calc/src/disc-brake/caliper.js';
export { bandBrake } from '../calc/src/band-brake/band.js';
export { rotatingEnergy, linearEnergy, potentialEnergy } from '../calc/src/energy/stop-energy.js';
export { temperatureRise } from '../calc/src/energy/heat.js';
export { stopping } from '../calc/src/stopping/stopping.js';
export { tenPercentStoppingDistance } from '../calc/src/stopping/limits.js';
export { hoistLoadTorques, hoistLoadSpeed } from '../calc/src/duty/hoist-load.js';
export { motorRatedTorque } from '../calc/src/duty/motor-torque.js';
export { referRotatingInertia, referLinearMass } from '../calc/src/duty/referral.js';
export { requiredBrakeTorque } from '../calc/src/duty/required-torque.js';
export { releaseAndStroke } from '../calc/src/release/release.js';
export { springLength } from '../calc/src/spring-setting/setting-table.js';

/** Unit helpers for cases: SI ↔ source units. */
export const IN = 0.0254;
export const LBF = 4.4482216152605;
export const PSI = LBF / (IN * IN);
export const MM = 1e-3;
export { discSpringStackSheet } from '../calc/src/sheets/disc-spring-stack.js';
export { speedAtSet } from '../calc/src/stopping/speed-at-set.js';
export { overspeedChecks, maxSetDelay } from '../calc/src/stopping/overspeed.js';
export { driveTrainOverload } from '../calc/src/duty/drive-train-overload.js';
export { loadConsistency } from '../calc/src/duty/load-consistency.js';
export { travelRatioCheck } from '../calc/src/shoe-brake/travel-ratio.js';
export { compressionSpring } from '../calc/src/helical-spring/compression-spring.js';
export { strokeWearChain, torqueWearPoints } from '../calc/src/release/stroke-wear.js';
export { holdingBrakeRedundancy } from '../calc/src/duty/redundancy.js';
export {
  leverBending,
  pinStrength,
  shoePinLoad,
  baseBoltTension,
} from '../calc/src/levers/lever-strength.js';
