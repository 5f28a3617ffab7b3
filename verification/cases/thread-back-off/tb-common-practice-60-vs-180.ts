import { discSprings } from '../../calc-api.js';
import { defineCase } from '../../case.js';

export const verificationCase = defineCase({
  id: 'tb-common-practice-60-vs-180',
  family: 'thread-back-off',
  title: 'Single disc backed off 60° versus a stack of three backed off 180° on the same thread',
  source:
    'common practice, no published source (disc under a castle nut: flat then about 60°; three on an equaliser: flat then about 180°); equality follows from Δ = P·θ/360° shared among i discs in series (derived)',
  confidence: 'derived',
  inputs: { disc: 'A 40', P: '2.5 mm', single: '60 deg, i = 1', stack: '180 deg, i = 3' },
  expected: [
    { key: 'ratio', label: 'Per-disc deflection, stack ÷ single', value: 1, unit: '', abs: 1e-12 },
    { key: 's', label: 'Per-disc deflection', value: 0.9 - 2.5 / 6, unit: 'mm', abs: 1e-9 },
  ],
  toleranceNote: 'exact geometry',
  run() {
    const disc = { De: 0.04, Di: 0.0204, t: 2.25e-3, l0: 3.15e-3, ...discSprings.TABLE_STEEL };
    const one = discSprings.backOffPreload(
      { disc, seriesCount: 1, parallelCount: 1, frictionCone: 0, frictionEdge: 0 },
      2.5e-3,
      60,
    );
    const three = discSprings.backOffPreload(
      { disc, seriesCount: 3, parallelCount: 1, frictionCone: 0, frictionEdge: 0 },
      2.5e-3,
      180,
    );
    return { ratio: three.setDeflection / one.setDeflection, s: one.setDeflection * 1e3 };
  },
});
