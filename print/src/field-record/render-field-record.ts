import { renderToBuffer } from '@react-pdf/renderer';
import { createElement } from 'react';
import { rememberEmbeddedFonts } from '../font-switch-cache.js';
import { registerPdfFonts } from '../fonts.js';
import { memoiseGlyphLayout } from '../glyph-layout-cache.js';
import type { PrintableSheet } from '../printable-sheet.js';
import { qrDataUrl } from '../qr.js';
import { FieldRecordDocument } from './field-record-document.js';
import type { PrintableFieldRecord } from './printable-field-record.js';

/**
 * Renders a field record on the calling thread: one or two pages of tables, far lighter than a
 * calculation sheet, so it does not queue behind sheets on the render pool.
 */
export async function renderFieldRecordPdf(
  record: PrintableFieldRecord,
  sheet: PrintableSheet,
): Promise<Uint8Array> {
  registerPdfFonts();
  rememberEmbeddedFonts();
  memoiseGlyphLayout();
  const qr = sheet.verification ? await qrDataUrl(sheet.verification.url) : null;
  return renderToBuffer(createElement(FieldRecordDocument, { record, sheet, qr }) as never);
}
