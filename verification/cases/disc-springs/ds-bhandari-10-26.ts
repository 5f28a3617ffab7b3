import { discSprings } from '../../calc-api.js';
import { defineCase } from '../../case.js';

const mm = 1e-3;

export const verificationCase = defineCase({
  id: 'ds-bhandari-10-26',
  family: 'disc-springs',
  title: 'Belleville spring pressed flat: load and maximum compressive stress',
  source:
    'Bhandari, Design of Machine Elements (3rd ed.), Example 10.26, as coded in the FOSSEE Scilab Textbook Companion (book 764): design for 4500 N at flat and 1375 N/mm²; resulting t = 2.65298, h = 3.97947, Do = 154.818, Di = 88.4677 mm (E 207 000 N/mm², ν 0.3)',
  confidence: 'secondary',
  inputs: {
    De: '154.818478 mm',
    Di: '88.467702 mm',
    t: '2.652980 mm',
    h0: '3.979470 mm',
    E: '207000 N/mm²',
    nu: 0.3,
    s: 'h0 (flat)',
  },
  expected: [
    { key: 'F', label: 'Force at flat', value: 4500, unit: 'N', rel: 0.01 },
    {
      key: 'sigmaI',
      label: 'Compressive stress at point I, flat',
      value: -1375,
      unit: 'N/mm²',
      rel: 0.01,
    },
  ],
  toleranceNote:
    "the book uses Almen–László's M = 6/(π·ln δ)·((δ−1)/δ)², 0.52 % below the DIN K1 at δ = 1.75, and six-figure dimensions: ±1 %",
  run() {
    const d = {
      De: 154.818478 * mm,
      Di: 88.467702 * mm,
      t: 2.65298 * mm,
      l0: (2.65298 + 3.97947) * mm,
      E: 207e9,
      nu: 0.3,
    };
    discSprings.validateDisc(d);
    const h0 = 3.97947 * mm;
    return {
      F: discSprings.discForce(d, h0),
      sigmaI: discSprings.discStresses(d, h0).sigmaI / 1e6,
    };
  },
});
