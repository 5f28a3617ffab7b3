import { discRowCase, CODE_TABLE, TOL_CODE } from '../../helpers/disc-row.js';

export const verificationCase = discRowCase({
  id: 'ds-din2093-group2-b63',
  designation: 'B 63',
  De: 63,
  Di: 31,
  t: 2.5,
  l0: 4.25,
  F: 7190,
  source: CODE_TABLE,
  confidence: 'secondary',
  rel: 0.005,
  toleranceNote: TOL_CODE,
});
