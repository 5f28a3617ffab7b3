import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { loadConsistency, type LoadConsistencyInput } from './load-consistency.js';
import { Derivation } from '../core/step.js';
import { isCalcInputError } from '../core/errors.js';
import { nearlyEqual } from '../testing/expect-close.js';
import { demoHoist } from '../testing/demo-hoist.js';
import * as q from '../units/quantities.js';

const close = (a: number, b: number, rel: number) =>
  expect(nearlyEqual(a, b, rel), `${a} vs ${b}`).toBe(true);
const g = 9.80665;

const base: LoadConsistencyInput = {
  staticTorque: q.torque(1000 * g * 0.05),
  loadSpeed: q.speed(0.5),
  brakeSpeed: q.angularSpeed(10),
  inertia: q.inertia(10),
};

describe('loadConsistency', () => {
  it('hand values: r_k = 0.5/10 = 0.05 m; 1000 kg; J_L = 1000·0.05² = 2.5 kg·m²', () => {
    const d = new Derivation('duty');
    const r = loadConsistency({ ...base, loadMass: q.mass(1010) }, d);
    close(r.kinematicRadius, 0.05, 1e-12);
    close(r.impliedMass, 1000, 1e-12);
    close(r.loadInertia, 2.5, 1e-12);
    close(r.torqueDeviation!, 1000 / 1010 - 1, 1e-12);
    expect(r.checks.map((c) => [c.id, c.pass])).toEqual([
      ['inertia-includes-load', true],
      ['static-torque-consistent', true],
    ]);
    expect(d.steps.map((s) => s.id)).toEqual([
      'kinematic-radius',
      'implied-load-mass',
      'load-inertia-implied',
      'static-torque-from-load',
      'static-torque-deviation',
    ]);
  });

  it('catches an inertia that leaves out the load, and a torque that belongs to another load', () => {
    const r = loadConsistency({ ...base, inertia: q.inertia(2), loadMass: q.mass(1200) });
    expect(r.checks.map((c) => c.pass)).toEqual([false, false]);
  });

  it('the demo hoist is consistent with itself: the implied mass is load + hook block', () => {
    const h = demoHoist();
    const r = loadConsistency({
      staticTorque: h.load.staticTorque,
      loadSpeed: h.loadSpeed,
      brakeSpeed: h.omega0,
      inertia: h.inertia,
      loadMass: q.mass(10_300),
    });
    close(r.impliedMass, 10_300, 1e-12);
    close(r.loadInertia, 0.025146484375, 1e-9); // the demo sheet's J_load,b
    expect(r.checks.every((c) => c.pass)).toBe(true);
  });

  it('the caliper demo (6315 N·m, 0.16 m/s at 975/40 rpm, 2800 kg·m²) implies about 10 270 kg', () => {
    const r = loadConsistency({
      staticTorque: q.torque(6315),
      loadSpeed: q.speed(0.16),
      brakeSpeed: q.rpm(975 / 40),
      inertia: q.inertia(2800),
    });
    close(r.impliedMass, 10_274, 0.001);
    close(r.loadInertia, 40.37, 0.001);
    expect(r.checks[0].pass).toBe(true);
  });

  it('invariants: J_L = m_impl·r_k², and a faster load for the same torque means a lighter one', () => {
    const pos = (min: number, max: number) => fc.double({ min, max, noNaN: true });
    fc.assert(
      fc.property(pos(1, 1e6), pos(0.01, 5), pos(0.1, 500), pos(1.01, 3), (M, v, w, k) => {
        const inp = {
          ...base,
          staticTorque: q.torque(M),
          loadSpeed: q.speed(v),
          brakeSpeed: q.angularSpeed(w),
        };
        const r = loadConsistency(inp);
        close(r.loadInertia, r.impliedMass * r.kinematicRadius ** 2, 1e-9);
        expect(loadConsistency({ ...inp, loadSpeed: q.speed(v * k) }).impliedMass).toBeLessThan(
          r.impliedMass,
        );
      }),
    );
  });

  it('bad input names the field', () => {
    for (const [patch, field] of [
      [{ staticTorque: q.torque(0) }, 'staticTorque'],
      [{ loadSpeed: q.speed(-1) }, 'loadSpeed'],
      [{ brakeSpeed: q.angularSpeed(Number.NaN) }, 'brakeSpeed'],
      [{ inertia: q.inertia(0) }, 'inertia'],
      [{ loadMass: q.mass(0) }, 'loadMass'],
      [{ tolerance: q.ratio(-0.1) }, 'tolerance'],
    ] as [Partial<LoadConsistencyInput>, string][]) {
      let err: unknown;
      try {
        loadConsistency({ ...base, ...patch });
      } catch (e) {
        err = e;
      }
      expect(isCalcInputError(err), field).toBe(true);
      expect((err as { fields: { field: string }[] }).fields[0].field).toBe(field);
    }
  });
});
