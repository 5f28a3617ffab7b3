import { defineCase } from '../../case.js';
import { angularSpeed, inertia, loadConsistency, speed, torque } from '../../calc-api.js';

const g = 9.80665;

export const verificationCase = defineCase({
  id: 'du-load-consistency-bhandari-12-3',
  family: 'duty',
  title: 'Static torque, load speed and inertia of one hoist: the implied mass and its inertia',
  source:
    'data of Bhandari, Design of Machine Elements (McGraw-Hill), Example 12.3, as coded in the FOSSEE Scilab Textbook Companion, book 764 (2500 kg at 1.5 m/s on a 0.75 m drum radius: ½·m·v² = 2812.5 J); the static torque m·g·R and the inverse relations are ours (derived)',
  confidence: 'derived',
  inputs: {
    'M_L = m·g·R': `${(2500 * g * 0.75).toPrecision(4)} N·m (m 2500 kg, R 0.75 m)`,
    v: '1.5 m/s',
    omega: '2 rad/s (R = 0.75 m)',
    J_eq: '1500 kg·m² (entered)',
  },
  expected: [
    { key: 'm', label: 'Implied hoisted mass', value: 2500, unit: 'kg', rel: 1e-12 },
    {
      key: 'JL',
      label: 'Inertia of the load at the drum',
      value: 1406.25,
      unit: 'kg·m²',
      rel: 1e-12,
    },
    {
      key: 'E',
      label: 'Kinetic energy of the load ½·J_L·ω² (published ½·m·v²)',
      value: 2812.5,
      unit: 'J',
      rel: 1e-12,
    },
  ],
  toleranceNote: 'exact arithmetic of the stated data',
  run() {
    const r = loadConsistency({
      staticTorque: torque(2500 * g * 0.75),
      loadSpeed: speed(1.5),
      brakeSpeed: angularSpeed(2),
      inertia: inertia(1500),
    });
    return { m: r.impliedMass, JL: r.loadInertia, E: 0.5 * r.loadInertia * 4 };
  },
});
