import { describe, expect, it } from 'vitest';
import { LINING_CHANGE_KIND, STROKE_SETTING_KINDS } from '@holdfast/calc';
import { fieldRecordKinds, type FieldTarget } from '@holdfast/shared';
import { buildMeasurements } from './measurement-entry';

const target: FieldTarget = {
  settingKey: 'springLength',
  label: 'Spring length',
  value: 0.2,
  unit: 'm',
  dimension: 'length',
  group: 'spring',
  tolerance: {
    band: { kind: 'absolute', minus: 0.0005, plus: 0.0005 },
    source: 'common practice',
    confidence: 'common practice',
  },
};

describe('record form measurements', () => {
  it('converts typed values to SI and asks for a reason when as-left is out', () => {
    const out = buildMeasurements([target], {
      springLength: {
        asFound: { value: 201.2, unit: 'mm' },
        asLeft: { value: 200.8, unit: 'mm' },
        reason: '',
      },
    });
    expect(out.measurements[0]!.asFound).toBeCloseTo(0.2012, 12);
    expect(out.errors).toEqual({ 'springLength.reason': 'Out of tolerance as left: say why' });
  });

  it('accepts an in-tolerance value, and names text that is not a number', () => {
    const ok = buildMeasurements([target], {
      springLength: { asLeft: { value: 200.5, unit: 'mm' }, reason: '' },
    });
    expect(ok.errors).toEqual({});
    const bad = buildMeasurements([target], { springLength: { asLeft: '20o', reason: '' } });
    expect(bad.errors).toEqual({ 'springLength.asLeft': 'Enter a number' });
  });
});

describe('wear series keys and kinds', () => {
  it('names only kinds of work a field record can have', () => {
    // calc's wear series restarts on these kinds by name; a renamed kind must fail here.
    for (const kind of [...STROKE_SETTING_KINDS, LINING_CHANGE_KIND]) {
      expect(fieldRecordKinds).toContain(kind);
    }
  });
});
