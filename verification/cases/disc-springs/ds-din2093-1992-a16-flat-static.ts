import { discSprings } from '../../calc-api.js';
import { defineCase } from '../../case.js';
import { CATALOGUE_1992 } from '../../helpers/disc-row.js';

export const verificationCase = defineCase({
  id: 'ds-din2093-1992-a16-flat-static',
  family: 'disc-springs',
  title: 'Disc spring A 16 pressed flat: σOM, as the stack sheet checks it',
  source: `${CATALOGUE_1992}: σOM = −1160 N/mm² at s = 0.75·h0; σOM is linear in s for group 1–2 discs (DIN EN 16984 σOM formula), so at flat σOM = −1160/0.75 = −1546.7 N/mm² (derived from the published value)`,
  confidence: 'derived',
  inputs: {
    De: '16 mm',
    Di: '8.2 mm',
    t: '0.9 mm',
    l0: '1.25 mm',
    s: 'h0 = 0.35 mm',
    E: '206000 N/mm²',
    nu: 0.3,
  },
  expected: [
    { key: 'sigma', label: 'σOM at flat', value: -1160 / 0.75, unit: 'N/mm²', rel: 0.025 },
  ],
  toleranceNote: 'the 1992 table values scatter up to ±2 % about the formula: ±2.5 %',
  run() {
    const disc = { De: 0.016, Di: 0.0082, t: 0.0009, l0: 0.00125, ...discSprings.TABLE_STEEL };
    const flat = disc.l0 - disc.t;
    return { sigma: discSprings.discStresses(disc, flat).sigmaOM / 1e6 };
  },
});
