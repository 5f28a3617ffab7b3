import { describe, expect, it } from 'vitest';
import { bandBrake, bandTightFromSlack } from './band.js';
import { nearlyEqual } from '../testing/expect-close.js';
import { degrees, length, pressure, ratio } from '../units/quantities.js';

const IN = 0.0254;
const LBF = 4.4482216152605;
const PSI = 6894.75729276459;

describe('band brake', () => {
  it('Mott, Machine Elements in Mechanical Design 4th ed., Example Problem 22-10: P1 300 lb, P2 112 lb, T 1126 lb·in (±0.3 %)', () => {
    const r = bandBrake(
      pressure(25 * PSI),
      length(2 * IN),
      length(6 * IN),
      ratio(0.25),
      degrees(225),
    );
    expect(nearlyEqual(r.tight / LBF, 300, 1e-9)).toBe(true);
    // The book prints P2 rounded to whole pounds: ±0.5 lb.
    expect(nearlyEqual(r.slack / LBF, 112, 0, 0.5)).toBe(true);
    expect(nearlyEqual(r.torque / (LBF * IN), 1126, 3e-3)).toBe(true);
  });
  it('tension ratio e^{fφ}', () => {
    expect(
      nearlyEqual(bandTightFromSlack(100, 0.3, Math.PI), 100 * Math.exp(0.3 * Math.PI), 1e-12),
    ).toBe(true);
  });
});
