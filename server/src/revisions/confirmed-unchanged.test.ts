import { describe, expect, it } from 'vitest';
import { confirmedUnchanged } from './revisions.service.js';

const rev = {
  unconfirmed: ['load', 'drumDiameter', 'springForce', 'hotMetal'],
  inputs: {
    load: { value: 10, unit: 't' },
    drumDiameter: { unit: 'mm', value: 400 },
    springForce: { value: 1150, unit: 'N' },
    hotMetal: true,
  },
};

describe('values confirmed unchanged in a save', () => {
  it('counts only fields dropped from the list with the same value, whatever the key order', () => {
    const inputs = {
      load: { value: 12, unit: 't' }, // changed: an entry, not a confirmation
      drumDiameter: { value: 400, unit: 'mm' }, // same value, keys in another order
      springForce: { value: 1150, unit: 'N' }, // same, but still on the list
      hotMetal: true,
    };
    expect(confirmedUnchanged(rev, inputs, ['springForce'])).toEqual(['drumDiameter', 'hotMetal']);
  });

  it('counts a field left out or emptied as a change, not a confirmation', () => {
    const { hotMetal: _left, ...rest } = rev.inputs;
    expect(confirmedUnchanged(rev, { ...rest, load: '' }, [])).toEqual([
      'drumDiameter',
      'springForce',
    ]);
  });
});
