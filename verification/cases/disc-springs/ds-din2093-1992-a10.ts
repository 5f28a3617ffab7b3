import { discRowCase, CATALOGUE_1992, TOL_1992 } from '../../helpers/disc-row.js';

export const verificationCase = discRowCase({
  id: 'ds-din2093-1992-a10',
  designation: 'A 10',
  De: 10,
  Di: 5.2,
  t: 0.5,
  l0: 0.75,
  F: 329,
  sigmaOM: -1210,
  source: CATALOGUE_1992,
  confidence: 'published',
  rel: 0.025,
  toleranceNote: TOL_1992,
});
