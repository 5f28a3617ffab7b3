import { describe, expect, it } from 'vitest';
import { LINING_CHANGE_KIND, STROKE_SETTING_KINDS } from '@holdfast/calc';
import { fieldRecordKinds, type CreateFieldRecordInput } from '@holdfast/shared';
import { springTarget } from '../../../testing/fixtures';
import { buildMeasurements } from './measurement-entry';
import { refusedFieldErrors } from './refused-fields';

const target = springTarget(0.2);

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

  it('refuses a negative reading and says how to write a decimal comma', () => {
    const negative = buildMeasurements([target], {
      springLength: { asLeft: { value: -520, unit: 'mm' }, reason: '' },
    });
    expect(negative.errors).toEqual({ 'springLength.asLeft': 'A reading cannot be negative' });
    expect(negative.measurements).toEqual([
      { settingKey: 'springLength', asFound: null, asLeft: null, reason: '' },
    ]);
    const comma = buildMeasurements([target], { springLength: { asLeft: '1,2', reason: '' } });
    expect(comma.errors['springLength.asLeft']).toMatch(/^Use a point for decimals, e\.g\. 1\.2\./);
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

describe('a refused record', () => {
  it('puts the server’s field errors under the boxes they belong to', () => {
    const payload: CreateFieldRecordInput = {
      id: '0f5e2a1c-7d3b-4c8e-9a6f-1b2c3d4e5f60',
      positionId: '2b1c3d4e-5f60-4a7b-8c9d-0e1f2a3b4c5d',
      revisionId: '3c2d4e5f-6071-4b8c-9d0e-1f2a3b4c5d6e',
      kind: 'periodic-inspection',
      performedAt: '2026-12-01T09:30:00Z',
      meterHours: null,
      measurements: [
        { settingKey: 'springLength', asFound: 0.2, asLeft: 0.2, reason: '' },
        { settingKey: 'reserveStroke', asFound: 0.01, asLeft: 0.012, reason: '' },
      ],
      checks: [{ key: 'lining-thickness-shoe-a', result: 'ok', value: 1, cycles: null, note: '' }],
      findings: '',
    };
    expect(
      refusedFieldErrors(payload, [
        { path: 'measurements.1.asLeft', message: 'too large' },
        { path: 'checks.0.value', message: 'thicker than a new lining' },
        { path: 'checks.0.result', message: 'unknown result' },
        { path: 'checks.0.cycles', message: 'at most 1000' },
        { path: 'performedAt', message: 'in the future' },
        { path: 'measurements.7.asLeft', message: 'no such row' },
      ]),
    ).toEqual({
      'reserveStroke.asLeft': 'too large',
      'checks.lining-thickness-shoe-a.value': 'thicker than a new lining',
      'checks.lining-thickness-shoe-a': 'unknown result',
      'checks.lining-thickness-shoe-a.cycles': 'at most 1000',
      performedAt: 'in the future',
      'measurements.7.asLeft': 'no such row',
    });
  });
});
