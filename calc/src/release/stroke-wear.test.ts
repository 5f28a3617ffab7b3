import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { strokeWearChain, torqueWearPoints, type StrokeWearInput } from './stroke-wear.js';
import { Derivation } from '../core/step.js';
import { isCalcInputError } from '../core/errors.js';
import { nearlyEqual } from '../testing/expect-close.js';
import * as q from '../units/quantities.js';

const close = (a: number, b: number, rel: number) =>
  expect(nearlyEqual(a, b, rel), `${a} vs ${b}`).toBe(true);

// Demo hoist brake: thruster 50 mm, reserve 20 mm, minimum 5 mm, r_t 25; spring 1100 N, 40 N/mm,
// r_s 5; torque at μ min new 332.77 N·m; required 224.18 N·m.
const demo: StrokeWearInput = {
  nominalStroke: q.length(0.05),
  reserveStroke: q.length(0.02),
  minReserveStroke: q.length(0.005),
  thrusterTravelRatio: q.ratio(25),
  springForce: q.force(1100),
  springRate: q.stiffness(40e3),
  springTravelRatio: q.ratio(5),
  torqueNew: q.torque(332.7737),
  requiredTorque: q.torque(224.1843),
};

describe('strokeWearChain', () => {
  it('demo: clearance (50 − 20)/25 = 1.2 mm, re-adjust at 0.6 mm, torque lost at 0.8 mm', () => {
    const d = new Derivation('release');
    const r = strokeWearChain(demo, d);
    close(r.clearance, 1.2e-3, 1e-12);
    close(r.wearAtReadjust, 0.6e-3, 1e-12);
    close(r.wearReserveUsed, 0.8e-3, 1e-12);
    // F at 0.6 mm = 1100 − 40·5·0.6 = 980 N → 332.77 · 980/1100
    close(r.torqueAtReadjust, (332.7737 * 980) / 1100, 1e-12);
    expect(r.checks.map((c) => [c.id, c.pass])).toEqual([
      ['reserve-stroke-set', true],
      ['torque-at-readjust', true],
    ]);
    close(r.torqueAtWear(0.79e-3), (332.7737 * (1100 - 40 * 5 * 0.79)) / 1100, 1e-9);
    expect(r.torqueAtWear(0.8e-3)).toBe(0);
    expect(r.torqueAtWear(1.0e-3)).toBe(0);
    expect(d.find('clearance-from-stroke')!.formula).toBe('ε = (s_n − s_r,0) / r_t');
  });

  it('relaxation lowers every worn torque from F_s·(1 − ρ_s), and not the new-lining torque', () => {
    const r = strokeWearChain({ ...demo, relaxation: q.ratio(0.02) });
    // F at 0.6 mm = 1100·0.98 − 40·5·0.6 = 958 N
    close(r.torqueAtReadjust, (332.7737 * 958) / 1100, 1e-12);
    close(r.torqueAtWear(0), 332.7737 * 0.98, 1e-12);
    expect(r.torqueAtWear(0.8e-3)).toBe(0);
  });

  it('the chart points show the drop to zero as a vertical step at w_0', () => {
    const r = strokeWearChain(demo);
    const pts = torqueWearPoints(r, 1e-3, 10);
    const at = pts.filter((p) => nearlyEqual(p.x, 0.8e-3, 1e-9));
    expect(at.length).toBe(2);
    expect(at[0].y).toBeGreaterThan(200);
    expect(at[1].y).toBe(0);
    expect(pts[pts.length - 1]).toEqual({ x: 1e-3, y: 0 });
    for (let k = 1; k < pts.length; k++) expect(pts[k].x).toBeGreaterThanOrEqual(pts[k - 1].x);
  });

  it('a reserve below the minimum is a failed check, not an error', () => {
    const r = strokeWearChain({ ...demo, reserveStroke: q.length(0.004) });
    expect(r.checks[0].pass).toBe(false);
    expect(r.wearAtReadjust).toBeLessThan(0);
  });

  it('invariants: torque never rises with wear; zero from w_0 on; clearance + reserve = stroke', () => {
    const pos = (min: number, max: number) => fc.double({ min, max, noNaN: true });
    fc.assert(
      fc.property(pos(0.001, 0.049), pos(0, 2e-3), pos(0, 2e-3), (sr, w1, dw) => {
        const r = strokeWearChain({
          ...demo,
          reserveStroke: q.length(sr),
          minReserveStroke: q.length(0),
        });
        close(r.clearance * 25 + sr, 0.05, 1e-9);
        expect(r.torqueAtWear(w1 + dw)).toBeLessThanOrEqual(r.torqueAtWear(w1));
        if (w1 >= r.wearReserveUsed) expect(r.torqueAtWear(w1)).toBe(0);
      }),
    );
  });

  it('bad input names the field', () => {
    for (const [patch, field] of [
      [{ nominalStroke: q.length(0) }, 'nominalStroke'],
      [{ reserveStroke: q.length(0.06) }, 'reserveStroke'],
      [{ minReserveStroke: q.length(-1) }, 'minReserveStroke'],
      [{ thrusterTravelRatio: q.ratio(0) }, 'thrusterTravelRatio'],
      [{ springForce: q.force(0) }, 'springForce'],
      [{ springForce: q.force(100) }, 'springForce'], // slack before 0.6 mm (needs 120 N)
      [{ springRate: q.stiffness(Number.NaN) }, 'springRate'],
      [{ springTravelRatio: q.ratio(-2) }, 'springTravelRatio'],
      [{ torqueNew: q.torque(-1) }, 'torqueNew'],
      [{ requiredTorque: q.torque(-1) }, 'requiredTorque'],
    ] as [Partial<StrokeWearInput>, string][]) {
      let err: unknown;
      try {
        strokeWearChain({ ...demo, ...patch });
      } catch (e) {
        err = e;
      }
      expect(isCalcInputError(err), field).toBe(true);
      expect((err as { fields: { field: string }[] }).fields[0].field).toBe(field);
    }
  });
});
