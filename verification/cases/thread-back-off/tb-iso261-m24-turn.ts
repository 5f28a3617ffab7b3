import { discSprings } from '../../calc-api.js';
import { defineCase } from '../../case.js';

export const verificationCase = defineCase({
  id: 'tb-iso261-m24-turn',
  family: 'thread-back-off',
  title: 'M24 coarse thread: one full turn and half a turn',
  source:
    'ISO 261 coarse pitch M24 = 3.0 mm (secondary copy, reference-values.md §5); axial travel = pitch × angle/360°',
  confidence: 'secondary',
  inputs: { P: '3.0 mm', theta: '360 deg and 180 deg' },
  expected: [
    { key: 'turn', label: 'Travel for 360°', value: 3.0, unit: 'mm', abs: 1e-9 },
    { key: 'half', label: 'Travel for 180°', value: 1.5, unit: 'mm', abs: 1e-9 },
  ],
  toleranceNote: 'exact geometry: ±1e-9 mm',
  run: () => ({
    turn: discSprings.threadRelease(3.0e-3, 360) * 1e3,
    half: discSprings.threadRelease(3.0e-3, 180) * 1e3,
  }),
});
