// pdfkit ships no type declarations; Holdfast only reaches its document prototype
// (font-switch-cache.ts).
declare module 'pdfkit' {
  const PDFDocument: { prototype: object };
  export default PDFDocument;
}
