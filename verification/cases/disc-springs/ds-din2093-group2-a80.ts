import { discRowCase, CODE_TABLE, TOL_CODE } from '../../helpers/disc-row.js';

export const verificationCase = discRowCase({
  id: 'ds-din2093-group2-a80',
  designation: 'A 80',
  De: 80,
  Di: 41,
  t: 5,
  l0: 6.7,
  F: 33600,
  source: CODE_TABLE,
  confidence: 'secondary',
  rel: 0.005,
  toleranceNote: TOL_CODE,
});
