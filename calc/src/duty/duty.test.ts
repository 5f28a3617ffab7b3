import { describe, expect, it } from 'vitest';
import { motorRatedTorque } from './motor-torque.js';
import { referTorque, referRotatingInertia, referLinearMass } from './referral.js';
import { hoistLoadTorques, hoistLoadSpeed } from './hoist-load.js';
import { requiredBrakeTorque } from './required-torque.js';
import { Derivation } from '../core/step.js';
import { CalcInputError } from '../core/errors.js';
import { nearlyEqual } from '../testing/expect-close.js';
import {
  angularSpeed,
  inertia,
  length,
  mass,
  power,
  ratio,
  rpm,
  speed,
  torque,
} from '../units/quantities.js';

const close = (a: number, b: number, rel: number) =>
  expect(nearlyEqual(a, b, rel), `${a} vs ${b}`).toBe(true);

describe('motor rated torque', () => {
  it('equals the trade identity 9550·P[kW]/n[rpm] (9549.3 exactly)', () => {
    // Identity from DOMAIN §1.1 row 2 (SI form M = 9550·P/n); 60000/2π = 9549.297.
    close(motorRatedTorque(power(55_000), rpm(1480)), (9549.296585513721 * 55) / 1480, 1e-12);
    close(motorRatedTorque(power(55_000), rpm(1480)), (9550 * 55) / 1480, 1e-4);
  });
  it('matches the US form T[lb·ft] = 5252·HP/rpm within its rounding', () => {
    const t = motorRatedTorque(power(100 * 745.6998715822702), rpm(1750));
    close(t / 1.3558179483314003, (5252 * 100) / 1750, 2e-4);
  });
  it('records the derivation step and rejects zero speed', () => {
    const d = new Derivation('duty');
    motorRatedTorque(power(1000), angularSpeed(100), d);
    expect(d.steps[0].formula).toBe('M_mot = P / ω_mot');
    expect(() => motorRatedTorque(power(1000), angularSpeed(0))).toThrow(CalcInputError);
  });
});

describe('referral through gears', () => {
  it('divides by i·η when driving and multiplies by η/i when overhauling', () => {
    close(referTorque(torque(10_000), ratio(40), ratio(0.9), 'driving'), 10_000 / 36, 1e-12);
    close(referTorque(torque(10_000), ratio(40), ratio(0.9), 'overhauling'), 225, 1e-12);
  });
  it('refers rotating inertia by speed ratio squared and masses by (v/ω)²', () => {
    close(referRotatingInertia(inertia(100), angularSpeed(1), angularSpeed(40)), 0.0625, 1e-12);
    close(
      referLinearMass(mass(20_000), speed(0.2), angularSpeed(155)),
      20_000 * (0.2 / 155) ** 2,
      1e-12,
    );
  });
  it('rejects efficiency above 1', () => {
    expect(() => referTorque(torque(1), ratio(1), ratio(1.2), 'driving')).toThrow(/efficiency/);
  });
});

describe('hoist load torque', () => {
  const input = {
    load: mass(20_000),
    hookBlock: mass(500),
    drumDiameter: length(0.5),
    reeving: ratio(4),
    gearRatio: ratio(40),
    efficiency: ratio(0.9),
  };
  it('computes static, hoisting (M/η) and holding (M·η) torque', () => {
    const r = hoistLoadTorques(input);
    const ML = (20_500 * 9.80665 * 0.25) / 160;
    close(r.staticTorque, ML, 1e-12);
    close(r.hoistingTorque, ML / 0.9, 1e-12);
    close(r.holdingTorque, ML * 0.9, 1e-12);
    // DOMAIN §2.1: hoisting ÷ holding = 1/η² (≈ 23 % more at η = 0.9).
    close(r.hoistingTorque / r.holdingTorque, 1 / 0.81, 1e-12);
  });
  it('hook speed follows from brake-shaft speed', () => {
    close(
      hoistLoadSpeed(rpm(1480), length(0.5), ratio(4), ratio(40)),
      (((1480 * Math.PI) / 30) * 0.25) / 160,
      1e-12,
    );
  });
  it('required torque = factor × reference', () => {
    close(requiredBrakeTorque(ratio(1.25), torque(400)), 500, 1e-12);
    const d = new Derivation();
    requiredBrakeTorque(ratio(1.25), torque(400), d, 'hoisting');
    expect(d.steps[0].label).toContain('hoisting torque');
  });
});
