import { defineCase } from '../../case.js';
import {
  degrees,
  length,
  pivotDistance,
  pivotedNormalForce,
  pivotedShoeTorque,
  pressure,
  ratio,
} from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'ps-bhandari-12-7',
  family: 'pivoted-shoe',
  title: 'Pivoted block subtending 100°: pivot distance, normal reaction, torque per shoe',
  source:
    'Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 12.7',
  confidence: 'secondary',
  inputs: {
    'angle subtended': '100 deg (θ2 = 50 deg)',
    D: '500 mm',
    w: '100 mm',
    mu: 0.2,
    pmax: '0.5 N/mm²',
  },
  expected: [
    {
      key: 'h',
      label: 'Pivot distance from the drum axis',
      value: 280.588279,
      unit: 'mm',
      rel: 1e-6,
    },
    {
      key: 'Rx',
      label: 'Normal resultant (reaction Rx)',
      value: 17063.356281,
      unit: 'N',
      rel: 1e-6,
    },
    { key: 'Mt', label: 'Torque of each shoe', value: 957555.553899, unit: 'N·mm', rel: 1e-6 },
  ],
  toleranceNote: 'the companion prints six decimals from the same relations: ±1e-6',
  run() {
    const h = pivotDistance(length(0.25), degrees(50));
    const N = pivotedNormalForce(pressure(0.5e6), length(0.1), length(0.25), degrees(50));
    return { h: h * 1e3, Rx: N, Mt: pivotedShoeTorque(ratio(0.2), N, h, 1) * 1e3 };
  },
});
