import { discSprings } from '../../calc-api.js';
import { defineCase } from '../../case.js';

export const verificationCase = defineCase({
  id: 'ds-parallel-friction-three',
  family: 'disc-springs',
  title: 'Three discs in parallel with friction: loading force',
  source:
    'rule of thumb published by a disc-spring maker (reference-values.md §1): a disc needing 5000 N for 1 mm, three in parallel need about 15 900 N when loading (about 3 % per interface)',
  confidence: 'published',
  inputs: { 'single-disc force': '5000 N', n: 3, wM: '0.03 per nested interface', wR: 0 },
  expected: [{ key: 'F', label: 'Stack force while loading', value: 15900, unit: 'N', rel: 0.01 }],
  toleranceNote: 'the source says "about 15 900 N": ±1 %',
  run() {
    // Scale a real disc so that one disc gives exactly 5000 N at its deflection, then stack three.
    const disc = { De: 0.05, Di: 0.0254, t: 2e-3, l0: 3.4e-3, ...discSprings.TABLE_STEEL };
    const s = 1e-3;
    const one = discSprings.discForce(disc, s);
    const scaled = { ...disc, E: (disc.E * 5000) / one };
    const st = {
      disc: scaled,
      seriesCount: 1,
      parallelCount: 3,
      frictionCone: 0.03,
      frictionEdge: 0,
    };
    return { F: discSprings.stackForces(st, s).loading };
  },
});
