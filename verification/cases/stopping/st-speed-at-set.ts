import { defineCase } from '../../case.js';
import {
  angularSpeed,
  inertia,
  length,
  pressure,
  ratio,
  speedAtSet,
  time,
  torque,
} from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'st-speed-at-set',
  family: 'stopping',
  title: 'Lowering load: shaft speed, rubbing speed, p·v and friction power when the brake sets',
  source:
    'rigid-body dynamics (textbook identity): M_d = M_L·η_bd, ω_set = ω_0 + (M_d/J)·t_d; v = ω·r; p·v; P = M·ω — values computed by hand (derived)',
  confidence: 'derived',
  inputs: {
    J: '2 kg·m²',
    omega0: '100 rad/s',
    ML: '400 N·m',
    eta_bd: 0.8,
    td: '0.25 s',
    r_f: '0.2 m',
    p: '0.1 MPa',
    Mb: '600 N·m',
  },
  expected: [
    // α = 400·0.8/2 = 160 rad/s²; ω_set = 100 + 160·0.25 = 140 rad/s
    { key: 'omegaSet', label: 'Speed when the brake sets', value: 140, unit: 'rad/s', rel: 1e-12 },
    { key: 'ratio', label: 'Speed ratio at set', value: 1.4, unit: '', rel: 1e-12 },
    { key: 'v', label: 'Rubbing speed at set', value: 28, unit: 'm/s', rel: 1e-12 },
    { key: 'pv', label: 'p·v at set', value: 2.8, unit: 'MPa·m/s', rel: 1e-12 },
    { key: 'P', label: 'Friction power at set', value: 84, unit: 'kW', rel: 1e-12 },
  ],
  toleranceNote: 'exact arithmetic',
  run() {
    const r = speedAtSet({
      inertia: inertia(2),
      speed: angularSpeed(100),
      loadTorque: torque(400),
      backDrivingEfficiency: ratio(0.8),
      setDelay: time(0.25),
      frictionRadius: length(0.2),
      pressure: pressure(1e5),
      brakeTorque: torque(600),
    });
    return {
      omegaSet: r.setSpeed,
      ratio: r.speedRatio,
      v: r.rubbingSpeed,
      pv: r.pv / 1e6,
      P: r.frictionPower / 1e3,
    };
  },
});
