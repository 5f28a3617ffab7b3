import { defineCase } from '../../case.js';
import { actuatingForce, shoeFromActuatingForce, MM } from '../../calc-api.js';

const g = {
  f: 0.3,
  b: 50 * MM,
  r: 250 * MM,
  a: 200 * MM,
  theta1: (15 * Math.PI) / 180,
  theta2: (75 * Math.PI) / 180,
};
const c = 200 * MM;

export const verificationCase = defineCase({
  id: 'sb-bhandari-12-9',
  family: 'shoe-brake',
  title: 'Four-shoe brake with short linings (θ2 < 90°, θa = θ2): actuating force and torque',
  source:
    'Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 12.9',
  confidence: 'secondary',
  inputs: {
    w: '50 mm',
    pmax: '1 N/mm²',
    mu: 0.3,
    R: '250 mm',
    theta1: '15 deg',
    theta2: '75 deg',
    a: '200 mm',
    c: '200 mm',
    shoes: '2 pairs',
  },
  expected: [
    { key: 'P', label: 'Actuating force', value: 5025.457606, unit: 'N', rel: 1e-5 },
    {
      key: 'Mt',
      label: 'Torque of the four shoes',
      value: 2181614.276244,
      unit: 'N·mm',
      rel: 1e-5,
    },
  ],
  toleranceNote: 'the companion prints six decimals from the same equations: ±0.001 %',
  run() {
    const P = actuatingForce(g, 1e6, c, true);
    const right = shoeFromActuatingForce(g, P, c, true);
    const left = shoeFromActuatingForce(g, P, c, false);
    return { P, Mt: (2 * (right.shoeTorque + left.shoeTorque)) / MM };
  },
});
