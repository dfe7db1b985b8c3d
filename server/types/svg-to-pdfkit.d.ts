// svg-to-pdfkit ships no types; this is the one call we use (its README's signature).
declare module 'svg-to-pdfkit' {
  function SVGtoPDF(
    doc: PDFKit.PDFDocument,
    svg: string,
    x: number,
    y: number,
    options?: { width?: number; height?: number; fontCallback?: (family: string, bold: boolean, italic: boolean) => string },
  ): void
  export default SVGtoPDF
}
