import { defineCase } from '../../case.js';
import { caliperTorque, force, length, ratio, uniformPressureRadius } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'ca-bhandari-12-12',
  family: 'caliper',
  title:
    'Caliper disc brake with two pads: friction radius, clamp force and pad angle for 1500 N·m',
  source:
    'Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 12.12 (uniform-pressure friction radius)',
  confidence: 'secondary',
  inputs: { Mt: '1500 N·m', Ro: '150 mm', Ri: '100 mm', mu: 0.35, pavg: '2 MPa', pads: 2 },
  expected: [
    {
      key: 'Rf',
      label: 'Friction radius (uniform pressure)',
      value: (2 * (150 ** 3 - 100 ** 3)) / (3 * (150 ** 2 - 100 ** 2)),
      unit: 'mm',
      rel: 1e-9,
    },
    {
      key: 'theta',
      label: 'Angular dimension of the pad',
      value: 77.54316,
      unit: 'deg',
      rel: 1e-6,
    },
  ],
  toleranceNote:
    "the companion prints six decimals: ±1e-6 (the friction radius is the book's formula evaluated exactly)",
  run() {
    const rf = uniformPressureRadius(0.15, 0.1);
    // clamp force per pad so that two faces (pads) give 1500 N·m
    const perNewton = caliperTorque(ratio(0.35), force(1), length(rf), 2, 1);
    const P = 1500 / perNewton;
    const area = P / 2e6;
    return { Rf: rf * 1e3, theta: ((2 * area) / (0.15 ** 2 - 0.1 ** 2)) * (180 / Math.PI) };
  },
});
