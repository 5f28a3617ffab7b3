/**
 * Version of the calculation core; stored with every evaluated revision (semver).
 * 1.1.0: rubbing speed and p·v are checked at the speed the brake sets with (the load speeds up
 * during the set delay); the stop of an overhauling load takes no credit for gear losses (η_bd,
 * default 1), so stopping distance, stop energy and temperatures rise; new checks: motor overspeed,
 * drive-train torque at μ max with the spring at the top of its range (replaces the check at the
 * set force), spring travel ratio against the lever ratio, caliper torque/speed/inertia consistency.
 */
export const CORE_VERSION = '1.1.0';
