import { describe, expect, it } from 'vitest';
import {
  formatForDerivation,
  formatInPrintUnits,
  formatNumber,
  placeDigits,
  printUnitsOf,
} from './format.js';

describe('formatNumber', () => {
  it('prints significant figures without an exponent for everyday magnitudes', () => {
    const cases: [number, number | undefined, string][] = [
      [12.4, undefined, '12.40'],
      [-0.35, undefined, '−0.3500'],
      [0, undefined, '0'],
      [1, undefined, '1.000'],
      [10, undefined, '10.00'],
      [100, undefined, '100.0'],
      [0.001, undefined, '0.001000'],
      [0.00099995, undefined, '1.000×10⁻³'],
      [9.9995, undefined, '10.00'],
      [9.99949, undefined, '9.999'],
      [999.95, undefined, '1000'],
      [1234.5, undefined, '1235'],
      [12345, undefined, '12350'],
      [123456789, undefined, '123500000'],
      [1e9, undefined, '1.000×10⁹'],
      [0.1, undefined, '0.1000'],
      [0.15, 2, '0.15'],
      [152.4, 3, '152'],
      [1e-7, undefined, '1.000×10⁻⁷'],
      [99999.5, 6, '99999.5'],
      [-1e-4, undefined, '−1.000×10⁻⁴'],
      [2.5e-12, 2, '2.5×10⁻¹²'],
      [6.02e23, 3, '6.02×10²³'],
    ];
    for (const [value, digits, text] of cases) expect(formatNumber(value, digits)).toBe(text);
  });

  it('prints the same digits as the Math.log10 exponent it replaced, next to every power of ten', () => {
    // The exponent comes from a table of powers of ten; log10 can round across a power of ten a
    // few ulps from it. Every double within 200 ulps of each power must print as before.
    const withLog10 = (value: number, digits: number): string =>
      placeDigits(
        Math.abs(value),
        value < 0 ? '−' : '',
        digits,
        Math.floor(Math.log10(Math.abs(value))),
      );
    const bits = new Float64Array(1);
    const word = new BigInt64Array(bits.buffer);
    let mismatches = 0;
    for (let k = -3; k <= 8; k++) {
      bits[0] = 10 ** k;
      const centre = word[0];
      for (let u = -200n; u <= 200n; u++) {
        word[0] = centre + u;
        const x = bits[0];
        if (x < 1e-3 || x >= 1e9) continue;
        for (let digits = 1; digits <= 15; digits++) {
          if (formatNumber(x, digits) !== withLog10(x, digits)) mismatches++;
          if (formatNumber(-x, digits) !== withLog10(-x, digits)) mismatches++;
        }
      }
    }
    expect(mismatches).toBe(0);
  });
});

describe('formatForDerivation', () => {
  it('picks a readable unit by magnitude', () => {
    expect(formatForDerivation(12400, 'force')).toBe('12.4 kN');
    expect(formatForDerivation(0.4, 'length')).toBe('400.0 mm');
    expect(formatForDerivation(0.4, 'area')).toBe('0.400 m²');
    expect(formatForDerivation(293.15, 'temperature')).toBe('20 °C');
    expect(formatForDerivation(2.5e6, 'pressure')).toBe('2.50 MPa');
    expect(formatForDerivation(0.3, 'dimensionless')).toBe('0.3');
    expect(formatForDerivation(1 / 3600, 'frequency')).toBe('1.00 stops/h');
    expect(formatForDerivation(2e7, 'energy')).toBe('20.0 MJ');
    // A fixed number of figures when asked (a check whose value and limit print alike).
    expect(formatForDerivation(12400, 'force', 6)).toBe('12.4000 kN');
  });

  it('prints the same with the print units looked up beforehand', () => {
    const units = printUnitsOf('energy');
    for (const v of [0, -5, 9999, 1e4, 3.2e6, 1e7, 4.5e8]) {
      expect(formatInPrintUnits(v, units)).toBe(formatForDerivation(v, 'energy'));
    }
  });
});
