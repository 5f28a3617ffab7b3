import { describe, expect, it } from 'vitest';
import { isCalcInputError } from '../core/errors.js';
import {
  discConstants,
  discFlatForce,
  discForce,
  discStiffness,
  discStresses,
  TABLE_STEEL,
} from './disc.js';
import { k1, k4 } from './factors.js';
import { validateDisc, validateDeflection } from './validate.js';

const mm = 1e-3;
const disc = (De: number, Di: number, t: number, l0: number, tReduced?: number) => ({
  De: De * mm,
  Di: Di * mm,
  t: t * mm,
  l0: l0 * mm,
  tReduced: tReduced === undefined ? undefined : tReduced * mm,
  ...TABLE_STEEL,
});

describe('disc-spring factors', () => {
  it('K1 at δ = 2 matches the published implementation value 0.6943332', () => {
    expect(k1(2)).toBeCloseTo(0.6943332, 7);
  });
  it('K4 is 1 when t′ = t and l0/t = 1.4 (no contact flats)', () => {
    expect(k4(1, 1, 1.4)).toBeCloseTo(1, 12);
  });
  it('K4 exceeds 1 for a reduced thickness', () => {
    expect(k4(8, 7.5, 10.6)).toBeGreaterThan(1.05);
  });
});

describe('single disc force', () => {
  // DIN 2093:1992 series A rows as reproduced in a disc-spring maker's public catalogue (±2.5 %).
  const rows: [number, number, number, number, number, number][] = [
    [8, 4.2, 0.4, 0.6, 210, -1200],
    [10, 5.2, 0.5, 0.75, 329, -1210],
    [12.5, 6.2, 0.7, 1.0, 673, -1280],
    [16, 8.2, 0.9, 1.25, 1000, -1160],
    [20, 10.2, 1.1, 1.55, 1530, -1180],
  ];
  it.each(rows)('De %s: F(0.75·h0) and σOM within 2.5 %% of the table', (De, Di, t, l0, F, som) => {
    const d = disc(De, Di, t, l0);
    const s = 0.75 * (l0 - t) * mm;
    expect(Math.abs(discForce(d, s) / F - 1)).toBeLessThan(0.025);
    expect(Math.abs(discStresses(d, s).sigmaOM / (som * 1e6) - 1)).toBeLessThan(0.025);
  });

  it('is zero at s = 0 and equals the flat load at s = h0', () => {
    const d = disc(40, 20.4, 2.25, 3.15);
    expect(discForce(d, 0)).toBe(0);
    const c = discConstants(d);
    expect(discFlatForce(d, c)).toBeCloseTo(discForce(d, c.h0, c), 6);
    // flat load of a linear-ish A disc: F_c = 4E/(1−ν²)·t³·h0/(K1·De²)
    const fc = (((4 * 206e9) / 0.91) * 2.25e-3 ** 3 * 0.9e-3) / (c.K1 * 0.04 ** 2);
    expect(discFlatForce(d, c) / fc).toBeCloseTo(1, 10);
  });

  it('stiffness is the derivative of the force', () => {
    const d = disc(50, 25.4, 2, 3.6);
    const s = 0.7e-3;
    const h = 1e-9;
    const numeric = (discForce(d, s + h) - discForce(d, s - h)) / (2 * h);
    expect(discStiffness(d, s) / numeric).toBeCloseTo(1, 5);
  });

  it('group 3 rows with contact flats reproduce the nominal-thickness design force', () => {
    // With t′ and K4 the force at s = 0.75·(l0 − t) matches the same disc computed with nominal
    // t to within 0.1 %: the purpose of K4 (DIN EN 16984). A125: 125/64/8 (t′ 7.5)/10.6.
    const withFlats = disc(125, 64, 8, 10.6, 7.5);
    const nominal = disc(125, 64, 8, 10.6);
    const s = 0.75 * 2.6 * mm;
    expect(discForce(withFlats, s) / discForce(nominal, s)).toBeCloseTo(1, 3);
    expect(discConstants(withFlats).group).toBe(3);
    expect(discConstants(withFlats).h0).toBeCloseTo(3.1e-3, 12);
  });

  it('stress at point I is the largest compressive stress of a series A disc', () => {
    const d = disc(40, 20.4, 2.25, 3.15);
    const st = discStresses(d, 0.675e-3);
    expect(st.sigmaI).toBeLessThan(st.sigmaOM);
    expect(st.sigmaII).toBeGreaterThan(0);
    expect(st.sigmaIII).toBeGreaterThan(0);
  });
});

describe('validation', () => {
  const fields = (fn: () => void) => {
    try {
      fn();
    } catch (e) {
      if (isCalcInputError(e)) return e.fields.map((f) => f.field);
      throw e;
    }
    return [];
  };
  it('rejects Di ≥ De naming Di', () => {
    expect(fields(() => validateDisc(disc(20, 20, 1, 1.5)))).toEqual(['Di']);
  });
  it('rejects non-positive t and l0 ≤ t', () => {
    expect(fields(() => validateDisc(disc(20, 10, 0, 1.5)))).toContain('t');
    expect(fields(() => validateDisc(disc(20, 10, 1.5, 1.5)))).toContain('l0');
  });
  it('rejects deflection beyond flat', () => {
    expect(fields(() => validateDeflection(0.6e-3, 0.5e-3))).toEqual(['deflection']);
    expect(fields(() => validateDeflection(0.5e-3, 0.5e-3))).toEqual([]);
  });
  it('reports every bad field at once', () => {
    expect(fields(() => validateDisc({ ...disc(10, 20, -1, 1), nu: 0.7 }))).toEqual(
      expect.arrayContaining(['Di', 't', 'nu']),
    );
  });
});

describe('standard sizes table', () => {
  it('every row reproduces its listed force at 0.75·(l0 − t) within its source tolerance', async () => {
    const { STANDARD_DISC_SIZES } = await import('./standard-sizes.js');
    for (const r of STANDARD_DISC_SIZES) {
      const d = disc(r.De, r.Di, r.t, r.l0, r.tReduced);
      const F = discForce(d, 0.75 * (r.l0 - r.t) * mm);
      const tol =
        r.confidence === 'published' ? 0.025 : r.confidence === 'secondary' ? 0.005 : 0.01;
      expect(Math.abs(F / r.force075 - 1), r.designation).toBeLessThan(tol);
    }
  });
});
