import { compressionSpring, force, length, pressure, ratio } from '../../calc-api.js';
import { defineCase } from '../../case.js';

const common = {
  activeCoils: 8,
  endType: 'squared-ground' as const,
  freeLength: length(0.11),
  shearModulus: pressure(81_370e6),
  elasticModulus: pressure(2.6 * 81_370e6),
  endFixity: ratio(0.5),
  maxForce: force(1250),
  allowableShear: pressure(545e6),
  allowableShearSolid: pressure(1090e6),
  correction: 'wahl' as const,
};

export const verificationCase = defineCase({
  id: 'hs-bhandari-10-1-wahl',
  family: 'helical-spring',
  title:
    'Helical compression spring with the Wahl factor: wire size, coils, solid length, deflection',
  source:
    'Bhandari, Design of Machine Elements (McGraw-Hill), Example 10.1, as coded in the FOSSEE Scilab Textbook Companion, book 764 (P 1250 N, C 6, τ = 0.5·S_ut = 545 MPa, G 81 370 N/mm², squared and ground ends: d = 6.625083 mm → 7 mm, D 42 mm, N 8, N_t 10; free length 109.337611 mm = 70 mm solid + 9 mm gaps + deflection)',
  confidence: 'secondary',
  inputs: { P: '1250 N', C: 6, τ: '545 MPa', G: '81370 N/mm²', ends: 'squared and ground' },
  expected: [
    { key: 'K', label: 'Wahl factor at C 6', value: 1.2525, unit: '', rel: 1e-4 },
    { key: 'tau', label: 'Shear stress at d 6.625083 mm', value: 545, unit: 'MPa', rel: 1e-5 },
    { key: 'Nt', label: 'Total coils', value: 10, unit: '', rel: 1e-12 },
    { key: 'Ls', label: 'Solid length', value: 70, unit: 'mm', rel: 1e-12 },
    { key: 'y', label: 'Deflection at 1250 N', value: 30.337611, unit: 'mm', rel: 1e-6 },
  ],
  toleranceNote:
    'the companion prints six to seven significant figures; the Wahl factor is 1.2525 exactly',
  run() {
    const d0 = 6.625083e-3;
    const sized = compressionSpring({
      ...common,
      wireDiameter: length(d0),
      meanDiameter: length(6 * d0),
    });
    const built = compressionSpring({
      ...common,
      wireDiameter: length(7e-3),
      meanDiameter: length(42e-3),
    });
    return {
      K: sized.correction,
      tau: sized.shearStress / 1e6,
      Nt: built.totalCoils,
      Ls: built.solidLength * 1e3,
      y: (1250 / built.rate) * 1e3,
    };
  },
});
