import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { backOffAngleForPreload, backOffPreload } from '../disc-springs/back-off.js';
import {
  discConstants,
  discForce,
  discStresses,
  TABLE_STEEL,
  type DiscSpring,
} from '../disc-springs/disc.js';
import { stackForces } from '../disc-springs/stack.js';

/** Valid disc geometry: De 5–300 mm, Di/De 0.3–0.8, t/De 0.01–0.08, h0/t 0.1–1.35. */
const discArb = (maxHt = 1.35) =>
  fc
    .record({
      De: fc.double({ min: 5e-3, max: 0.3, noNaN: true }),
      ratio: fc.double({ min: 0.3, max: 0.8, noNaN: true }),
      tRel: fc.double({ min: 0.01, max: 0.08, noNaN: true }),
      ht: fc.double({ min: 0.1, max: maxHt, noNaN: true }),
    })
    .map(({ De, ratio, tRel, ht }): DiscSpring => {
      const t = De * tRel;
      return { De, Di: De * ratio, t, l0: t * (1 + ht), ...TABLE_STEEL };
    });
const frac = fc.double({ min: 0, max: 1, noNaN: true });
const inner = fc.double({ min: 0.02, max: 0.98, noNaN: true });

describe('disc springs: properties', () => {
  it('force and stresses are finite, force ≥ 0, for any valid disc and 0 ≤ s ≤ h0', () => {
    fc.assert(
      fc.property(discArb(), frac, (d, q) => {
        const s = q * discConstants(d).h0;
        const F = discForce(d, s);
        expect(Number.isFinite(F) && F >= 0).toBe(true);
        for (const v of Object.values(discStresses(d, s))) expect(Number.isFinite(v)).toBe(true);
      }),
      { numRuns: 300 },
    );
  }, 30_000);

  it('force increases with deflection when h0/t < 1.4', () => {
    fc.assert(
      fc.property(discArb(1.39), frac, frac, (d, a, b) => {
        fc.pre(Math.abs(a - b) > 1e-6);
        const h0 = discConstants(d).h0;
        const [lo, hi] = a < b ? [a, b] : [b, a];
        expect(discForce(d, hi * h0)).toBeGreaterThan(discForce(d, lo * h0));
      }),
      { numRuns: 300 },
    );
  }, 30_000);

  it('friction brackets the frictionless stack force, parallel discs multiply it', () => {
    fc.assert(
      fc.property(
        discArb(),
        frac,
        fc.integer({ min: 1, max: 6 }),
        fc.double({ min: 0, max: 0.05, noNaN: true }),
        fc.double({ min: 0, max: 0.05, noNaN: true }),
        (d, q, n, wM, wR) => {
          const s = q * discConstants(d).h0;
          const f = stackForces(
            { disc: d, seriesCount: 2, parallelCount: n, frictionCone: wM, frictionEdge: wR },
            s,
          );
          expect(f.nominal).toBeCloseTo(n * discForce(d, s), 6);
          expect(f.loading).toBeGreaterThanOrEqual(f.nominal);
          expect(f.unloading).toBeLessThanOrEqual(f.nominal);
        },
      ),
      { numRuns: 200 },
    );
  }, 30_000);

  it('backing off further never raises the preload when h0/t < 1.4, and the inverse recovers the angle', () => {
    fc.assert(
      fc.property(
        discArb(1.39),
        fc.integer({ min: 1, max: 6 }),
        fc.double({ min: 0.5e-3, max: 4e-3, noNaN: true }),
        inner,
        inner,
        (d, i, lead, a, b) => {
          const st = {
            disc: d,
            seriesCount: i,
            parallelCount: 1,
            frictionCone: 0.02,
            frictionEdge: 0.03,
          };
          const full = (360 * i * discConstants(d).h0) / lead;
          const [lo, hi] = a < b ? [a, b] : [b, a];
          const fLo = backOffPreload(st, lead, lo * full).forces.unloading;
          const fHi = backOffPreload(st, lead, hi * full).forces.unloading;
          expect(fHi).toBeLessThanOrEqual(fLo * (1 + 1e-12));
          const back = backOffAngleForPreload(st, lead, fLo);
          expect(back).toBeDefined();
          expect(Math.abs((back as number) - lo * full) / full).toBeLessThan(1e-6);
        },
      ),
      { numRuns: 100 },
    );
  }, 30_000);
});
