import { defineCase } from '../../case.js';
import { force, length, ratio, releaseAndStroke, stiffness } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'rs-openstax-9-3-lever',
  family: 'release-stroke',
  title: 'Lever statics by virtual work (wheelbarrow): input force for a 45 kg load',
  source:
    'OpenStax, College Physics (2012), Example 9.3, as coded in the FOSSEE Scilab Textbook Companion, book 3845 (F_i = F_o·l_o/l_i = 32.4 N, MA 13.6); the release linkage uses the same virtual-work relation F_th = F·r_s/(r_t·η)',
  confidence: 'secondary',
  inputs: {
    load: '45.0 kg × 9.80 m/s²',
    'output arm (spring side)': '7.50 cm',
    'input arm (thruster side)': '1.02 m',
    efficiency: 1,
  },
  expected: [
    { key: 'Fi', label: 'Input (thruster-side) force', value: 32.4, unit: 'N', rel: 0.002 },
  ],
  toleranceNote: 'three significant figures: ±0.2 %',
  run() {
    const r = releaseAndStroke({
      springForce: force(45 * 9.8),
      springRate: stiffness(0),
      clearance: length(1e-3),
      springTravelRatio: ratio(0.075),
      thrusterTravelRatio: ratio(1.02),
      efficiency: ratio(1),
      thrusterForce: force(100),
      nominalStroke: length(0.06),
      reserveStroke: length(0.01),
      wear: length(0),
      minReserveStroke: length(0.002),
    });
    return { Fi: r.thrusterForceNeeded };
  },
});
