import { describe, expect, it } from 'vitest';
import { Derivation } from '../core/step.js';
import { nearlyEqual } from '../testing/expect-close.js';
import { backOffPreload } from './back-off.js';
import { discFlatForce, discStresses, TABLE_STEEL } from './disc.js';
import { deriveStackSet } from './stack-derivation.js';
import type { DiscStack } from './stack.js';

const st = (tReduced?: number): DiscStack => ({
  disc: { De: 0.125, Di: 0.064, t: 8e-3, l0: 10.6e-3, tReduced, ...TABLE_STEEL },
  seriesCount: 3,
  parallelCount: 2,
  frictionCone: 0.02,
  frictionEdge: 0.03,
});

describe('deriveStackSet', () => {
  it('gives the same numbers as the numeric model and records every step', () => {
    const d = new Derivation('stack');
    const lead = 3e-3;
    const r = deriveStackSet({ stack: st(), lead, angle: Math.PI / 2 }, d, 'a-');
    const ref = backOffPreload(st(), lead, 90);
    expect(nearlyEqual(r.setDeflection, ref.setDeflection, 1e-12)).toBe(true);
    expect(nearlyEqual(r.stackUnloading, ref.forces.unloading, 1e-12)).toBe(true);
    expect(nearlyEqual(r.stackLoading, ref.forces.loading, 1e-12)).toBe(true);
    expect(nearlyEqual(r.flatForce, discFlatForce(st().disc), 1e-12)).toBe(true);
    const s = discStresses(st().disc, r.setDeflection);
    expect(nearlyEqual(r.stresses.I, s.sigmaI, 1e-12)).toBe(true);
    expect(nearlyEqual(r.stresses.IV, s.sigmaIV, 1e-12)).toBe(true);
    const ids = d.steps.map((x) => x.id);
    expect(ids).toContain('a-preload');
    expect(ids).not.toContain('a-K4');
    const pre = d.steps.find((x) => x.id === 'a-preload');
    expect(pre?.formula).toBe('F_V = F_ges / (1 + w_M · (n − 1) + w_R)');
    expect(pre?.substituted).toMatch(/^F_V = [\d.]+ kN \/ \(1 \+ 0\.02 · \(2 − 1\) \+ 0\.03\)$/);
  });

  it('adds C1, C2 and K4 steps for a group 3 disc with contact flats', () => {
    const d = new Derivation('stack');
    const r = deriveStackSet({ stack: st(7.5e-3), lead: 3e-3, angle: 1 }, d);
    expect(d.steps.map((x) => x.id)).toEqual(expect.arrayContaining(['C1', 'C2', 'K4']));
    expect(r.constants.K4).toBeGreaterThan(1);
    expect(nearlyEqual(d.value('K4'), r.constants.K4, 1e-12)).toBe(true);
  });

  it('solves the angle for a required preload', () => {
    const d = new Derivation('stack');
    const target = backOffPreload(st(), 3e-3, 120).forces.unloading;
    const r = deriveStackSet({ stack: st(), lead: 3e-3, angle: 0, requiredPreload: target }, d);
    expect(((r.angleForRequired as number) * 180) / Math.PI).toBeCloseTo(120, 5);
  });

  it('backing off past flat travel leaves a slack stack with zero preload, not NaN', () => {
    const d = new Derivation('stack');
    const r = deriveStackSet({ stack: st(), lead: 3e-3, angle: 20 * Math.PI }, d);
    expect(r.slack).toBe(true);
    expect(r.stackUnloading).toBe(0);
    expect(d.steps.every((x) => Number.isFinite(x.value))).toBe(true);
  });
});
