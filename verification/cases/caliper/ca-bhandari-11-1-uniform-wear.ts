import { defineCase } from '../../case.js';
import { caliperTorque, force, length, ratio, uniformWearRadius } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'ca-bhandari-11-1-uniform-wear',
  family: 'caliper',
  title:
    'Annular friction face, uniform wear: torque from the clamp force (single-plate clutch example)',
  source:
    'Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 11.1 (friction clutch, uniform-wear criterion: P = π·pa·d·(D − d)/2, Mt = μ·P·(D + d)/4)',
  confidence: 'secondary',
  inputs: {
    d: '100 mm',
    D: '200 mm',
    mu: 0.2,
    P: '15707.963268 N (pa = 1 MPa at the inner radius)',
    faces: 1,
  },
  expected: [
    { key: 'Mt', label: 'Friction torque', value: 235619.449019, unit: 'N·mm', rel: 1e-6 },
  ],
  toleranceNote: 'the companion prints six decimals: ±1e-6',
  run() {
    const re = uniformWearRadius(length(0.1), length(0.05));
    return { Mt: caliperTorque(ratio(0.2), force(15707.963268), re, 1, 1) * 1e3 };
  },
});
