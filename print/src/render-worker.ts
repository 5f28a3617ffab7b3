import { renderFieldCardPdf, renderSheetPdf, warmUpPdfRenderer } from './render.js';
import type { RenderTask } from './render-pool.js';

// Loaded once per worker thread: fonts are parsed and the glyph caches filled here, before the
// first task, and live as long as the thread.
await warmUpPdfRenderer();

/** One render on a worker thread: a printable sheet in, PDF bytes out. */
export default async function render(task: RenderTask): Promise<Uint8Array> {
  return task.kind === 'sheet' ? renderSheetPdf(task.sheet) : renderFieldCardPdf(task.sheet);
}
