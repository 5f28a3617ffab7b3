import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isCalcInputError } from '../core/errors.js';
import type { SheetInputs } from '../core/types.js';
import { getCriteriaSet } from '../criteria/lookup.js';
import { nearlyEqual } from '../testing/expect-close.js';
import { demoInputs, getSheetType } from './registry.js';

const caliper = getSheetType('caliper-disc-brake')!;
const general = getCriteriaSet('general-industry')!;
const kgm2 = (value: number) => ({ value, unit: 'kg m^2' });

// The demo hoist by hand (SI): brake shaft 975/40 rpm, M_L 6315 N·m, v_0 0.16 m/s; the set delay
// is held at 0.3 s here (the demo's quick-drop release unit takes 0.2 s) for the hand values.
const omegaB = ((975 / 40) * 2 * Math.PI) / 60;
const ML = 6315;
const td = 0.3;
const rk = 0.16 / omegaB;
const JL = (ML * rk) / 9.80665;
// μ min · worn clamp force (22 kN − 1 kN/mm · 1 mm · 2) · r_e (450 mm) · 2 faces · 2 calipers.
const Mb = 0.3 * 20_000 * 0.45 * 2 * 2;

const evaluate = (patch: SheetInputs) =>
  caliper.evaluate(
    { ...demoInputs(caliper), setDelay: { value: td, unit: 's' }, ...patch },
    general,
  );
const withJ = (J: number, patch: SheetInputs = {}) =>
  evaluate({ brokenTrainInertia: kgm2(J), ...patch });
const check = (e: ReturnType<typeof evaluate>, id: string) => e.checks.find((c) => c.id === id)!;
const step = (e: ReturnType<typeof evaluate>, id: string) => e.derivation.find((s) => s.id === id)!;

/** The check passes with `inside` and fails with `beyond` (the same input just across its limit). */
function edge(id: string, inside: SheetInputs, beyond: SheetInputs, J = 120) {
  expect(check(withJ(J, inside), id).pass, `${id} inside`).toBe(true);
  expect(check(withJ(J, beyond), id).pass, `${id} beyond`).toBe(false);
}

describe('caliper sheet: drive train broken', () => {
  it('the speed at set is ω_b + (M_L/J_dr)·t_d, with no gear-loss credit (η_bd = 1)', () => {
    const e = withJ(120, { backDrivingEfficiency: 0.8 });
    const hand = omegaB + (ML / 120) * td; // 2.5525 + 52.625 · 0.3 = 18.34 rad/s
    expect(nearlyEqual(step(e, 'broken-speed-after-delay').value, hand, 1e-12)).toBe(true);
    expect(step(e, 'broken-set-drive-torque').value).toBe(ML);
    expect(step(e, 'broken-delay-acceleration').formula).toBe('α_d = M_d / J_dr');
    expect(step(e, 'broken-speed-after-delay').label).toMatch(/— drive train broken$/);
  });

  it('the load stops only if the lowest brake torque exceeds M_L', () => {
    // Clamp force for M_b,w,min = k·M_L: F = k·M_L / (μ_min·r_e·z_f·z_c) + k_s·w·r_s.
    const F = (k: number) => ({ value: (k * ML) / (0.3 * 0.45 * 4) + 2000, unit: 'N' });
    edge('broken-stops-load', { clampForce: F(1 + 1e-6) }, { clampForce: F(1 - 1e-6) });
    const stuck = withJ(120, { clampForce: F(1 - 1e-3) });
    expect(stuck.warnings.some((w) => w.startsWith('Drive train broken: The brake torque'))).toBe(
      true,
    );
  });

  it('stopping distance against the allowed distance', () => {
    const s = check(withJ(120), 'broken-stopping-distance').value;
    // By hand: ω_1 = 18.34 rad/s, t_b = ω_1·J/(M_b − M_L), φ = (ω_b + ω_1)/2·t_d + ω_1·t_b/2.
    const w1 = omegaB + (ML / 120) * td;
    const tb = (w1 * 120) / (Mb - ML);
    expect(nearlyEqual(s, (((omegaB + w1) / 2) * td + (w1 * tb) / 2) * rk, 1e-9)).toBe(true);
    const at = (k: number) => ({ maxStoppingDistance: { value: s * k, unit: 'm' } });
    edge('broken-stopping-distance', at(1 + 1e-6), at(1 - 1e-6));
  });

  it('rubbing speed at the outer radius when the brake sets against the disc rating', () => {
    const v = check(withJ(120), 'broken-rubbing-speed').value;
    expect(nearlyEqual(v, (omegaB + (ML / 120) * td) * 0.5, 1e-12)).toBe(true);
    const at = (k: number) => ({ discMaxSpeed: { value: v * k, unit: 'm/s' } });
    edge('broken-rubbing-speed', at(1 + 1e-6), at(1 - 1e-6));
  });

  it('disc temperature after the stop, from the peak of normal duty, against the pad limit', () => {
    const cotton = { liningMaterial: 'woven-cotton' }; // max operating temperature 100 °C
    const e = withJ(120, { ...cotton, ambient: { value: 30, unit: 'degC' } });
    const T1 = check(e, 'broken-temperature').value;
    const rise = step(e, 'broken-temperature-rise').value;
    expect(nearlyEqual(T1, step(e, 'peak-temperature').value + rise, 1e-12)).toBe(true);
    // T_1 − T_amb does not depend on the ambient: move the ambient to put T_1 across 100 °C.
    const above = T1 - (273.15 + 30);
    const amb = (dK: number) => ({ ...cotton, ambient: { value: 100 - above + dK, unit: 'degC' } });
    edge('broken-temperature', amb(-1e-3), amb(1e-3));
  });

  it('names its source beside each check: common practice, defer to the governing standard', () => {
    const ids = withJ(120)
      .checks.filter((c) => c.id.startsWith('broken-'))
      .map((c) => c.id);
    expect(ids).toEqual([
      'broken-stops-load',
      'broken-stopping-distance',
      'broken-rubbing-speed',
      'broken-temperature',
    ]);
    for (const id of ids) {
      expect(check(withJ(120), id).source).toMatch(
        /common practice.*defer to the governing standard/,
      );
    }
  });

  it('a smaller J_dr sets the brake faster: over the whole range from J_L to J_eq', () => {
    fc.assert(
      fc.property(
        fc.double({ min: JL * 1.001, max: 2800, noNaN: true }),
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        (J2, k) => {
          const J1 = Math.max(JL * 1.0005, J2 * k);
          fc.pre(J1 < J2);
          const w = (J: number) => step(withJ(J), 'broken-speed-after-delay').value;
          expect(w(J1)).toBeGreaterThan(w(J2));
        },
      ),
      { numRuns: 40 },
    );
  });

  it('a smaller J_dr gives a longer stop below J* = t_d·√(M_L·M_b)/ω_b, a shorter one above', () => {
    // φ(J) = ω_b·t_d + M_L·t_d²/(2J) + (ω_b²·J + 2ω_b·M_L·t_d + M_L²·t_d²/J)/(2(M_b − M_L)) has
    // its minimum at J*: below it the run-away during t_d outweighs the lower kinetic energy.
    const Jstar = (td * Math.sqrt(ML * Mb)) / omegaB; // ≈ 970 kg·m²
    const s = (J: number) => check(withJ(J), 'broken-stopping-distance').value;
    fc.assert(
      fc.property(
        fc.double({ min: JL * 1.001, max: Jstar * 0.999, noNaN: true }),
        fc.double({ min: JL * 1.001, max: Jstar * 0.999, noNaN: true }),
        (a, b) => {
          fc.pre(Math.abs(a - b) > 1e-6 * Jstar);
          const [J1, J2] = a < b ? [a, b] : [b, a];
          expect(s(J1)).toBeGreaterThan(s(J2));
        },
      ),
      { numRuns: 40 },
    );
    expect(s(Jstar * 2)).toBeGreaterThan(s(Jstar * 1.5));
    // And the stopping time falls with J_dr: t_s = t_d + (ω_b·J + M_L·t_d)/(M_b − M_L).
    const t = (J: number) => step(withJ(J), 'broken-stopping-time').value;
    expect(t(100)).toBeLessThan(t(200));
  });

  it("refuses J_dr below the load's own inertia or above the total, on the new field", () => {
    const fieldErrors = (J: number) => {
      try {
        withJ(J);
      } catch (err) {
        if (!isCalcInputError(err)) throw err;
        return err.fields;
      }
      return [];
    };
    const low = fieldErrors(JL * 0.999);
    expect(low.map((f) => f.field)).toEqual(['brokenTrainInertia']);
    expect(low[0]!.message).toMatch(/hoisted load's own inertia.*40\.4 kg·m²/);
    expect(fieldErrors(JL * 1.001)).toEqual([]);
    expect(fieldErrors(2800 * 1.001).map((f) => f.field)).toEqual(['brokenTrainInertia']);
    expect(fieldErrors(2800)).toEqual([]);
  });

  it('without J_dr: a warning when the brake is off the motor shaft, none on it (i = 1)', () => {
    const unchecked = (e: ReturnType<typeof evaluate>) =>
      e.warnings.filter((w) => w.startsWith('Drive train broken is not checked'));
    const empty = evaluate({ brokenTrainInertia: '' });
    expect(unchecked(empty)).toHaveLength(1);
    expect(empty.checks.some((c) => c.id.startsWith('broken-'))).toBe(false);
    expect(unchecked(evaluate({ brokenTrainInertia: '', ratioToBrake: 1 }))).toEqual([]);
    expect(unchecked(withJ(120))).toEqual([]);
  });

  it('the demo enters J_dr and passes the case with its 0.2 s release unit, not with 0.3 s', () => {
    const demo = caliper.evaluate(demoInputs(caliper), general);
    const distance = check(demo, 'broken-stopping-distance');
    expect(distance.pass).toBe(true);
    expect(distance.value).toBeCloseTo(0.2414, 4);
    expect(demo.pass).toBe(true);
    // At 0.3 s the drum runs away for longer: 479 mm against the 300 mm allowed.
    expect(check(withJ(120), 'broken-stopping-distance').value).toBeCloseTo(0.4785, 4);
    expect(check(withJ(120), 'broken-stopping-distance').pass).toBe(false);
  });
});
