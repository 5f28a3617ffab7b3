import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { lnGamma, studentTCdf, studentTQuantile } from './student-t.js';

describe('Student t quantile', () => {
  it('ln Γ agrees with factorials and Γ(½) = √π', () => {
    expect(lnGamma(0.5)).toBeCloseTo(0.5 * Math.log(Math.PI), 12);
    expect(lnGamma(1)).toBeCloseTo(0, 12);
    expect(lnGamma(11)).toBeCloseTo(Math.log(3628800), 12);
    expect(lnGamma(3.5)).toBeCloseTo(Math.log((15 / 8) * Math.sqrt(Math.PI)), 12);
  });

  it('matches the closed forms for 1 and 2 degrees of freedom', () => {
    // ν = 1 is the Cauchy distribution: t_p = tan(π(p − ½)); ν = 2: t_p = (2p − 1)/√(2p(1 − p)).
    for (const p of [0.6, 0.9, 0.95, 0.975, 0.995]) {
      expect(studentTQuantile(p, 1)).toBeCloseTo(Math.tan(Math.PI * (p - 0.5)), 8);
      expect(studentTQuantile(p, 2)).toBeCloseTo((2 * p - 1) / Math.sqrt(2 * p * (1 - p)), 8);
    }
  });

  it('matches printed table values (two-sided 95 %, table values recalled from memory)', () => {
    expect(studentTQuantile(0.975, 5)).toBeCloseTo(2.571, 3);
    expect(studentTQuantile(0.975, 10)).toBeCloseTo(2.228, 3);
    expect(studentTQuantile(0.975, 30)).toBeCloseTo(2.042, 3);
    expect(studentTQuantile(0.95, 3)).toBeCloseTo(2.353, 3);
  });

  it('approaches the normal quantile for many degrees of freedom', () => {
    expect(studentTQuantile(0.975, 100000)).toBeCloseTo(1.95996, 4);
  });

  it('refuses probabilities outside [0.5, 1) and ν < 1', () => {
    expect(() => studentTQuantile(0.4, 3)).toThrow(RangeError);
    expect(() => studentTQuantile(1, 3)).toThrow(RangeError);
    expect(() => studentTQuantile(0.9, 0)).toThrow(RangeError);
  });

  it('is the inverse of the CDF', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 0.999, noNaN: true }),
        fc.integer({ min: 1, max: 200 }),
        (p, dof) => {
          expect(studentTCdf(studentTQuantile(p, dof), dof)).toBeCloseTo(p, 9);
        },
      ),
    );
  });
});
