declare module 'svg-to-pdfkit' {
  interface SvgToPdfOptions {
    width?: number;
    height?: number;
    preserveAspectRatio?: string;
    assumePt?: boolean;
    precision?: number;
    warningCallback?: (message: string) => void;
    imageCallback?: (link: string) => string;
    documentCallback?: (file: string) => string[] | string;
    fontCallback?: (family: string, bold: boolean, italic: boolean) => string;
  }
  /** Draws SVG markup into a pdfkit document at (x, y). */
  function SVGtoPDF(doc: PDFKit.PDFDocument, svg: string, x: number, y: number, options?: SvgToPdfOptions): void;
  export = SVGtoPDF;
}
