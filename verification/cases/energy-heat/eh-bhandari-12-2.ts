import { defineCase } from '../../case.js';
import {
  angularSpeed,
  inertia,
  linearEnergy,
  mass,
  referRotatingInertia,
  rotatingEnergy,
  speed,
} from '../../calc-api.js';

const v = 100 / 3.6;
const w = v / 0.35;

export const verificationCase = defineCase({
  id: 'eh-bhandari-12-2',
  family: 'energy-heat',
  title:
    'Car of 1000 kg braked from 100 km/h: energy per brake including wheels and engine inertia',
  source:
    "Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 12.2 — the companion notes an error in the printed answer; the expected value is its recomputation from the book's data",
  confidence: 'derived',
  inputs: {
    m: '1000 kg',
    'wheel inertia': '0.5 kg·m² each, 4 wheels',
    R: '0.35 m',
    'engine-side inertia': '2.5 kg·m² at 5 × wheel speed',
    v: '100 km/h',
    brakes: 4,
  },
  expected: [
    {
      key: 'E',
      label: 'Energy absorbed by each brake',
      value: 147234.819854,
      unit: 'J',
      rel: 1e-6,
    },
  ],
  toleranceNote: 'recomputed to six decimals: ±1e-6',
  run() {
    const car = linearEnergy(mass(1000), speed(v));
    const wheels = 4 * rotatingEnergy(inertia(0.5), angularSpeed(w));
    const engineAtWheel = referRotatingInertia(inertia(2.5), angularSpeed(5 * w), angularSpeed(w));
    const engine = rotatingEnergy(engineAtWheel, angularSpeed(w));
    return { E: (car + wheels + engine) / 4 };
  },
});
