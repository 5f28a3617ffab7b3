import { defineCase } from '../../case.js';
import {
  angularSpeed,
  inertia,
  length,
  linearEnergy,
  mass,
  potentialEnergy,
  rotatingEnergy,
  speed,
} from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'eh-bhandari-12-3',
  family: 'energy-heat',
  title:
    'Lowering load of 2500 kg stopped in 0.5 m: kinetic, drum and potential energy; brake torque',
  source:
    'Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 12.3 (g = 9.81 m/s²)',
  confidence: 'secondary',
  inputs: {
    m: '2500 kg',
    v: '1.5 m/s',
    'drum mass': '50 kg',
    k: '0.7 m',
    R: '0.75 m',
    'stopping distance': '0.5 m',
  },
  expected: [
    { key: 'E', label: 'Energy absorbed', value: 15124, unit: 'J', rel: 1e-6 },
    { key: 'Mt', label: 'Brake torque over the stop', value: 22686, unit: 'N·m', rel: 1e-6 },
  ],
  toleranceNote: 'the companion prints exact integers for these inputs: ±1e-6',
  run() {
    const E =
      linearEnergy(mass(2500), speed(1.5)) +
      rotatingEnergy(inertia(50 * 0.7 ** 2), angularSpeed(1.5 / 0.75)) +
      potentialEnergy(mass(2500), length(0.5), 9.81);
    return { E, Mt: E / (0.5 / 0.75) };
  },
});
