import { describe, expect, it } from 'vitest';
import { failAdvice, makeCheck } from './checks.js';

const spec = {
  id: 'stop-distance',
  section: 'duty',
  label: 'Stopping distance',
  value: 0.2255,
  limit: 0.25,
  dimension: 'length' as const,
  kind: 'max' as const,
  source: 'common practice',
};

describe('makeCheck', () => {
  it('decides pass and utilisation when made', () => {
    const c = makeCheck(spec);
    expect(c.pass).toBe(true);
    expect(c.utilisation).toBeCloseTo(0.902, 3);
    expect(makeCheck({ ...spec, value: 0.26 }).pass).toBe(false);
  });

  it('writes its message when read, and keeps it through JSON and structured clone', () => {
    const c = makeCheck({ ...spec, value: 0.26, failHint: 'Set the brake sooner.' });
    const message = 'Stopping distance: 260.0 mm is not ≤ 250.0 mm — FAIL. Set the brake sooner.';
    expect(c.message).toBe(message);
    expect((JSON.parse(JSON.stringify(c)) as { message: string }).message).toBe(message);
    const clone = structuredClone(c);
    expect(clone.message).toBe(message);
    expect(Object.getOwnPropertySymbols(clone)).toEqual([]);
  });

  it('prints more figures when value and limit would read the same', () => {
    const c = makeCheck({ ...spec, value: 0.25001 });
    expect(c.message).toMatch(/250\.010 mm is not ≤ 250\.000 mm/);
  });
});

describe('failAdvice', () => {
  it('keeps only what a failed message adds to its label and numbers', () => {
    const failed = makeCheck({ ...spec, value: 0.26, failHint: 'Set the brake sooner.' });
    expect(failAdvice(failed.message)).toBe('Set the brake sooner.');
    expect(failAdvice(makeCheck({ ...spec, value: 0.26 }).message)).toBeNull();
    expect(failAdvice(makeCheck(spec).message)).toBeNull();
    expect(failAdvice(undefined)).toBeNull();
  });
});
