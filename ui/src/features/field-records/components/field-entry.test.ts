import { describe, expect, it } from 'vitest';
import type { FieldRecord, FieldTarget } from '@holdfast/shared';
import { buildMeasurements } from './measurement-entry';
import { liningSeries, reserveStrokeSeries } from './wear-series';

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

const POS = '2b1c3d4e-5f60-4a7b-8c9d-0e1f2a3b4c5d';
const REV = '3c2d4e5f-6071-4b8c-9d0e-1f2a3b4c5d6e';
const person = {
  id: '4d3e5f60-7182-4c9d-8e0f-2a3b4c5d6e7f',
  displayName: 'A. Fitter',
  initials: 'AF',
};
let n = 0;
function rec(
  date: string,
  kind: FieldRecord['kind'],
  found: number | null,
  left: number | null,
  lining?: number,
): FieldRecord {
  n++;
  return {
    id: `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`,
    positionId: POS,
    positionTag: 'BR-1',
    revisionId: REV,
    sheetId: REV,
    documentNumber: 'CS-1',
    revisionLabel: 'A',
    kind,
    status: 'countersigned',
    performedAt: `${date}T08:00:00.000Z`,
    meterHours: null,
    measurements: [
      {
        settingKey: 'reserveStroke',
        asFound: found,
        asLeft: left,
        reason: '',
        label: 'Reserve stroke',
        target: 0.012,
        unit: 'm',
        dimension: 'length',
        tolerance: {
          band: { kind: 'absolute', minus: 0.006, plus: 0.002 },
          source: 'common practice',
          confidence: 'common practice',
        },
        asFoundVerdict: null,
        asLeftVerdict: null,
      },
    ],
    checks:
      lining === undefined
        ? []
        : [{ key: 'lining-thickness-shoe-a', result: 'ok', value: lining, cycles: null, note: '' }],
    findings: '',
    outOfTolerance: false,
    flags: { superseded: false, underReview: false },
    createdBy: person,
    createdAt: `${date}T09:00:00.000Z`,
    updatedAt: `${date}T09:00:00.000Z`,
    signed: null,
    countersigned: null,
    verificationCode: null,
  };
}

describe('wear series from the records', () => {
  it('starts at the last setting and predicts when the minimum is reached', () => {
    const records = [
      rec('2025-01-01', 'commissioning', null, 0.012, 0.008),
      rec('2025-04-11', 'periodic-inspection', 0.011, 0.011, 0.0078),
      rec('2025-07-20', 'periodic-inspection', 0.0104, 0.0104, 0.0075),
      rec('2025-10-28', 'periodic-inspection', 0.0092, 0.0092, 0.0074),
    ];
    const s = reserveStrokeSeries(records, 0.006);
    expect(s.readings.map((r) => r.value)).toEqual([0.012, 0.011, 0.0104, 0.0092]);
    expect(s.minimum).toBeCloseTo(0.006, 12);
    expect(s.fit?.kind).toBe('trend');
    // Readings 100 days apart as in calc's hand case (12.0, 11.0, 10.4, 9.2 mm): 666.67 days on.
    if (s.fit?.kind === 'trend' && s.fit.crossing) {
      const days = (s.fit.crossing.at * 1000 - Date.parse('2025-01-01T08:00:00Z')) / 86400000;
      expect(days).toBeCloseTo(666.67, 1);
    }
    expect(liningSeries(records, 'lining-thickness-shoe-a').readings).toHaveLength(4);
  });

  it('a re-adjustment starts a new line; too few readings is said, not fitted', () => {
    const records = [
      rec('2025-01-01', 'commissioning', null, 0.012),
      rec('2025-04-11', 'periodic-inspection', 0.011, 0.011),
      rec('2025-07-20', 're-adjustment', 0.0075, 0.012),
      rec('2025-10-28', 'periodic-inspection', 0.0112, 0.0112),
    ];
    const s = reserveStrokeSeries(records, 0.006);
    expect(s.readings.map((r) => r.value)).toEqual([0.012, 0.0112]);
    expect(s.fit).toBeNull();
    expect(s.note).toMatch(/at least 3 readings/);
  });
});
