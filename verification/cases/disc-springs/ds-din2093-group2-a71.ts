import { discRowCase, CODE_TABLE, TOL_CODE } from '../../helpers/disc-row.js';

export const verificationCase = discRowCase({
  id: 'ds-din2093-group2-a71',
  designation: 'A 71',
  De: 71,
  Di: 36,
  t: 4.0,
  l0: 5.6,
  F: 20500,
  source: CODE_TABLE,
  confidence: 'secondary',
  rel: 0.005,
  toleranceNote: TOL_CODE,
});
