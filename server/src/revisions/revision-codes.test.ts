import { describe, expect, it } from 'vitest';
import { base32, contentHash, newVerificationCode, revisionLabel } from './revision-codes.js';

describe('revision codes', () => {
  it('encodes base32 as RFC 4648 test vectors', () => {
    expect(base32(Buffer.from('f'))).toBe('MY');
    expect(base32(Buffer.from('foobar'))).toBe('MZXW6YTBOI');
  });

  it('hashes content independently of key order', () => {
    const a = contentHash({ x: 1, y: { value: 2, unit: 'm' } }, { pass: true, results: [] });
    const b = contentHash({ y: { unit: 'm', value: 2 }, x: 1 }, { results: [], pass: true });
    expect(a).toBe(b);
    expect(a).toMatch(/^[0-9a-f]{64}$/);
    expect(contentHash({ x: 1.0000001 }, {})).not.toBe(contentHash({ x: 1 }, {}));
  });

  it('makes distinct 10-character codes for the same content', () => {
    const codes = new Set(Array.from({ length: 200 }, () => newVerificationCode('abc')));
    expect(codes.size).toBe(200);
    for (const c of codes) expect(c).toMatch(/^[A-Z2-7]{10}$/);
  });

  it('labels revisions A…Z, AA', () => {
    expect([1, 2, 26, 27, 28, 52, 53].map(revisionLabel)).toEqual([
      'A',
      'B',
      'Z',
      'AA',
      'AB',
      'AZ',
      'BA',
    ]);
  });
});
