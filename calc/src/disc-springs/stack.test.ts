import { describe, expect, it } from 'vitest';
import { isCalcInputError } from '../core/errors.js';
import { backOffAngleForPreload, backOffPreload, threadRelease } from './back-off.js';
import { stackCurve, workingBandWarning } from './curve.js';
import { discConstants, discForce, discForceAt, TABLE_STEEL } from './disc.js';
import {
  stackFlatLength,
  stackForces,
  stackFreeLength,
  stackUnloadingAt,
  type DiscStack,
} from './stack.js';
import { validateStack } from './validate.js';

const a40 = { De: 0.04, Di: 0.0204, t: 2.25e-3, l0: 3.15e-3, ...TABLE_STEEL };
const stack = (i: number, n: number, wM = 0, wR = 0): DiscStack => ({
  disc: a40,
  seriesCount: i,
  parallelCount: n,
  frictionCone: wM,
  frictionEdge: wR,
});

describe('stacks', () => {
  it('parallel discs add force, series sets add travel', () => {
    const s = 0.5e-3;
    expect(stackForces(stack(1, 3), s).nominal).toBeCloseTo(3 * discForce(a40, s), 6);
    expect(stackForces(stack(4, 1), s).nominal).toBeCloseTo(discForce(a40, s), 6);
  });
  it('the force of s alone gives the very same doubles as discForce and stackForces', () => {
    // discForceAt and stackUnloadingAt serve the preload search; it must not drift from them.
    const reduced = { ...a40, De: 0.125, Di: 0.064, t: 8e-3, l0: 10.6e-3, tReduced: 7.5e-3 };
    for (const disc of [a40, reduced]) {
      const st = { ...stack(3, 2, 0.015, 0.02), disc };
      const c = discConstants(disc);
      const force = discForceAt(disc, c);
      const unloading = stackUnloadingAt(st, c);
      for (let k = 0; k <= 50; k++) {
        const s = (c.h0 * k) / 37;
        expect(force(s)).toBe(discForce(disc, s, c));
        expect(unloading(s)).toBe(stackForces(st, s, c).unloading);
      }
    }
  });
  it('free and flat length: L0 = i·(l0 + (n−1)·t), Lc = i·n·t', () => {
    expect(stackFreeLength(stack(3, 2))).toBeCloseTo(3 * (3.15e-3 + 2.25e-3), 12);
    expect(stackFlatLength(stack(3, 2))).toBeCloseTo(3 * 2 * 2.25e-3, 12);
  });
  it('friction: three in parallel at 3 % per interface load to about 15 900 N for 3 × 5000 N', () => {
    // Rule of thumb published by a disc-spring maker (reference-values §1).
    const f = 5000;
    const w = 0.03 * 2;
    expect((3 * f) / (1 - w)).toBeGreaterThan(15900 * 0.99);
    const st = stack(1, 3, 0.03, 0);
    const forces = stackForces(st, 0.5e-3);
    expect(forces.loading).toBeGreaterThan(forces.nominal);
    expect(forces.unloading).toBeLessThan(forces.nominal);
    expect(forces.loading / forces.nominal).toBeCloseTo(1 / 0.94, 10);
  });
  it('curve runs from zero force at free to the flat load, loading above unloading', () => {
    const pts = stackCurve(stack(2, 2, 0.02, 0.03), 20);
    expect(pts).toHaveLength(21);
    expect(pts[0].nominal).toBe(0);
    expect(pts[20].stackDeflection).toBeCloseTo(2 * 0.9e-3, 12);
    for (const p of pts.slice(1)) expect(p.loading).toBeGreaterThan(p.unloading);
  });
});

describe('flat then back off', () => {
  it('Δ = P·θ/360°: M20×2.5 backed off 90° releases 0.625 mm', () => {
    expect(threadRelease(2.5e-3, 90)).toBeCloseTo(0.625e-3, 12);
  });
  it('shares the release among sets in series (DOMAIN §5.3 example: i = 4, 90° on M20)', () => {
    const r = backOffPreload(stack(4, 1), 2.5e-3, 90);
    expect(r.setDeflection).toBeCloseTo(0.9e-3 - 0.625e-3 / 4, 12);
    expect(r.slack).toBe(false);
  });
  it('three in series backed off 180° equal one backed off 60° on the same thread', () => {
    const one = backOffPreload(stack(1, 1), 2.5e-3, 60);
    const three = backOffPreload(stack(3, 1), 2.5e-3, 180);
    expect(three.setDeflection).toBeCloseTo(one.setDeflection, 12);
    expect(three.forces.nominal).toBeCloseTo(one.forces.nominal, 6);
  });
  it('backing off past the travel to flat leaves the stack slack with zero force', () => {
    const r = backOffPreload(stack(1, 1), 2.5e-3, 360);
    expect(r.slack).toBe(true);
    expect(r.forces.nominal).toBe(0);
  });
  it('inverse returns the angle that gives the target preload', () => {
    const st = stack(3, 2, 0.02, 0.03);
    const target = backOffPreload(st, 2.5e-3, 150).forces.unloading;
    const angle = backOffAngleForPreload(st, 2.5e-3, target);
    expect(angle).toBeDefined();
    expect(angle as number).toBeCloseTo(150, 6);
  });
  it('inverse is undefined for a target above anything the stack can give', () => {
    expect(backOffAngleForPreload(stack(1, 1), 2.5e-3, 1e7)).toBeUndefined();
  });
});

describe('working band and stack validation', () => {
  it('warns outside 0.15–0.75·h0 and not inside', () => {
    expect(workingBandWarning(0.1)).toMatch(/below/);
    expect(workingBandWarning(0.9)).toMatch(/above/);
    expect(workingBandWarning(0.5)).toBeUndefined();
  });
  it('rejects fractional counts and friction out of range, naming the fields', () => {
    try {
      validateStack({ ...stack(1.5, 0, -0.1, 0.5), disc: { ...a40, Di: 0.05 } });
      expect.unreachable();
    } catch (e) {
      expect(isCalcInputError(e)).toBe(true);
      const f = (e as { fields: { field: string }[] }).fields.map((x) => x.field);
      expect(f).toEqual(
        expect.arrayContaining([
          'Di',
          'seriesCount',
          'parallelCount',
          'frictionCone',
          'frictionEdge',
        ]),
      );
    }
  });
});
