/**
 * Version of the calculation core; stored with every evaluated revision (semver).
 * 1.1.0: rubbing speed and p·v are checked at the speed the brake sets with (the load speeds up
 * during the set delay); the stop of an overhauling load takes no gear-loss credit (η_bd input,
 * default 1), and the shoe sheets default to the short-shoe torque, so stopping distance, stop
 * energy and temperatures rise; the peak bulk temperature is held to the lining's operating
 * limit; service and emergency stops per hour are entered apart. New checks: motor overspeed,
 * drive train at μ max with the spring at the top of its range (replaces the check at the set
 * force), spring travel ratio against the lever ratio, caliper torque/speed/inertia consistency.
 * 1.2.0: shoe sheets: the stop and each-brake-alone checks take the lowest torque in service (drum
 * at its wear limit); optional spring relaxation ρ_s lowers every worn case, the stop and the
 * setting band; optional lever, shoe-pin and base-bolt strength at the highest spring setting;
 * lining wear prints to 0.05 mm on the card; a disc-spring stack's back-off tolerance on the card
 * is the sheet's declared one. Derivation lines and check messages are written when first read.
 * Later in 1.2.0, with no number moved: an evaluation lists the criteria values it read
 * (`criteriaUsed`, for the printed design basis); one stored before that has no such list. The
 * efficiency reference now reads for any drive (torque to drive the load, torque held with it
 * overhauling) where it read "to hoist" and "while lowering", and the travel, drive and caliper
 * sheets carry cautions of their own where they carried the hoist's; stored evaluations keep
 * their text.
 * 1.3.0: travel wheel adhesion is worked out from the force the braked wheels carry to the rail,
 * F_rail = m·a_L + n_br·M_d·ω/v (the deceleration force plus the force still driving the motion,
 * slope or wind), where it took m·a_L alone and so fell as the slope steepened; with no driving
 * torque the value is unchanged, and the derivation prints F_rail as a step of its own. With no
 * number moved: the spring setting table's title speaks of the torque limits ("torque limits met
 * from … to … N") where it said "permitted band", since other checks can fail inside it (the band
 * where all pass is worked out apart, see sheets/setting-band.ts); the friction power at set says
 * it is worked with the stop's own torque. The disc-spring sheet's angle for the required preload
 * reads as the limit it is ("back off no further than"), and the main spring force as set says
 * the fitter sets the length, not the force. Two brakes on one drive train read "Both brakes".
 * Also in 1.3.0: the travel sheet takes the travelling mass without the load (optional) and checks
 * the wheels of the empty crane or trolley, which skid first under the same brake torque; left
 * empty, it warns that the laden case alone is checked. The steps of the travel sheet's second and
 * third stops (hardest laden, unladen) carry their case in the label.
 * 1.4.0: the shoe sheets' drive-train check at μ max, top of range, credits no linkage losses
 * (M_b,max,η=1 = M_b,max / η_L, a step of its own): pin friction may be far lower than η_L allows,
 * so the bound takes η_L = 1, and the spring setting table's top row keeps within the rating by
 * the same figure (the higher shoe model, which the table had not used). The lever, pin and
 * base-bolt checks at the highest setting take the same torque. The shoe sheets' default drive-
 * train rating is 1600 N·m (was 1500: the demo hoist's two brakes reach 1528 N·m without the
 * linkage credit). With no number moved: the travel stopping rule cites its paragraph, 29 CFR
 * 1910.179(f)(4)(vii).
 * Also in 1.4.0: the disc-spring stack sheet checks the set deflection against the working band
 * 0.15–0.75·h0 (from memory of DIN 2093, now DIN EN 16983) at the set angle and at both ends of a
 * declared back-off tolerance (new input per stack, default 15°: θ − Δθ as the margin for reading
 * the angle, θ + Δθ where a fitter backs on to the next slot), and the required preload also at
 * θ + Δθ; the words and sources are the shoe sheets', from one builder. Its working-band warning,
 * which repeated a failing check, is gone; the field card's back-off band is the declared
 * tolerance. No number of the demo moves; the preload and σOM checks' labels name their stack,
 * and the σOM check's message reads as every other check's (value, limit, utilisation).
 * Also in 1.4.0: the caliper sheet checks the stop with the drive train broken. With the optional
 * inertia left on the brake side (J_dr, between the load's own inertia and the total), the
 * overhauling load (η_bd = 1) speeds up the drum during the set delay and the brake at μ min, worn,
 * stops it: that it stops, the stopping distance, the disc speed when the brake sets and the disc
 * temperature after the stop are checked (common practice; defer to the governing standard), with
 * steps from the sheet's own stopping functions, labelled "drive train broken". Empty, with the
 * brake off the motor shaft, the sheet warns that the case is not checked. The caliper demo enters
 * J_dr = 120 kg·m² and a 0.2 s release unit (was 0.3 s), so its normal stop shortens too.
 * With no number moved, powers print to four figures (23.76 kW, not 23.8 kW), so a checker can
 * work the motor torque again from the printed line.
 * 1.5.0: a disc-spring stack's length on the field card keeps ± 0.2 mm only where the back-off
 * band the sheet checks allows it: otherwise it is held to the stack lengths at θ − Δθ and θ + Δθ
 * (± 0.104 mm for the demo holder's 2.5 mm lead over 15°), so a stack measured short of the
 * working band is judged out. With no number moved: the spring setting table's title gives its
 * range ("… from 771 to 1600 N") without saying the torque limits hold there (a torque check on
 * the worn drum can fail in its first row; the band sentence says where every check passes); the
 * set length of the main spring is L_set, as Shigley's L_s is the solid length beside it; and the
 * end-type steps name no table in their labels (the reference gives Shigley's Table 10-1); the
 * lining data's source names the handbook's edition (Tribology Handbook, 2nd ed.); the temperature
 * chart draws the mean steady temperature its hour of duty tends to (the check's own value).
 * Also in 1.5.0, with no number moved: the hoist's redundancy checks of each brake alone stopping
 * the load are left out where they repeat the sheet's own stop figure for figure (η_bd = 1: the
 * sheet's stop is worked out with this brake alone), with a note saying so; one failure was
 * counted twice. The demo hoist has 45 checks (was 47). With no lift stop, the card's working
 * stroke and clearance take their tolerance from the reserve stroke's through the stroke chain
 * (−3 mm / +0 and −0.12 mm / +0 on the demo, was ± 10 % and −0.1 / +0.2 mm, which accepted a
 * reserve below its target and refused the clearance a reserve of 23 mm gives). Field settings
 * that wear moves carry their in-service limit (`inService`): the reserve stroke down to its
 * minimum, and with no lift stop the working stroke and clearance up to their values there; a
 * reading as found is judged against it. The hoist's load and torque test notes give their
 * figures in US units too (27550 lb, 133 lbf·ft beside 12500 kg, 180 N·m), rounded the same safe
 * way, as a note is one text for both unit systems.
 */
export const CORE_VERSION = '1.5.0';
