/**
 * Holdfast printing. Pure: each renderer takes plain data and returns PDF bytes; nothing here
 * reads a database, a request or the clock (the generation time is part of the data).
 */
export { renderSheet, renderSheetPdf, renderFieldCardPdf, warmUpPdfRenderer } from './render.js';
export type { SheetRender } from './render.js';
export type { PageMode } from './sheet-document.js';
export { renderFieldRecordPdf } from './field-record/render-field-record.js';
export type {
  PrintableFieldRecord,
  PrintFieldCheck,
  PrintFieldMeasurement,
  PrintFieldPhoto,
  PrintFieldSignature,
} from './field-record/printable-field-record.js';
export {
  buildPrintableSheet,
  compareLabels,
  type BuildPrintableOptions,
  type PrintRevisionSource,
  type PrintRevisionSummarySource,
  type PrintSheetSource,
} from './build-printable-sheet.js';
export type {
  Paper,
  PrintableInput,
  PrintableSheet,
  PrintApproval,
  PrintCriteriaReview,
  PrintCriterion,
  PrintHistoryRow,
  PrintPerson,
  PrintRevisionState,
  PrintUnitSystem,
} from './printable-sheet.js';
