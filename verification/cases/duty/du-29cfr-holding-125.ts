import { defineCase } from '../../case.js';
import { ratio, requiredBrakeTorque, torque } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'du-29cfr-holding-125',
  family: 'duty',
  title:
    'Hoist holding brake: 125 % of the rated-load hoisting torque (non-mechanical control braking)',
  source:
    '29 CFR 1910.179(f)(2) and California Title 8 §4898: holding brake at least 125 % of the rated-load hoisting torque at the point of application where a control braking means other than mechanical is used (reference-values.md §4)',
  confidence: 'published',
  inputs: { 'rated-load hoisting torque': '400 N·m', factor: '125 %' },
  expected: [
    { key: 'M', label: 'Required holding-brake torque', value: 500, unit: 'N·m', rel: 1e-12 },
  ],
  toleranceNote: 'exact arithmetic of the stated data',
  run: () => ({ M: requiredBrakeTorque(ratio(1.25), torque(400)) }),
});
