import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Derivation } from '../core/step.js';
import { isCalcInputError } from '../core/errors.js';
import { nearlyEqual } from '../testing/expect-close.js';
import * as q from '../units/quantities.js';
import {
  baseBoltTension,
  leverBending,
  pinStrength,
  shoePinLoad,
  type BaseBoltInput,
  type LeverBendingInput,
  type PinStrengthInput,
} from './lever-strength.js';

const close = (a: number, b: number, rel: number) =>
  expect(nearlyEqual(a, b, rel), `${a} vs ${b}`).toBe(true);

// Bhandari, Design of Machine Elements, Example 4.16 as coded in the FOSSEE Scilab Textbook
// Companion, book 764: 5 kN at the 100 mm arm, section sized to σ = 400/5 = 80 MPa (b 16.091490 mm,
// h 48.274469 mm); fulcrum reaction R = √(5000² + 1111.1²) on a pin sized to p = 10 MPa
// (d 20.242469 mm, l 25.303086 mm).
const lever: LeverBendingInput = {
  force: q.force(5000),
  momentArm: q.length(0.1),
  width: q.length(16.09149e-3),
  depth: q.length(48.274469e-3),
  allowableStress: q.pressure(80e6),
};
const R = Math.hypot(5000, (5000 * 100) / 450);
const pin: PinStrengthInput = {
  load: q.force(R),
  diameter: q.length(20.242469e-3),
  bearingLength: q.length(25.303086e-3),
  allowableShear: q.pressure(40e6),
  allowableBearing: q.pressure(10e6),
};
const bolts: BaseBoltInput = {
  torque: q.torque(600),
  rowSpacing: q.length(0.2),
  boltsPerRow: 2,
  allowableLoad: q.force(8000),
};

function fieldOf(f: () => unknown): string | undefined {
  try {
    f();
  } catch (e) {
    if (isCalcInputError(e)) return e.fields[0]!.field;
    throw e;
  }
  return undefined;
}

describe('leverBending', () => {
  it('Bhandari Ex. 4.16: M = 500 N·m, σ = 80 MPa at the section the example sizes', () => {
    const d = new Derivation('levers');
    const r = leverBending(lever, d);
    close(r.moment, 500, 1e-12);
    close(r.stress / 1e6, 80, 1e-6);
    expect(r.check.pass).toBe(true);
    close(r.check.utilisation, 1, 1e-6);
    expect(d.find('lever-bending-stress')!.formula).toBe('σ_b = 6 · M_l / (b_l · h_l²)');
  });

  it('a 10 × 20 mm section under 10 N·m: W = 666.7 mm³, σ = 15 MPa (hand value)', () => {
    const r = leverBending({
      ...lever,
      force: q.force(100),
      width: q.length(0.01),
      depth: q.length(0.02),
    });
    close(r.stress, 15e6, 1e-12);
  });

  it('fails above the permissible stress', () => {
    const r = leverBending({ ...lever, force: q.force(5100) });
    expect(r.check.pass).toBe(false);
  });
});

describe('shoePinLoad', () => {
  it('i 2.5, F 1 kN, μ 0.75: N = 2.5 kN, F_p = 2.5 kN × 1.25 = 3.125 kN', () => {
    close(
      shoePinLoad({ leverRatio: q.ratio(2.5), springForce: q.force(1000), muMax: q.ratio(0.75) }),
      3125,
      1e-12,
    );
  });
});

describe('pinStrength', () => {
  it('Bhandari Ex. 4.16: bearing pressure 10 MPa on the fulcrum pin; τ by hand 7.958 MPa', () => {
    const r = pinStrength(pin, new Derivation('levers'));
    close(r.bearingPressure / 1e6, 10, 1e-6);
    close(r.shearStress / 1e6, R / (2 * (Math.PI / 4) * 20.242469 ** 2), 1e-12);
    close(r.shearStress / 1e6, 7.958, 5e-4);
    expect(r.checks.map((c) => c.pass)).toEqual([true, true]);
  });

  it('1 kN on a 10 mm pin: τ = 1000/(2 · 78.54 mm²) = 6.366 MPa (hand value)', () => {
    const r = pinStrength({ ...pin, load: q.force(1000), diameter: q.length(0.01) });
    close(r.shearStress / 1e6, 6.3662, 1e-4);
  });
});

describe('baseBoltTension', () => {
  it('600 N·m over 200 mm, two bolts a row: 1.5 kN each', () => {
    const r = baseBoltTension(bolts, new Derivation('levers'));
    close(r.tension, 1500, 1e-12);
    close(r.check.utilisation, 1500 / 8000, 1e-12);
  });
});

describe('lever, pin and bolt invariants (fast-check)', () => {
  const pos = (min: number, max: number) => fc.double({ min, max, noNaN: true });

  it('stresses and bolt tension scale linearly with the load', () => {
    fc.assert(
      fc.property(pos(1, 1e5), pos(0.1, 10), (F, k) => {
        const a = leverBending({ ...lever, force: q.force(F) });
        const b = leverBending({ ...lever, force: q.force(k * F) });
        close(b.stress, k * a.stress, 1e-9);
        const p1 = pinStrength({ ...pin, load: q.force(F) });
        const p2 = pinStrength({ ...pin, load: q.force(k * F) });
        close(p2.shearStress, k * p1.shearStress, 1e-9);
        close(p2.bearingPressure, k * p1.bearingPressure, 1e-9);
        const t1 = baseBoltTension({ ...bolts, torque: q.torque(F) });
        const t2 = baseBoltTension({ ...bolts, torque: q.torque(k * F) });
        close(t2.tension, k * t1.tension, 1e-9);
      }),
    );
  });

  it('doubling the pin diameter quarters its shear stress and halves its bearing pressure; doubling the depth quarters σ', () => {
    fc.assert(
      fc.property(pos(1e-3, 0.2), pos(1, 1e5), (d, F) => {
        const one = pinStrength({ ...pin, load: q.force(F), diameter: q.length(d) });
        const two = pinStrength({ ...pin, load: q.force(F), diameter: q.length(2 * d) });
        close(two.shearStress, one.shearStress / 4, 1e-9);
        close(two.bearingPressure, one.bearingPressure / 2, 1e-9);
        const h1 = leverBending({ ...lever, depth: q.length(d) });
        const h2 = leverBending({ ...lever, depth: q.length(2 * d) });
        close(h2.stress, h1.stress / 4, 1e-9);
      }),
    );
  });

  it('bad input is a CalcInputError naming the field', () => {
    const bad = fc.oneof(
      fc.double({ max: 0, noNaN: true }),
      fc.constant(Number.NaN),
      fc.constant(Number.POSITIVE_INFINITY),
    );
    fc.assert(
      fc.property(bad, (x) => {
        for (const k of ['momentArm', 'width', 'depth', 'allowableStress'] as const) {
          expect(fieldOf(() => leverBending({ ...lever, [k]: x }))).toBe(k);
        }
        for (const k of [
          'diameter',
          'bearingLength',
          'allowableShear',
          'allowableBearing',
        ] as const) {
          expect(fieldOf(() => pinStrength({ ...pin, [k]: x }))).toBe(k);
        }
        for (const k of ['rowSpacing', 'allowableLoad', 'boltsPerRow'] as const) {
          expect(fieldOf(() => baseBoltTension({ ...bolts, [k]: x }))).toBe(k);
        }
        expect(
          fieldOf(() =>
            shoePinLoad({ leverRatio: q.ratio(x), springForce: q.force(1), muMax: q.ratio(0.4) }),
          ),
        ).toBe('leverRatio');
      }),
    );
  });

  it('negative or non-finite loads are refused; every bad field is listed at once', () => {
    expect(fieldOf(() => leverBending({ ...lever, force: q.force(-1) }))).toBe('force');
    expect(fieldOf(() => pinStrength({ ...pin, load: q.force(Number.NaN) }))).toBe('load');
    expect(fieldOf(() => baseBoltTension({ ...bolts, boltsPerRow: 1.5 }))).toBe('boltsPerRow');
    try {
      pinStrength({ ...pin, diameter: q.length(0), bearingLength: q.length(-1) });
      expect.unreachable();
    } catch (e) {
      expect(isCalcInputError(e) && e.fields.map((f) => f.field)).toEqual([
        'diameter',
        'bearingLength',
      ]);
    }
  });
});
