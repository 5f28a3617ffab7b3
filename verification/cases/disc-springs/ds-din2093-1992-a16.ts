import { discRowCase, CATALOGUE_1992, TOL_1992 } from '../../helpers/disc-row.js';

export const verificationCase = discRowCase({
  id: 'ds-din2093-1992-a16',
  designation: 'A 16',
  De: 16,
  Di: 8.2,
  t: 0.9,
  l0: 1.25,
  F: 1000,
  sigmaOM: -1160,
  source: CATALOGUE_1992,
  confidence: 'published',
  rel: 0.025,
  toleranceNote: TOL_1992,
});
