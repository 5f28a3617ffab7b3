/** Source texts cited by derivation steps. One place, so the printed references stay consistent. */
export const REF = {
  definition: 'definition (SI identity)',
  motorTorque: 'definition: M = P/ω (SI); 9550·P[kW]/n[rpm] is the same identity in trade units',
  referral:
    'energy/power balance through the gear train (textbook identity; e.g. Shigley MED, ch. 16 energy considerations)',
  hoistLoad: 'statics of the rope drive: load × g × drum radius ÷ (reeving ratio × gear ratio)',
  efficiency:
    'efficiency treatment: torque to drive the load (hoisting) = M/η, torque held with the load overhauling (lowering) = M·η (common practice)',
  requiredTorque: 'required torque = factor × reference torque; factor from the criteria set',
  shoeForce: 'lever statics with linkage efficiency (common practice)',
  shortShoe:
    "short-shoe model, Budynas & Nisbett, Shigley's MED 8th ed., §16-2 (short shoe: T = f·N·r)",
  pivotedShoe:
    "pivoted symmetrical shoe, Budynas & Nisbett, Shigley's MED 8th ed., §16-4, p = pa·cos θ",
  generalShoe:
    "external/internal shoe moments, Budynas & Nisbett, Shigley's MED 8th ed., §16-2/16-3",
  wear: 'spring extension from lining wear through the linkage travel ratio; force loss = rate × extension (statics, common practice)',
  pressure:
    "mean pressure on projected area b·D·sin(β/2) (Shigley's MED 8th ed., Table 16-3 note); peak per p = pa·cos θ",
  pv: 'pressure–velocity product p·v (common practice for lining duty)',
  caliper:
    "uniform-wear disc brake, Budynas & Nisbett, Shigley's MED 8th ed., §16-5 (r_e = (r_o + r_i)/2)",
  band: "band brake, Budynas & Nisbett, Shigley's MED 8th ed., §16-6; Mott, Machine Elements in Mechanical Design 4th ed., §22-9",
  energy:
    "kinetic energy ½·J·ω² and work of the load, Shigley's MED 8th ed., §16-9 energy considerations",
  heat: "temperature rise ΔT = E/(m·c), Shigley's MED 8th ed., §16-10",
  cooling:
    'lumped heat balance with convective cooling: P = α·A·(T − T_amb) (Newton cooling, textbook identity)',
  kinematics: 'kinematics of the drive train (speed ratio; v = ω·D/2)',
  backDriving:
    'torque reaching the brake shaft from an overhauling load = M_L·η_bd (efficiency of the drive train driven backwards; η_bd = 1 is the conservative choice for an emergency stop — common practice)',
  stopping:
    'rigid-body dynamics at constant brake torque: α = (M_b − M_drive)/J_eq (textbook identity)',
  tenPercent:
    '29 CFR 1910.179(f)(4)(vii) (brakes for trolleys and bridges): stop within a distance in ft = 10 % of full-load speed in ft/min; SI form derived',
  adhesion:
    'wheel–rail adhesion: needed μ = braking force / normal load on braked wheels (statics)',
  railForce:
    'force balance on the travelling mass (textbook identity): the braked wheels carry m·a_L plus the force that drives the motion, F_ext = n_br·M_d·ω/v from the driving torque at each brake shaft, with no gear-efficiency credit (η = 1)',
  release: 'virtual work through the release linkage: F_th·s_th·η = F_s·s_s (statics)',
  liftedSpring:
    'linear spring (Hooke): opening the brake by the clearance ε compresses the spring by ε·r_s through the linkage travel ratio (statics)',
  stroke: 'stroke budget of the thruster (common practice; maker data governs)',
  springSetting: 'linear spring: L = L0 − F/k (Hooke)',
} as const;
