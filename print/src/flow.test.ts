import { createElement } from 'react';
import { describe, expect, it } from 'vitest';
import { paginate, type FlowBlock } from './flow.js';

const block = (key: string, height: number, extra: Partial<FlowBlock> = {}): FlowBlock => ({
  key,
  height,
  element: createElement('span', { key }),
  ...extra,
});
const keys = (pages: FlowBlock[][]) => pages.map((p) => p.map((b) => b.key));

describe('paginate', () => {
  it('fills a page until the next block does not fit', () => {
    const pages = paginate([block('a', 40), block('b', 40), block('c', 30)], 100);
    expect(keys(pages)).toEqual([['a', 'b'], ['c']]);
  });

  it('moves a trailing heading with the block it introduces', () => {
    const pages = paginate(
      [block('a', 70), block('h', 10, { keepWithNext: true }), block('b', 30)],
      100,
    );
    expect(keys(pages)).toEqual([['a'], ['h', 'b']]);
  });

  it('repeats the carry (continued heading, column header) above a row that opens a page', () => {
    const carry = [block('cont', 8, { keepWithNext: true })];
    const rows = [
      block('r1', 40, { carry }),
      block('r2', 40, { carry }),
      block('r3', 40, { carry }),
    ];
    const pages = paginate([block('head', 10, { keepWithNext: true }), ...rows], 100);
    expect(keys(pages)).toEqual([
      ['head', 'r1', 'r2'],
      ['cont', 'r3'],
    ]);
  });

  it('starts a new page before a part that asks for it, without carrying anything', () => {
    const pages = paginate(
      [
        block('a', 10),
        block('h', 10, { keepWithNext: true, pageBreakBefore: true }),
        block('b', 10),
      ],
      100,
    );
    expect(keys(pages)).toEqual([['a'], ['h', 'b']]);
  });

  it('gives a block taller than a page a page of its own', () => {
    const pages = paginate([block('a', 20), block('huge', 250), block('b', 20)], 100);
    expect(keys(pages)).toEqual([['a'], ['huge'], ['b']]);
  });

  it('keeps every block exactly once, in order, whatever the heights', () => {
    const blocks = Array.from({ length: 200 }, (_, i) =>
      block(`b${i}`, 5 + ((i * 37) % 60), { keepWithNext: i % 7 === 0 }),
    );
    const pages = paginate(blocks, 150);
    expect(pages.flat().map((b) => b.key)).toEqual(blocks.map((b) => b.key));
    for (const page of pages) {
      const used = page.reduce((sum, b) => sum + b.height, 0);
      if (page.length > 1) expect(used).toBeLessThanOrEqual(150);
    }
  });
});
