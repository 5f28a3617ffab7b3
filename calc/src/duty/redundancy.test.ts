import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { holdingBrakeRedundancy, type RedundancyInput } from './redundancy.js';
import { Derivation } from '../core/step.js';
import { isCalcInputError } from '../core/errors.js';
import { nearlyEqual } from '../testing/expect-close.js';
import { demoHoist } from '../testing/demo-hoist.js';
import * as q from '../units/quantities.js';

const close = (a: number, b: number, rel: number) =>
  expect(nearlyEqual(a, b, rel), `${a} vs ${b}`).toBe(true);

const h = demoHoist();
// Two brakes like the demo brake: μ min at the re-adjustment point 296.5 N·m; μ max, top of range 726 N·m.
const brake = { torqueMinWorn: q.torque(296.5), torqueMaxTopOfRange: q.torque(726.05) };
const base: RedundancyInput = {
  hotMetal: true,
  powerControlBraking: true,
  brakes: [brake, brake],
  hoistingTorque: h.load.hoistingTorque,
  loadTorque: h.load.staticTorque,
  backDrivingEfficiency: q.ratio(1),
  inertia: h.inertia,
  lowerSpeed: h.omega0,
  loadSpeed: h.loadSpeed,
  setDelay: h.setDelay,
  stoppingDistanceLimit: q.length(0.25),
  driveTrainRating: q.torque(1000),
};
const byId = (r: ReturnType<typeof holdingBrakeRedundancy>) =>
  Object.fromEntries(r.checks.map((c) => [c.id, c]));

describe('holdingBrakeRedundancy', () => {
  it('hot metal with power control braking needs two brakes; one brake fails the count', () => {
    const one = holdingBrakeRedundancy({ ...base, brakes: [brake] });
    expect(one.requiredBrakes).toBe(2);
    expect(byId(one)['holding-brakes-installed'].pass).toBe(false);
    expect(one.rules.join(' ')).toMatch(/1910\.179\(f\)\(2\)\(vi\).*4898\(h\)/);
    const cold = holdingBrakeRedundancy({ ...base, hotMetal: false, brakes: [brake] });
    expect(cold.requiredBrakes).toBe(1);
    expect(byId(cold)['holding-brakes-installed'].pass).toBe(true);
  });

  it('demo hoist with two demo brakes: each holds and stops alone; together they overload the train', () => {
    const d = new Derivation('redundancy');
    const r = holdingBrakeRedundancy(base, d);
    const c = byId(r);
    expect(c['brake-1-holds-alone'].pass).toBe(true);
    close(c['brake-1-holds-alone'].utilisation, 179.3475 / 296.5, 1e-5);
    expect(c['brake-2-stops-alone'].pass).toBe(true);
    expect(r.stops[0].stops).toBe(true);
    // with no credit for gear losses: α_d = 157.83/1.7439, ω1 = ω0 + α_d·0.3
    close(r.stops[0].speedAfterDelay, h.omega0 + (h.load.staticTorque / h.inertia) * 0.3, 1e-12);
    expect(c['brake-1-stopping-distance']).toBeDefined();
    close(c['brakes-together-drive-train'].value, 1452.1, 1e-12);
    expect(c['brakes-together-drive-train'].pass).toBe(false);
    expect(d.find('brake-2-alone-speed-after-delay')).toBeDefined();
  });

  it('a brake too weak to stop the lowering load alone fails, without an exception', () => {
    const weak = { torqueMinWorn: q.torque(150), torqueMaxTopOfRange: q.torque(300) };
    const r = holdingBrakeRedundancy({ ...base, brakes: [brake, weak] });
    const c = byId(r);
    expect(c['brake-2-stops-alone'].pass).toBe(false);
    expect(c['brake-2-holds-alone'].pass).toBe(false);
    expect(r.stops[1].stops).toBe(false);
    expect(c['brake-2-stopping-distance']).toBeUndefined();
  });

  it('invariant: every brake check passes or fails with its own torque only', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 2000, noNaN: true }), (T) => {
        const other = { torqueMinWorn: q.torque(T), torqueMaxTopOfRange: q.torque(T) };
        const c = byId(holdingBrakeRedundancy({ ...base, brakes: [brake, other] }));
        expect(c['brake-1-holds-alone'].pass).toBe(true);
        expect(c['brake-2-holds-alone'].pass).toBe(T >= h.load.hoistingTorque);
        expect(c['brake-2-stops-alone'].pass).toBe(T > h.load.staticTorque);
      }),
    );
  });

  it('bad input names the field', () => {
    for (const [patch, field] of [
      [{ brakes: [] }, 'brakes'],
      [{ brakes: [brake, { ...brake, torqueMinWorn: q.torque(-1) }] }, 'brakes[1].torqueMinWorn'],
      [{ hoistingTorque: q.torque(0) }, 'hoistingTorque'],
      [{ lowerSpeed: q.angularSpeed(0) }, 'lowerSpeed'],
      [{ backDrivingEfficiency: q.ratio(1.1) }, 'backDrivingEfficiency'],
      [{ driveTrainRating: q.torque(Number.NaN) }, 'driveTrainRating'],
      [{ stoppingDistanceLimit: q.length(0) }, 'stoppingDistanceLimit'],
    ] as [Partial<RedundancyInput>, string][]) {
      let err: unknown;
      try {
        holdingBrakeRedundancy({ ...base, ...patch });
      } catch (e) {
        err = e;
      }
      expect(isCalcInputError(err), field).toBe(true);
      expect((err as { fields: { field: string }[] }).fields[0].field).toBe(field);
    }
  });
});
