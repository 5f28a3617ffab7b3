import { defineCase } from '../../case.js';
import { force, length, ratio, releaseAndStroke, stiffness } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'rs-stroke-budget',
  family: 'release-stroke',
  title: 'Release force and stroke budget of a thruster drum brake (new and worn lining)',
  source:
    "virtual work through the release linkage and the stroke budget (statics; stroke terms common practice, the thruster maker's data governs) — values computed by hand (derived)",
  confidence: 'derived',
  inputs: {
    Fs: '5000 N',
    k: '100 N/mm',
    clearance: '1.0 mm',
    'spring travel ratio': 2,
    'thruster travel ratio': 8,
    eta: 0.9,
    'nominal stroke': '50 mm',
    'reserve stroke': '10 mm',
    wear: '1.5 mm',
  },
  expected: [
    { key: 'Frel', label: 'Spring force when released', value: 5200, unit: 'N', rel: 1e-12 },
    {
      key: 'Fth',
      label: 'Thruster force needed',
      value: (5200 * 2) / (8 * 0.9),
      unit: 'N',
      rel: 1e-12,
    },
    { key: 'sw', label: 'Working stroke', value: 8, unit: 'mm', rel: 1e-12 },
    { key: 'sworn', label: 'Reserve stroke at worn lining', value: -2, unit: 'mm', abs: 1e-9 },
    { key: 'warn', label: 'Zero-reserve warning raised (1 = yes)', value: 1, unit: '', abs: 0 },
  ],
  toleranceNote: 'exact arithmetic',
  run() {
    const r = releaseAndStroke({
      springForce: force(5000),
      springRate: stiffness(100e3),
      clearance: length(1e-3),
      springTravelRatio: ratio(2),
      thrusterTravelRatio: ratio(8),
      efficiency: ratio(0.9),
      thrusterForce: force(2000),
      nominalStroke: length(0.05),
      reserveStroke: length(0.01),
      wear: length(1.5e-3),
      minReserveStroke: length(0.002),
    });
    return {
      Frel: r.releasedSpringForce,
      Fth: r.thrusterForceNeeded,
      sw: r.workingStroke * 1e3,
      sworn: r.wornReserveStroke * 1e3,
      warn: r.warnings.some((w) => /reserve stroke reaches zero/.test(w)) ? 1 : 0,
    };
  },
});
