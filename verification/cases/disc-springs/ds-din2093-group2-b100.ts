import { discRowCase, CODE_TABLE, TOL_CODE } from '../../helpers/disc-row.js';

export const verificationCase = discRowCase({
  id: 'ds-din2093-group2-b100',
  designation: 'B 100',
  De: 100,
  Di: 51,
  t: 3.5,
  l0: 6.3,
  F: 13100,
  source: CODE_TABLE,
  confidence: 'secondary',
  rel: 0.005,
  toleranceNote: TOL_CODE,
});
