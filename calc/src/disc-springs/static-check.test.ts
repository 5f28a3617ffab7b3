import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { staticDiscCheck } from './static-check.js';
import { discStresses, TABLE_STEEL } from './disc.js';
import { Derivation } from '../core/step.js';
import { isCalcInputError } from '../core/errors.js';
import { nearlyEqual } from '../testing/expect-close.js';

const close = (a: number, b: number, rel: number) =>
  expect(nearlyEqual(a, b, rel), `${a} vs ${b}`).toBe(true);

// The demo shoe holder / equaliser disc: De 40, Di 20.4, t 1.5, l0 2.65 mm.
const demo = { De: 0.04, Di: 0.0204, t: 0.0015, l0: 0.00265, ...TABLE_STEEL };

describe('staticDiscCheck', () => {
  it('demo disc: σOM at flat ≈ −1 359 MPa (the figure the review quoted), within 1 600 MPa', () => {
    const d = new Derivation('discSprings');
    const r = staticDiscCheck(demo, d, undefined, 'holder-');
    close(r.sigmaOMFlat / 1e6, -1359, 0.001);
    expect(r.check.pass).toBe(true);
    expect(r.check.id).toBe('holder-sigma-om-flat-static');
    expect(d.find('holder-sigma-OM-flat')).toBeDefined();
  });

  it('is linear in s: σOM(h0) = σOM(0.75·h0)/0.75 (groups 1 and 2)', () => {
    const at075 = discStresses(demo, 0.75 * (demo.l0 - demo.t)).sigmaOM;
    close(staticDiscCheck(demo).sigmaOMFlat, at075 / 0.75, 1e-12);
  });

  it('a lower limit from the criteria set makes it fail', () => {
    const r = staticDiscCheck(demo, undefined, { value: 1200e6, source: 'plant standard' });
    expect(r.check.pass).toBe(false);
    expect(r.check.source).toBe('plant standard');
  });

  it('invariant: a taller cone (larger h0) gives a larger |σOM| at flat', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 1.2, noNaN: true }),
        fc.double({ min: 1.01, max: 1.5, noNaN: true }),
        (h0mm, k) => {
          const a = staticDiscCheck({ ...demo, l0: demo.t + h0mm * 1e-3 });
          const b = staticDiscCheck({ ...demo, l0: demo.t + h0mm * k * 1e-3 });
          expect(Math.abs(b.sigmaOMFlat)).toBeGreaterThan(Math.abs(a.sigmaOMFlat));
        },
      ),
    );
  });

  it('bad input names the field', () => {
    const field = (f: () => unknown) => {
      try {
        f();
      } catch (e) {
        expect(isCalcInputError(e)).toBe(true);
        return (e as { fields: { field: string }[] }).fields[0].field;
      }
      return 'none';
    };
    expect(field(() => staticDiscCheck({ ...demo, Di: 0.05 }))).toBe('Di');
    expect(field(() => staticDiscCheck({ ...demo, l0: 0.001 }))).toBe('l0');
    expect(field(() => staticDiscCheck(demo, undefined, { value: 0, source: 'x' }))).toBe(
      'sigmaOMLimit',
    );
  });
});
