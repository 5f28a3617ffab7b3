import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { SheetInputs } from '../core/types.js';
import { CRANE_HOIST } from '../criteria/sets.js';
import { sheetInputsArb } from '../properties/sheet-arbitraries.js';
import { hoistShoeBrakeSheet } from '../sheets/hoist-shoe-brake.js';
import { demoInputs } from '../sheets/registry.js';
import { checkDrivers, rankDrivers } from './check-drivers.js';

const hoist = hoistShoeBrakeSheet;
const demo = () => demoInputs(hoist);
const numericKeys = new Set(
  hoist.fields.filter((f) => ['quantity', 'number', 'integer'].includes(f.kind)).map((f) => f.key),
);

describe('checkDrivers on the demo hoist sheet', () => {
  it('finds the setting and its limit behind the spring-setting check, with their elasticities', () => {
    // u = F_set / F_max: +1 % of F_set is +1 % of u; +1 % of F_max is 1/1.01 − 1 = −0.990 %.
    const drivers = checkDrivers(hoist, demo(), CRANE_HOIST, 'spring-setting-max');
    expect(drivers.map((d) => d.key)).toEqual(['springForce', 'springForceMax']);
    expect(drivers[0]!.effect).toBeCloseTo(1, 9);
    expect(drivers[1]!.effect).toBeCloseTo((1 / 1.01 - 1) / 0.01, 9);
    expect(drivers[0]!.label).toBe(hoist.fields.find((f) => f.key === 'springForce')!.label);
  });

  it('gives a torque check (a minimum) a negative effect for the lever ratio: more lever, more margin', () => {
    const lever = checkDrivers(hoist, demo(), CRANE_HOIST, 'torque-nominal', 50).find(
      (d) => d.key === 'leverRatio',
    );
    expect(lever?.effect).toBeCloseTo(-0.99, 2);
  });

  it('keeps to the limit and the order, strongest first', () => {
    const all = checkDrivers(hoist, demo(), CRANE_HOIST, 'stopping-distance', 50);
    const two = checkDrivers(hoist, demo(), CRANE_HOIST, 'stopping-distance', 2);
    expect(all.length).toBeGreaterThan(2);
    expect(two).toEqual(all.slice(0, 2));
    expect(checkDrivers(hoist, demo(), CRANE_HOIST, 'stopping-distance', 0)).toEqual([]);
  });

  it('gives nothing for an unknown check, a check at zero utilisation or refused inputs', () => {
    expect(checkDrivers(hoist, demo(), CRANE_HOIST, 'no-such-check')).toEqual([]);
    expect(checkDrivers(hoist, demo(), CRANE_HOIST, 'stroke-headroom')).toEqual([]);
    const bad: SheetInputs = { ...demo(), springForce: { value: -5, unit: 'kN' } };
    expect(checkDrivers(hoist, bad, CRANE_HOIST, 'spring-setting-max')).toEqual([]);
  });

  it('nudges an input at its upper bound down instead of dropping it', () => {
    const field = hoist.fields.find((f) => f.key === 'efficiency')!;
    expect(field.max).toBe(1);
    const atBound = { ...demo(), efficiency: 1 };
    const eff = checkDrivers(hoist, atBound, CRANE_HOIST, 'torque-nominal', 50).find(
      (d) => d.key === 'efficiency',
    );
    expect(eff).toBeDefined();
    expect(Number.isFinite(eff!.effect)).toBe(true);
  });

  it('ranks equal effects (factors of one product) in the order the sheet declares its fields', () => {
    const fields = ['b', 'a', 'c'].map((key) => ({ key, label: key }));
    const inputs: SheetInputs = { a: 2, b: 3, c: { value: 5, unit: 'm' } };
    const product = (x: SheetInputs) =>
      (x.a as number) * (x.b as number) * (x.c as { value: number }).value;
    expect(rankDrivers(fields, inputs, product).map((d) => d.key)).toEqual(['b', 'a', 'c']);
    // With the spring force low, every torque check fails; the spring force is among its drivers.
    const weak = { ...demo(), springForce: { value: 500, unit: 'N' } };
    const keys = checkDrivers(hoist, weak, CRANE_HOIST, 'torque-nominal').map((d) => d.key);
    expect(keys).toContain('springForce');
  });

  it('lets a fault that is not an input error through', () => {
    const broken = {
      fields: hoist.fields,
      evaluate: () => {
        throw new TypeError('a fault in the core');
      },
    };
    expect(() => checkDrivers(broken, demo(), CRANE_HOIST, 'torque-nominal')).toThrow(TypeError);
  });
});

describe('rankDrivers (properties)', () => {
  it('recovers the exponents of a power law u = c · Π xᵢ^pᵢ as (1.01^p − 1)/0.01', () => {
    const term = fc.record({
      x: fc.double({ min: 0.01, max: 1e4, noNaN: true }),
      p: fc.oneof(
        fc.constant(0),
        fc.integer({ min: -3, max: 3 }),
        fc.double({ min: -3, max: 3, noNaN: true }),
      ),
    });
    fc.assert(
      fc.property(
        fc.array(term, { minLength: 1, maxLength: 8 }),
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        (terms, c) => {
          const fields = terms.map((_, i) => ({ key: `x${i}`, label: `input ${i}` }));
          const inputs: SheetInputs = Object.fromEntries(
            terms.map((t, i) => [`x${i}`, i % 2 ? t.x : { value: t.x, unit: 'm' }]),
          );
          const u = (x: SheetInputs) =>
            terms.reduce((acc, t, i) => {
              const v = x[`x${i}`]!;
              return (
                acc * Math.pow(typeof v === 'number' ? v : (v as { value: number }).value, t.p)
              );
            }, c);
          const ranked = rankDrivers(fields, inputs, u, terms.length);
          const expected = terms
            .map((t, i) => ({ key: `x${i}`, effect: (Math.pow(1.01, t.p) - 1) / 0.01 }))
            .filter((d) => Math.abs(d.effect) > 1e-3);
          for (const d of expected) {
            const got = ranked.find((r) => r.key === d.key);
            expect(got, d.key).toBeDefined();
            expect(got!.effect).toBeCloseTo(d.effect, 6);
          }
          for (const r of ranked) expect(Math.abs(r.effect)).toBeGreaterThan(1e-4);
          for (let i = 1; i < ranked.length; i++)
            expect(Math.abs(ranked[i - 1]!.effect)).toBeGreaterThanOrEqual(
              Math.abs(ranked[i]!.effect) * (1 - 1e-6),
            );
        },
      ),
      { numRuns: 300 },
    );
  });

  it('on any valid hoist inputs: only numeric fields, each once, finite, strongest first, within the limit', () => {
    const checkIds = hoist.evaluate(demo(), CRANE_HOIST).checks.map((c) => c.id);
    fc.assert(
      fc.property(
        sheetInputsArb(hoist, 'near'),
        fc.constantFrom(...checkIds),
        fc.integer({ min: 0, max: 8 }),
        (inputs, checkId, limit) => {
          const drivers = checkDrivers(hoist, inputs, CRANE_HOIST, checkId, limit);
          expect(drivers.length).toBeLessThanOrEqual(limit);
          expect(new Set(drivers.map((d) => d.key)).size).toBe(drivers.length);
          for (const d of drivers) {
            expect(numericKeys.has(d.key)).toBe(true);
            expect(Number.isFinite(d.effect)).toBe(true);
          }
          for (let i = 1; i < drivers.length; i++)
            expect(Math.abs(drivers[i - 1]!.effect)).toBeGreaterThanOrEqual(
              Math.abs(drivers[i]!.effect) * (1 - 1e-6),
            );
        },
      ),
      { numRuns: 40 },
    );
  });
});
