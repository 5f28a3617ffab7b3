import { discRowCase, CATALOGUE_1992, TOL_1992 } from '../../helpers/disc-row.js';

export const verificationCase = discRowCase({
  id: 'ds-din2093-1992-a20',
  designation: 'A 20',
  De: 20,
  Di: 10.2,
  t: 1.1,
  l0: 1.55,
  F: 1530,
  sigmaOM: -1180,
  source: CATALOGUE_1992,
  confidence: 'published',
  rel: 0.025,
  toleranceNote: TOL_1992,
});
