import { discSprings, fromSI, toSI } from '../../calc-api.js';
import { defineCase } from '../../case.js';

export const verificationCase = defineCase({
  id: 'tb-unc-half-inch-60deg',
  family: 'thread-back-off',
  title: 'UNC 1/2-13 castle nut backed off 60°',
  source:
    'UNC 1/2-13 (13 threads per inch, reference-values.md §5, secondary); axial travel = pitch × angle/360° = (1/13)/6 in',
  confidence: 'secondary',
  inputs: { pitch: '1/13 in', theta: '60 deg' },
  expected: [{ key: 'release', label: 'Axial release', value: 1 / 78, unit: 'in', rel: 1e-9 }],
  toleranceNote: 'exact geometry through the unit conversion: ±1e-9 relative',
  run: () => ({
    release: fromSI(discSprings.threadRelease(toSI(1 / 13, 'in', 'length'), 60), 'in', 'length'),
  }),
});
