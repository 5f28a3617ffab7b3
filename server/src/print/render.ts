import { renderToBuffer } from '@react-pdf/renderer';
import { createElement } from 'react';
import { FieldCardDocument } from './field-card-document.js';
import { registerPdfFonts } from './fonts.js';
import type { PrintableSheet } from './printable-sheet.js';
import { qrDataUrl } from './qr.js';
import { SheetDocument } from './sheet-document.js';

/** Renders the printed calculation sheet. Pure: reads only `sheet`, returns the PDF bytes. */
export async function renderSheetPdf(sheet: PrintableSheet): Promise<Buffer> {
  registerPdfFonts();
  const qr = sheet.verification ? await qrDataUrl(sheet.verification.url) : null;
  return renderToBuffer(createElement(SheetDocument, { sheet, qr }) as never);
}

/** Renders the one- or two-page field setting card for the same revision. */
export async function renderFieldCardPdf(sheet: PrintableSheet): Promise<Buffer> {
  registerPdfFonts();
  const qr = sheet.verification ? await qrDataUrl(sheet.verification.url) : null;
  return renderToBuffer(createElement(FieldCardDocument, { sheet, qr }) as never);
}
