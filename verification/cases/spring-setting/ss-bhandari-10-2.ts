import { defineCase } from '../../case.js';
import { force, length, springLength, stiffness } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'ss-bhandari-10-2',
  family: 'spring-setting',
  title: 'Helical spring: length at the minimum and maximum working forces',
  source:
    "Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 10.2 (free length 100 mm, actual rate 179.014 N/mm, forces 2.5 and 3.5 kN); lengths L = L0 − F/k computed by us (derived from the example's printed values)",
  confidence: 'derived',
  inputs: { L0: '100 mm', k: '179.014 N/mm', Fmin: '2.5 kN', Fmax: '3.5 kN' },
  expected: [
    { key: 'Lmin', label: 'Length at 2.5 kN', value: 100 - 2500 / 179.014, unit: 'mm', rel: 1e-9 },
    { key: 'Lmax', label: 'Length at 3.5 kN', value: 100 - 3500 / 179.014, unit: 'mm', rel: 1e-9 },
  ],
  toleranceNote: 'exact Hooke relation',
  run: () => ({
    Lmin: springLength(length(0.1), force(2500), stiffness(179014)) * 1e3,
    Lmax: springLength(length(0.1), force(3500), stiffness(179014)) * 1e3,
  }),
});
