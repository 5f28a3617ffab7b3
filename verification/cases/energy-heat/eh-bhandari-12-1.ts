import { defineCase } from '../../case.js';
import { inertia, rotatingEnergy, rpm, speed, stopping, time, torque } from '../../calc-api.js';

// Solid steel disc: m = ρ·π·D²/4·t, J = m·D²/8.
const m = 7200 * Math.PI * 0.25 * 0.2;
const J = (m * 1) / 8;

export const verificationCase = defineCase({
  id: 'eh-bhandari-12-1',
  family: 'energy-heat',
  title: 'Solid steel disc stopped from 350 rpm in 1.5 s: energy and braking torque',
  source:
    'Bhandari, Design of Machine Elements, Example 12.1, as coded in the FOSSEE Scilab Textbook Companion, book 764 (reference-values.md §3, published)',
  confidence: 'published',
  inputs: { D: '1 m', thickness: '0.2 m', rho: '7200 kg/m³', n: '350 rpm', 'stop time': '1.5 s' },
  expected: [
    { key: 'E', label: 'Energy absorbed', value: 94956.72, unit: 'J', rel: 1e-4 },
    {
      key: 't',
      label: 'Stop time at the published torque 3454.36 N·m',
      value: 1.5,
      unit: 's',
      rel: 1e-4,
    },
  ],
  toleranceNote: 'published to two decimals: ±0.01 %',
  run() {
    const E = rotatingEnergy(inertia(J), rpm(350));
    const s = stopping({
      inertia: inertia(J),
      speed: rpm(350),
      loadSpeed: speed(1),
      brakeTorque: torque(3454.36),
      driveTorque: torque(0),
      setDelay: time(0),
    });
    if (!s.stops) throw new Error('expected the disc to stop');
    return { E, t: s.stoppingTime };
  },
});
