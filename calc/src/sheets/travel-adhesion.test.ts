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

describe('travel shoe brake: the unladen crane skids first', () => {
  const check = (inputs: ReturnType<typeof demoInputs>, id: string) =>
    trav.evaluate(inputs, travel).checks.find((c) => c.id === id);

  it('checks the empty crane at the same torque, and needs more adhesion than laden', () => {
    const laden = check(demoInputs(trav), 'wheel-adhesion')!;
    const empty = check(demoInputs(trav), 'wheel-adhesion-unladen')!;
    expect(empty.value).toBeGreaterThan(laden.value);
    expect(empty.limit).toBe(laden.limit);
    expect(empty.source).toMatch(/unladen case: common practice$/);
  });

  it('equals the laden check when the empty mass is the laden one', () => {
    const same = { ...demoInputs(trav), unladenMass: { value: 60, unit: 't' } };
    expect(check(same, 'wheel-adhesion-unladen')!.value).toBe(check(same, 'wheel-adhesion')!.value);
  });

  it('fails a brake that holds the laden crane but skids the empty one', () => {
    // 40 t empty: μ_req ≈ 0.17 against 0.15, with the laden check still passing.
    const light = { ...demoInputs(trav), unladenMass: { value: 40, unit: 't' } };
    expect(check(light, 'wheel-adhesion')!.pass).toBe(true);
    const empty = check(light, 'wheel-adhesion-unladen')!;
    expect(empty.pass).toBe(false);
    expect(empty.value).toBeGreaterThan(0.16);
  });

  it('says the laden case alone is checked when the empty mass is left out', () => {
    const { unladenMass: _left, ...without } = demoInputs(trav);
    const e = trav.evaluate(without, travel);
    expect(e.checks.find((c) => c.id === 'wheel-adhesion-unladen')).toBeUndefined();
    expect(e.warnings.some((w) => /covers the laden crane only/.test(w))).toBe(true);
  });

  it('refuses an empty mass above the laden one on its field', () => {
    expect(() =>
      trav.evaluate({ ...demoInputs(trav), unladenMass: { value: 61, unit: 't' } }, travel),
    ).toThrow(
      expect.objectContaining({
        fields: [expect.objectContaining({ field: 'unladenMass' })],
      }),
    );
  });
});
