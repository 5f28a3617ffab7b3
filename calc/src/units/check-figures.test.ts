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

  it('prints a value that is not finite as a dash', () => {
    expect(checkFigures({ value: Number.NaN, limit: 1, dimension: 'force' }, 'SI').value).toBe('—');
  });
});
