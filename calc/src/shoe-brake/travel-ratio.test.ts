import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { travelRatioCheck, type TravelRatioInput } from './travel-ratio.js';
import { Derivation } from '../core/step.js';
import { isCalcInputError } from '../core/errors.js';
import { nearlyEqual } from '../testing/expect-close.js';
import * as q from '../units/quantities.js';

const close = (a: number, b: number, rel: number) =>
  expect(nearlyEqual(a, b, rel), `${a} vs ${b}`).toBe(true);

const base: TravelRatioInput = {
  leverRatio: q.ratio(2.5),
  shoes: 2,
  springTravelRatio: q.ratio(5),
};

describe('travelRatioCheck', () => {
  it('demo brake: i = 2.5, two shoes → r_s = 5, as entered', () => {
    const d = new Derivation('lining');
    const r = travelRatioCheck(base, d);
    close(r.geometricRatio, 5, 1e-12);
    expect(r.deviation).toBe(0);
    expect(r.checks[0].pass).toBe(true);
    expect(d.find('spring-travel-ratio-geometry')!.formula).toBe('r_s,geo = n_shoes · i');
  });

  it('a ratio 6 % off the linkage fails at the 3 % default, passes at 10 %', () => {
    const r = travelRatioCheck({ ...base, springTravelRatio: q.ratio(5.3) });
    close(r.deviation, 0.06, 1e-12);
    expect(r.checks[0].pass).toBe(false);
    expect(
      travelRatioCheck({ ...base, springTravelRatio: q.ratio(5.3), tolerance: q.ratio(0.1) })
        .checks[0].pass,
    ).toBe(true);
  });

  it('thruster ratio: rod travels 5× the spring → r_t,geo = 25 (the demo value)', () => {
    const r = travelRatioCheck({
      ...base,
      thruster: { travelRatio: q.ratio(25), rodPerSpringTravel: q.ratio(5) },
    });
    close(r.thrusterGeometricRatio!, 25, 1e-12);
    expect(r.checks.map((c) => c.pass)).toEqual([true, true]);
    const off = travelRatioCheck({
      ...base,
      thruster: { travelRatio: q.ratio(20), rodPerSpringTravel: q.ratio(5) },
    });
    close(off.thrusterDeviation!, -0.2, 1e-12);
    expect(off.checks[1].pass).toBe(false);
  });

  it('invariant: the ratio made from the linkage always passes; pass ⇔ |Δ| ≤ tol', () => {
    const pos = (min: number, max: number) => fc.double({ min, max, noNaN: true });
    fc.assert(
      fc.property(pos(0.1, 50), fc.integer({ min: 1, max: 4 }), pos(0.2, 3), (i, n, k) => {
        const exact = travelRatioCheck({
          leverRatio: q.ratio(i),
          shoes: n,
          springTravelRatio: q.ratio(n * i),
        });
        expect(exact.checks[0].pass).toBe(true);
        const r = travelRatioCheck({
          leverRatio: q.ratio(i),
          shoes: n,
          springTravelRatio: q.ratio(n * i * k),
        });
        expect(r.checks[0].pass).toBe(Math.abs(r.deviation) <= 0.03);
      }),
    );
  });

  it('bad input names the field', () => {
    for (const [patch, field] of [
      [{ leverRatio: q.ratio(0) }, 'leverRatio'],
      [{ shoes: 0 }, 'shoes'],
      [{ shoes: 2.5 }, 'shoes'],
      [{ springTravelRatio: q.ratio(Number.NaN) }, 'springTravelRatio'],
      [
        { thruster: { travelRatio: q.ratio(-1), rodPerSpringTravel: q.ratio(5) } },
        'thrusterTravelRatio',
      ],
      [
        { thruster: { travelRatio: q.ratio(25), rodPerSpringTravel: q.ratio(0) } },
        'rodPerSpringTravel',
      ],
      [{ tolerance: q.ratio(2) }, 'tolerance'],
    ] as [Partial<TravelRatioInput>, string][]) {
      let err: unknown;
      try {
        travelRatioCheck({ ...base, ...patch });
      } catch (e) {
        err = e;
      }
      expect(isCalcInputError(err), field).toBe(true);
      expect((err as { fields: { field: string }[] }).fields[0].field).toBe(field);
    }
  });
});
