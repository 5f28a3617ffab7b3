import { discRowCase, CODE_TABLE, TOL_CODE } from '../../helpers/disc-row.js';

export const verificationCase = discRowCase({
  id: 'ds-din2093-group2-a63',
  designation: 'A 63',
  De: 63,
  Di: 31,
  t: 3.5,
  l0: 4.9,
  F: 15000,
  source: CODE_TABLE,
  confidence: 'secondary',
  rel: 0.005,
  toleranceNote: TOL_CODE,
});
