import { fromSI, motorRatedTorque, power, rpm, toSI } from '../../calc-api.js';
import { defineCase } from '../../case.js';

export const verificationCase = defineCase({
  id: 'du-motor-torque',
  family: 'duty',
  title: 'Motor rated torque from power and speed, SI and US customary',
  source:
    'definition M = P/ω; trade forms 9550·P[kW]/n[rpm] and 5252·P[hp]/n[rpm] (lbf·ft) (DOMAIN.md sources S13/S14) — values computed by us (derived)',
  confidence: 'derived',
  inputs: { 'SI motor': '55 kW at 1480 rpm', 'US motor': '100 hp at 1750 rpm' },
  expected: [
    {
      key: 'si',
      label: 'Rated torque, 55 kW at 1480 rpm',
      value: (9549.297 * 55) / 1480,
      unit: 'N·m',
      rel: 1e-6,
    },
    {
      key: 'us',
      label: 'Rated torque, 100 hp at 1750 rpm',
      value: (5252.113 * 100) / 1750,
      unit: 'lbf·ft',
      rel: 1e-5,
    },
  ],
  toleranceNote: 'the trade constants are rounded (9549.30, 5252.11): ±1e-6 / ±1e-5',
  run() {
    return {
      si: motorRatedTorque(power(55000), rpm(1480)),
      us: fromSI(motorRatedTorque(power(toSI(100, 'hp', 'power')), rpm(1750)), 'lbf ft', 'torque'),
    };
  },
});
