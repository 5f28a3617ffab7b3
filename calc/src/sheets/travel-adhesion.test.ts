import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { getCriteriaSet } from '../criteria/lookup.js';
import { nearlyEqual } from '../testing/expect-close.js';
import { demoInputs, getSheetType } from './registry.js';

const travel = getCriteriaSet('travel-drive')!; // a built-in set
const trav = getSheetType('travel-shoe-brake')!; // a registered sheet type
const withDrive = (Md: number) => ({
  ...demoInputs(trav),
  driveTorque: { value: Md, unit: 'N m' },
});
const adhesion = (Md: number) =>
  trav.evaluate(withDrive(Md), travel).checks.find((c) => c.id === 'wheel-adhesion')!.value;

describe('travel shoe brake: wheel adhesion with a force driving the motion', () => {
  it('on the level (M_d = 0) the demo keeps its former value, bit for bit', () => {
    const e = trav.evaluate(demoInputs(trav), travel);
    const step = (id: string) => e.derivation.find((s) => s.id === id)!.value;
    const check = e.checks.find((c) => c.id === 'wheel-adhesion')!;
    // Former basis m·a_L/(m·g·n_b/n_w): 60 t, 2 of 4 wheels braked.
    const m = 60_000;
    expect(check.value).toBe((m * step('hard-load-deceleration')) / ((m * 9.80665 * 2) / 4));
    expect(check.value).toBe(0.12954058904119042); // the demo's value before the change
    expect(check.label).toBe('Adhesion needed at μ max ≤ allowed (no wheel skid)');
    expect(e.derivation.find((s) => s.id === 'rail-braking-force')!.label).toContain(
      'including the force that drives the motion (slope, wind)',
    );
  });

  it('rises as the slope or wind steepens (M_d from 0 to 90 % of the hardest brake torque)', () => {
    // Demo brake at μ max, new lining: 111.15 N·m at each brake shaft.
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 90, noNaN: true }),
        fc.double({ min: 1, max: 10, noNaN: true }),
        (lo, gap) => {
          expect(adhesion(lo + gap)).toBeGreaterThan(adhesion(lo));
        },
      ),
      { numRuns: 50 },
    );
  });

  it('the rail force equals n_br·(M_b − J_rot·α_b)·ω/v from the sheet’s own steps', () => {
    const e = trav.evaluate(withDrive(40), travel);
    const step = (id: string) => e.derivation.find((s) => s.id === id)!.value;
    const omega = (1450 * 2 * Math.PI) / 60; // demo motor speed, rad/s
    const v = 40 / 60; // demo travel speed, m/s
    const jRot = 0.05 + 0.12 + 0.02; // demo J_mot + J_drum + J_gear, kg·m²
    const expected =
      (2 * (step('torque-max') - jRot * step('hard-brake-deceleration')) * omega) / v;
    const F = step('rail-braking-force');
    expect(nearlyEqual(F, expected, 1e-12), `${F} vs ${expected}`).toBe(true);
    // and the 40 N·m at each of the 2 brake shafts adds n_br·M_d·ω/v to m·a_L
    const extra = F - 60_000 * step('hard-load-deceleration');
    expect(nearlyEqual(extra, (2 * 40 * omega) / v, 1e-9)).toBe(true);
  });
});
