import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Dimension } from '../core/types.js';
import { fromSI, toSI } from '../units/conversion.js';
import { displayUnitFor, toDisplay } from '../units/display.js';
import { parseQuantity } from '../units/parse.js';
import { DIMENSIONS } from '../units/unit-table.js';

const dims = Object.keys(DIMENSIONS) as Dimension[];
const value = fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true });

describe('unit round trips', () => {
  it('every unit of every dimension: SI → unit → SI returns the value', () => {
    fc.assert(
      fc.property(fc.constantFrom(...dims), value, (dim, v) => {
        for (const u of DIMENSIONS[dim].units) {
          const back = toSI(fromSI(v, u.unit, dim), u.unit, dim);
          expect(Math.abs(back - v)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(v)));
        }
      }),
      { numRuns: 200 },
    );
  }, 30_000);

  it('SI → US customary display → parse back to SI returns the value', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...dims.filter((d) => d !== 'temperature')),
        fc.double({ min: 1e-3, max: 1e6, noNaN: true }),
        (dim, v) => {
          const shown = toDisplay(v, dim, 'US', undefined, 17);
          const back = parseQuantity(
            { value: shown.value, unit: displayUnitFor(dim, 'US') },
            dim,
            'x',
          );
          expect(Math.abs(back - v)).toBeLessThanOrEqual(1e-9 * Math.abs(v));
        },
      ),
      { numRuns: 200 },
    );
  }, 30_000);

  it('temperatures above absolute zero survive °C → °F → K', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 2000, noNaN: true }), (k) => {
        const f = fromSI(k, 'degF', 'temperature');
        const c = fromSI(k, 'degC', 'temperature');
        expect(toSI(f, 'degF', 'temperature')).toBeCloseTo(k, 9);
        expect(toSI(c, 'degC', 'temperature')).toBeCloseTo(k, 9);
      }),
    );
  }, 30_000);
});
