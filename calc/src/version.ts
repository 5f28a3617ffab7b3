/**
 * Version of the calculation core; stored with every evaluated revision (semver).
 * 1.1.0: rubbing speed and p·v are checked at the speed the brake sets with (the load speeds up
 * during the set delay); the stop of an overhauling load takes no gear-loss credit (η_bd input,
 * default 1), and the shoe sheets default to the short-shoe torque, so stopping distance, stop
 * energy and temperatures rise; the peak bulk temperature is held to the lining's operating
 * limit; service and emergency stops per hour are entered apart. New checks: motor overspeed,
 * drive train at μ max with the spring at the top of its range (replaces the check at the set
 * force), spring travel ratio against the lever ratio, caliper torque/speed/inertia consistency.
 */
export const CORE_VERSION = '1.1.0';
