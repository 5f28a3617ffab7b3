import { defineCase } from '../../case.js';
import {
  angularSpeed,
  holdingBrakeRedundancy,
  inertia,
  ratio,
  speed,
  time,
  torque,
} from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'du-title8-4898-two-brakes',
  family: 'duty',
  title:
    'Hot-metal hoist: two holding brakes, each 100 % of the hoisting torque and able to stop alone',
  source:
    'California Title 8 §4898(h) (hot metal with power control braking: at least two holding brakes) and §4898(c)(3) (100 % each if two holding brakes are provided), the same rules as 29 CFR 1910.179(f)(2); the stop by rigid-body dynamics — numbers computed by hand (derived)',
  confidence: 'derived',
  inputs: {
    service: 'hot metal, power control braking',
    'hoisting torque': '200 N·m',
    'M_L (η_bd = 1)': '180 N·m',
    'brake 1 / 2 (μ min, worn)': '210 / 190 N·m',
    'brakes at μ max, top of range': '2 × 450 N·m',
    'drive-train rating': '1000 N·m',
    J: '2 kg·m²',
    omega0: '100 rad/s',
    t_d: '0.2 s',
  },
  expected: [
    { key: 'req', label: 'Holding brakes required', value: 2, unit: '', abs: 0 },
    {
      key: 'hold2',
      label: 'Brake 2 holds 100 % alone (0 = no: 190 < 200)',
      value: 0,
      unit: '',
      abs: 0,
    },
    { key: 'stop2', label: 'Brake 2 stops the load alone (190 > 180)', value: 1, unit: '', abs: 0 },
    // brake 2 alone: ω1 = 100 + 180/2·0.2 = 118 rad/s; α = (190 − 180)/2 = 5 rad/s²; t_b = 23.6 s
    { key: 'tb2', label: 'Braking time with brake 2 alone', value: 23.6, unit: 's', rel: 1e-12 },
    { key: 'train', label: 'Both brakes on the drive train', value: 900, unit: 'N·m', rel: 1e-12 },
  ],
  toleranceNote: 'exact arithmetic',
  run() {
    const r = holdingBrakeRedundancy({
      hotMetal: true,
      powerControlBraking: true,
      brakes: [
        { torqueMinWorn: torque(210), torqueMaxTopOfRange: torque(450) },
        { torqueMinWorn: torque(190), torqueMaxTopOfRange: torque(450) },
      ],
      hoistingTorque: torque(200),
      loadTorque: torque(180),
      backDrivingEfficiency: ratio(1),
      inertia: inertia(2),
      lowerSpeed: angularSpeed(100),
      loadSpeed: speed(0.2),
      setDelay: time(0.2),
      driveTrainRating: torque(1000),
    });
    const c = Object.fromEntries(r.checks.map((x) => [x.id, x]));
    const s2 = r.stops[1];
    return {
      req: r.requiredBrakes,
      hold2: c['brake-2-holds-alone'].pass ? 1 : 0,
      stop2: c['brake-2-stops-alone'].pass ? 1 : 0,
      tb2: s2.stops ? s2.brakingTime : Number.NaN,
      train: c['brakes-together-drive-train'].value,
    };
  },
});
