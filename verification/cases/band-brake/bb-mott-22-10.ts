import { defineCase } from '../../case.js';
import { bandBrake, degrees, length, pressure, ratio, IN, LBF, PSI } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'bb-mott-22-10',
  family: 'band-brake',
  title: 'Band brake: tight and slack side forces and torque at the allowed lining pressure',
  source:
    'Mott, Machine Elements in Mechanical Design, 4th ed., Example Problem 22-10 (reference-values.md §2)',
  confidence: 'published',
  inputs: { pmax: '25 psi', f: 0.25, r: '6.0 in', wrap: '225 deg', width: '2.0 in' },
  expected: [
    { key: 'P1', label: 'Tight side P1', value: 300, unit: 'lb', rel: 0.003 },
    { key: 'P2', label: 'Slack side P2', value: 112, unit: 'lb', rel: 0.005 },
    { key: 'T', label: 'Torque', value: 1128, unit: 'lb·in', rel: 0.003 },
  ],
  toleranceNote:
    'the book rounds P2 to 112 lb (exact 112.3) and so prints 1128 lb·in where the exact exponential gives 1126: ±0.3 % (P2 ±0.5 %)',
  run() {
    const r = bandBrake(
      pressure(25 * PSI),
      length(2 * IN),
      length(6 * IN),
      ratio(0.25),
      degrees(225),
    );
    return { P1: r.tight / LBF, P2: r.slack / LBF, T: r.torque / (LBF * IN) };
  },
});
