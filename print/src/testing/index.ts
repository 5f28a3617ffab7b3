// Fixtures and PDF inspection for tests and benchmarks (print's own and the server's e2e tests).
export { ensurePoppler, inspectPdf, pageInk, OUTPUT_DIR, type PdfFacts } from './poppler.js';
export { hoistPrintable } from './hoist-fixture.js';
export { criteriaFor, hoistRevisionVariants, realPrintable } from './real-sheet.js';
