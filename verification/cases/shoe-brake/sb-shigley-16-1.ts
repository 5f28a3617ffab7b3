import { defineCase } from '../../case.js';
import {
  actuatingForce,
  shoeFromActuatingForce,
  shoeMomentCoefficients,
  IN,
  LBF,
  PSI,
} from '../../calc-api.js';

const g = { f: 0.28, b: 1.5 * IN, r: 6 * IN, a: 5 * IN, theta1: 0, theta2: (120 * Math.PI) / 180 };
const F = 500 * LBF;
const c = 8.66 * IN;
const LBF_IN = LBF * IN;

export const verificationCase = defineCase({
  id: 'sb-shigley-16-1',
  family: 'shoe-brake',
  title: 'Internal expanding two-shoe brake: shoe moments, pressures and torques',
  source:
    "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 8th ed., Problem 16-1 (instructor's solutions; reference-values.md §2)",
  confidence: 'published',
  inputs: {
    theta1: '0 deg',
    theta2: '120 deg',
    thetaA: '90 deg',
    a: '5 in',
    r: '6 in',
    b: '1.5 in',
    f: 0.28,
    F: '500 lbf each shoe',
    c: '8.66 in',
  },
  expected: [
    { key: 'mf', label: 'Mf per unit pa', value: 17.96, unit: 'lbf·in/psi', rel: 0.005 },
    { key: 'mn', label: 'MN per unit pa', value: 56.87, unit: 'lbf·in/psi', rel: 0.005 },
    {
      key: 'paRight',
      label: 'pa, right (self-energising) shoe',
      value: 111.4,
      unit: 'psi',
      rel: 0.005,
    },
    { key: 'paLeft', label: 'pa, left shoe', value: 57.9, unit: 'psi', rel: 0.005 },
    { key: 'tRight', label: 'Torque, right shoe', value: 2530, unit: 'lbf·in', rel: 0.005 },
    { key: 'tLeft', label: 'Torque, left shoe', value: 1310, unit: 'lbf·in', rel: 0.005 },
    { key: 'total', label: 'Total torque', value: 3840, unit: 'lbf·in', rel: 0.005 },
  ],
  toleranceNote: 'the solution rounds to three or four significant figures: ±0.5 %',
  run() {
    const k = shoeMomentCoefficients(g);
    const right = shoeFromActuatingForce(g, F, c, true);
    const left = shoeFromActuatingForce(g, F, c, false);
    // consistency: the forward form gives back the actuating force
    if (Math.abs(actuatingForce(g, right.maxPressure, c, true) / F - 1) > 1e-9)
      throw new Error('actuatingForce inverse mismatch');
    return {
      mf: (k.mf * PSI) / LBF_IN,
      mn: (k.mn * PSI) / LBF_IN,
      paRight: right.maxPressure / PSI,
      paLeft: left.maxPressure / PSI,
      tRight: right.shoeTorque / LBF_IN,
      tLeft: left.shoeTorque / LBF_IN,
      total: (right.shoeTorque + left.shoeTorque) / LBF_IN,
    };
  },
});
