/**
 * The flow down the page shared by every document: page breaks, measured text, headings, paragraphs.
 * Blocks are measured before they are drawn, so a block is never split across a page break.
 */
import { FONT } from './fonts';
import { colour, gap, size } from './style';

export type Doc = PDFKit.PDFDocument;

export const leftEdge = (doc: Doc): number => doc.page.margins.left;
export const contentWidth = (doc: Doc): number => doc.page.width - doc.page.margins.left - doc.page.margins.right;
const bottomEdge = (doc: Doc): number => doc.page.height - doc.page.margins.bottom;

/** Starts a new page unless `height` still fits below the current position. */
export function ensureSpace(doc: Doc, height: number): void {
  if (doc.y + height > bottomEdge(doc)) doc.addPage();
}

export const roomLeft = (doc: Doc): number => bottomEdge(doc) - doc.y;

/** The height a fresh page offers between its margins. */
export const pageRoom = (doc: Doc): number => bottomEdge(doc) - doc.page.margins.top;

// Blocks are measured before they are drawn, often more than once (a block, then its rows): remember.
const measured = new WeakMap<Doc, Map<string, number>>();

function wrappedHeight(doc: Doc, text: string, width: number): number {
  if (!text.includes('\n') && doc.widthOfString(text) < width - 0.5) return doc.currentLineHeight(true);
  return doc.heightOfString(text, { width });
}

/**
 * The height `text` takes at `width`. Most texts here are one short line: their height is the line
 * height, known from the text's width without running the line wrapper (which dominates layout time).
 */
export function textHeight(doc: Doc, text: string, width: number, font: string = FONT.body, pt: number = size.body): number {
  if (text === '') return 0;
  doc.font(font).fontSize(pt);
  let cache = measured.get(doc);
  if (!cache) measured.set(doc, (cache = new Map()));
  const key = `${font}|${pt}|${width}|${text}`;
  let h = cache.get(key);
  if (h === undefined) cache.set(key, (h = wrappedHeight(doc, text, width)));
  return h;
}

/** Draws text at a point without moving the flow; returns its height. */
export function put(doc: Doc, text: string, x: number, y: number, width: number, style: { font?: string; pt?: number; fill?: string; align?: 'left' | 'right' | 'center' } = {}): number {
  doc.font(style.font ?? FONT.body).fontSize(style.pt ?? size.body).fillColor(style.fill ?? colour.ink);
  doc.text(text, x, y, { width, align: style.align ?? 'left' });
  return doc.y - y;
}

export function heading(doc: Doc, text: string, keepWith = 40): void {
  ensureSpace(doc, size.heading + gap.heading + keepWith);
  const x = leftEdge(doc);
  const y = doc.y;
  const h = put(doc, text, x, y, contentWidth(doc), { font: FONT.bold, pt: size.heading, fill: colour.accent });
  doc.moveTo(x, y + h + 1).lineTo(x + contentWidth(doc), y + h + 1).lineWidth(0.6).strokeColor(colour.accent).stroke();
  doc.y = y + h + 1 + gap.heading;
}

export interface ParagraphStyle {
  pt?: number;
  bullet?: boolean;
  fill?: string;
  font?: string;
}

export function paragraphsHeight(doc: Doc, texts: readonly string[], width: number, s: ParagraphStyle = {}): number {
  const indent = s.bullet ? 10 : 0;
  return texts.reduce((sum, t) => sum + textHeight(doc, t, width - indent, s.font, s.pt) + gap.line, 0);
}

/** Paragraphs in the flow; long ones continue on the next page as running text does. */
export function paragraphs(doc: Doc, texts: readonly string[], s: ParagraphStyle = {}, x = leftEdge(doc), width = contentWidth(doc)): void {
  const indent = s.bullet ? 10 : 0;
  for (const t of texts) {
    ensureSpace(doc, 2 * (s.pt ?? size.body));
    const y = doc.y;
    if (s.bullet) put(doc, '•', x, y, indent, { pt: s.pt, fill: s.fill });
    doc.font(s.font ?? FONT.body).fontSize(s.pt ?? size.body).fillColor(s.fill ?? colour.ink);
    doc.text(t, x + indent, y, { width: width - indent });
    doc.y += gap.line;
  }
}

export function space(doc: Doc, points: number = gap.block): void {
  doc.y += points;
}
