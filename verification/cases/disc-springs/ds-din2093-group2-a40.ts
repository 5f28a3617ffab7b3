import { discRowCase, CODE_TABLE, TOL_CODE } from '../../helpers/disc-row.js';

export const verificationCase = discRowCase({
  id: 'ds-din2093-group2-a40',
  designation: 'A 40',
  De: 40,
  Di: 20.4,
  t: 2.25,
  l0: 3.15,
  F: 6500,
  source: CODE_TABLE,
  confidence: 'secondary',
  rel: 0.005,
  toleranceNote: TOL_CODE,
});
