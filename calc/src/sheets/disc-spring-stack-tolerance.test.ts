import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isCalcInputError } from '../core/errors.js';
import type { CriteriaSet, SheetInputs } from '../core/types.js';
import { backOffPreload } from '../disc-springs/back-off.js';
import { TABLE_STEEL } from '../disc-springs/disc.js';
import { WORKING_BAND } from '../disc-springs/curve.js';
import { evaluateTolerance, settingTolerance } from '../field/evaluate-tolerance.js';
import { BACK_OFF_ANGLE } from '../field/tolerances.js';
import { discSpringStackSheet as sheet } from './disc-spring-stack.js';
import { demoInputs } from './registry.js';

const criteria: CriteriaSet = { id: 'test', version: 1, name: 'test', description: '', values: [] };
const DEG = Math.PI / 180;
type E = ReturnType<typeof sheet.evaluate>;

// Stack 1 of the demo alone: one disc 40 × 20.4 × 2.25, l0 3.15 (h0 0.9 mm) on a 2.5 mm lead.
const H0 = 0.9e-3;
const LEAD = 2.5e-3;
const demoStack = {
  disc: { De: 0.04, Di: 0.0204, t: 2.25e-3, l0: 3.15e-3, ...TABLE_STEEL },
  seriesCount: 1,
  parallelCount: 1,
  frictionCone: 0.02,
  frictionEdge: 0.03,
};
/** Back-off (°) that leaves stack 1 at s/h0 = ratio: s = h0 − P·θ/360°. */
const angleAt = (ratio: number) => ((1 - ratio) * H0 * 360) / LEAD;

const evaluate = (angleDeg: number, tolDeg: number, extra: SheetInputs = {}): E =>
  sheet.evaluate(
    {
      ...demoInputs(sheet),
      bEnabled: false,
      aBackOff: { value: angleDeg, unit: 'deg' },
      aBackOffTolerance: { value: tolDeg, unit: 'deg' },
      ...extra,
    },
    criteria,
  );
const check = (e: E, id: string) => {
  const c = e.checks.find((x) => x.id === id);
  if (!c) throw new Error(`no check ${id}`);
  return c;
};

describe('disc-spring stack sheet: working band and back-off tolerance', () => {
  it('set deflection ÷ h0 at least 0.15: fails just beyond, passes inside', () => {
    const inside = check(evaluate(angleAt(WORKING_BAND.min + 0.005), 0), 'a-set-deflection-min');
    const beyond = check(evaluate(angleAt(WORKING_BAND.min - 0.005), 0), 'a-set-deflection-min');
    expect(inside.pass).toBe(true);
    expect(beyond.pass).toBe(false);
    expect(beyond.value).toBeCloseTo(WORKING_BAND.min - 0.005, 9);
    expect(beyond.source).toMatch(
      /from memory of DIN 2093 \(now DIN EN 16983\).*governing standard/,
    );
  });

  it('set deflection ÷ h0 at most 0.75: fails just beyond, passes inside', () => {
    const inside = check(evaluate(angleAt(WORKING_BAND.max - 0.005), 0), 'a-set-deflection-max');
    const beyond = check(evaluate(angleAt(WORKING_BAND.max + 0.005), 0), 'a-set-deflection-max');
    expect(inside.pass).toBe(true);
    expect(beyond.pass).toBe(false);
    expect(beyond.source).toMatch(/from memory of DIN 2093.*governing standard/);
  });

  it('backed off past: fails when angle + tolerance leaves less than 0.15·h0, passes inside', () => {
    // The set angle itself stays well inside the band; only the tolerance carries it out.
    const angle = 60;
    const tolInside = angleAt(WORKING_BAND.min + 0.005) - angle;
    const tolBeyond = angleAt(WORKING_BAND.min - 0.005) - angle;
    expect(check(evaluate(angle, tolInside), 'a-band-past').pass).toBe(true);
    const beyond = evaluate(angle, tolBeyond);
    expect(check(beyond, 'a-band-past').pass).toBe(false);
    expect(check(beyond, 'a-set-deflection-min').pass).toBe(true);
  });

  it('backed off short (angle − tolerance, the reading margin): fails just beyond 0.75·h0', () => {
    const inside = evaluate(angleAt(WORKING_BAND.max - 0.005) + 30, 30);
    const beyond = evaluate(angleAt(WORKING_BAND.max + 0.005) + 30, 30);
    expect(check(inside, 'a-band-short').pass).toBe(true);
    expect(check(beyond, 'a-band-short').pass).toBe(false);
    // The set angle itself is well inside the band: only the margin fails.
    expect(check(beyond, 'a-set-deflection-max').pass).toBe(true);
    expect(check(beyond, 'a-band-short').label).toMatch(/backed off short \(−30°\)/);
  });

  it('evaluates the ends of the tolerance at angle − tolerance and angle + tolerance', () => {
    const e = evaluate(60, 20);
    const at = (deg: number) => backOffPreload(demoStack, LEAD, deg);
    expect(check(e, 'a-band-short').value).toBeCloseTo(at(40).setDeflection / H0, 12);
    expect(check(e, 'a-set-deflection-max').value).toBeCloseTo(at(60).setDeflection / H0, 12);
    expect(check(e, 'a-band-past').value).toBeCloseTo(at(80).setDeflection / H0, 12);
    expect(check(e, 'a-preload').value).toBeCloseTo(at(60).forces.unloading, 6);
    expect(check(e, 'a-preload-past').value).toBeCloseTo(at(80).forces.unloading, 6);
    expect(check(e, 'a-band-past').label).toMatch(/backed off past \(\+20°\)/);
  });

  it('checks the required preload at the past end, where it is least', () => {
    const short = backOffPreload(demoStack, LEAD, 60).forces.unloading;
    const past = backOffPreload(demoStack, LEAD, 80).forces.unloading;
    const between = { aRequiredPreload: { value: (short + past) / 2, unit: 'N' } };
    const e = evaluate(60, 20, between);
    expect(check(e, 'a-preload').pass).toBe(true);
    expect(check(e, 'a-preload-past').pass).toBe(false);
    expect(e.pass).toBe(false);
    // No tolerance: both ends are the set angle and the same required preload is met.
    expect(check(evaluate(60, 0, between), 'a-preload-past').pass).toBe(true);
    const none = evaluate(60, 20, { aRequiredPreload: '0 N' });
    expect(none.checks.some((c) => c.id.startsWith('a-preload'))).toBe(false);
  });

  it('defaults the tolerance to the field card band (+15°) and carries the declared one on the card', () => {
    const field = sheet.fields.find((f) => f.key === 'aBackOffTolerance');
    expect(field?.demo).toEqual({ value: 15, unit: 'deg' });
    expect(BACK_OFF_ANGLE.band).toMatchObject({ minus: 0 });
    const e = evaluate(60, 25);
    const setting = e.fieldSettings.find((f) => f.key === 'a.backOffAngle')!;
    const tol = settingTolerance(setting, sheet.fieldCard)!;
    expect(tol.band).toEqual({ kind: 'absolute', minus: 0, plus: 25 * DEG });
    expect(tol.direction).toBe('loosen');
    const measured = (deg: number) => evaluateTolerance(60 * DEG, deg * DEG, tol, 'angle').status;
    expect(measured(84)).toBe('in');
    expect(measured(86)).toBe('out');
    expect(measured(58)).toBe('out');
  });

  it('holds the stack-length tolerance to the lengths the back-off band leaves (± P·Δθ/360°)', () => {
    // 2.5 mm lead over 15°: 0.104 mm each way, inside the usual ± 0.2 mm (common practice).
    const e = evaluate(60, 15);
    const length = e.fieldSettings.find((f) => f.key === 'a.setLength')!;
    const band = settingTolerance(length, sheet.fieldCard)!.band;
    expect(band).toMatchObject({ kind: 'absolute' });
    if (band.kind !== 'absolute') return;
    expect(band.minus).toBeCloseTo((LEAD * 15) / 360, 12);
    expect(band.plus).toBeCloseTo((LEAD * 15) / 360, 12);
    // A stack measured 0.2 mm short sits nearer flat than the band the sheet checks: judged out.
    expect(
      evaluateTolerance(
        length.value,
        length.value - 0.2e-3,
        settingTolerance(length, sheet.fieldCard)!,
        'length',
      ).status,
    ).toBe('out');
    // A back-off band wider than ± 0.2 mm of length keeps the usual ± 0.2 mm.
    const wide = evaluate(60, 45).fieldSettings.find((f) => f.key === 'a.setLength')!;
    expect(settingTolerance(wide, sheet.fieldCard)!.band).toEqual({
      kind: 'absolute',
      minus: 0.2e-3,
      plus: 0.2e-3,
    });
  });

  it('refuses a negative tolerance on its own field', () => {
    try {
      evaluate(60, -5);
      expect.unreachable('a negative tolerance was accepted');
    } catch (e) {
      if (!isCalcInputError(e)) throw e;
      expect(e.fields.map((f) => f.field)).toEqual(['aBackOffTolerance']);
    }
  });

  it('backed off past never leaves more preload than the set angle (any angle, any tolerance)', () => {
    // Holds for the demo discs, whose h0/t (0.4 and 0.7) is below √2: their force rises all the
    // way to flat. A disc above that is why the sheet checks the preload at both ends.
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1080, noNaN: true }),
        fc.double({ min: 0, max: 360, noNaN: true }),
        (angle, tol) => {
          const e = sheet.evaluate(
            {
              ...demoInputs(sheet),
              aBackOff: { value: angle, unit: 'deg' },
              aBackOffTolerance: { value: tol, unit: 'deg' },
              bBackOff: { value: angle, unit: 'deg' },
              bBackOffTolerance: { value: tol, unit: 'deg' },
            },
            criteria,
          );
          for (const k of ['a', 'b']) {
            const past = check(e, `${k}-preload-past`).value;
            expect(past).toBeLessThanOrEqual(check(e, `${k}-preload`).value);
          }
        },
      ),
      { numRuns: 200 },
    );
  });
});
