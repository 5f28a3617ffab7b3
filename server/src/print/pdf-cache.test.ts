import { describe, expect, it } from 'vitest';
import { PdfCache } from './pdf-cache.js';

const pdf = (n: number, fill = 1) => Buffer.alloc(n, fill);

describe('PdfCache', () => {
  it('keeps its total size under the bound, dropping the least recently used', () => {
    const cache = new PdfCache(100);
    cache.set('a', pdf(40));
    cache.set('b', pdf(40));
    expect(cache.get('a')).toBeDefined(); // a is now the most recent
    cache.set('c', pdf(40));
    expect(cache.get('b')).toBeUndefined();
    expect(cache.get('a')).toBeDefined();
    expect(cache.get('c')).toBeDefined();
    expect(cache.size).toEqual({ entries: 2, bytes: 80 });
  });

  it('replaces an entry under the same key and counts it once', () => {
    const cache = new PdfCache(100);
    cache.set('a', pdf(40, 1));
    cache.set('a', pdf(30, 2));
    expect(cache.size).toEqual({ entries: 1, bytes: 30 });
    expect(cache.get('a')![0]).toBe(2);
  });

  it('keeps nothing larger than the bound, and nothing at all with a bound of 0', () => {
    const small = new PdfCache(10);
    small.set('big', pdf(11));
    expect(small.get('big')).toBeUndefined();
    const none = new PdfCache(0);
    none.set('a', pdf(1));
    expect(none.size.entries).toBe(0);
  });
});
