import { describe, expect, it } from 'vitest';
import { checkFigures } from './check-figures.js';

describe('checkFigures', () => {
  it('prints value and limit to the dimension’s precision (a count of brakes as 2, not 2.000)', () => {
    expect(checkFigures({ value: 2, limit: 2, dimension: 'dimensionless' }, 'SI')).toEqual({
      value: '2',
      limit: '2',
    });
    expect(checkFigures({ value: 0.0794e6, limit: 0.7e6, dimension: 'pressure' }, 'SI')).toEqual({
      value: '0.0794 MPa',
      limit: '0.700 MPa',
    });
  });

  it('gives more figures when value and limit would print alike but differ', () => {
    const f = checkFigures({ value: 2.098e6, limit: 2.1e6, dimension: 'pv' }, 'SI');
    expect(f.value).not.toBe(f.limit);
    expect(f).toEqual({ value: '2.09800 MPa·m/s', limit: '2.10000 MPa·m/s' });
  });

  it('converts to US customary units', () => {
    expect(checkFigures({ value: 1355.82, limit: 1694.8, dimension: 'torque' }, 'US')).toEqual({
      value: '1000 lbf·ft',
      limit: '1250 lbf·ft',
    });
  });

  it('prints a deviation as a percentage, as its label gives the limit', () => {
    const rate = {
      label: 'Spring rate from the geometry agrees with the rate used (deviation ≤ 5 %)',
      value: 0.007387081816853991,
      limit: 0.05,
      dimension: 'dimensionless' as const,
    };
    expect(checkFigures(rate, 'SI')).toEqual({ value: '0.739 %', limit: '5 %' });
    expect(checkFigures({ ...rate, value: 0 }, 'US')).toEqual({ value: '0 %', limit: '5 %' });
    // A ratio that is no deviation stays a ratio.
    expect(
      checkFigures({ ...rate, label: 'Thruster force ÷ force needed', value: 1.6187 }, 'SI').value,
    ).toBe('1.619');
  });

  it('in SI, gives value and limit in the unit the derivation gives the larger of them', () => {
    // A caliper's torques print as kN·m in its steps: the summary says the same.
    expect(checkFigures({ value: 13860, limit: 9971, dimension: 'torque' }, 'SI')).toEqual({
      value: '13.86 kN·m',
      limit: '9.971 kN·m',
    });
    // A 4 m allowed stop prints in m, and the stop against it too.
    expect(checkFigures({ value: 0.8162, limit: 4, dimension: 'length' }, 'SI')).toEqual({
      value: '0.8162 m',
      limit: '4.000 m',
    });
    expect(checkFigures({ value: 0.2344, limit: 0.25, dimension: 'length' }, 'SI').value).toBe(
      '234.4 mm',
    );
    // A speed keeps its display unit (rpm), where the steps work in rad/s.
    expect(
      checkFigures({ value: 129.25, limit: 230.38, dimension: 'angularSpeed' }, 'SI').value,
    ).toBe('1234 rpm');
  });

  it('prints a value that is not finite as a dash', () => {
    expect(checkFigures({ value: Number.NaN, limit: 1, dimension: 'force' }, 'SI').value).toBe('—');
  });
});
