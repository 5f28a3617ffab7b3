import { discSprings } from '../../calc-api.js';
import { defineCase } from '../../case.js';

export const verificationCase = defineCase({
  id: 'tb-domain-m20-four-discs',
  family: 'thread-back-off',
  title: 'M20×2.5, four discs in series, backed off 90° from flat',
  source:
    'Δ = P·θ/360° shared by the discs in series (DOMAIN.md §5.3 worked example, derived from thread geometry; ISO 261 pitch 2.5 mm for M20, secondary copy)',
  confidence: 'derived',
  inputs: { P: '2.5 mm', theta: '90 deg', i: 4, disc: 'A 40 (h0 = 0.9 mm)' },
  expected: [
    { key: 'release', label: 'Axial release Δ', value: 0.625, unit: 'mm', abs: 1e-9 },
    { key: 'perDisc', label: 'Release per disc', value: 0.15625, unit: 'mm', abs: 1e-9 },
  ],
  toleranceNote: 'exact geometry: ±1e-9 mm',
  run() {
    const disc = { De: 0.04, Di: 0.0204, t: 2.25e-3, l0: 3.15e-3, ...discSprings.TABLE_STEEL };
    const r = discSprings.backOffPreload(
      { disc, seriesCount: 4, parallelCount: 1, frictionCone: 0, frictionEdge: 0 },
      2.5e-3,
      90,
    );
    return { release: r.release * 1e3, perDisc: (0.9e-3 - r.setDeflection) * 1e3 };
  },
});
