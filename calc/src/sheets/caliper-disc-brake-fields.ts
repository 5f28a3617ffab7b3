import type { SectionDefinition } from '../core/types.js';
import { LININGS } from '../criteria/linings.js';
import { choice, num, qty, withBounds, type InputsOf } from './field-builders.js';
import { CALIPER_BOUNDS } from './field-bounds.js';
import { ARRANGEMENT_CHOICES } from './hoist-shoe-brake.js';
import { setDelayFields } from './set-delay-fields.js';

export const CALIPER_SECTIONS: SectionDefinition[] = [
  { id: 'duty', title: 'Duty at the brake shaft' },
  { id: 'brake', title: 'Disc, calipers and springs' },
  { id: 'lining', title: 'Pads and friction band' },
  { id: 'stopping', title: 'Stopping' },
  { id: 'thermal', title: 'Energy and heat' },
  { id: 'release', title: 'Release' },
  { id: 'setting', title: 'Field settings' },
];

const U = 'duty';
const B = 'brake';
const L = 'lining';
const T = 'thermal';
const R = 'release';

/** Demo: a caliper brake on a hoist rope drum (low-speed shaft). */
export const CALIPER_FIELDS = withBounds(
  [
    qty(U, 'motorPower', 'Motor rated power', 'P', 'power', 22, 'kW', 'hp', {
      min: 0,
      exclusiveMin: true,
    }),
    qty(U, 'motorSpeed', 'Motor rated speed', 'n_mot', 'angularSpeed', 975, 'rpm', 'rpm', {
      min: 0,
      exclusiveMin: true,
      max: 6000,
    }),
    num(U, 'ratioToBrake', 'Speed ratio motor ÷ brake shaft (1 on the motor shaft)', 'i', 40, {
      min: 0,
      exclusiveMin: true,
      max: 5000,
    }),
    qty(
      U,
      'staticTorque',
      'Static load torque at the brake shaft (no efficiency)',
      'M_L',
      'torque',
      6315,
      'N m',
      'lbf ft',
      { min: 0 },
    ),
    num(U, 'efficiency', 'Efficiency between load and brake', 'η', 0.95, {
      min: 0,
      exclusiveMin: true,
      max: 1,
    }),
    choice(U, 'referenceBasis', 'Reference torque for the required torque', 'hoisting', [
      { value: 'hoisting', label: 'Load torque to drive the load (M_L/η)' },
      { value: 'holding', label: 'Static holding torque, load overhauling (M_L·η)' },
      { value: 'motor', label: 'Motor rated torque referred to the brake shaft' },
    ]),
    choice(U, 'brakeArrangement', 'Brake arrangement', 'single', ARRANGEMENT_CHOICES),
    qty(
      U,
      'inertia',
      'Total inertia referred to the brake shaft',
      'J_eq',
      'inertia',
      2800,
      'kg m^2',
      'lb ft^2',
      { min: 0, exclusiveMin: true },
    ),
    // Demo: drum Ø 0.5 m ≈ 27, disc ≈ 25, load's own ≈ 40, ropes and drum gear ≈ 28 kg·m². With
    // it the drum speeds up about sevenfold in the set delay, which is why the demo's release
    // unit is a quick-drop one (0.2 s): at 0.3 s this stop runs 479 mm against the 300 mm allowed.
    qty(
      U,
      'brokenTrainInertia',
      'Inertia left on the brake side if the drive train breaks, referred to the brake shaft',
      'J_dr',
      'inertia',
      120,
      'kg m^2',
      'lb ft^2',
      {
        min: 0,
        exclusiveMin: true,
        required: false,
        help: "Drum, disc, ropes and hoisted load (and any gear wheel fixed to the drum): what still turns with the disc if a shaft, coupling or gearbox between motor and drum fails. Between the load's own inertia and the total. The set delay counts from the break; the overspeed switch's detection time is not included. Empty: this stop is not checked.",
      },
    ),
    qty(
      U,
      'loadSpeed',
      'Load speed at rated brake-shaft speed',
      'v_0',
      'speed',
      0.16,
      'm/s',
      'ft/min',
      { min: 0, exclusiveMin: true },
    ),
    num(
      U,
      'backDrivingEfficiency',
      'Efficiency of the drive train driven backwards by the load (emergency stop)',
      'η_bd',
      1,
      {
        min: 0,
        exclusiveMin: true,
        max: 1,
        help: 'No credit for gear losses while the load overhauls in an emergency stop: leave 1 unless the gearbox maker states a back-driving efficiency (common practice).',
      },
    ),
    qty(
      U,
      'loadMass',
      'Hoisted mass (load, hook block, ropes), if known',
      'm',
      'mass',
      10_300,
      'kg',
      'lb',
      {
        min: 0,
        exclusiveMin: true,
        required: false,
        help: 'When given, the static torque is checked against m·g·v_0/ω_b so that torque, speed and inertia describe the same hoist.',
      },
    ),
    ...setDelayFields(2200, 'release unit', 0.2),
    qty(
      U,
      'maxStoppingDistance',
      'Allowed stopping distance (duty specification)',
      's_max',
      'length',
      300,
      'mm',
      'in',
      { min: 0, exclusiveMin: true },
    ),
    qty(B, 'padOuterRadius', 'Pad outer radius on the disc', 'r_o', 'length', 500, 'mm', 'in', {
      min: 0,
      exclusiveMin: true,
    }),
    qty(B, 'padInnerRadius', 'Pad inner radius on the disc', 'r_i', 'length', 400, 'mm', 'in', {
      min: 0,
      exclusiveMin: true,
    }),
    qty(
      B,
      'clampForce',
      'Spring clamp force per caliper (new pads)',
      'F_c',
      'force',
      22,
      'kN',
      'lbf',
      { min: 0, exclusiveMin: true },
    ),
    qty(
      B,
      'clampForceMin',
      'Adjustable clamp force, lowest setting',
      'F_c,min',
      'force',
      12,
      'kN',
      'lbf',
      { min: 0 },
    ),
    qty(
      B,
      'clampForceMax',
      'Adjustable clamp force, highest setting',
      'F_c,max',
      'force',
      30,
      'kN',
      'lbf',
      { min: 0, exclusiveMin: true },
    ),
    num(B, 'calipers', 'Calipers on the disc', 'z_c', 2, { min: 1, max: 12 }, true),
    num(B, 'faces', 'Friction faces per caliper', 'z_f', 2, { min: 1, max: 4 }, true),
    qty(B, 'springRate', 'Caliper spring-stack rate', 'k_s', 'stiffness', 1, 'kN/mm', 'lbf/in', {
      min: 0,
    }),
    qty(
      B,
      'maxBrakeTorque',
      'Torque rating of the shaft and disc hub',
      'M_max',
      'torque',
      30,
      'kN m',
      'lbf ft',
      { min: 0, exclusiveMin: true },
    ),
    choice(
      L,
      'liningMaterial',
      'Pad material (limits)',
      'resin-bonded-pad',
      LININGS.map((l) => ({ value: l.id, label: l.label })),
      "Limits from the Tribology Handbook (Neale, ed.), 2nd ed., B8, Table 8.10; the pad maker's data governs.",
    ),
    qty(L, 'padArea', 'Friction area of one pad', 'A_pad', 'area', 200, 'cm^2', 'in^2', {
      min: 0,
      exclusiveMin: true,
    }),
    num(L, 'muNominal', 'Friction coefficient, nominal', 'μ_nom', 0.35, {
      min: 0,
      exclusiveMin: true,
      max: 1,
    }),
    num(L, 'muMin', 'Friction coefficient, minimum', 'μ_min', 0.3, {
      min: 0,
      exclusiveMin: true,
      max: 1,
    }),
    num(L, 'muMax', 'Friction coefficient, maximum', 'μ_max', 0.42, {
      min: 0,
      exclusiveMin: true,
      max: 1,
    }),
    qty(L, 'wear', 'Pad wear per pad before re-adjustment', 'w', 'length', 1, 'mm', 'in', {
      min: 0,
    }),
    num(L, 'wearTravelRatio', 'Spring extension per unit pad wear', 'r_s', 2, {
      min: 0,
      exclusiveMin: true,
      max: 10,
      help: 'Floating caliper, both pads wear: 2.',
    }),
    qty(L, 'discMaxSpeed', 'Disc peripheral speed rating', 'v_max', 'speed', 40, 'm/s', 'ft/min', {
      min: 0,
      exclusiveMin: true,
    }),
    qty(
      T,
      'stopsPerHour',
      'Service stops per hour made by the brake',
      'z_s',
      'frequency',
      1,
      '1/h',
      '1/h',
      {
        min: 0,
        help: 'Stops in normal service where the brake does the stopping (0 when the drive stops electrically and the brake only holds). Taken at the energy of the full-load emergency stop (conservative).',
      },
    ),
    qty(
      T,
      'emergencyStopsPerHour',
      'Emergency stops per hour',
      'z_e',
      'frequency',
      1,
      '1/h',
      '1/h',
      {
        min: 0,
        help: 'Full-load emergency stops (power failure, emergency switch): the brake stops the load from the highest speed.',
      },
    ),
    qty(T, 'discMass', 'Heat-absorbing disc mass', 'm_d', 'mass', 150, 'kg', 'lb', {
      min: 0,
      exclusiveMin: true,
    }),
    qty(
      T,
      'specificHeat',
      'Specific heat of the disc',
      'c',
      'specificHeat',
      460,
      'J/(kg K)',
      'BTU/(lb degF)',
      { min: 0, exclusiveMin: true },
    ),
    qty(
      T,
      'coolingCoefficient',
      'Cooling coefficient of the disc surface',
      'α',
      'heatTransferCoefficient',
      20,
      'W/(m^2 K)',
      'BTU/(h ft^2 degF)',
      { min: 0, exclusiveMin: true },
    ),
    qty(T, 'coolingArea', 'Cooling surface of the disc', 'A_c', 'area', 1.2, 'm^2', 'ft^2', {
      min: 0,
      exclusiveMin: true,
    }),
    qty(T, 'ambient', 'Ambient temperature', 'T_amb', 'temperature', 30, 'degC', 'degF', {
      min: -60,
      max: 150,
    }),
    qty(R, 'airGap', 'Air gap per pad when released', 'ε', 'length', 1, 'mm', 'in', {
      min: 0,
      exclusiveMin: true,
      max: 10,
    }),
    qty(
      R,
      'releaseForce',
      'Release force available per caliper',
      'F_rel,av',
      'force',
      30,
      'kN',
      'lbf',
      { min: 0, exclusiveMin: true },
    ),
  ] as const,
  CALIPER_BOUNDS,
);

/** The caliper sheet's inputs as its formulas read them (SI). */
export type CaliperInputs = InputsOf<typeof CALIPER_FIELDS>;
