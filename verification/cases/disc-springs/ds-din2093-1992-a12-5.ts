import { discRowCase, CATALOGUE_1992, TOL_1992 } from '../../helpers/disc-row.js';

export const verificationCase = discRowCase({
  id: 'ds-din2093-1992-a12-5',
  designation: 'A 12.5',
  De: 12.5,
  Di: 6.2,
  t: 0.7,
  l0: 1.0,
  F: 673,
  sigmaOM: -1280,
  source: CATALOGUE_1992,
  confidence: 'published',
  rel: 0.025,
  toleranceNote: TOL_1992,
});
