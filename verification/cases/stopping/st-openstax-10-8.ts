import { defineCase } from '../../case.js';
import { angularSpeed, inertia, speed, stopping, time, torque } from '../../calc-api.js';

// Grindstone: I = ½·85·0.320², net torque 0.320 m × 200 N spun it up through 1 rad; the same torque
// as a brake stops it from the reached speed in the same angle.
const I = 0.5 * 85 * 0.32 ** 2;
const tau = 0.32 * 200;
const omega = Math.sqrt((2 * tau * 1) / I);

export const verificationCase = defineCase({
  id: 'st-openstax-10-8',
  family: 'stopping',
  title: 'Grindstone: angular deceleration from torque and inertia, stopping angle',
  source:
    'OpenStax, College Physics (2012), Example 10.8, as coded in the FOSSEE Scilab Textbook Companion, book 3845 (α = τ/I = 14.7 rad/s², ω = 5.42 rad/s after 1 rad)',
  confidence: 'secondary',
  inputs: { M: '85.0 kg', r: '0.320 m', F: '200 N', 'spin-up angle': '1.00 rad' },
  expected: [
    { key: 'alpha', label: 'Angular deceleration', value: 14.7, unit: 'rad/s²', rel: 0.004 },
    {
      key: 'omega',
      label: 'Speed reached after 1 rad (stopping from it)',
      value: 5.42,
      unit: 'rad/s',
      rel: 0.002,
    },
    { key: 'angle', label: 'Stopping angle', value: 1.0, unit: 'rad', rel: 1e-9 },
  ],
  toleranceNote: 'three significant figures: ±0.4 % (α) and ±0.2 % (ω); the angle is exact',
  run() {
    const r = stopping({
      inertia: inertia(I),
      speed: angularSpeed(omega),
      loadSpeed: speed(1),
      brakeTorque: torque(tau),
      driveTorque: torque(0),
      setDelay: time(0),
    });
    if (!r.stops) throw new Error('expected a stop');
    return { alpha: r.deceleration, omega, angle: r.stoppingAngle };
  },
});
