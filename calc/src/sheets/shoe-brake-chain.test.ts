import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { getCriteriaSet } from '../criteria/lookup.js';
import { nearlyEqual } from '../testing/expect-close.js';
import { hoistTestRequirements } from './hoist-redundancy.js';
import { demoInputs, getSheetType } from './registry.js';

const crane = getCriteriaSet('crane-hoist')!;
const hoist = getSheetType('hoist-shoe-brake')!;
const trav = getSheetType('travel-shoe-brake')!;
const travel = getCriteriaSet('travel-drive')!;
const check = (e: ReturnType<typeof hoist.evaluate>, id: string) =>
  e.checks.find((c) => c.id === id);
const result = (e: ReturnType<typeof hoist.evaluate>, key: string) =>
  e.results.find((r) => r.key === key)?.value;
const setting = (e: ReturnType<typeof hoist.evaluate>, key: string) =>
  e.fieldSettings.find((f) => f.key === key);

describe('stroke–wear–setting chain on the shoe sheets', () => {
  const demo = hoist.evaluate(demoInputs(hoist), crane);

  it('without a lift stop the clearance is derived: (50 − 20) mm ÷ 25 = 1.2 mm, printed as derived', () => {
    expect(nearlyEqual(result(demo, 'clearance-from-stroke')!, 0.0012, 1e-12)).toBe(true);
    expect(nearlyEqual(setting(demo, 'shoeClearance')!.value, 0.0012, 1e-12)).toBe(true);
    expect(setting(demo, 'shoeClearance')!.note).toMatch(/Derived, not set/);
    expect(setting(demo, 'reserveStroke')!.note).toBeUndefined();
    expect(check(demo, 'stroke-headroom')).toBeUndefined();
  });

  it('the worn case is the re-adjustment point (20 − 5) mm ÷ 25 = 0.6 mm; torque is lost at 0.8 mm', () => {
    expect(nearlyEqual(result(demo, 'wear-readjust-point')!, 0.0006, 1e-12)).toBe(true);
    expect(nearlyEqual(result(demo, 'wear-reserve-used')!, 0.0008, 1e-12)).toBe(true);
    // F_s,r = 1150 N · (1 − 0.02) = 1127 N; F_s,w = 1127 − 40 N/mm · 5 · 0.6 mm = 1007 N
    const relaxed = demo.derivation.find((x) => x.id === 'spring-force-relaxed')!;
    expect(nearlyEqual(relaxed.value, 1127, 1e-9)).toBe(true);
    expect(nearlyEqual(result(demo, 'worn-spring-force')!, 1007, 1e-9)).toBe(true);
    expect(demo.checks.map((c) => c.label).join(' ')).not.toMatch(/fully worn/);
  });

  it('the wear chart falls to zero where the reserve is used up and marks the re-adjustment point', () => {
    const ch = demo.charts.find((c) => c.id === 'torque-wear')!;
    const min = ch.series.find((s) => s.name === 'μ min')!.points;
    const at = min.filter((p) => nearlyEqual(p.x, 0.0008, 1e-9));
    expect(at.some((p) => p.y > 0) && at.some((p) => p.y === 0)).toBe(true);
    expect(min.filter((p) => p.x > 0.0008).every((p) => p.y === 0)).toBe(true);
    expect(ch.referenceLines!.find((l) => /Re-adjust/.test(l.label))!.value).toBeCloseTo(
      0.0006,
      12,
    );
  });

  it('with a lift stop the set clearance is used and the stroke headroom is checked', () => {
    const e = hoist.evaluate({ ...demoInputs(hoist), liftStop: true, clearance: '0.8 mm' }, crane);
    expect(nearlyEqual(setting(e, 'shoeClearance')!.value, 0.0008, 1e-12)).toBe(true);
    expect(check(e, 'stroke-headroom')!.pass).toBe(true);
    const far = hoist.evaluate(
      { ...demoInputs(hoist), liftStop: true, clearance: '1.5 mm' },
      crane,
    );
    expect(check(far, 'stroke-headroom')!.pass).toBe(false);
  });

  it('without a lift stop the clearance field may be left out', () => {
    const inputs: Record<string, unknown> = { ...demoInputs(hoist) };
    delete inputs.clearance;
    expect(() => hoist.evaluate(inputs as never, crane)).not.toThrow();
  });

  it('a drum worn to its limit lowers the worst-case torque in proportion to the diameter', () => {
    const M = result(demo, 'torque-worn-min')!;
    expect(nearlyEqual(result(demo, 'torque-drum-limit')!, (M * 396) / 400, 1e-12)).toBe(true);
    const e = hoist.evaluate({ ...demoInputs(hoist), drumWearAllowance: '190 mm' }, crane);
    expect(check(e, 'torque-drum-wear-limit')!.pass).toBe(false);
  });

  it('stops and holds with the lowest torque in service (drum at its wear limit), as the required-torque check does', () => {
    const lowest = result(demo, 'torque-drum-limit')!;
    expect(check(demo, 'stops-load')!.value).toBe(lowest);
    expect(check(demo, 'each-brake-holds-alone')!.value).toBe(lowest);
    expect(check(demo, 'torque-drum-wear-limit')!.value).toBe(lowest);
    // The deceleration step is worked out with that torque.
    const decel = demo.derivation.find((s) => s.id === 'brake-deceleration')!;
    expect(decel.substituted).toContain(`${lowest.toFixed(1)} N·m`);
    // A larger drum wear allowance lengthens the stop.
    const worn = hoist.evaluate({ ...demoInputs(hoist), drumWearAllowance: '8 mm' }, crane);
    expect(check(worn, 'stopping-distance')!.value).toBeGreaterThan(
      check(demo, 'stopping-distance')!.value,
    );
  });

  it('a minimum lining thickness at or above the new thickness is refused on its field', () => {
    expect(() =>
      hoist.evaluate({ ...demoInputs(hoist), liningMinThickness: '8 mm' }, crane),
    ).toThrow(/liningMinThickness/);
  });
});

describe('spring setting table: only the torque band', () => {
  it.each([
    ['hoist', hoist, crane],
    ['travel', trav, travel],
  ] as const)(
    '%s: every row gives the required torque worn at μ min and stays in range',
    (_n, sheet, set) => {
      const e = sheet.evaluate(demoInputs(sheet), set);
      const req = e.results.find((r) => r.key === 'required-torque')!.value;
      const rows = e.tables.find((t) => t.id === 'spring-setting')!.rows;
      expect(rows.length).toBeGreaterThan(1);
      for (const r of rows) {
        expect(r.torqueMinWorn).toBeGreaterThanOrEqual(req * (1 - 1e-9));
        expect(r.torqueMinWorn).toBeLessThan(r.torqueMin);
      }
    },
  );

  it('property: for any spring setting range the rows stay inside it and above the required torque', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 100, max: 900, noNaN: true }),
        fc.double({ min: 1150, max: 3000, noNaN: true }),
        (lo, hi) => {
          const e = hoist.evaluate(
            { ...demoInputs(hoist), springForceMin: `${lo} N`, springForceMax: `${hi} N` },
            crane,
          );
          const req = e.results.find((r) => r.key === 'required-torque')!.value;
          for (const r of e.tables.find((t) => t.id === 'spring-setting')!.rows) {
            expect(r.springForce).toBeGreaterThanOrEqual(lo * (1 - 1e-12));
            expect(r.springForce).toBeLessThanOrEqual(hi * (1 + 1e-12));
            expect(r.torqueMinWorn).toBeGreaterThanOrEqual(req * (1 - 1e-9));
          }
        },
      ),
      { numRuns: 40 },
    );
  });
});

describe('holding-brake redundancy on the hoist sheet', () => {
  it('the demo (hot metal, power control braking) is two holding brakes and passes with the rules printed', () => {
    const e = hoist.evaluate(demoInputs(hoist), crane);
    expect(check(e, 'holding-brakes-installed')!.pass).toBe(true);
    expect(check(e, 'each-brake-holds-alone')!.pass).toBe(true);
    // With η_bd = 1 each brake's stop is the sheet's own stop (one brake, lowest torque): once.
    expect(check(e, 'each-brake-stops-alone')).toBeUndefined();
    expect(check(e, 'each-brake-stopping-distance')).toBeUndefined();
    expect(check(e, 'stops-load')!.pass).toBe(true);
    expect(e.warnings.join(' ')).toMatch(/its checks stand for each brake alone/);
    expect(check(e, 'brakes-together-drive-train')).toBeUndefined();
    expect(check(e, 'torque-max-friction')!.pass).toBe(true);
    expect(e.warnings.join(' ')).toMatch(/1910\.179\(f\)\(2\)\(vi\).*§4898\(h\)/);
  });

  it("keeps each brake's own stop checks where the sheet's stop credits gear losses (η_bd below 1)", () => {
    const e = hoist.evaluate({ ...demoInputs(hoist), backDrivingEfficiency: 0.9 }, crane);
    expect(check(e, 'each-brake-stops-alone')).toBeDefined();
    expect(check(e, 'each-brake-stopping-distance')).toBeDefined();
    expect(e.warnings.join(' ')).not.toMatch(/its checks stand for each brake alone/);
  });

  it('hot metal on one holding brake fails the redundancy check', () => {
    const e = hoist.evaluate({ ...demoInputs(hoist), brakeArrangement: 'single' }, crane);
    expect(check(e, 'holding-brakes-installed')!.pass).toBe(false);
    expect(e.pass).toBe(false);
  });

  it('without hot metal one holding brake is enough and no rule is printed', () => {
    const e = hoist.evaluate(
      { ...demoInputs(hoist), brakeArrangement: 'single', hotMetal: false },
      crane,
    );
    expect(check(e, 'holding-brakes-installed')!.pass).toBe(true);
    expect(e.warnings.join(' ')).not.toMatch(/§4898\(h\)/);
  });

  it('both brakes at μ max at the top of the range count against the drive train, once', () => {
    const e = hoist.evaluate({ ...demoInputs(hoist), maxBrakeTorque: '1000 N m' }, crane);
    const c = check(e, 'torque-max-friction')!;
    expect(c.pass).toBe(false);
    // The higher of the short-shoe and the pivoted long-shoe torque, spring at 1600 N of 1100 N.
    const top = (Math.max(result(e, 'torque-max')!, c.value / 2 / (1600 / 1100)) * 1600) / 1100;
    expect(nearlyEqual(c.value, 2 * top, 1e-9)).toBe(true);
    expect(e.checks.filter((x) => /drive-train rating/.test(x.label))).toHaveLength(1);
  });
});

describe('main spring, thruster extremes and test requirements', () => {
  const demo = hoist.evaluate(demoInputs(hoist), crane);

  it('checks the main spring at the highest setting with the shoes lifted', () => {
    // F = 1600 N + 40 N/mm · 1.2 mm · 5 = 1840 N
    expect(nearlyEqual(result(demo, 'spring-force-highest')!, 1840, 1e-9)).toBe(true);
    for (const id of [
      'spring-stress-working',
      'spring-stress-solid',
      'spring-solid-margin',
      'spring-buckling',
      'spring-rate-agrees',
    ])
      expect(check(demo, id)!.pass, id).toBe(true);
    const thin = hoist.evaluate({ ...demoInputs(hoist), springWireDiameter: '8 mm' }, crane);
    expect(check(thin, 'spring-rate-agrees')!.pass).toBe(false);
  });

  it('a spring whose solid length exceeds its free length is refused on the sheet field', () => {
    expect(() => hoist.evaluate({ ...demoInputs(hoist), springActiveCoils: 30 }, crane)).toThrow(
      /springFreeLength/,
    );
  });

  it('checks the thruster force at −10 % voltage and both temperature extremes', () => {
    const base = check(demo, 'thruster-force')!.value;
    expect(nearlyEqual(check(demo, 'thruster-force-cold')!.value, base * 0.85, 1e-12)).toBe(true);
    const weak = hoist.evaluate({ ...demoInputs(hoist), thrusterFactorCold: 0.5 }, crane);
    expect(check(weak, 'thruster-force-cold')!.pass).toBe(false);
    expect(check(weak, 'thruster-force-hot')!.pass).toBe(true);
  });

  it('prints the load test (125 % of rated load) and the static torque test', () => {
    const w = demo.warnings.join(' ');
    expect(w).toMatch(/at most 12500 kg/);
    expect(w).toMatch(/1910\.179\(k\)\(2\)/);
    expect(w).toMatch(/each holding brake alone/);
    expect(w).toMatch(/Static torque test after the linings have bedded in: .*apply 180 N·m/);
    // The same figures in US units for a sheet printed in them: 12 500 kg = 27 557.8 lb, down to
    // 27 550 lb; 179.35 N·m = 132.28 lbf·ft, up to 133 lbf·ft (the required torque, not less).
    expect(w).toMatch(/at most 12500 kg \(27550 lb;/);
    expect(w).toMatch(/apply 180 N·m \(133 lbf·ft;/);
  });

  it('never prints a test load above 125 % nor a test torque below the required torque', () => {
    // 1.25 × 10 005 kg = 12 506.25 kg: 12 510 kg would exceed the limit; 100.2 N·m is not 100.
    const [load, torque] = hoistTestRequirements({
      ratedLoad: 10_005,
      requiredTorque: 100.2,
      brakesInstalled: 1,
    });
    expect(load).toMatch(/at most 12500 kg/);
    expect(torque).toMatch(/apply 101 N·m/);
    // 12 506.25 kg = 27 571.6 lb: down to 27 570 lb; 100.2 N·m = 73.90 lbf·ft: up to 74.
    expect(load).toMatch(/\(27570 lb;/);
    expect(torque).toMatch(/\(74 lbf·ft;/);
  });
});

describe('spring relaxation in service', () => {
  const base = demoInputs(hoist);
  const none: Record<string, unknown> = { ...base };
  delete none.springRelaxation;
  const demo = hoist.evaluate(base, crane);
  const without = hoist.evaluate(none as never, crane);
  const step = (e: ReturnType<typeof hoist.evaluate>, id: string) =>
    e.derivation.find((s) => s.id === id);

  it('starts every worn case from F_s·(1 − ρ_s): the worn force falls by ρ_s·F_s exactly', () => {
    const F = 1150;
    const drop = step(without, 'worn-spring-force')!.value - step(demo, 'worn-spring-force')!.value;
    expect(nearlyEqual(drop, 0.02 * F, 1e-9)).toBe(true);
    expect(step(demo, 'worn-spring-force')!.formula).toBe('F_s,w = F_s,r − k_s · ΔL_s');
    // The chart and the setting table come from the same relaxed force as the printed steps.
    const ch = demo.charts.find((c) => c.id === 'torque-wear')!;
    const min = ch.series.find((s) => s.name === 'μ min')!.points;
    const atAdj = min.find((p) => nearlyEqual(p.x, 0.0006, 1e-9))!;
    expect(nearlyEqual(atAdj.y, result(demo, 'torque-worn-min')!, 1e-6)).toBe(true);
  });

  it('keeps the full set force for the new-lining and drive-train torques', () => {
    expect(result(demo, 'torque-max')).toBe(result(without, 'torque-max'));
    expect(check(demo, 'torque-max-friction')!.value).toBe(
      check(without, 'torque-max-friction')!.value,
    );
  });

  it('raises the low end of the torque band by 1/(1 − ρ_s)', () => {
    const low = (e: typeof demo) => e.tables[0]!.rows[0]!.springForce!;
    expect(low(demo)).toBeGreaterThan(low(without));
  });

  it('says so when left empty, and refuses a share above 0.3 on its field', () => {
    expect(without.warnings.some((w) => /Spring relaxation not entered/.test(w))).toBe(true);
    expect(demo.warnings.some((w) => /Spring relaxation not entered/.test(w))).toBe(false);
    expect(() => hoist.evaluate({ ...base, springRelaxation: 0.5 }, crane)).toThrow(
      expect.objectContaining({
        fields: [expect.objectContaining({ field: 'springRelaxation' })],
      }),
    );
  });
});

describe('the stroke chain on the card, no lift stop', () => {
  const setting = (e: ReturnType<typeof hoist.evaluate>, key: string) =>
    e.fieldSettings.find((f) => f.key === key)!;

  it('a reserve set anywhere in its tolerance leaves the clearance and working stroke inside theirs', () => {
    const base = hoist.evaluate(demoInputs(hoist), crane);
    for (const key of ['shoeClearance', 'workingStroke']) {
      const f = setting(base, key);
      const band = f.tolerance!.band;
      if (band.kind !== 'absolute') throw new Error('absolute band expected');
      // Reserve at the top of its −0 / +3 mm: the chain's values at the low end of theirs.
      const high = hoist.evaluate(
        { ...demoInputs(hoist), reserveStroke: { value: 23, unit: 'mm' } },
        crane,
      );
      expect(nearlyEqual(setting(high, key).value, f.value - band.minus, 1e-9), key).toBe(true);
      expect(band.plus, key).toBe(0);
    }
    // Demo: 50 mm nominal stroke, r_t 25: 1.20 mm at 20 mm reserve, 1.08 mm at 23 mm.
    const clearance = setting(base, 'shoeClearance').tolerance!.band;
    expect(clearance).toMatchObject({ kind: 'absolute' });
    if (clearance.kind === 'absolute') expect(clearance.minus * 1000).toBeCloseTo(0.12, 12);
  });

  it('gives the in-service limits wear moves the chain to: the reserve down to its minimum', () => {
    const e = hoist.evaluate(demoInputs(hoist), crane);
    // Demo: 50 mm nominal stroke, reserve 20 mm set and 5 mm minimum, r_t 25.
    expect(setting(e, 'reserveStroke').inService).toMatchObject({ kind: 'atLeast' });
    expect(setting(e, 'reserveStroke').inService!.value * 1000).toBeCloseTo(5, 12);
    expect(setting(e, 'workingStroke').inService).toMatchObject({ kind: 'atMost' });
    expect(setting(e, 'workingStroke').inService!.value * 1000).toBeCloseTo(45, 9);
    expect(setting(e, 'shoeClearance').inService!.value * 1000).toBeCloseTo(1.8, 9);
    // With a lift stop the clearance is set and does not follow the reserve.
    const stop = hoist.evaluate(
      { ...demoInputs(hoist), liftStop: true, clearance: { value: 0.8, unit: 'mm' } },
      crane,
    );
    expect(setting(stop, 'shoeClearance').inService).toBeUndefined();
  });
});
