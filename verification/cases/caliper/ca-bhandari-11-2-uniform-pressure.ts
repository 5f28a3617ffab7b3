import { defineCase } from '../../case.js';
import { caliperTorque, force, length, ratio, uniformPressureRadius } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'ca-bhandari-11-2-uniform-pressure',
  family: 'caliper',
  title:
    'Annular friction face, uniform pressure: friction radius and torque (single-plate clutch example)',
  source:
    'Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 11.2 (friction clutch, uniform-pressure criterion: P = π·pa·(D² − d²)/4, Mt = μ·P·(D³ − d³)/(3·(D² − d²)))',
  confidence: 'secondary',
  inputs: { d: '100 mm', D: '200 mm', mu: 0.2, P: '23561.944902 N (pa = 1 MPa)', faces: 1 },
  expected: [
    { key: 'Mt', label: 'Friction torque', value: 366519.142919, unit: 'N·mm', rel: 1e-6 },
  ],
  toleranceNote: 'the companion prints six decimals: ±1e-6',
  run() {
    const rf = uniformPressureRadius(0.1, 0.05);
    return { Mt: caliperTorque(ratio(0.2), force(23561.944902), length(rf), 1, 1) * 1e3 };
  },
});
