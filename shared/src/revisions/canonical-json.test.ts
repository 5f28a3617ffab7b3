import { describe, expect, it } from 'vitest';
import { canonicalJson } from './canonical-json.js';

describe('canonicalJson', () => {
  it('sorts keys at every depth and drops whitespace', () => {
    expect(canonicalJson({ b: 1, a: { d: [2, { z: 1, y: 2 }], c: 'x' } })).toBe(
      '{"a":{"c":"x","d":[2,{"y":2,"z":1}]},"b":1}',
    );
  });

  it('gives the same text for equal values built in different orders', () => {
    const one = { inputs: { springForce: { value: 12, unit: 'kN' }, ratio: 3.5 }, ok: true };
    const two = { ok: true, inputs: { ratio: 3.5, springForce: { unit: 'kN', value: 12 } } };
    expect(canonicalJson(one)).toBe(canonicalJson(two));
  });

  it('drops undefined members, writes -0 as 0 and escapes strings', () => {
    expect(canonicalJson({ a: undefined, b: -0, c: 'line\n"q"' })).toBe(
      '{"b":0,"c":"line\\n\\"q\\""}',
    );
  });

  it('refuses values JSON cannot carry', () => {
    expect(() => canonicalJson({ a: Number.NaN })).toThrow(/NaN/);
    expect(() => canonicalJson({ a: Infinity })).toThrow();
    const cyclic: Record<string, unknown> = {};
    cyclic.self = cyclic;
    expect(() => canonicalJson(cyclic)).toThrow(/cyclic/);
  });

  it('keeps shared (non-cyclic) references', () => {
    const q = { value: 1, unit: 'm' };
    expect(canonicalJson({ a: q, b: q })).toBe(
      '{"a":{"unit":"m","value":1},"b":{"unit":"m","value":1}}',
    );
  });
});
