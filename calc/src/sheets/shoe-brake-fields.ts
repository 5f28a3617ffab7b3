import type { FieldDefinition, SectionDefinition } from '../core/types.js';
import { LININGS } from '../criteria/linings.js';
import { choice, flag, num, qty, type InputsOf } from './field-builders.js';
import { MAIN_SPRING_FIELDS } from './shoe-main-spring.js';
import { LEVER_FIELDS } from './shoe-levers.js';

/** Sections shared by the shoe-brake sheets (after each sheet's own duty section). */
export const SHOE_SECTIONS: SectionDefinition[] = [
  { id: 'brake', title: 'Brake, spring and levers' },
  { id: 'lining', title: 'Lining and friction band' },
  { id: 'stopping', title: 'Stopping' },
  { id: 'thermal', title: 'Energy and heat' },
  { id: 'release', title: 'Release and thruster stroke' },
  { id: 'setting', title: 'Field settings' },
  { id: 'discSprings', title: 'Disc springs on shoe holder and equaliser' },
  { id: 'levers', title: 'Levers, pins and base bolts' },
];

const B = 'brake';
const L = 'lining';
const T = 'thermal';
const R = 'release';
const S = 'discSprings';

export const BRAKE_FIELDS = [
  qty(B, 'drumDiameter', 'Brake drum diameter', 'D', 'length', 400, 'mm', 'in', {
    min: 50,
    max: 2000,
    help: 'Brake wheel (drum) diameter.',
  }),
  qty(B, 'shoeWidth', 'Lining width', 'b', 'length', 150, 'mm', 'in', { min: 10, max: 1000 }),
  qty(B, 'contactAngle', 'Contact angle of one shoe', 'β', 'angle', 70, 'deg', 'deg', {
    min: 10,
    max: 170,
    help: 'Arc covered by one lining; the pivoted-shoe model needs β < 180°.',
  }),
  choice(
    B,
    'torqueModel',
    'Torque model for the required-torque checks',
    'short',
    [
      { value: 'short', label: 'Short shoe (2·μ·N·r), conservative' },
      { value: 'pivoted', label: 'Pivoted long shoe (p = pa·cos θ)' },
    ],
    "Short shoe and pivoted symmetrical long shoe per Budynas & Nisbett, Shigley's MED 8th ed., §16-2 and §16-4. The long shoe gives more torque (about 6 % at 70°): use the short shoe for the required torque and the stop; the drive-train check always takes the higher of the two.",
  ),
  qty(B, 'springForce', 'Main spring force as set (new lining)', 'F_s', 'force', 1150, 'N', 'lbf', {
    min: 0,
    exclusiveMin: true,
  }),
  qty(B, 'springRate', 'Main spring rate', 'k_s', 'stiffness', 40, 'N/mm', 'lbf/in', {
    min: 0,
    exclusiveMin: true,
  }),
  qty(B, 'springFreeLength', 'Main spring free length', 'L_0', 'length', 250, 'mm', 'in', {
    min: 0,
    exclusiveMin: true,
  }),
  qty(
    B,
    'springForceMin',
    'Adjustable spring force, lowest setting',
    'F_s,min',
    'force',
    500,
    'N',
    'lbf',
    { min: 0 },
  ),
  qty(
    B,
    'springForceMax',
    'Adjustable spring force, highest setting',
    'F_s,max',
    'force',
    1600,
    'N',
    'lbf',
    { min: 0, exclusiveMin: true },
  ),
  num(
    B,
    'springRelaxation',
    'Spring force lost to relaxation in service (fraction of the set force)',
    'ρ_s',
    0.02,
    {
      min: 0,
      max: 0.3,
      required: false,
      help: "Spring maker's data for the spring's service temperature and stress (for example 0.02 = 2 %). It lowers the torque of the worn cases, the stop and the setting band; the new-lining and drive-train torques keep the full force. Left empty, the sheet allows for none and says so.",
    },
  ),
  num(B, 'leverRatio', 'Lever ratio (shoe normal force ÷ spring force, ideal)', 'i', 2.5, {
    min: 0,
    exclusiveMin: true,
    max: 50,
  }),
  num(B, 'linkageEfficiency', 'Linkage efficiency', 'η_L', 0.95, {
    min: 0,
    exclusiveMin: true,
    max: 1,
  }),
  qty(
    B,
    'maxBrakeTorque',
    'Torque rating of the drive train at the brake shaft',
    'M_max',
    'torque',
    1600,
    'N m',
    'lbf ft',
    {
      min: 0,
      exclusiveMin: true,
      help: 'Shaft, coupling and gearbox rating (equipment data): the brake at μ max, spring at the top of its range and no linkage losses credited, must not exceed it.',
    },
  ),
] as const;

export const LINING_FIELDS = [
  choice(
    L,
    'liningMaterial',
    'Lining material (limits)',
    'non-asbestos-rigid',
    LININGS.map((l) => ({ value: l.id, label: l.label })),
    "Pressure and temperature limits from the Tribology Handbook (Neale, ed.), 2nd ed., B8, Table 8.10; the lining maker's data governs.",
  ),
  num(L, 'muNominal', 'Friction coefficient, nominal', 'μ_nom', 0.38, {
    min: 0,
    exclusiveMin: true,
    max: 1,
  }),
  num(L, 'muMin', 'Friction coefficient, minimum', 'μ_min', 0.3, {
    min: 0,
    exclusiveMin: true,
    max: 1,
    help: "Design texts advise 50–75 % of the test μ for design (Shigley's MED 8th ed., Table 16-3 note).",
  }),
  num(L, 'muMax', 'Friction coefficient, maximum', 'μ_max', 0.45, {
    min: 0,
    exclusiveMin: true,
    max: 1,
  }),
  qty(L, 'liningThickness', 'Lining thickness, new', 't_L', 'length', 8, 'mm', 'in', {
    min: 0,
    exclusiveMin: true,
  }),
  qty(
    L,
    'liningMinThickness',
    "Lining thickness, minimum (replace; lining maker's data)",
    't_L,min',
    'length',
    3,
    'mm',
    'in',
    { min: 0, exclusiveMin: true },
  ),
  qty(
    L,
    'drumWearAllowance',
    "Drum diameter reduction allowed by wear and re-machining (drum maker's data)",
    'ΔD',
    'length',
    4,
    'mm',
    'in',
    { min: 0 },
  ),
  num(L, 'springTravelRatio', 'Spring travel per unit shoe travel', 'r_s', 5, {
    min: 0,
    exclusiveMin: true,
    max: 200,
    help: 'Ideal symmetric double-shoe linkage: 2 × lever ratio (virtual work).',
  }),
  qty(L, 'drumMaxSpeed', 'Drum peripheral speed rating', 'v_max', 'speed', 30, 'm/s', 'ft/min', {
    min: 0,
    exclusiveMin: true,
    help: 'From the drum maker (material and balance). About 30 m/s for grey iron is a value from memory.',
  }),
] as const;

export const THERMAL_FIELDS = [
  qty(
    T,
    'stopsPerHour',
    'Service stops per hour made by the brake',
    'z_s',
    'frequency',
    56,
    '1/h',
    '1/h',
    {
      min: 0,
      help: 'Stops in normal service where the brake does the stopping (0 when the drive stops electrically and the brake only holds). Taken at the energy of the full-load emergency stop (conservative).',
    },
  ),
  qty(T, 'emergencyStopsPerHour', 'Emergency stops per hour', 'z_e', 'frequency', 4, '1/h', '1/h', {
    min: 0,
    help: 'Full-load emergency stops (power failure, emergency switch): the brake stops the load from the highest speed.',
  }),
  qty(T, 'drumMass', 'Heat-absorbing drum mass', 'm_d', 'mass', 60, 'kg', 'lb', {
    min: 0,
    exclusiveMin: true,
  }),
  qty(
    T,
    'specificHeat',
    'Specific heat of the drum',
    'c',
    'specificHeat',
    460,
    'J/(kg K)',
    'BTU/(lb degF)',
    { min: 0, exclusiveMin: true, help: 'Cast iron or steel about 450–500 J/(kg·K).' },
  ),
  qty(
    T,
    'coolingCoefficient',
    'Cooling coefficient of the drum surface',
    'α',
    'heatTransferCoefficient',
    20,
    'W/(m^2 K)',
    'BTU/(h ft^2 degF)',
    {
      min: 0,
      exclusiveMin: true,
      help: 'Convection plus radiation; depends on speed and air flow (engineering estimate).',
    },
  ),
  qty(T, 'coolingArea', 'Cooling surface of the drum', 'A_c', 'area', 0.6, 'm^2', 'ft^2', {
    min: 0,
    exclusiveMin: true,
  }),
  qty(T, 'ambient', 'Ambient temperature', 'T_amb', 'temperature', 30, 'degC', 'degF', {
    min: -60,
    max: 150,
  }),
] as const;

export const RELEASE_FIELDS = [
  flag(
    R,
    'liftStop',
    'Thruster has a lift stop (the fitter sets the clearance)',
    false,
    'Without a lift stop the released thruster runs to its end stop: the clearance then follows from the stroke, the reserve stroke and the linkage, and is derived, not set (common practice; the thruster maker’s data governs).',
  ),
  {
    ...qty(
      R,
      'clearance',
      'Shoe clearance when released (per shoe)',
      'ε',
      'length',
      0.8,
      'mm',
      'in',
      {
        min: 0,
        exclusiveMin: true,
        max: 10,
        help: 'Set with a lift stop only; without one it is derived from the stroke.',
      },
    ),
    requiredIf: 'liftStop',
  },
  num(R, 'thrusterTravelRatio', 'Thruster rod travel per unit shoe travel', 'r_t', 25, {
    min: 0,
    exclusiveMin: true,
    max: 500,
  }),
  num(R, 'releaseEfficiency', 'Release linkage efficiency', 'η_r', 0.9, {
    min: 0,
    exclusiveMin: true,
    max: 1,
  }),
  qty(R, 'thrusterForce', 'Thruster rated lift force', 'F_th', 'force', 500, 'N', 'lbf', {
    min: 0,
    exclusiveMin: true,
  }),
  ...(
    [
      ['thrusterFactorLowVoltage', 'at −10 % supply voltage', 'k_th,U', 0.95],
      ['thrusterFactorCold', 'at the lowest site temperature (coldest oil)', 'k_th,cold', 0.85],
      ['thrusterFactorHot', 'at the highest site temperature', 'k_th,hot', 0.95],
    ] as const
  ).map(([key, when, symbol, demo]) =>
    num(R, key, `Thruster lift force ${when} ÷ rated force (maker's data)`, symbol, demo, {
      min: 0,
      exclusiveMin: true,
      max: 1.5,
    }),
  ),
  qty(R, 'thrusterStroke', 'Thruster nominal stroke', 's_n', 'length', 50, 'mm', 'in', {
    min: 0,
    exclusiveMin: true,
  }),
  qty(R, 'reserveStroke', 'Reserve stroke as set (new lining)', 's_r,0', 'length', 20, 'mm', 'in', {
    min: 0,
  }),
  qty(
    R,
    'minReserveStroke',
    "Minimum reserve stroke (maker's data)",
    's_r,min',
    'length',
    5,
    'mm',
    'in',
    { min: 0 },
  ),
] as const;

function stackFields<P extends 'holder' | 'equaliser'>(
  prefix: P,
  title: string,
  series: number,
  pitch: number,
  backOff: number,
  tolerance: number,
) {
  return [
    flag(S, `${prefix}Enabled`, `${title}: include`, true),
    qty(S, `${prefix}De`, `${title}: disc outer diameter`, 'D_e', 'length', 40, 'mm', 'in', {
      min: 0,
      exclusiveMin: true,
    }),
    qty(S, `${prefix}Di`, `${title}: disc inner diameter`, 'D_i', 'length', 20.4, 'mm', 'in', {
      min: 0,
      exclusiveMin: true,
    }),
    qty(S, `${prefix}T`, `${title}: disc thickness`, 't', 'length', 1.5, 'mm', 'in', {
      min: 0,
      exclusiveMin: true,
    }),
    qty(S, `${prefix}L0`, `${title}: disc free height`, 'l_0', 'length', 2.65, 'mm', 'in', {
      min: 0,
      exclusiveMin: true,
    }),
    num(
      S,
      `${prefix}Series`,
      `${title}: discs (sets) in series`,
      'i',
      series,
      { min: 1, max: 50 },
      true,
    ),
    num(
      S,
      `${prefix}Parallel`,
      `${title}: discs in parallel per set`,
      'n',
      1,
      { min: 1, max: 6 },
      true,
    ),
    qty(S, `${prefix}Pitch`, `${title}: thread pitch (lead)`, 'P', 'length', pitch, 'mm', 'in', {
      min: 0,
      exclusiveMin: true,
    }),
    qty(
      S,
      `${prefix}BackOff`,
      `${title}: back-off angle from flat`,
      'θ',
      'angle',
      backOff,
      'deg',
      'deg',
      { min: 0, max: 3600 },
    ),
    qty(
      S,
      `${prefix}BackOffTolerance`,
      `${title}: back-off angle tolerance`,
      'Δθ',
      'angle',
      tolerance,
      'deg',
      'deg',
      {
        min: 0,
        max: 360,
        help: 'Common practice: the sheet checks the stack at θ − Δθ (a margin for reading the angle) and at θ + Δθ (the fitter backs off on to the next slot or lock-plate hole). On the field card the band is one-sided: back off further, never tighten back.',
      },
    ),
  ] as const;
}

/** A stack's fields other than its flag are needed only while the stack is included. */
function ifEnabled<const Fs extends readonly FieldDefinition[]>(prefix: string, fields: Fs): Fs {
  return fields.map((f) =>
    f.kind === 'boolean' ? f : { ...f, requiredIf: `${prefix}Enabled` },
  ) as unknown as Fs;
}

/** Optional disc-spring stacks (common practice: tightened flat, then backed off by an angle; holder about 60°). */
export const DISC_SPRING_FIELDS = [
  ...ifEnabled('holder', [
    ...stackFields('holder', 'Shoe holder', 1, 2.5, 60, 15),
    qty(
      S,
      'holderRequiredPreload',
      'Shoe holder: preload the holder needs',
      'F_V,req',
      'force',
      1500,
      'N',
      'lbf',
      {
        min: 0,
        help: "The force that keeps the shoe from rattling or tilting on its pivot (brake maker's data).",
      },
    ),
  ] as const),
  ...ifEnabled('equaliser', stackFields('equaliser', 'Equaliser', 3, 2, 240, 30)),
  qty(S, 'discE', 'Disc springs: elastic modulus', 'E', 'pressure', 206000, 'MPa', 'psi', {
    min: 1000,
    help: 'DIN EN 16983 (formerly DIN 2093) tables use 206 000 N/mm² for spring steel.',
  }),
  num(S, 'discNu', "Disc springs: Poisson's ratio", 'ν', 0.3, { min: 0.1, max: 0.49 }),
  num(S, 'discFrictionEdge', 'Disc springs: edge friction coefficient', 'μ_R', 0.02, {
    min: 0,
    max: 0.19,
    help: 'Friction at the load edges (series stacks): from memory of the DIN EN 16984 table.',
  }),
  num(
    S,
    'discFrictionCone',
    'Disc springs: cone friction coefficient (nested discs)',
    'μ_M',
    0.015,
    {
      min: 0,
      max: 0.19,
      help: 'Friction between nested discs of a parallel set: from memory of the DIN EN 16984 table.',
    },
  ),
] as const;

export const SHOE_BRAKE_FIELDS = [
  ...BRAKE_FIELDS,
  ...MAIN_SPRING_FIELDS,
  ...LINING_FIELDS,
  ...THERMAL_FIELDS,
  ...RELEASE_FIELDS,
  ...DISC_SPRING_FIELDS,
  ...LEVER_FIELDS,
] as const;

/** The shoe-brake inputs as the shared shoe-brake formulas read them (SI). */
export type ShoeInputs = InputsOf<typeof SHOE_BRAKE_FIELDS>;
