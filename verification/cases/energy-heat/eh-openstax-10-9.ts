import { defineCase } from '../../case.js';
import { inertia, linearEnergy, mass, rotatingEnergy, rpm, speed } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'eh-openstax-10-9',
  family: 'energy-heat',
  title: 'Helicopter rotor: rotational and translational kinetic energy',
  source:
    'OpenStax, College Physics (2012), Example 10.9, as coded in the FOSSEE Scilab Textbook Companion, book 3845 (4 blades of 50 kg, 4 m, I = 4·M·l²/3)',
  confidence: 'secondary',
  inputs: {
    blades: '4 × 50 kg, 4.00 m (rods about one end)',
    n: '300 rpm',
    m: '1000 kg',
    v: '20.0 m/s',
  },
  expected: [
    { key: 'rot', label: 'Rotational kinetic energy', value: 5.26e5, unit: 'J', rel: 0.002 },
    { key: 'trans', label: 'Translational kinetic energy', value: 2.0e5, unit: 'J', rel: 0.002 },
  ],
  toleranceNote: 'three significant figures: ±0.2 %',
  run: () => ({
    rot: rotatingEnergy(inertia((4 * 50 * 16) / 3), rpm(300)),
    trans: linearEnergy(mass(1000), speed(20)),
  }),
});
