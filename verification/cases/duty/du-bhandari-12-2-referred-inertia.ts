import { defineCase } from '../../case.js';
import { angularSpeed, inertia, referRotatingInertia } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'du-bhandari-12-2-referred-inertia',
  family: 'duty',
  title: 'Engine-side inertia referred to the wheel by the speed ratio squared',
  source:
    'Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 12.2 (other parts: 2.5 kg·m² turning 5 × wheel speed, energy ½·Ie·(r·ω)²)',
  confidence: 'secondary',
  inputs: { Ie: '2.5 kg·m²', 'speed ratio': 5 },
  expected: [
    { key: 'J', label: 'Inertia referred to the wheel', value: 62.5, unit: 'kg·m²', rel: 1e-12 },
  ],
  toleranceNote: 'exact arithmetic of the stated data',
  run: () => ({ J: referRotatingInertia(inertia(2.5), angularSpeed(5), angularSpeed(1)) }),
});
