/** The part of svg-to-pdfkit (0.1, untyped) the handover pack uses. */
declare module 'svg-to-pdfkit' {
  type Options = {
    width?: number;
    height?: number;
    preserveAspectRatio?: string;
    assumePt?: boolean;
    fontCallback?: (family: string, bold: boolean, italic: boolean) => string;
    warningCallback?: (message: string) => void;
  };
  function SVGtoPDF(doc: PDFKit.PDFDocument, svg: string, x?: number, y?: number, options?: Options): void;
  export = SVGtoPDF;
}
