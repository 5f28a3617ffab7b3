import { compressionSpring, force, length, pressure, ratio } from '../../calc-api.js';
import { defineCase } from '../../case.js';

export const verificationCase = defineCase({
  id: 'hs-shigley-10e-p10-3',
  family: 'helical-spring',
  title:
    'Helical compression spring: index, Bergsträsser factor, rate, solid length, stress, buckling',
  source:
    "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Problem 10-3 as worked in the publisher's solutions (music wire d 2.5 mm, OD 31 mm, plain and ground ends, N_t 14: k = 1.314 N/mm Eq. (10-9), L_s = 35 mm Table 10-1, K_B = 1.117 Eq. (10-5), F_s = 167.9 N at S_sy 871.2 MPa Eq. (10-7), (L_0)cr = 2.63·D/α = 149.9 mm with α 0.5)",
  confidence: 'secondary',
  inputs: {
    d: '2.5 mm',
    D: '28.5 mm',
    N_a: 13,
    ends: 'plain and ground',
    G: '81.0 GPa',
    E: '2.6·G (for the buckling constant)',
    alpha: 0.5,
    F: '167.9 N',
  },
  expected: [
    { key: 'KB', label: 'Bergsträsser factor', value: 1.117, unit: '', rel: 5e-4 },
    { key: 'k', label: 'Spring rate', value: 1.314, unit: 'N/mm', rel: 5e-4 },
    { key: 'Ls', label: 'Solid length', value: 35, unit: 'mm', rel: 1e-12 },
    { key: 'tau', label: 'Shear stress at 167.9 N', value: 871.2, unit: 'MPa', rel: 5e-4 },
    { key: 'L0cr', label: 'Critical free length', value: 149.9, unit: 'mm', rel: 0.005 },
  ],
  toleranceNote:
    'the solution prints four significant figures (±0.05 %); the critical length uses the rounded steel constant 2.63, ours evaluates Eq. (10-13) with E = 2.6·G (2.620): ±0.5 %',
  run() {
    const r = compressionSpring({
      wireDiameter: length(2.5e-3),
      meanDiameter: length(28.5e-3),
      activeCoils: 13,
      endType: 'plain-ground',
      freeLength: length(162.8e-3),
      shearModulus: pressure(81e9),
      elasticModulus: pressure(2.6 * 81e9),
      endFixity: ratio(0.5),
      maxForce: force(167.9),
      allowableShear: pressure(871.2e6),
      allowableShearSolid: pressure(871.2e6),
    });
    return {
      KB: r.correction,
      k: r.rate / 1e3,
      Ls: r.solidLength * 1e3,
      tau: r.shearStress / 1e6,
      L0cr: r.criticalFreeLength * 1e3,
    };
  },
});
