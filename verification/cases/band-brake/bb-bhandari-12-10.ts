import { bandBrake, degrees, length, pressure, ratio } from '../../calc-api.js';
import { defineCase } from '../../case.js';

export const verificationCase = defineCase({
  id: 'bb-bhandari-12-10',
  family: 'band-brake',
  title: 'Band brake limited by band stress: tensions and torque',
  source:
    'Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 12.10 (P1 = σt·w·t = 50·100·3 N)',
  confidence: 'secondary',
  inputs: { P1: '15000 N (band 100 × 3 mm at 50 N/mm²)', mu: 0.25, R: '300 mm', wrap: '240 deg' },
  expected: [
    { key: 'P2', label: 'Slack side P2', value: 5263.797108, unit: 'N', rel: 1e-6 },
    { key: 'Mt', label: 'Torque', value: 2920.860868, unit: 'N·m', rel: 1e-6 },
  ],
  toleranceNote: 'the companion prints six decimals: ±1e-6',
  run() {
    // Express the tight-side force as the equivalent allowed pressure p = P1/(b·r) for b = 0.1 m, r = 0.3 m.
    const r = bandBrake(
      pressure(15000 / (0.1 * 0.3)),
      length(0.1),
      length(0.3),
      ratio(0.25),
      degrees(240),
    );
    return { P2: r.slack, Mt: r.torque };
  },
});
