import { describe, expect, it } from 'vitest';
import { parseQuantity, parseQuantityText } from './parse.js';
import { fromSI, toSI, unitsFor } from './conversion.js';
import { toDisplay } from './display.js';
import { CalcInputError } from '../core/errors.js';
import { nearlyEqual } from '../testing/expect-close.js';

const close = (a: number, b: number, rel = 1e-9) => expect(nearlyEqual(a, b, rel)).toBe(true);

describe('parseQuantity', () => {
  it('parses strings and quantities into SI', () => {
    close(parseQuantity('1500 lbf', 'force'), 1500 * 4.4482216152605);
    close(parseQuantity('11.8 in', 'length'), 0.29972);
    close(parseQuantity({ value: 12, unit: 'kN' }, 'force'), 12000);
    close(parseQuantity({ value: 300, unit: 'mm' }, 'length'), 0.3);
    close(parseQuantity('1475 lbf·ft', 'torque'), 1475 * 1.3558179483314003);
    close(parseQuantity('1475 lb-ft', 'torque'), 1475 * 1.3558179483314003);
    close(parseQuantity('1 lb·ft²', 'inertia'), 0.0421401100938048);
    close(parseQuantity('1480 rpm', 'angularSpeed'), (1480 * Math.PI) / 30);
    close(parseQuantity('20 °C', 'temperature'), 293.15);
    close(parseQuantity('68 degF', 'temperature'), 293.15, 1e-12);
    close(parseQuantity('18 degF', 'temperatureDifference'), 10);
    close(parseQuantity('95 %', 'dimensionless'), 0.95);
    close(parseQuantity(0.35, 'dimensionless'), 0.35);
    close(parseQuantity('120 1/h', 'frequency'), 120 / 3600);
    close(parseQuantity('120 stops/h', 'frequency'), 120 / 3600);
    close(parseQuantity('30000 psi ft/min', 'pv'), 30000 * 35.02536704724412);
    close(parseQuantity('1 BTU/(lb degF)', 'specificHeat'), 4186.8);
    close(parseQuantity('2.5 kN/mm', 'stiffness'), 2.5e6);
    close(parseQuantity('10 hp', 'power'), 7456.998715386);
  });

  it('accepts units mathjs knows even when not offered (daN)', () => {
    close(parseQuantity('150 daN', 'force'), 1500);
  });

  it('rejects wrong dimension, missing unit, non-finite and missing values with the field', () => {
    const cases: [unknown, string][] = [
      ['12 kN', 'length'],
      [12, 'force'],
      [{ value: Number.NaN, unit: 'N' }, 'force'],
      [{ value: Number.POSITIVE_INFINITY, unit: 'N' }, 'force'],
      [undefined, 'force'],
      ['abc', 'force'],
      ['12 furlongs', 'length'],
      ['-300 degC', 'temperature'],
    ];
    for (const [input, dim] of cases) {
      try {
        parseQuantity(input as never, dim as never, 'brake.spring');
        throw new Error(`accepted ${JSON.stringify(input)}`);
      } catch (e) {
        expect(e).toBeInstanceOf(CalcInputError);
        expect((e as CalcInputError).fields[0].field).toBe('brake.spring');
        expect((e as CalcInputError).fields[0].message.length).toBeGreaterThan(5);
      }
    }
  });

  it('refuses a finite value that overflows in SI, quoting what was typed', () => {
    expect(() => parseQuantity({ value: 1e308, unit: 't' }, 'mass', 'load')).toThrow(
      expect.objectContaining({
        fields: [{ field: 'load', message: '1e+308 t is too large to work with' }],
      }),
    );
    expect(parseQuantity({ value: 1e300, unit: 't' }, 'mass', 'load')).toBeCloseTo(1e303, -290);
  });

  it('splits number and unit text', () => {
    expect(parseQuantityText('11.8in')).toEqual({ value: 11.8, unit: 'in' });
    expect(parseQuantityText(' -2.5e3  N ')).toEqual({ value: -2500, unit: 'N' });
  });
});

describe('display conversion', () => {
  it('converts SI to US customary and back', () => {
    const t = toDisplay(1000, 'torque', 'US');
    expect(t.label).toBe('lbf·ft');
    close(t.value, 737.5621492772653, 1e-9);
    expect(t.text).toBe('737.6 lbf·ft');
    close(toDisplay(7456.998715386, 'power', 'US').value, 10, 1e-9);
    close(toDisplay(0.0421401100938048, 'inertia', 'US').value, 1, 1e-9);
    close(toDisplay(6894.75729276459, 'pressure', 'US').value, 1, 1e-6);
    close(toDisplay(373.15, 'temperature', 'US').value, 212, 1e-9);
    close(toDisplay(373.15, 'temperature', 'SI').value, 100, 1e-9);
    close(toDisplay(0.0254, 'length', 'US').value, 1, 1e-9);
    close(toDisplay(0.3, 'length', 'SI').value, 300, 1e-9);
    close(toDisplay(4.4482216152605, 'force', 'US').value, 1, 1e-9);
    close(toDisplay(0.3048 / 60, 'speed', 'US').value, 1, 1e-9);
    close(toDisplay(1.3558179483314003, 'energy', 'US').value, 1, 1e-9);
    close(toDisplay(0.45359237, 'mass', 'US').value, 1, 1e-9);
    close(toDisplay(1e6, 'pv', 'SI').value, 1, 1e-9);
    close(toDisplay(35.02536704724412, 'pv', 'US').value, 1, 1e-9);
    close(toDisplay(10, 'temperatureDifference', 'US').value, 18, 1e-9);
    close(toDisplay((1480 * Math.PI) / 30, 'angularSpeed', 'SI').value, 1480, 1e-9);
  });

  it('round-trips every offered unit', () => {
    const dims = [
      'length',
      'force',
      'torque',
      'power',
      'speed',
      'mass',
      'inertia',
      'pressure',
      'pv',
      'energy',
      'temperature',
      'time',
      'angle',
      'stiffness',
      'area',
      'frequency',
    ] as const;
    for (const d of dims) {
      for (const o of unitsFor(d)) {
        close(toSI(fromSI(123.456, o.unit, d), o.unit, d), 123.456, 1e-12);
      }
    }
  });

  it('offers units per system', () => {
    const us = unitsFor('torque', 'US').map((o) => o.unit);
    expect(us).toContain('lbf ft');
    expect(us).not.toContain('N m');
  });
});
