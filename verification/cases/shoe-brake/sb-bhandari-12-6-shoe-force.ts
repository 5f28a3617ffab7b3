import { defineCase } from '../../case.js';
import { force, length, ratio, shortShoeTorque } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'sb-bhandari-12-6-shoe-force',
  family: 'shoe-brake',
  title: 'Block brake on a hoist: shoe force holding 500 kg, torque of the short shoe',
  source:
    'Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 12.6 (shoe force P = 4598.4375 N for m·g·Rc/(i·μ·Rb))',
  confidence: 'secondary',
  inputs: {
    mu: 0.2,
    Rb: '200 mm',
    'shoe force P': '4598.4375 N',
    'load torque at the brake': '500·9.81·0.15/4 N·m',
  },
  expected: [
    {
      key: 'T',
      label: 'Torque of one short shoe at P',
      value: (500 * 9.81 * 0.15) / 4,
      unit: 'N·m',
      rel: 1e-9,
    },
  ],
  toleranceNote:
    "the companion's shoe force is exact to its printed digits; short-shoe torque μ·N·r is an identity: ±1e-9",
  run: () => ({ T: shortShoeTorque(ratio(0.2), force(4598.4375), length(0.2)) / 2 }),
});
