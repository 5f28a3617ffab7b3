import { describe, expect, it } from 'vitest';
import { fieldMeasurementInputSchema } from './field-record.schema.js';

describe('a measured field-card value', () => {
  it('takes readings in SI of zero or more, and refuses a negative one on its field', () => {
    const ok = fieldMeasurementInputSchema.parse({ settingKey: 'springLength', asLeft: 0.2215 });
    expect(ok).toEqual({ settingKey: 'springLength', asFound: null, asLeft: 0.2215, reason: '' });
    const r = fieldMeasurementInputSchema.safeParse({ settingKey: 'workingStroke', asLeft: -0.52 });
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
      ['asLeft', 'a reading cannot be negative'],
    ]);
  });
});
