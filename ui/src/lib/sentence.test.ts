import { describe, expect, it } from 'vitest';
import { sentence } from './sentence';

describe('sentence', () => {
  it('starts a schema message with a capital and leaves the rest as written', () => {
    expect(sentence('at least 3 characters')).toBe('At least 3 characters');
    expect(sentence('a code has the digits 2 to 7')).toBe('A code has the digits 2 to 7');
    expect(sentence('')).toBe('');
  });
});
