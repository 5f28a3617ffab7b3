import { defineCase } from '../../case.js';
import { angularSpeed, inertia, speed, stopping, time, torque } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'st-lowering-during-delay',
  family: 'stopping',
  title: 'Lowering load keeps accelerating during the set delay, then stops under the net torque',
  source:
    'rigid-body dynamics (textbook identity): ω1 = ω0 + (M_d/J)·t_d, α = (M_b − M_d)/J, t_b = ω1/α, φ = (ω0 + ω1)·t_d/2 + ω1·t_b/2 — values computed by hand (derived)',
  confidence: 'derived',
  inputs: {
    J: '2 kg·m²',
    omega0: '150 rad/s',
    v0: '0.3 m/s',
    Mb: '700 N·m',
    Md: '300 N·m',
    td: '0.2 s',
  },
  expected: [
    { key: 'omega1', label: 'Speed when the brake sets', value: 180, unit: 'rad/s', rel: 1e-12 },
    { key: 'alpha', label: 'Deceleration', value: 200, unit: 'rad/s²', rel: 1e-12 },
    { key: 'tStop', label: 'Stopping time incl. delay', value: 1.1, unit: 's', rel: 1e-12 },
    {
      key: 'sLoad',
      label: 'Load travel incl. delay',
      value: ((33 + 81) * 0.3) / 150,
      unit: 'm',
      rel: 1e-12,
    },
  ],
  toleranceNote: 'exact arithmetic',
  run() {
    const r = stopping({
      inertia: inertia(2),
      speed: angularSpeed(150),
      loadSpeed: speed(0.3),
      brakeTorque: torque(700),
      driveTorque: torque(300),
      setDelay: time(0.2),
    });
    if (!r.stops) throw new Error('expected a stop');
    return {
      omega1: r.speedAfterDelay,
      alpha: r.deceleration,
      tStop: r.stoppingTime,
      sLoad: r.stoppingDistance,
    };
  },
});
