import { describe, expect, it } from 'vitest';
import { stopping } from './stopping.js';
import { tenPercentStoppingDistance } from './limits.js';
import { Derivation } from '../core/step.js';
import { nearlyEqual } from '../testing/expect-close.js';
import { angularSpeed, inertia, speed, time, torque } from '../units/quantities.js';

const close = (a: number, b: number, rel: number) =>
  expect(nearlyEqual(a, b, rel), `${a} vs ${b}`).toBe(true);

describe('stopping', () => {
  const base = {
    inertia: inertia(2),
    speed: angularSpeed(150),
    loadSpeed: speed(0.3),
    brakeTorque: torque(700),
    driveTorque: torque(300),
    setDelay: time(0.2),
  };

  it('a lowering load accelerates during the set delay, then decelerates at (M_b − M_d)/J', () => {
    const d = new Derivation('stopping');
    const r = stopping(base, d);
    if (!r.stops) throw new Error('expected a stop');
    close(r.speedAfterDelay, 180, 1e-12);
    close(r.deceleration, 200, 1e-12);
    close(r.brakingTime, 0.9, 1e-12);
    close(r.stoppingTime, 1.1, 1e-12);
    const phi = 165 * 0.2 + (180 * 0.9) / 2;
    close(r.stoppingAngle, phi, 1e-12);
    close(r.stoppingDistance, (phi * 0.3) / 150, 1e-12);
    close(r.loadDeceleration, (200 * 0.3) / 150, 1e-12);
    // Work of the brake = kinetic energy at set + work of the driving load while braking.
    close(r.brakeEnergy, 0.5 * 2 * 180 ** 2 + (300 * 180 * 0.9) / 2, 1e-12);
    expect(d.steps.map((s) => s.id)).toContain('braking-time');
  });

  it('no driving torque and no delay: t = Jω/M (US form t = WK²·N/(308·T))', () => {
    const r = stopping({ ...base, driveTorque: torque(0), setDelay: time(0) });
    if (!r.stops) throw new Error('expected a stop');
    close(r.brakingTime, (2 * 150) / 700, 1e-12);
    // 308 form: WK² [lb·ft²] = J/0.0421401, N [rpm], T [lb·ft].
    const wk2 = 2 / 0.042140110093804806;
    const n = (150 * 30) / Math.PI;
    const T = 700 / 1.3558179483314003;
    // 308 is rounded from g·60/(2π) = 307.2 (g = 32.174 ft/s²): agree within 0.3 %.
    close(r.brakingTime, (wk2 * n) / (308 * T), 3e-3);
  });

  it('a brake weaker than the lowering load is a failed result, not an exception', () => {
    const r = stopping({ ...base, brakeTorque: torque(250) });
    expect(r.stops).toBe(false);
    if (!r.stops) expect(r.message).toMatch(/never stopped/);
  });
});

describe('travel limits', () => {
  it('10 %-of-speed rule (29 CFR 1910.179): 100 ft/min → 10 ft', () => {
    const v = speed((100 * 0.3048) / 60);
    close(tenPercentStoppingDistance(v) / 0.3048, 10, 1e-12);
    close(tenPercentStoppingDistance(speed(1)), 6, 1e-12);
  });
});
