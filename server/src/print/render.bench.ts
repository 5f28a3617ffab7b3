import { bench, describe } from 'vitest';
import { renderFieldCardPdf, renderSheetPdf, warmUpPdfRenderer } from './render.js';
import { hoistPrintable } from './testing/hoist-fixture.js';

// Fonts are parsed once per process (warm-up); the figure is the steady-state cost per request.
await warmUpPdfRenderer();
const approved = hoistPrintable({ state: 'approved' });

describe('PDF', () => {
  bench('calculation sheet, approved hoist, A4', async () => {
    await renderSheetPdf(approved);
  }, { iterations: 10, warmupIterations: 1, time: 0 });

  bench('field setting card, approved hoist, A4', async () => {
    await renderFieldCardPdf(approved);
  }, { iterations: 10, warmupIterations: 1, time: 0 });
});
