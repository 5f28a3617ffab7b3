import { defineCase } from '../../case.js';
import {
  energy,
  length,
  mass,
  potentialEnergy,
  specificHeat,
  temperatureRise,
} from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'eh-openstax-14-2',
  family: 'energy-heat',
  title: 'Truck descending 75 m: temperature rise of 100 kg of brake material',
  source:
    'OpenStax, College Physics (2012), Example 14.2 (reference-values.md §3; also coded in FOSSEE Textbook Companion 3845)',
  confidence: 'published',
  inputs: { m: '10000 kg', h: '75 m', g: '9.80 m/s²', 'brake mass': '100 kg', c: '800 J/(kg·°C)' },
  expected: [{ key: 'dT', label: 'Temperature rise', value: 91.875, unit: 'K', rel: 1e-9 }],
  toleranceNote: 'exact arithmetic of the stated data (the book rounds to ≈ 92 °C)',
  run: () => ({
    dT: temperatureRise(
      energy(potentialEnergy(mass(10000), length(75), 9.8)),
      mass(100),
      specificHeat(800),
    ),
  }),
});
