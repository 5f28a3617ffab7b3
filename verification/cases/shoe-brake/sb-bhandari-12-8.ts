import { defineCase } from '../../case.js';
import { actuatingForce, shoeFromActuatingForce, MM } from '../../calc-api.js';

const h = Math.hypot(86.6, 50) * MM;
const g = { f: 0.32, b: 40 * MM, r: 125 * MM, a: h, theta1: 0, theta2: (120 * Math.PI) / 180 };
const c = (100.9 + 86.6) * MM;

export const verificationCase = defineCase({
  id: 'sb-bhandari-12-8',
  family: 'shoe-brake',
  title: 'Internal two-shoe brake: actuating force for pmax = 1 N/mm² and total torque',
  source:
    'Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 12.8',
  confidence: 'secondary',
  inputs: {
    w: '40 mm',
    pmax: '1 N/mm²',
    mu: 0.32,
    R: '125 mm',
    theta1: '0 deg',
    theta2: '120 deg',
    hinge: '86.6 mm and 50 mm from the centre lines (a = 100 mm)',
    c: '100.9 + 86.6 mm',
  },
  expected: [
    { key: 'P', label: 'Actuating force', value: 2089.795894, unit: 'N', rel: 1e-4 },
    {
      key: 'Mt',
      label: 'Total torque of both shoes',
      value: 434831.05153,
      unit: 'N·mm',
      rel: 1e-4,
    },
  ],
  toleranceNote:
    'the companion prints six decimals from the same equations; the hinge distance a = √(86.6² + 50²) is rounded in the book: ±0.01 %',
  run() {
    const P = actuatingForce(g, 1e6, c, true);
    const right = shoeFromActuatingForce(g, P, c, true);
    const left = shoeFromActuatingForce(g, P, c, false);
    return { P, Mt: (right.shoeTorque + left.shoeTorque) / MM };
  },
});
