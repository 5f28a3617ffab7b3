import { defineCase } from '../../case.js';
import { angularSpeed, inertia, speed, stopping, time, torque } from '../../calc-api.js';

/**
 * A straight-line stop maps onto the rotational model with J = 1 kg·m², ω = v (1 m radius): the
 * "torque" is then the decelerating force per kilogram, and the set delay is the reaction time.
 */
function stopDistance(v0: number, decel: number, delay: number): number {
  const r = stopping({
    inertia: inertia(1),
    speed: angularSpeed(v0),
    loadSpeed: speed(v0),
    brakeTorque: torque(decel),
    driveTorque: torque(0),
    setDelay: time(delay),
  });
  if (!r.stops) throw new Error('expected a stop');
  return r.stoppingDistance;
}

export const verificationCase = defineCase({
  id: 'st-openstax-2-12',
  family: 'stopping',
  title: 'Car from 30 m/s on dry and wet concrete, with and without a 0.5 s reaction time',
  source:
    'OpenStax, College Physics (2012), Example 2.12, as coded in the FOSSEE Scilab Textbook Companion, book 3845 (book: 64.3 m, 90.0 m, 79.3 m, 105 m)',
  confidence: 'secondary',
  inputs: {
    v0: '30.0 m/s',
    'deceleration dry': '7.00 m/s²',
    'deceleration wet': '5.00 m/s²',
    'reaction time': '0.500 s',
  },
  expected: [
    { key: 'dry', label: 'Stopping distance, dry', value: 64.3, unit: 'm', abs: 0.05 },
    { key: 'wet', label: 'Stopping distance, wet', value: 90.0, unit: 'm', abs: 0.05 },
    { key: 'dryDelay', label: 'Dry, with reaction time', value: 79.3, unit: 'm', abs: 0.05 },
    { key: 'wetDelay', label: 'Wet, with reaction time', value: 105, unit: 'm', abs: 0.5 },
  ],
  toleranceNote: 'three significant figures: half a unit in the last printed digit',
  run: () => ({
    dry: stopDistance(30, 7, 0),
    wet: stopDistance(30, 5, 0),
    dryDelay: stopDistance(30, 7, 0.5),
    wetDelay: stopDistance(30, 5, 0.5),
  }),
});
