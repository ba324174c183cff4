/** svg-to-pdfkit ships no types: the one function pdf.ts calls. */
declare module 'svg-to-pdfkit' {
  function SVGtoPDF(doc: PDFKit.PDFDocument, svg: string, x: number, y: number, options?: Record<string, unknown>): void;
  export default SVGtoPDF;
}
