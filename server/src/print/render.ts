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

/**
 * Registers and parses the fonts by rendering a one-line document, so the first real request
 * does not pay for font loading (several hundred ms). Call it once at start-up, not awaited.
 */
export async function warmUpPdfRenderer(): Promise<void> {
  registerPdfFonts();
  const { Document, Page, Text } = await import('@react-pdf/renderer');
  const { MONO, SANS } = await import('./fonts.js');
  const doc = createElement(
    Document,
    null,
    createElement(
      Page,
      { size: 'A4' },
      createElement(Text, { style: { fontFamily: SANS, fontWeight: 700 } }, 'Holdfast ≤ ≥ √ Δ μ'),
      createElement(Text, { style: { fontFamily: SANS, fontWeight: 600 } }, 'Holdfast ĉ'),
      createElement(Text, { style: { fontFamily: SANS } }, 'Holdfast ĉ μ ≤'),
      createElement(
        Text,
        { style: { fontFamily: MONO, fontFeatureSettings: { calt: false } } },
        'T = μ ≤ ĉ',
      ),
      createElement(
        Text,
        { style: { fontFamily: MONO, fontWeight: 700, fontFeatureSettings: { calt: false } } },
        'T',
      ),
    ),
  );
  await renderToBuffer(doc as never);
}
