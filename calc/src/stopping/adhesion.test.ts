import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Derivation } from '../core/step.js';
import { nearlyEqual } from '../testing/expect-close.js';
import {
  acceleration,
  angularSpeed,
  inertia,
  mass,
  speed,
  time,
  torque,
} from '../units/quantities.js';
import { adhesionNeeded, railBrakingForce, type AdhesionInput } from './limits.js';
import { stopping } from './stopping.js';

const G = 9.80665;
const close = (a: number, b: number, rel: number) =>
  expect(nearlyEqual(a, b, rel), `${a} vs ${b}`).toBe(true);
const pos = (min: number, max: number) =>
  fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

/** The stop of one brake (t_d = 0) and the adhesion its wheels need, as the travel sheet chains them. */
function stopAndAdhesion(p: {
  m: number;
  nBr: number;
  v: number;
  omega: number;
  jRot: number;
  Mb: number;
  Md: number;
}) {
  const jLoad = (p.m / p.nBr) * (p.v / p.omega) ** 2;
  const r = stopping({
    inertia: inertia(p.jRot + jLoad),
    speed: angularSpeed(p.omega),
    loadSpeed: speed(p.v),
    brakeTorque: torque(p.Mb),
    driveTorque: torque(p.Md),
    setDelay: time(0),
  });
  if (!r.stops) throw new Error('expected a stop');
  const input: AdhesionInput = {
    mass: mass(p.m),
    loadDeceleration: r.loadDeceleration,
    driveTorque: torque(p.Md),
    brakeCount: p.nBr,
    shaftSpeed: angularSpeed(p.omega),
    loadSpeed: speed(p.v),
    brakedWheels: 2,
    wheels: 4,
  };
  return { alpha: r.deceleration, F: railBrakingForce(input), mu: adhesionNeeded(input), input };
}

describe('wheel adhesion needed by a travel stop', () => {
  // Hand-worked: m = 60 000 kg on 4 wheels, 2 braked, n_br = 2 brakes, v = 0.5 m/s at ω = 100 rad/s
  // (v/ω = 0.005 m/rad). Per brake J_rot = 0.2 kg·m², J_load,b = 30 000 · 0.005² = 0.75 kg·m²,
  // J_eq = 0.95 kg·m². M_b = 100 N·m, M_d = 5 N·m (slope) at each brake shaft:
  //   α_b = (100 − 5)/0.95 = 100 rad/s², a_L = 100 · 0.005 = 0.5 m/s², m·a_L = 30 000 N
  //   F_ext = n_br·M_d·ω/v = 2 · 5 · 100/0.5 = 2 000 N → F_rail = 32 000 N
  //   check: n_br·(M_b − J_rot·α_b)·ω/v = 2 · (100 − 0.2 · 100) · 200 = 32 000 N
  //   normal load on braked wheels m·g·2/4 = 294 199.5 N → μ_req = 32 000/294 199.5 = 0.108 770
  // The old m·a_L basis gave 30 000/294 199.5 = 0.101 972, below the 0.107 339 it gives on the
  // level (M_d = 0: α_b = 100/0.95, a_L = 0.526 3 m/s²): the slope lowered the adhesion needed.
  const hand = { m: 60_000, nBr: 2, v: 0.5, omega: 100, jRot: 0.2, Mb: 100 };

  it('hand-worked case: the rail force includes the force driving the motion', () => {
    const { alpha, F, mu, input } = stopAndAdhesion({ ...hand, Md: 5 });
    close(alpha, 100, 1e-12);
    close(input.loadDeceleration, 0.5, 1e-12);
    close(F, 32_000, 1e-12);
    close(mu, 0.10876972938431234, 1e-12);
    close(mu, 32_000 / 294_199.5, 1e-12);
    const level = stopAndAdhesion({ ...hand, Md: 0 });
    close(level.mu, 0.10733854873451877, 1e-12);
    expect(mu).toBeGreaterThan(level.mu);
  });

  it('prints both steps, the rail force saying it includes the driving force', () => {
    const d = new Derivation('stopping');
    adhesionNeeded(stopAndAdhesion({ ...hand, Md: 5 }).input, d);
    const f = d.find('rail-braking-force');
    expect(f?.label).toContain('including the force that drives the motion (slope, wind)');
    expect(f?.formula).toBe('F_rail = m · a_L + n_br · M_d · ω_0 / v_0');
    expect(d.find('adhesion-needed')?.formula).toBe(
      'μ_req = F_rail / (m · g · n_braked / n_wheels)',
    );
  });

  it('with no driving torque it equals the former m·a_L/(m·g·n_b/n_w), bit for bit', () => {
    fc.assert(
      fc.property(
        pos(100, 1e6),
        pos(0, 5),
        fc.integer({ min: 1, max: 8 }),
        fc.integer({ min: 1, max: 32 }),
        fc.integer({ min: 0, max: 32 }),
        pos(0.05, 5),
        pos(1, 400),
        (m, a, nBr, nB, extra, v, omega) => {
          const mu = adhesionNeeded({
            mass: mass(m),
            loadDeceleration: acceleration(a),
            driveTorque: torque(0),
            brakeCount: nBr,
            shaftSpeed: angularSpeed(omega),
            loadSpeed: speed(v),
            brakedWheels: nB,
            wheels: nB + extra,
          });
          expect(mu).toBe((m * a) / ((m * G * nB) / (nB + extra)));
        },
      ),
    );
    // The value the former test held: 50 t at 0.5 m/s², 2 of 4 wheels braked.
    const former = adhesionNeeded({
      mass: mass(50_000),
      loadDeceleration: acceleration(0.5),
      driveTorque: torque(0),
      brakeCount: 1,
      shaftSpeed: angularSpeed(100),
      loadSpeed: speed(1),
      brakedWheels: 2,
      wheels: 4,
    });
    close(former, 0.5 / (G * 0.5), 1e-12);
  });

  const chain = fc.record({
    m: pos(1_000, 500_000),
    nBr: fc.integer({ min: 1, max: 4 }),
    v: pos(0.1, 3),
    omega: pos(50, 320),
    jRot: pos(0.01, 2),
    Mb: pos(20, 5_000),
  });

  it('rises with the driving torque (slope, wind) over the stop', () => {
    fc.assert(
      fc.property(chain, pos(0, 0.89), pos(0.01, 0.1), (p, lo, gap) => {
        const a = stopAndAdhesion({ ...p, Md: lo * p.Mb });
        const b = stopAndAdhesion({ ...p, Md: (lo + gap) * p.Mb });
        expect(b.F).toBeGreaterThan(a.F);
        expect(b.mu).toBeGreaterThan(a.mu);
      }),
      { numRuns: 300 },
    );
  });

  it('equals n_br·(M_b − J_rot·α_b)·ω/v, the brake torque less the rotating parts’ share', () => {
    fc.assert(
      fc.property(chain, pos(0, 0.99), (p, frac) => {
        const { alpha, F } = stopAndAdhesion({ ...p, Md: frac * p.Mb });
        close(F, (p.nBr * (p.Mb - p.jRot * alpha) * p.omega) / p.v, 1e-9);
      }),
      { numRuns: 300 },
    );
  });

  it('refuses more braked wheels than wheels', () => {
    const { input } = stopAndAdhesion({ ...hand, Md: 5 });
    expect(() => adhesionNeeded({ ...input, brakedWheels: 5 })).toThrow(/brakedWheels/);
  });
});
