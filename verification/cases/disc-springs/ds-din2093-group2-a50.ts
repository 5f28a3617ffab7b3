import { discRowCase, CODE_TABLE, TOL_CODE } from '../../helpers/disc-row.js';

export const verificationCase = discRowCase({
  id: 'ds-din2093-group2-a50',
  designation: 'A 50',
  De: 50,
  Di: 25.4,
  t: 3.0,
  l0: 4.1,
  F: 12000,
  source: CODE_TABLE,
  confidence: 'secondary',
  rel: 0.005,
  toleranceNote: TOL_CODE,
});
