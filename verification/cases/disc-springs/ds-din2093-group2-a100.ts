import { discRowCase, CODE_TABLE, TOL_CODE } from '../../helpers/disc-row.js';

export const verificationCase = discRowCase({
  id: 'ds-din2093-group2-a100',
  designation: 'A 100',
  De: 100,
  Di: 51,
  t: 6.0,
  l0: 8.2,
  F: 48000,
  source: CODE_TABLE,
  confidence: 'secondary',
  rel: 0.005,
  toleranceNote: TOL_CODE,
});
