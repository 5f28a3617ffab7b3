import { discRowCase, CATALOGUE_1992, TOL_1992 } from '../../helpers/disc-row.js';

export const verificationCase = discRowCase({
  id: 'ds-din2093-1992-a8',
  designation: 'A 8',
  De: 8,
  Di: 4.2,
  t: 0.4,
  l0: 0.6,
  F: 210,
  sigmaOM: -1200,
  source: CATALOGUE_1992,
  confidence: 'published',
  rel: 0.025,
  toleranceNote: TOL_1992,
});
