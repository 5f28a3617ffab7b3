import { renderToBuffer } from '@react-pdf/renderer';
import { createElement } from 'react';
import { FieldCardDocument } from './field-card-document.js';
import { registerPdfFonts } from './fonts.js';
import { rememberEmbeddedFonts } from './font-switch-cache.js';
import { memoiseGlyphLayout } from './glyph-layout-cache.js';
import type { PrintableSheet } from './printable-sheet.js';
import { qrDataUrl } from './qr.js';
import { TextMeasure } from './measure.js';
import { PAPER_SIZE } from './paper.js';
import { SheetDocument, planSheet, type PageMode } from './sheet-document.js';

/** Fonts registered, and pdfkit's font switching remembered per document (idempotent). */
function setUpRenderer(): void {
  registerPdfFonts();
  rememberEmbeddedFonts();
}

let measure: Promise<TextMeasure> | null = null;

/** The fonts' text measure, loaded once per process. */
function textMeasure(): Promise<TextMeasure> {
  setUpRenderer();
  measure ??= TextMeasure.load();
  return measure;
}

/** A rendered sheet and how its pages were made (see PageMode). */
export interface SheetRender {
  pdf: Uint8Array;
  mode: PageMode;
  /** Planned pages (1-based) whose content ran past the foot of the page, if any. */
  overflowPages: number[];
}

/**
 * Renders the printed calculation sheet. Pure: reads only `sheet`, returns the PDF bytes.
 * Pages are planned from measured heights and rendered as they are; if a page still came out
 * too long, the sheet is rendered again with react-pdf's own page breaking, so nothing is cut.
 */
export async function renderSheet(sheet: PrintableSheet): Promise<SheetRender> {
  const m = await textMeasure();
  memoiseGlyphLayout();
  const qr = sheet.verification ? await qrDataUrl(sheet.verification.url) : null;
  const pages = planSheet(sheet, m);
  let overflowPages: number[] = [];
  const onRender = (result: unknown) => {
    overflowPages = overflowingPages(result, PAPER_SIZE[sheet.paper].height);
  };
  const planned = await renderToBuffer(
    createElement(SheetDocument, { sheet, qr, pages, mode: 'planned', onRender }) as never,
  );
  if (overflowPages.length === 0) return { pdf: planned, mode: 'planned', overflowPages };
  const flowing = await renderToBuffer(
    createElement(SheetDocument, { sheet, qr, pages, mode: 'flowing' }) as never,
  );
  return { pdf: flowing, mode: 'flowing', overflowPages };
}

export async function renderSheetPdf(sheet: PrintableSheet): Promise<Uint8Array> {
  return (await renderSheet(sheet)).pdf;
}

/**
 * Pages of react-pdf's layout that grew taller than the paper: a page that may not break
 * takes the height of its content.
 */
function overflowingPages(result: unknown, paperHeight: number): number[] {
  const layout = (result as { _INTERNAL__LAYOUT__DATA_?: { children?: LaidOutPage[] } } | undefined)
    ?._INTERNAL__LAYOUT__DATA_;
  const pages = layout?.children ?? [];
  const over: number[] = [];
  pages.forEach((p, i) => {
    if ((p.box?.height ?? 0) > paperHeight + 0.001) over.push(i + 1);
  });
  return over;
}

interface LaidOutPage {
  box?: { height: number };
}

/** Renders the one- or two-page field setting card for the same revision. */
export async function renderFieldCardPdf(sheet: PrintableSheet): Promise<Uint8Array> {
  setUpRenderer();
  memoiseGlyphLayout();
  const qr = sheet.verification ? await qrDataUrl(sheet.verification.url) : null;
  return renderToBuffer(createElement(FieldCardDocument, { sheet, qr }) as never);
}

/**
 * Registers and parses the fonts by rendering a one-line document, so the first real request
 * does not pay for font loading (several hundred ms). Call it once at start-up, not awaited.
 */
export async function warmUpPdfRenderer(): Promise<void> {
  setUpRenderer();
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
  await textMeasure();
  memoiseGlyphLayout();
}
