import { defineCase } from '../../case.js';
import { angularSpeed, mass, referLinearMass, speed } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'du-bhandari-12-3-moving-mass',
  family: 'duty',
  title: 'Moving load referred to the drum shaft by (v/ω)²',
  source:
    'Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 12.3 (2500 kg at 1.5 m/s on a 0.75 m drum: ½·m·v² = 2812.5 J)',
  confidence: 'secondary',
  inputs: { m: '2500 kg', v: '1.5 m/s', omega: '2 rad/s (R = 0.75 m)' },
  expected: [
    {
      key: 'J',
      label: 'Equivalent inertia at the drum',
      value: 2500 * 0.75 ** 2,
      unit: 'kg·m²',
      rel: 1e-12,
    },
    { key: 'E', label: 'Its kinetic energy ½·J·ω²', value: 2812.5, unit: 'J', rel: 1e-12 },
  ],
  toleranceNote: 'exact arithmetic of the stated data',
  run() {
    const J = referLinearMass(mass(2500), speed(1.5), angularSpeed(2));
    return { J, E: 0.5 * J * 4 };
  },
});
