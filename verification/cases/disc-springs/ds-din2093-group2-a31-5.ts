import { discRowCase, CODE_TABLE, TOL_CODE } from '../../helpers/disc-row.js';

export const verificationCase = discRowCase({
  id: 'ds-din2093-group2-a31-5',
  designation: 'A 31.5',
  De: 31.5,
  Di: 16.3,
  t: 1.75,
  l0: 2.45,
  F: 3870,
  source: CODE_TABLE,
  confidence: 'secondary',
  rel: 0.005,
  toleranceNote: TOL_CODE,
});
