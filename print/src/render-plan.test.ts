import { beforeAll, describe, expect, it } from 'vitest';
import { sheetTypes } from '@holdfast/calc';
import { PAPER_SIZE } from './paper.js';
import { renderSheet, type SheetRender } from './render.js';
import { realPrintable } from './testing/real-sheet.js';
import { ensurePoppler, inspectPdf } from './testing/poppler.js';

const SLOW = 300_000;
const TYPES = sheetTypes.map((s) => s.id);

describe('page planning', () => {
  beforeAll(() => ensurePoppler());

  // Every shipped sheet type on both papers, approved and draft (the banner takes room), fits
  // its measured pages: react-pdf's slower page breaking is never needed for them.
  const cases = TYPES.flatMap((sheetTypeId) =>
    (['A4', 'LETTER'] as const).flatMap((paper) =>
      (['approved', 'draft'] as const).map((state) => ({ sheetTypeId, paper, state })),
    ),
  );
  it.each(cases)(
    '$sheetTypeId, $paper, $state: planned pages, each the paper size, numbered',
    async ({ sheetTypeId, paper, state }) => {
      const unitSystem = paper === 'LETTER' ? 'US' : 'SI';
      const sheet = realPrintable({ sheetTypeId, state, paper, unitSystem });
      const r = await renderSheet(sheet);
      expect(r.overflowPages).toEqual([]);
      expect(r.mode).toBe('planned');
      const pdf = inspectPdf(r.pdf, `plan-${sheetTypeId}-${paper}-${state}`);
      expect(pdf.pageSizes).toHaveLength(pdf.pages);
      for (const size of pdf.pageSizes) expect(size).toEqual(PAPER_SIZE[paper]);
      pdf.pageText.forEach((t, i) => expect(t).toContain(`Page ${i + 1} of ${pdf.pages}`));
    },
    SLOW,
  );

  describe('a block taller than a page', () => {
    // 3 000 words of justification cannot fit one page: the planned render overflows, and the
    // sheet is rendered again with react-pdf breaking the page, losing nothing.
    const words = Array.from({ length: 3000 }, (_, i) => `word${i}`).join(' ');
    const base = realPrintable({ sheetTypeId: 'caliper-disc-brake', state: 'draft' });
    const failing = {
      ...base,
      justification: `${words} THE-END`,
      evaluation: {
        ...base.evaluation!,
        checks: base.evaluation!.checks.map((c, i) => (i === 0 ? { ...c, pass: false } : c)),
      },
    };
    let r: SheetRender;
    beforeAll(async () => {
      r = await renderSheet(failing);
    }, SLOW);

    it('is detected and rendered with page breaking', () => {
      expect(r.overflowPages.length).toBeGreaterThan(0);
      expect(r.mode).toBe('flowing');
    });

    it('keeps all of its text, on A4 pages numbered n of N', () => {
      const pdf = inspectPdf(r.pdf, 'plan-overflow');
      const text = pdf.text.replace(/\s+/g, ' ');
      expect(text).toContain('word0 word1');
      expect(text).toContain('word2999 THE-END');
      for (const size of pdf.pageSizes) expect(size).toEqual(PAPER_SIZE.A4);
      pdf.pageText.forEach((t, i) => expect(t).toContain(`Page ${i + 1} of ${pdf.pages}`));
    });
  });
});
