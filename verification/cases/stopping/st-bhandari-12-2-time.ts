import { defineCase } from '../../case.js';
import { angularSpeed, inertia, speed, stopping, time, torque } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'st-bhandari-12-2-time',
  family: 'stopping',
  title: 'Car from 100 km/h at 0.5 g: braking time',
  source:
    'Bhandari, Design of Machine Elements (McGraw-Hill), worked example as coded in the FOSSEE Scilab Textbook Companion, book 764, Example 12.2 (t = v/a)',
  confidence: 'secondary',
  inputs: { v: '100 km/h', deceleration: '0.5 × 9.81 m/s²' },
  expected: [{ key: 't', label: 'Braking time', value: 100 / 3.6 / 4.905, unit: 's', rel: 1e-9 }],
  toleranceNote: 'exact kinematics of the stated data',
  run() {
    const v = 100 / 3.6;
    const r = stopping({
      inertia: inertia(1),
      speed: angularSpeed(v),
      loadSpeed: speed(v),
      brakeTorque: torque(4.905),
      driveTorque: torque(0),
      setDelay: time(0),
    });
    if (!r.stops) throw new Error('expected a stop');
    return { t: r.stoppingTime };
  },
});
