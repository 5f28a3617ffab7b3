import { describe, expect, it } from 'vitest';
import { getCriteriaSet } from '../criteria/lookup.js';
import { isCalcInputError } from '../core/errors.js';
import { nearlyEqual } from '../testing/expect-close.js';
import { demoInputs, getSheetType } from './registry.js';

const crane = getCriteriaSet('crane-hoist')!;
const hoist = getSheetType('hoist-shoe-brake')!;
type E = ReturnType<typeof hoist.evaluate>;
const check = (e: E, id: string) => e.checks.find((c) => c.id === id);
const step = (e: E, id: string) => e.derivation.find((s) => s.id === id)!;
const IDS = ['lever-bending', 'pin-shear', 'pin-bearing', 'base-bolt-tension'];
const LEVER_KEYS = [
  'leverMomentArm',
  'leverSectionWidth',
  'leverSectionDepth',
  'leverAllowableBending',
  'shoePinDiameter',
  'shoePinBearingLength',
  'shoePinAllowableShear',
  'shoePinAllowableBearing',
  'baseBoltRowSpacing',
  'baseBoltsPerRow',
  'baseBoltAllowableLoad',
];

describe('levers, pins and base bolts on the shoe sheets', () => {
  const demo = hoist.evaluate(demoInputs(hoist), crane);

  it('the demo hoist passes each check with margin (utilisation 0.1–0.7)', () => {
    for (const id of IDS) {
      const c = check(demo, id)!;
      expect(c.section, id).toBe('levers');
      expect(c.pass, id).toBe(true);
      expect(c.utilisation, id).toBeGreaterThan(0.1);
      expect(c.utilisation, id).toBeLessThan(0.7);
    }
  });

  it('the lever and the pin take their load from the spring at the top of its range, shoes lifted', () => {
    const Fs = step(demo, 'spring-force-highest').value;
    // 1600 N + 40 N/mm × 1.2 mm × 5 = 1840 N; M = 1840 N × 150 mm; σ = 6M/(12 mm × (40 mm)²)
    expect(nearlyEqual(Fs, 1840, 1e-9)).toBe(true);
    expect(
      nearlyEqual(
        check(demo, 'lever-bending')!.value,
        (6 * Fs * 0.15) / (0.012 * 0.04 ** 2),
        1e-12,
      ),
    ).toBe(true);
    const Fp = 2.5 * Fs * Math.hypot(1, 0.45);
    expect(nearlyEqual(step(demo, 'shoe-pin-load').value, Fp, 1e-12)).toBe(true);
    expect(step(demo, 'lever-bending-moment').formula).toBe('M_l = F_s,max,rel · a_l');
    expect(step(demo, 'shoe-pin-load').formula).toBe('F_p = i · F_s,max,rel · √(1 + μ_max²)');
  });

  it('the base bolts take the torque at μ max with the spring at the top of its range', () => {
    const M = step(demo, 'torque-max-adjustable').value;
    expect(nearlyEqual(check(demo, 'base-bolt-tension')!.value, M / (0.2 * 2), 1e-12)).toBe(true);
  });

  it('a higher top of the spring range raises every lever, pin and bolt load', () => {
    const e = hoist.evaluate({ ...demoInputs(hoist), springForceMax: '1800 N' }, crane);
    for (const id of IDS) expect(check(e, id)!.value, id).toBeGreaterThan(check(demo, id)!.value);
  });

  it('a thin lever fails its check', () => {
    const e = hoist.evaluate({ ...demoInputs(hoist), leverSectionDepth: '25 mm' }, crane);
    expect(check(e, 'lever-bending')!.pass).toBe(false);
    expect(e.pass).toBe(false);
  });

  it('left out, the sheet evaluates without the fields and without the checks', () => {
    const inputs: Record<string, unknown> = { ...demoInputs(hoist), leversEnabled: false };
    for (const k of LEVER_KEYS) delete inputs[k];
    const e = hoist.evaluate(inputs as Parameters<typeof hoist.evaluate>[0], crane);
    for (const id of IDS) expect(check(e, id), id).toBeUndefined();
  });

  it('included, a missing or bad field is an error for that field', () => {
    const inputs: Record<string, unknown> = { ...demoInputs(hoist), shoePinBearingLength: '0 mm' };
    delete inputs.baseBoltsPerRow;
    try {
      hoist.evaluate(inputs as Parameters<typeof hoist.evaluate>[0], crane);
      expect.unreachable();
    } catch (e) {
      expect(isCalcInputError(e)).toBe(true);
      const fields = (e as { fields: { field: string }[] }).fields.map((f) => f.field);
      expect(fields).toContain('shoePinBearingLength');
      expect(fields).toContain('baseBoltsPerRow');
    }
  });
});
