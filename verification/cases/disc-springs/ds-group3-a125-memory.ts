import { discRowCase } from '../../helpers/disc-row.js';

export const verificationCase = discRowCase({
  id: 'ds-group3-a125-memory',
  designation: 'A 125 (group 3, t′ = 7.5 mm)',
  De: 125,
  Di: 64,
  t: 8,
  l0: 10.6,
  tReduced: 7.5,
  F: 85900,
  source:
    'DIN 2093 group 3 row A 125 recalled from memory (F = 85 900 N at s = 0.75·(l0 − t)); exercises the K4 relation, itself recalled from DIN 2092:2006 — a lead, not an oracle',
  confidence: 'memory',
  rel: 0.01,
  toleranceNote: 'memory of a three-significant-figure table value: ±1 %',
});
