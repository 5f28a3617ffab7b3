import { defineCase } from '../../case.js';
import { degrees, length, pivotDistance } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'ps-shigley-16-8',
  family: 'pivoted-shoe',
  title: 'Pivot distance of a symmetrical pivoted shoe with θ2 = 60°',
  source:
    "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 8th ed., Problem 16-8 (reference-values.md §2): a = 1.170·r",
  confidence: 'published',
  inputs: { r: '1 (a is reported as a multiple of r)', theta2: '60 deg' },
  expected: [{ key: 'aOverR', label: 'a/r', value: 1.17, unit: '', abs: 0.001 }],
  toleranceNote: 'the solution gives three decimals: ±0.001·r',
  run: () => ({ aOverR: pivotDistance(length(1), degrees(60)) }),
});
