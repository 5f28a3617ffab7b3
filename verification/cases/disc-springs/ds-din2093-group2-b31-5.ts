import { discRowCase, CODE_TABLE, TOL_CODE } from '../../helpers/disc-row.js';

export const verificationCase = discRowCase({
  id: 'ds-din2093-group2-b31-5',
  designation: 'B 31.5',
  De: 31.5,
  Di: 16.3,
  t: 1.25,
  l0: 2.15,
  F: 1910,
  source: CODE_TABLE,
  confidence: 'secondary',
  rel: 0.005,
  toleranceNote: TOL_CODE,
});
