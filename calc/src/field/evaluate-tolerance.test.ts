import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isCalcInputError } from '../core/errors.js';
import { sheetTypes } from '../sheets/registry.js';
import { evaluateTolerance, toleranceBounds } from './evaluate-tolerance.js';
import type { FieldTolerance } from './tolerance-types.js';
import * as T from './tolerances.js';

const abs = (minus: number, plus: number): FieldTolerance => ({
  band: { kind: 'absolute', minus, plus },
  source: 'common practice',
  confidence: 'common practice',
});

describe('evaluateTolerance, cases worked by hand', () => {
  it('spring length 200 mm ± 0.5 mm: 200.4 in, 200.6 out by 0.6 mm', () => {
    const a = evaluateTolerance(0.2, 0.2004, T.SPRING_LENGTH, 'length');
    expect(a.status).toBe('in');
    expect(a.display.unit).toBe('mm');
    expect(a.display.deviation).toBeCloseTo(0.4, 9);
    expect(a.display.lower).toBeCloseTo(199.5, 9);
    expect(a.display.upper).toBeCloseTo(200.5, 9);
    const b = evaluateTolerance(0.2, 0.2006, T.SPRING_LENGTH, 'length');
    expect(b.status).toBe('out');
    expect(b.display.deviation).toBeCloseTo(0.6, 9);
  });

  it('a value typed exactly on the bound in mm counts as in', () => {
    // 199.5 mm typed → 0.1995 m, which is not exactly 0.2 − 0.0005 in binary.
    expect(evaluateTolerance(0.2, 199.5 / 1000, T.SPRING_LENGTH, 'length').status).toBe('in');
    expect(evaluateTolerance(0.2, 200.5 / 1000, T.SPRING_LENGTH, 'length').status).toBe('in');
  });

  it('spring force 12 kN ± 5 %: 11.4 kN in, 11.3 kN out, deviation in kN', () => {
    expect(evaluateTolerance(12000, 11400, T.SPRING_FORCE, 'force').status).toBe('in');
    const v = evaluateTolerance(12000, 11300, T.SPRING_FORCE, 'force', 'SI', 'kN');
    expect(v.status).toBe('out');
    expect(v.display.deviation).toBeCloseTo(-0.7, 9);
    expect(v.lowerSI).toBeCloseTo(11400, 9);
  });

  it('back-off angle 60°: backing off further is in, stopping short is out', () => {
    const rad = Math.PI / 180;
    expect(evaluateTolerance(60 * rad, 70 * rad, T.BACK_OFF_ANGLE, 'angle').status).toBe('in');
    const short = evaluateTolerance(60 * rad, 58 * rad, T.BACK_OFF_ANGLE, 'angle', 'SI', 'deg');
    expect(short.status).toBe('out');
    expect(short.display.deviation).toBeCloseTo(-2, 9);
    expect(T.BACK_OFF_ANGLE.direction).toBe('loosen');
    expect(T.BACK_OFF_ANGLE.rule).toMatch(/never tighten to align a slot/i);
  });

  it('one-sided bands leave one side open', () => {
    const atLeast: FieldTolerance = { ...abs(0, 0), band: { kind: 'atLeast' } };
    expect(toleranceBounds(5, atLeast)).toEqual({ lower: 5, upper: null });
    expect(evaluateTolerance(0.005, 1, atLeast, 'length').status).toBe('in');
    expect(evaluateTolerance(0.005, 0.004, atLeast, 'length').status).toBe('out');
  });

  it('bad input is refused with the field that is wrong', () => {
    for (const [t, m, tol, field] of [
      [NaN, 1, T.SPRING_LENGTH, 'target'],
      [1, Infinity, T.SPRING_LENGTH, 'measured'],
      [1, 1, abs(-1, 0), 'tolerance.minus'],
    ] as const) {
      try {
        evaluateTolerance(t, m, tol, 'length');
        expect.unreachable();
      } catch (e) {
        expect(isCalcInputError(e) && e.fields.map((f) => f.field)).toContain(field);
      }
    }
  });
});

describe('evaluateTolerance, properties', () => {
  const finite = fc.double({ min: -1e4, max: 1e4, noNaN: true, noDefaultInfinity: true });
  const width = fc.double({ min: 0, max: 100, noNaN: true, noDefaultInfinity: true });

  it('in exactly when lower ≤ measured ≤ upper (away from the bound slack)', () => {
    fc.assert(
      fc.property(finite, width, width, finite, (target, minus, plus, measured) => {
        const v = evaluateTolerance(target, measured, abs(minus, plus), 'length');
        const gap = 1e-6 * Math.max(1, Math.abs(target) + minus + plus);
        if (measured < target - minus - gap || measured > target + plus + gap) {
          expect(v.status).toBe('out');
        }
        if (measured >= target - minus && measured <= target + plus) expect(v.status).toBe('in');
        expect(v.deviationSI).toBe(measured - target);
      }),
    );
  });

  it('the target itself is always in, and the verdict does not depend on the display unit', () => {
    fc.assert(
      fc.property(finite, width, width, finite, (target, minus, plus, measured) => {
        const t = abs(minus, plus);
        expect(evaluateTolerance(target, target, t, 'length').status).toBe('in');
        const si = evaluateTolerance(target, measured, t, 'length', 'SI');
        const us = evaluateTolerance(target, measured, t, 'length', 'US');
        expect(us.status).toBe(si.status);
        expect(Math.sign(us.display.deviation)).toBe(Math.sign(si.display.deviation));
      }),
    );
  });

  it('a wider band never turns an in into an out', () => {
    fc.assert(
      fc.property(finite, width, width, width, finite, (target, minus, plus, more, measured) => {
        const narrow = evaluateTolerance(target, measured, abs(minus, plus), 'force');
        const wide = evaluateTolerance(target, measured, abs(minus + more, plus + more), 'force');
        if (narrow.status === 'in') expect(wide.status).toBe('in');
      }),
    );
  });
});

describe('field-card tolerance declarations', () => {
  it('every tolerance names its source and has a non-negative band', () => {
    for (const sheet of sheetTypes) {
      for (const [key, p] of Object.entries(sheet.fieldCard.settings)) {
        if (!p.tolerance) continue;
        expect(p.tolerance.source, `${sheet.id} ${key}`).not.toBe('');
        const b = p.tolerance.band;
        if (b.kind === 'absolute' || b.kind === 'relative') {
          expect(b.minus).toBeGreaterThanOrEqual(0);
          expect(b.plus).toBeGreaterThanOrEqual(0);
        }
      }
    }
  });

  it('a stack preload carries no tolerance: nobody measures it on site', () => {
    for (const sheet of sheetTypes)
      for (const [key, p] of Object.entries(sheet.fieldCard.settings))
        if (p.role === 'preload') expect(p.tolerance, `${sheet.id} ${key}`).toBeUndefined();
  });

  it('the values a fitter measures declare a tolerance on every sheet that produces them', () => {
    const measured = [
      'springLength',
      'springForce',
      'shoeClearance',
      'workingStroke',
      'reserveStroke',
      'holderBackOff',
      'holderSetLength',
      'a.backOffAngle',
      'a.setLength',
      'clampForce',
      'airGap',
    ];
    let seen = 0;
    for (const sheet of sheetTypes) {
      for (const key of measured) {
        const p = sheet.fieldCard.settings[key];
        if (p) {
          seen++;
          expect(p.tolerance, `${sheet.id} ${key}`).toBeDefined();
        }
      }
    }
    expect(seen).toBeGreaterThanOrEqual(measured.length);
  });

  it('the caliper air gap keeps the clearance band but speaks of pads, not shoes', () => {
    expect(T.AIR_GAP.band).toEqual(T.SHOE_CLEARANCE.band);
    expect(T.AIR_GAP.rule).toMatch(/each pad/);
    expect(T.AIR_GAP.rule).not.toMatch(/shoe/);
  });
});
