import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { defineFormula, Derivation } from '../core/step.js';
import { toDisplay } from './display.js';
import { formatForDerivation } from './format.js';
import { PRECISION, formatWithPrecision, readingPrecision, settingPrecision } from './precision.js';

/** Significant figures of a printed number ('0.0806' → 3, '2290' → 3 at most, '65' → 2). */
function significantFigures(text: string): number {
  const digits = text.replace(/[^\d.]/g, '');
  const [whole, frac = ''] = digits.split('.');
  const all = (whole + frac).replace(/^0+/, '');
  return frac ? all.length : all.replace(/0+$/, '').length;
}

describe('printing precision per quantity', () => {
  it('prints pressures to 3 significant figures in MPa, never 4 or more', () => {
    expect(formatForDerivation(80_580, 'pressure')).toBe('0.0806 MPa');
    expect(toDisplay(80_580, 'pressure', 'SI').text).toBe('0.0806 MPa');
    fc.assert(
      fc.property(fc.double({ min: 1e3, max: 1e9, noNaN: true }), (pa) => {
        const text = formatForDerivation(pa, 'pressure');
        expect(text.endsWith(' MPa')).toBe(true);
        expect(significantFigures(text.split(' ')[0])).toBeLessThanOrEqual(3);
        const shown = toDisplay(pa, 'pressure', 'SI').text.split(' ')[0];
        expect(significantFigures(shown)).toBeLessThanOrEqual(3);
      }),
    );
  });

  it('prints temperatures to 1 °C and forces to 3 significant figures', () => {
    expect(formatForDerivation(273.15 + 64.96, 'temperature')).toBe('65 °C');
    expect(toDisplay(273.15 + 64.96, 'temperature', 'SI').text).toBe('65 °C');
    expect(toDisplay(273.15 + 99.6, 'temperature', 'SI').text).toBe('100 °C');
    expect(toDisplay(2291.68, 'force', 'SI').text).toBe('2290 N');
    expect(formatForDerivation(22_000, 'force')).toBe('22.0 kN');
  });

  it('prints lengths no finer than 0.01 mm: 0.8 mm is 0.80 mm, not 0.8000 mm', () => {
    expect(toDisplay(0.0008, 'length', 'SI').text).toBe('0.80 mm');
    expect(formatForDerivation(0.0008, 'length')).toBe('0.80 mm');
    expect(formatForDerivation(0.4, 'length')).toBe('400.0 mm');
    expect(formatForDerivation(1.5, 'length')).toBe('1.500 m');
  });

  it('prints field settings to what a fitter can measure', () => {
    const mm = (key: string, m: number) =>
      toDisplay(m, 'length', 'SI', undefined, settingPrecision(key, 'length')).text;
    // Feeler gauges step by 0.05 mm; disc-spring stack lengths by caliper to 0.05 mm.
    expect(mm('shoeClearance', 0.0008)).toBe('0.80 mm');
    expect(mm('shoeClearance', 0.00082)).toBe('0.80 mm');
    expect(mm('airGap', 0.00108)).toBe('1.10 mm');
    expect(mm('holderSetLength', 0.0019166)).toBe('1.90 mm');
    expect(mm('a.setLength', 0.0026667)).toBe('2.65 mm');
    // Spring lengths and strokes with a steel rule, to 0.5 mm.
    expect(mm('springLength', 0.2225)).toBe('222.5 mm');
    expect(mm('springLength', 0.22262)).toBe('222.5 mm');
    expect(mm('reserveStroke', 0.02)).toBe('20.0 mm');
    // Wear allowances are under a millimetre: to 0.05 mm, never to the steel rule's 0.5 mm
    // (0.60 mm printed as 0.5 mm, or 0.80 mm as 1.0 mm, tells the fitter the wrong point).
    expect(mm('wearToReadjust', 0.0006)).toBe('0.60 mm');
    expect(mm('wearTorqueLost', 0.0008)).toBe('0.80 mm');
    expect(mm('wear', 0.00103)).toBe('1.05 mm');
    // Angles in degrees to 1°; forces by their dimension.
    const deg = toDisplay(Math.PI / 3, 'angle', 'SI', undefined, settingPrecision('x', 'angle'));
    expect(deg.text).toBe('60°');
    expect(settingPrecision('holderPreload', 'force')).toBe(PRECISION.force);
  });

  it("prints a fitter's reading to a tenth of the setting's step, never snapped to the step", () => {
    const mm = (key: string, m: number) =>
      toDisplay(m, 'length', 'SI', undefined, readingPrecision(key, 'length')).text;
    // Snapped to 0.5 mm, 222.6 mm would print as the 222.5 mm target while judged against it.
    expect(mm('springLength', 0.2226)).toBe('222.6 mm');
    expect(mm('reserveStroke', 0.017)).toBe('17.0 mm');
    expect(mm('shoeClearance', 0.00083)).toBe('0.83 mm');
    // A length with no rule of its own, and other dimensions, print as any value does.
    expect(readingPrecision('other', 'length')).toBe(PRECISION.length);
    expect(readingPrecision('springForce', 'force')).toBe(PRECISION.force);
  });

  it('drops trailing zeros of pure numbers and keeps full precision when figures are asked', () => {
    expect(formatForDerivation(0.95, 'dimensionless')).toBe('0.95');
    expect(formatForDerivation(2, 'dimensionless')).toBe('2');
    expect(formatForDerivation(0.6861, 'dimensionless')).toBe('0.6861');
    expect(formatWithPrecision(0.9, 1, '', { digits: 4 })).toBe('0.9000');
  });

  it('rounds, never truncates, at the step: 0.024 mm of clearance prints 0 mm', () => {
    expect(formatWithPrecision(0.024, 1e-3, 'mm', { digits: 4, finest: 5e-5 })).toBe('0');
    expect(formatWithPrecision(0.026, 1e-3, 'mm', { digits: 4, finest: 5e-5 })).toBe('0.05');
  });
});

describe('one unit per quantity inside a step', () => {
  const diff = defineFormula({
    id: 'torque-difference',
    label: 'difference',
    symbol: 'ΔM',
    expression: 'a - b',
    symbols: { a: { text: 'M_b', dimension: 'torque' }, b: { text: 'M_d', dimension: 'torque' } },
    dimension: 'torque',
    reference: 'test',
  });

  it('prints every torque of a step in the unit the largest needs', () => {
    expect(diff.substitute({ a: 10_800, b: 5999 })).toBe('ΔM = 10.80 kN·m − 5.999 kN·m');
    expect(diff.substitute({ a: 900, b: 500 })).toBe('ΔM = 900.0 N·m − 500.0 N·m');
  });

  it('prints the mathematics of expm1, not the function name', () => {
    const f = defineFormula({
      id: 'peak',
      label: 'peak',
      symbol: 'T',
      expression: 'a + d / (-expm1(-1 / x))',
      symbols: {
        a: { text: 'T_a', dimension: 'temperature' },
        d: { text: 'ΔT', dimension: 'temperatureDifference' },
        x: { text: 'x', dimension: 'dimensionless' },
      },
      dimension: 'temperature',
      reference: 'test',
    });
    expect(f.text).toBe('T = T_a + ΔT / (1 − e^(−1 / x))');
    expect(f.text).not.toContain('expm1');
    const g = defineFormula({ ...f.spec, id: 'g', expression: 'a + d * expm1(x)' });
    expect(g.text).toBe('T = T_a + ΔT · (e^(x) − 1)');
  });

  it('prints the symbol a step substitutes (F_s,w, not F_s, for the worn spring force)', () => {
    const f = defineFormula({
      id: 'normal',
      label: 'normal force',
      symbol: 'N',
      expression: 'F_s * i',
      symbols: {
        F_s: { text: 'F_s', dimension: 'force' },
        i: { text: 'i', dimension: 'dimensionless' },
      },
      dimension: 'force',
      reference: 'test',
    });
    const d = new Derivation('lining');
    d.step(f, { F_s: 1020, i: 2.5 }, { id: 'worn', symbol: 'N_w', names: { F_s: 'F_s,w' } });
    expect(d.steps[0].formula).toBe('N_w = F_s,w · i');
    expect(d.steps[0].substituted).toBe('N_w = 1020 N · 2.5');
  });
});
