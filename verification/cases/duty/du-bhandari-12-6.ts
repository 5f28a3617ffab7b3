import { defineCase } from '../../case.js';
import {
  angularSpeed,
  hoistLoadSpeed,
  hoistLoadTorques,
  length,
  mass,
  ratio,
} from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'du-bhandari-12-6',
  family: 'duty',
  title:
    'Hoist: load torque referred to the brake shaft through a 4:1 gear, lowering speed at the pv limit',
  source:
    'Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 12.6 (P = m·g·Rc/(i·μ·Rb) = 4598.4375 N with g = 9.81; lowering speed 0.375 m/s at pv = 2 N/mm²·m/s, p = 1 N/mm²)',
  confidence: 'secondary',
  inputs: {
    m: '500 kg',
    Rc: '150 mm',
    'gear ratio': 4,
    Rb: '200 mm',
    mu: 0.2,
    'rubbing speed at the pv limit': '2 m/s',
  },
  expected: [
    {
      key: 'M',
      label: 'Static load torque at the brake shaft (μ·P·Rb)',
      value: 0.2 * 4598.4375 * 0.2,
      unit: 'N·m',
      rel: 0.001,
    },
    { key: 'v', label: 'Lowering speed of the load', value: 0.375, unit: 'm/s', rel: 1e-9 },
  ],
  toleranceNote:
    'the book uses g = 9.81 m/s², the core standard gravity 9.80665 (0.035 % lower): ±0.1 %',
  run() {
    const t = hoistLoadTorques({
      load: mass(500),
      hookBlock: mass(0),
      drumDiameter: length(0.3),
      reeving: ratio(1),
      gearRatio: ratio(4),
      efficiency: ratio(1),
    });
    return {
      M: t.staticTorque,
      v: hoistLoadSpeed(angularSpeed(2 / 0.2), length(0.3), ratio(1), ratio(4)),
    };
  },
});
