/** The top of the first page: the shop on the left, the document's title and reference on the right. */
import type { Field, Letterhead } from '../../core/documents';
import { drawLogo } from './figure';
import { FONT } from './fonts';
import type { Doc } from './layout';
import { contentWidth, leftEdge, put } from './layout';
import { colour, gap, size } from './style';

const LOGO = { width: 110, height: 44 };
/** The title block is as wide as its title, but never narrower than this. */
const TITLE_MIN_WIDTH = 160;

export interface HeaderOptions {
  title: string;
  fields: Field[];
  /** Points kept free at the right edge (the traveller's QR code goes there). */
  reserveRight?: number;
}

function shopBlock(doc: Doc, lh: Letterhead, x: number, y: number, width: number): number {
  let top = y;
  if (lh.logo && drawLogo(doc, lh.logo, x, top, LOGO.width, LOGO.height)) top += LOGO.height + 4;
  top += put(doc, lh.name, x, top, width, { font: FONT.bold, pt: size.name });
  for (const line of [...lh.addressLines, ...lh.contact]) top += put(doc, line, x, top, width, { pt: size.small, fill: colour.muted });
  return top;
}

function titleWidth(doc: Doc, o: HeaderOptions): number {
  const title = doc.font(FONT.bold).fontSize(size.title).widthOfString(o.title);
  return Math.max(TITLE_MIN_WIDTH, Math.ceil(title) + 4);
}

function titleBlock(doc: Doc, o: HeaderOptions, right: number, y: number, width: number): number {
  const x = right - width;
  let top = y + put(doc, o.title, x, y, width, { font: FONT.bold, pt: size.title, align: 'right', fill: colour.accent }) + 2;
  const labelW = width * 0.4;
  for (const f of o.fields) {
    put(doc, f.label, x, top + 1, labelW - 4, { pt: size.small, fill: colour.muted, align: 'right' });
    top += put(doc, f.value, x + labelW, top, width - labelW, { font: FONT.bold, align: 'right' }) + 1;
  }
  return top;
}

/** Draws the header and moves the flow below it. */
export function documentHeader(doc: Doc, lh: Letterhead, o: HeaderOptions): void {
  const x = leftEdge(doc);
  const y = doc.y;
  const reserve = o.reserveRight ?? 0;
  const width = titleWidth(doc, o);
  const shopBottom = shopBlock(doc, lh, x, y, contentWidth(doc) - width - reserve - 12);
  const titleBottom = titleBlock(doc, o, x + contentWidth(doc) - reserve, y, width);
  const bottom = Math.max(shopBottom, titleBottom, y + reserve) + gap.heading;
  doc.moveTo(x, bottom).lineTo(x + contentWidth(doc), bottom).lineWidth(1.2).strokeColor(colour.accent).stroke();
  doc.y = bottom + gap.block;
}
