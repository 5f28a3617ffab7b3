import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { driveTrainOverload, type DriveTrainOverloadInput } from './drive-train-overload.js';
import { Derivation } from '../core/step.js';
import { isCalcInputError } from '../core/errors.js';
import { nearlyEqual } from '../testing/expect-close.js';
import { demoHoist } from '../testing/demo-hoist.js';
import * as q from '../units/quantities.js';

const close = (a: number, b: number, rel: number) =>
  expect(nearlyEqual(a, b, rel), `${a} vs ${b}`).toBe(true);

const base: DriveTrainOverloadInput = {
  torqueAtReference: q.torque(400),
  muAtReference: q.ratio(0.4),
  springForceAtReference: q.force(1000),
  muMax: q.ratio(0.5),
  springForceMax: q.force(1500),
  brakesOnTrain: 1,
  driveTrainRating: q.torque(800),
};

describe('driveTrainOverload', () => {
  it('hand values: 400 · (0.5/0.4) · (1500/1000) = 750 N·m ≤ 800; two brakes 1500 > 800', () => {
    const d = new Derivation('brake');
    const one = driveTrainOverload(base, d);
    close(one.torqueTopOfRange, 750, 1e-12);
    expect(one.check.pass).toBe(true);
    close(one.check.utilisation, 750 / 800, 1e-12);
    expect(d.find('torque-max-adjustable')!.formula).toBe(
      'M_b,max,adj = M_ref · (μ_max / μ_ref) · (F_s,max / F_s,ref)',
    );
    const two = driveTrainOverload({ ...base, brakesOnTrain: 2 });
    close(two.trainTorque, 1500, 1e-12);
    expect(two.check.pass).toBe(false);
    expect(two.check.label).toMatch(/^Both brakes at μ max/);
  });

  it('demo hoist: 499 N·m at the set force becomes 726 N·m at the top of the range', () => {
    const h = demoHoist();
    const r = driveTrainOverload({
      torqueAtReference: h.torqueMaxAtSetForce,
      muAtReference: h.muMax,
      springForceAtReference: h.springForce,
      muMax: h.muMax,
      springForceMax: h.springForceMax,
      brakesOnTrain: 1,
      driveTrainRating: h.driveTrainRating,
    });
    close(r.torqueTopOfRange, 726.05, 1e-4);
    expect(r.check.pass).toBe(true);
  });

  it('invariant: torque rises with μ max, spring maximum and brake count', () => {
    const pos = (min: number, max: number) => fc.double({ min, max, noNaN: true });
    fc.assert(
      fc.property(
        pos(0.05, 1),
        pos(10, 1e5),
        fc.integer({ min: 1, max: 4 }),
        pos(1.001, 2),
        (mu, F, n, k) => {
          const inp = { ...base, muMax: q.ratio(mu), springForceMax: q.force(F), brakesOnTrain: n };
          const r = driveTrainOverload(inp).trainTorque;
          expect(
            driveTrainOverload({ ...inp, muMax: q.ratio(Math.min(2, mu * k)) }).trainTorque,
          ).toBeGreaterThan(r);
          expect(
            driveTrainOverload({ ...inp, springForceMax: q.force(F * k) }).trainTorque,
          ).toBeGreaterThan(r);
          if (n < 4)
            expect(
              driveTrainOverload({ ...inp, brakesOnTrain: n + 1 }).trainTorque,
            ).toBeGreaterThan(r);
        },
      ),
    );
  });

  it('bad input names the field', () => {
    for (const [patch, field] of [
      [{ torqueAtReference: q.torque(-1) }, 'torqueAtReference'],
      [{ muAtReference: q.ratio(0) }, 'muAtReference'],
      [{ springForceAtReference: q.force(0) }, 'springForceAtReference'],
      [{ muMax: q.ratio(Number.NaN) }, 'muMax'],
      [{ springForceMax: q.force(-5) }, 'springForceMax'],
      [{ brakesOnTrain: 0 }, 'brakesOnTrain'],
      [{ brakesOnTrain: 1.5 }, 'brakesOnTrain'],
      [{ driveTrainRating: q.torque(0) }, 'driveTrainRating'],
    ] as [Partial<DriveTrainOverloadInput>, string][]) {
      let err: unknown;
      try {
        driveTrainOverload({ ...base, ...patch });
      } catch (e) {
        err = e;
      }
      expect(isCalcInputError(err), field).toBe(true);
      expect((err as { fields: { field: string }[] }).fields[0].field).toBe(field);
    }
  });
});
