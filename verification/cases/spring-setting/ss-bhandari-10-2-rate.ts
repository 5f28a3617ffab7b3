import { defineCase } from '../../case.js';
import { force, length, springLength, stiffness } from '../../calc-api.js';

const G = 81370e6;
const d = 11e-3;
const D = 55e-3;
const N = 5;
const k = (G * d ** 4) / (8 * D ** 3 * N);

export const verificationCase = defineCase({
  id: 'ss-bhandari-10-2-rate',
  family: 'spring-setting',
  title: 'Spring setting from the rate of a helical spring: change of length between two forces',
  source:
    'Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 10.2 (G 81 370 N/mm², d 11 mm, D 55 mm, 5 active coils → actual rate 179.014 N/mm; required rate 200 N/mm for 1 kN over 5 mm)',
  confidence: 'secondary',
  inputs: { G: '81370 N/mm²', d: '11 mm', D: '55 mm', N: 5, 'force change': '1 kN' },
  expected: [
    {
      key: 'dL',
      label: 'Length change for 1 kN at the actual rate',
      value: 1000 / 179.014,
      unit: 'mm',
      rel: 1e-6,
    },
  ],
  toleranceNote: 'the companion prints the rate to six significant figures: ±1e-6',
  run: () => ({
    dL:
      (springLength(length(0.1), force(2500), stiffness(k)) -
        springLength(length(0.1), force(3500), stiffness(k))) *
      1e3,
  }),
});
