import { defineCase } from '../../case.js';
import { ratio, travelRatioCheck } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'rs-travel-ratio-virtual-work',
  family: 'release-stroke',
  title: 'Spring and thruster travel ratios from the lever ratio by virtual work',
  source:
    'principle of virtual work for an ideal linkage: F_s·δs = 2·N·δx ⇒ δs/δx = 2·i (statics); values computed by hand (derived)',
  confidence: 'derived',
  inputs: {
    i: 3.2,
    shoes: 2,
    'r_s entered': 6.8,
    'rod ÷ spring travel': 4,
    'r_t entered': 25.6,
  },
  expected: [
    { key: 'rs', label: 'Spring travel ratio from the linkage', value: 6.4, unit: '', rel: 1e-12 },
    { key: 'dev', label: 'Deviation of the entered r_s', value: 0.0625, unit: '', rel: 1e-12 },
    {
      key: 'rt',
      label: 'Thruster travel ratio from the linkage',
      value: 25.6,
      unit: '',
      rel: 1e-12,
    },
    { key: 'springPass', label: 'Spring ratio check (1 pass, 0 fail)', value: 0, unit: '', abs: 0 },
  ],
  toleranceNote: 'exact arithmetic',
  run() {
    const r = travelRatioCheck({
      leverRatio: ratio(3.2),
      shoes: 2,
      springTravelRatio: ratio(6.8),
      thruster: { travelRatio: ratio(25.6), rodPerSpringTravel: ratio(4) },
    });
    return {
      rs: r.geometricRatio,
      dev: r.deviation,
      rt: r.thrusterGeometricRatio!,
      springPass: r.checks[0].pass ? 1 : 0,
    };
  },
});
