import { bench, describe } from 'vitest';
import { renderFieldCardPdf, renderSheetPdf, warmUpPdfRenderer } from './render.js';
import { hoistPrintable } from './testing/hoist-fixture.js';
import { hoistRevisionVariants, realPrintable } from './testing/real-sheet.js';

// Fonts are parsed once per process (warm-up); the figures are the steady cost per request.
await warmUpPdfRenderer();
const hoist = realPrintable({ sheetTypeId: 'hoist-shoe-brake', state: 'approved' });
const small = hoistPrintable({ state: 'approved' });

// Revisions that differ in their numbers, so each render shapes new strings: the shaped-text
// cache only helps with what sheets share (labels, units, formulas).
const variants = hoistRevisionVariants(12);
let next = 0;
const opts = { iterations: 10, warmupIterations: 2, time: 0 };

describe('PDF', () => {
  bench(
    'calculation sheet, approved hoist (calc defaults, 95 steps), A4',
    async () => {
      await renderSheetPdf(hoist);
    },
    opts,
  );

  bench(
    'calculation sheet, approved hoist, a different revision each time, A4',
    async () => {
      await renderSheetPdf(variants[next++ % variants.length]);
    },
    opts,
  );

  bench(
    'calculation sheet, 6-page fixture, A4',
    async () => {
      await renderSheetPdf(small);
    },
    opts,
  );

  bench(
    'field setting card, approved hoist, A4',
    async () => {
      await renderFieldCardPdf(hoist);
    },
    opts,
  );
});
