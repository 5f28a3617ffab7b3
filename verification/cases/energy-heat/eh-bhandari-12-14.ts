import { defineCase } from '../../case.js';
import {
  energy,
  inertia,
  mass,
  rotatingEnergy,
  rpm,
  specificHeat,
  temperatureRise,
} from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'eh-bhandari-12-14',
  family: 'energy-heat',
  title: 'Flywheel stopped from 500 rpm: temperature rise of a 5 kg drum',
  source:
    "Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 12.14 — the companion notes the printed answer is erroneous; the expected value is its recomputation from the book's data",
  confidence: 'derived',
  inputs: { M: '100 kg', k: '350 mm', n: '500 rpm', 'drum mass': '5 kg', c: '460 J/(kg·K)' },
  expected: [{ key: 'dT', label: 'Temperature rise', value: 7.300885, unit: 'K', rel: 1e-6 }],
  toleranceNote: 'recomputed to six decimals: ±1e-6',
  run() {
    const E = rotatingEnergy(inertia(100 * 0.35 ** 2), rpm(500));
    return { dT: temperatureRise(energy(E), mass(5), specificHeat(460)) };
  },
});
