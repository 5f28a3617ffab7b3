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
  id: 'ps-derived-instance',
  family: 'pivoted-shoe',
  title: 'Pivoted shoe: normal force, pivot distance and torque per shoe',
  source:
    "derived instance of Shigley's pivoted-shoe relations (Budynas & Nisbett, 8th ed., §16-4) given in reference-values.md §2",
  confidence: 'derived',
  inputs: { r: '0.25 m', b: '0.10 m', pa: '0.5 MPa', f: 0.35, theta2: '60 deg' },
  expected: [
    { key: 'N', label: 'Normal force', value: 18502.6, unit: 'N', abs: 0.05 },
    { key: 'a', label: 'Pivot distance', value: 0.29253, unit: 'm', abs: 5e-6 },
    { key: 'T', label: 'Torque per shoe', value: 1894.4, unit: 'N·m', abs: 0.05 },
  ],
  toleranceNote: 'half a unit in the last quoted digit (five or six significant figures)',
  run() {
    const N = pivotedNormalForce(pressure(0.5e6), length(0.1), length(0.25), degrees(60));
    const a = pivotDistance(length(0.25), degrees(60));
    return { N, a, T: pivotedShoeTorque(ratio(0.35), N, a, 1) };
  },
});
