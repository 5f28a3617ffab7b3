import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compressionSpring, type CompressionSpringInput } from './compression-spring.js';
import { Derivation } from '../core/step.js';
import { isCalcInputError } from '../core/errors.js';
import { nearlyEqual } from '../testing/expect-close.js';
import * as q from '../units/quantities.js';

const close = (a: number, b: number, rel: number) =>
  expect(nearlyEqual(a, b, rel), `${a} vs ${b}`).toBe(true);

// Shigley's MED 10th ed., Problem 10-3 (solution): music wire d 2.5 mm, OD 31 mm, plain and ground
// ends, N_t 14; G 81.0 GPa; S_sy 871.2 MPa; L_0 162.8 mm. E = 2.6·G stands for the steel constant.
const shigley: CompressionSpringInput = {
  wireDiameter: q.length(2.5e-3),
  meanDiameter: q.length(28.5e-3),
  activeCoils: 13,
  endType: 'plain-ground',
  freeLength: q.length(162.8e-3),
  shearModulus: q.pressure(81e9),
  elasticModulus: q.pressure(2.6 * 81e9),
  endFixity: q.ratio(0.5),
  maxForce: q.force(130),
  allowableShear: q.pressure(871.2e6),
  allowableShearSolid: q.pressure(871.2e6),
};

describe('compressionSpring', () => {
  it("Shigley's MED 10th ed. Problem 10-3: C 11.4, K_B 1.117, k 1.314 N/mm, L_s 35 mm, τ(167.9 N) = S_sy", () => {
    const d = new Derivation('spring');
    const r = compressionSpring(shigley, d);
    close(r.index, 11.4, 1e-12);
    close(r.correction, 1.117, 5e-4);
    close(r.rate / 1e3, 1.314, 5e-4);
    expect(r.totalCoils).toBe(14);
    close(r.solidLength, 35e-3, 1e-12);
    const atSsy = compressionSpring({ ...shigley, maxForce: q.force(167.9) });
    close(atSsy.shearStress / 1e6, 871.2, 5e-4);
    // L_0 162.8 mm > (L_0)cr 149.9 mm: "spring needs to be supported"
    close(r.criticalFreeLength * 1e3, 149.9, 0.005);
    expect(r.criticalDeflection).toBeDefined();
    expect(d.find('stress-correction')!.formula).toBe('K_B = (4 · C + 2) / (4 · C − 3)');
  });

  it('Bhandari Ex. 10.1 (Wahl): τ(1250 N) = 545 MPa at d 6.625 mm, C 6; d 7 mm gives N_t 10, L_s 70 mm, y 30.34 mm', () => {
    const d0 = 6.625083e-3;
    const wahl = compressionSpring({
      ...shigley,
      wireDiameter: q.length(d0),
      meanDiameter: q.length(6 * d0),
      endType: 'squared-ground',
      activeCoils: 8,
      freeLength: q.length(0.11),
      shearModulus: q.pressure(81_370e6),
      elasticModulus: q.pressure(2.6 * 81_370e6),
      maxForce: q.force(1250),
      correction: 'wahl',
    });
    close(wahl.correction, 1.2525, 1e-4);
    close(wahl.shearStress / 1e6, 545, 1e-5);
    const built = compressionSpring({
      ...shigley,
      wireDiameter: q.length(7e-3),
      meanDiameter: q.length(42e-3),
      endType: 'squared-ground',
      activeCoils: 8,
      freeLength: q.length(0.11),
      shearModulus: q.pressure(81_370e6),
      elasticModulus: q.pressure(2.6 * 81_370e6),
      maxForce: q.force(1250),
      correction: 'wahl',
    });
    expect(built.totalCoils).toBe(10);
    close(built.solidLength, 70e-3, 1e-12);
    close((1250 / built.rate) * 1e3, 30.337611, 1e-6);
  });

  it('solid length by end type (Table 10-1) for d 2 mm, N_a 10', () => {
    const L = (endType: CompressionSpringInput['endType']) =>
      compressionSpring({
        ...shigley,
        wireDiameter: q.length(2e-3),
        activeCoils: 10,
        endType,
      }).solidLength * 1e3;
    close(L('plain'), 22, 1e-12);
    close(L('plain-ground'), 22, 1e-12);
    close(L('squared'), 26, 1e-12);
    close(L('squared-ground'), 24, 1e-12);
  });

  it('a short spring is absolutely stable; a long one buckles once deflected far enough', () => {
    const stable = compressionSpring({ ...shigley, freeLength: q.length(0.1) });
    expect(stable.criticalDeflection).toBeUndefined();
    expect(stable.checks.find((c) => c.id === 'spring-buckling')!.pass).toBe(true);
    const slender = compressionSpring({
      ...shigley,
      freeLength: q.length(0.4),
      endFixity: q.ratio(2),
      maxForce: q.force(200),
    });
    expect(slender.checks.find((c) => c.id === 'spring-buckling')!.pass).toBe(false);
  });

  it('invariants: K_B > 1 and falls with C; Wahl ≥ Bergsträsser; stress rises with force', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 3, max: 20, noNaN: true }),
        fc.double({ min: 1, max: 1000, noNaN: true }),
        (C, F) => {
          const inp = { ...shigley, meanDiameter: q.length(C * 2.5e-3), freeLength: q.length(1) };
          const b = compressionSpring({ ...inp, maxForce: q.force(F) });
          const w = compressionSpring({ ...inp, maxForce: q.force(F), correction: 'wahl' });
          expect(b.correction).toBeGreaterThan(1);
          expect(w.correction).toBeGreaterThanOrEqual(b.correction);
          const wider = compressionSpring({ ...inp, meanDiameter: q.length(C * 1.1 * 2.5e-3) });
          expect(wider.correction).toBeLessThan(b.correction);
          const harder = compressionSpring({ ...inp, maxForce: q.force(F * 1.5) });
          expect(harder.shearStress).toBeGreaterThan(b.shearStress);
        },
      ),
    );
  });

  it('bad input names the field', () => {
    for (const [patch, field] of [
      [{ wireDiameter: q.length(0) }, 'wireDiameter'],
      [{ meanDiameter: q.length(5e-3) }, 'meanDiameter'], // C = 2
      [{ activeCoils: 0.5 }, 'activeCoils'],
      [{ endType: 'bent' }, 'endType'],
      [{ freeLength: q.length(0.02) }, 'freeLength'], // below solid 35 mm
      [{ shearModulus: q.pressure(-1) }, 'shearModulus'],
      [{ elasticModulus: q.pressure(50e9) }, 'elasticModulus'], // not above G
      [{ endFixity: q.ratio(0) }, 'endFixity'],
      [{ maxForce: q.force(Number.NaN) }, 'maxForce'],
      [{ allowableShear: q.pressure(0) }, 'allowableShear'],
      [{ allowableShearSolid: q.pressure(0) }, 'allowableShearSolid'],
      [{ overrun: q.ratio(-0.1) }, 'overrun'],
    ] as [Partial<CompressionSpringInput>, string][]) {
      let err: unknown;
      try {
        compressionSpring({ ...shigley, ...patch });
      } catch (e) {
        err = e;
      }
      expect(isCalcInputError(err), field).toBe(true);
      expect((err as { fields: { field: string }[] }).fields[0].field).toBe(field);
    }
  });
});
