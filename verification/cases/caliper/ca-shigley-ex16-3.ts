import { defineCase } from '../../case.js';
import { caliperTorque, force, length, ratio, uniformWearRadius, IN, LBF } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'ca-shigley-ex16-3',
  family: 'caliper',
  title: 'Caliper brake, two annular pads, uniform wear: equivalent radius and torque',
  source:
    "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 8th ed., Example 16-3 (ri 3.875 in, ro 5.50 in, 108°, f 0.37, torque 13 000 lbf·in → F ≈ 3748 lbf, re = 4.688 in) — numbers recalled from memory",
  confidence: 'memory',
  inputs: { ri: '3.875 in', ro: '5.50 in', f: 0.37, F: '3748 lbf per pad', pads: 2 },
  expected: [
    { key: 're', label: 'Equivalent radius (uniform wear)', value: 4.6875, unit: 'in', rel: 1e-9 },
    { key: 'T', label: 'Torque of the two pads', value: 13000, unit: 'lbf·in', rel: 0.002 },
  ],
  toleranceNote:
    'recalled four-significant-figure force: ±0.2 % on the torque; the radius is exact',
  run() {
    const re = uniformWearRadius(length(5.5 * IN), length(3.875 * IN));
    return { re: re / IN, T: caliperTorque(ratio(0.37), force(3748 * LBF), re, 2, 1) / (LBF * IN) };
  },
});
