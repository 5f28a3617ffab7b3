import { describe, expect, it } from 'vitest';
import { criterionDisplay } from './criterion-value';

describe('criterionDisplay', () => {
  it('shows the travel rule as stored, 0.1 min (it read 0.1000 s, a sixtieth of the rule)', () => {
    expect(criterionDisplay({ key: 'travelStopFraction', value: 0.1, unit: 'min' })).toEqual({
      number: '0.1',
      unit: 'min',
    });
  });

  it('shows an SI value in the unit system, as the printed sheet does', () => {
    expect(criterionDisplay({ key: 'pvLimit', value: 2.1e6, unit: 'Pa m/s' })).toEqual({
      number: '2.10',
      unit: 'MPa·m/s',
    });
    expect(criterionDisplay({ key: 'pvLimit', value: 2.1e6, unit: 'Pa m/s' }, 'US').unit).toBe(
      'psi·ft/min',
    );
  });
});
