import { defineCase } from '../../case.js';
import { force, length, ratio, stiffness, strokeWearChain, torque } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'rs-stroke-wear-chain',
  family: 'release-stroke',
  title:
    'Stroke–wear chain without lift stop: clearance from the stroke, re-adjustment point, torque lost',
  source:
    "stroke chain of a thruster without lift stop (common practice, no published source; the thruster maker's data governs): ε = (s_n − s_r,0)/r_t, w_adj = (s_r,0 − s_r,min)/r_t, w_0 = s_r,0/r_t; spring force F_s − k·r_s·w (statics) — values computed by hand (derived)",
  confidence: 'derived',
  inputs: {
    s_n: '60 mm',
    's_r,0': '24 mm',
    's_r,min': '6 mm',
    r_t: 20,
    F_s: '2000 N',
    k_s: '50 N/mm',
    r_s: 4,
    'M_b,0': '500 N·m',
  },
  expected: [
    { key: 'eps', label: 'Shoe clearance', value: 1.8, unit: 'mm', rel: 1e-12 },
    { key: 'wAdj', label: 'Wear at re-adjustment', value: 0.9, unit: 'mm', rel: 1e-12 },
    { key: 'w0', label: 'Wear at which torque is lost', value: 1.2, unit: 'mm', rel: 1e-12 },
    {
      key: 'Madj',
      label: 'Torque at re-adjustment (500 · 1820/2000)',
      value: 455,
      unit: 'N·m',
      rel: 1e-12,
    },
    { key: 'Mpast', label: 'Torque past w_0', value: 0, unit: 'N·m', abs: 0 },
  ],
  toleranceNote: 'exact arithmetic',
  run() {
    const r = strokeWearChain({
      nominalStroke: length(0.06),
      reserveStroke: length(0.024),
      minReserveStroke: length(0.006),
      thrusterTravelRatio: ratio(20),
      springForce: force(2000),
      springRate: stiffness(50e3),
      springTravelRatio: ratio(4),
      torqueNew: torque(500),
    });
    return {
      eps: r.clearance * 1e3,
      wAdj: r.wearAtReadjust * 1e3,
      w0: r.wearReserveUsed * 1e3,
      Madj: r.torqueAtReadjust,
      Mpast: r.torqueAtWear(1.3e-3),
    };
  },
});
