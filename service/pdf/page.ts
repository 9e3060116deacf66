/** A pdfkit document for one model: paper, margins, fonts, metadata, and "Page X of Y" footers at the end. */
import PDFDocument from 'pdfkit';
import type { DocumentCommon, PaperSize } from '../../core/documents';
import { FONT, registerFonts } from './fonts';
import { colour, size } from './style';

/** Points (1/72 in): ISO 216 A4 and US Letter. */
export const PAPER: Record<PaperSize, [number, number]> = { a4: [595.28, 841.89], letter: [612, 792] };

export const MARGIN = { top: 40, side: 42, bottom: 56 } as const;
const FOOTER_OFFSET = 36;

export interface OpenDocument {
  doc: PDFKit.PDFDocument;
  /** Resolves with the whole file once `finish` has ended the document. */
  bytes: Promise<Buffer>;
}

export function openDocument(model: DocumentCommon): OpenDocument {
  const doc = new PDFDocument({
    size: PAPER[model.paperSize],
    margins: { top: MARGIN.top, left: MARGIN.side, right: MARGIN.side, bottom: MARGIN.bottom },
    bufferPages: true,
    info: {
      Title: `${model.title}: ${model.reference}`, Author: model.letterhead.name, Creator: 'Coilwright', Producer: 'Coilwright',
      // The file ID is derived from the creation date: the model's date makes one model give one file.
      CreationDate: new Date(model.createdAt),
    },
  });
  const chunks: Buffer[] = [];
  const bytes = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  registerFonts(doc);
  doc.fillColor(colour.ink).fontSize(size.body);
  return { doc, bytes };
}

function footer(doc: PDFKit.PDFDocument, model: DocumentCommon, page: number, pages: number): void {
  const { width, height } = doc.page;
  const y = height - FOOTER_OFFSET;
  const inner = width - 2 * MARGIN.side;
  // Below the bottom margin pdfkit would start a new page for each footer line: lift the margin first.
  doc.page.margins.bottom = 0;
  doc.moveTo(MARGIN.side, y - 6).lineTo(width - MARGIN.side, y - 6).lineWidth(0.5).strokeColor(colour.rule).stroke();
  doc.font(FONT.body).fontSize(size.small).fillColor(colour.muted);
  doc.text(`${model.reference} · ${model.letterhead.name}`, MARGIN.side, y, { width: inner * 0.75, lineBreak: false, ellipsis: true });
  doc.text(`Page ${page} of ${pages}`, MARGIN.side, y, { width: inner, align: 'right', lineBreak: false });
}

/** Writes the footer on every page, then ends the document. */
export function finish(open: OpenDocument, model: DocumentCommon): Promise<Buffer> {
  const { doc } = open;
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    footer(doc, model, i - range.start + 1, range.count);
  }
  doc.end();
  return open.bytes;
}
