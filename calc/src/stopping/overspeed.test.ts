import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { maxSetDelay, overspeedChecks, type OverspeedInput } from './overspeed.js';
import { speedAtSet } from './speed-at-set.js';
import { Derivation } from '../core/step.js';
import { isCalcInputError } from '../core/errors.js';
import { nearlyEqual } from '../testing/expect-close.js';
import { demoHoist } from '../testing/demo-hoist.js';
import * as q from '../units/quantities.js';

const close = (a: number, b: number, rel: number) =>
  expect(nearlyEqual(a, b, rel), `${a} vs ${b}`).toBe(true);
const toRpm = (w: number) => (w * 30) / Math.PI;

const base: OverspeedInput = {
  setSpeed: q.rpm(1500),
  motorRatio: q.ratio(1),
  motorMaxSpeed: q.rpm(3000),
  drumDiameter: q.length(0.4),
  drumMaxPeripheralSpeed: q.speed(30),
};

describe('overspeedChecks', () => {
  it('hand values: 1500 rpm on a 400 mm drum is 31.4 m/s (over 30), motor at half its limit', () => {
    const d = new Derivation('stopping');
    const r = overspeedChecks(
      { ...base, ropeDrum: { gearRatio: q.ratio(40), maxSpeed: q.rpm(40) } },
      d,
    );
    close(r.drumPeripheralSpeed, (1500 * Math.PI * 0.4) / 60, 1e-12);
    const [motor, drum, rope] = r.checks;
    expect(motor.pass).toBe(true);
    close(motor.utilisation, 0.5, 1e-12);
    expect(drum.pass).toBe(false);
    close(drum.utilisation, 31.4159265 / 30, 1e-8);
    close(toRpm(r.ropeDrumSpeed!), 37.5, 1e-12);
    expect(rope.pass).toBe(true);
    expect(d.steps.map((s) => s.id)).toEqual([
      'motor-speed-at-set',
      'drum-peripheral-speed-at-set',
      'rope-drum-speed-at-set',
    ]);
  });

  it('demo hoist with a 10 s set delay reaches 8 580 rpm and fails both checks', () => {
    const h = demoHoist();
    const atSet = (td: number) =>
      speedAtSet({
        inertia: h.inertia,
        speed: h.omega0,
        loadTorque: h.load.staticTorque,
        backDrivingEfficiency: h.efficiency,
        setDelay: q.time(td),
        frictionRadius: q.length(0.2),
        pressure: h.lining.meanPressure,
        brakeTorque: q.torque(300),
      });
    const slow = atSet(10);
    close(toRpm(slow.setSpeed), 8580, 0.001);
    // motor limit and drum rating: invented demo values (a 6-pole motor, grey-iron drum)
    const limits = {
      motorRatio: q.ratio(1),
      motorMaxSpeed: q.rpm(2000),
      drumDiameter: q.length(0.4),
    };
    const r = overspeedChecks({
      ...limits,
      setSpeed: slow.setSpeed,
      drumMaxPeripheralSpeed: q.speed(30),
    });
    expect(r.checks.map((c) => c.pass)).toEqual([false, false]);
    // at the demo's 0.3 s both pass
    const ok = overspeedChecks({
      ...limits,
      setSpeed: atSet(0.3).setSpeed,
      drumMaxPeripheralSpeed: q.speed(30),
    });
    expect(ok.checks.every((c) => c.pass)).toBe(true);
    // and the longest delay the motor limit allows is about 1.34 s
    const tmax = maxSetDelay(h.omega0, q.rpm(2000), slow.delayAcceleration);
    close(tmax, (q.rpm(2000) - h.omega0) / slow.delayAcceleration, 1e-12);
    close(tmax, 1.348, 0.002);
  });

  it('invariant: a higher set speed never lowers the utilisation; pass ⇔ utilisation ≤ 1', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 2000, noNaN: true }),
        fc.double({ min: 1, max: 3, noNaN: true }),
        (w, k) => {
          const a = overspeedChecks({ ...base, setSpeed: q.angularSpeed(w) });
          const b = overspeedChecks({ ...base, setSpeed: q.angularSpeed(w * k) });
          a.checks.forEach((c, i) => {
            expect(b.checks[i].utilisation).toBeGreaterThanOrEqual(c.utilisation);
            expect(c.pass).toBe(c.utilisation <= 1);
          });
        },
      ),
    );
  });

  it('bad input names the field', () => {
    for (const [patch, field] of [
      [{ setSpeed: q.angularSpeed(0) }, 'setSpeed'],
      [{ motorRatio: q.ratio(-1) }, 'motorRatio'],
      [{ motorMaxSpeed: q.angularSpeed(Number.NaN) }, 'motorMaxSpeed'],
      [{ drumDiameter: q.length(0) }, 'drumDiameter'],
      [{ drumMaxPeripheralSpeed: q.speed(0) }, 'drumMaxPeripheralSpeed'],
      [{ ropeDrum: { gearRatio: q.ratio(0), maxSpeed: q.rpm(10) } }, 'ropeDrum.gearRatio'],
    ] as [Partial<OverspeedInput>, string][]) {
      let err: unknown;
      try {
        overspeedChecks({ ...base, ...patch });
      } catch (e) {
        err = e;
      }
      expect(isCalcInputError(err), field).toBe(true);
      expect((err as { fields: { field: string }[] }).fields[0].field).toBe(field);
    }
    expect(() => maxSetDelay(q.rpm(100), q.rpm(200), q.angularAcceleration(0))).toThrow(
      /delayAcceleration/,
    );
  });
});
