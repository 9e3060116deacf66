/** The quotation as a PDF, drawn from its document model alone (plus the embedded fonts). */
import type { FigureModel, QuoteDocument, QuoteLineModel } from '../../core/documents';
import { figure } from './figure';
import { FONT } from './fonts';
import type { Doc } from './layout';
import {
  contentWidth, ensureSpace, heading, leftEdge, paragraphs, paragraphsHeight, put, roomLeft, space, textHeight,
} from './layout';
import { fieldGrid, fieldGridHeight } from './grid';
import { FILL_IN_HEIGHT, fillInBoxes, notice } from './boxes';
import { documentHeader } from './letterhead';
import { finish, openDocument } from './page';
import { colour, gap, size } from './style';
import { drawTable, tableHeight } from './table';

const DRAWING_MAX_HEIGHT = 260;
const DRAWING_MIN_HEIGHT = 190;
/** A heading, the caption under the figure and the gap after it. */
const HEADING_ROOM = 50;

function customerHeight(doc: Doc, m: QuoteDocument, width: number): number {
  const lines = m.customer.lines.reduce((s, l) => s + textHeight(doc, l, width, FONT.body, size.small), 0);
  return 10 + textHeight(doc, m.customer.name, width, FONT.bold, size.heading) + lines;
}

/** The customer on the left, what the quotation covers (the part of a one-line quotation) on the right. */
function addressee(doc: Doc, m: QuoteDocument): void {
  const half = (contentWidth(doc) - 20) / 2;
  const x = leftEdge(doc);
  const right = x + half + 20;
  const height = Math.max(customerHeight(doc, m, half), fieldGridHeight(doc, m.overview, { columns: 1, width: half }));
  ensureSpace(doc, height);
  const y = doc.y;
  let top = y + put(doc, 'Prepared for', x, y, half, { pt: size.small, fill: colour.muted });
  top += put(doc, m.customer.name, x, top, half, { font: FONT.bold, pt: size.heading });
  for (const line of m.customer.lines) top += put(doc, line, x, top, half, { pt: size.small });
  doc.y = y;
  fieldGrid(doc, m.overview, { columns: 1, x: right, width: half, labelShare: 0.35 });
  doc.y = y + height + gap.block;
}

const PRICE_PT = size.body + 0.5;
const LEAD_TIME_GRID = { columns: 1, labelShare: 0.2 };

/** Prices, their notes and the lead time stay together on one page. */
function prices(doc: Doc, m: QuoteLineModel): void {
  const leadTime = [{ label: 'Lead time', value: m.leadTime }];
  const height = tableHeight(doc, m.prices.table, { pt: PRICE_PT }) + 2 * gap.heading
    + paragraphsHeight(doc, m.prices.notes, contentWidth(doc), { pt: size.small }) + fieldGridHeight(doc, leadTime, LEAD_TIME_GRID);
  heading(doc, 'Prices', Math.min(height, 400));
  drawTable(doc, m.prices.table, { pt: PRICE_PT });
  space(doc, gap.heading);
  paragraphs(doc, m.prices.notes, { pt: size.small, fill: colour.muted });
  space(doc, gap.heading);
  fieldGrid(doc, leadTime, LEAD_TIME_GRID);
  space(doc);
  if (m.priceCurve) figure(doc, m.priceCurve, contentWidth(doc) * 0.75, 220);
}

/** Payment, delivery, packaging and certificates, read down one column like the lead time above them. */
function commercial(doc: Doc, m: QuoteDocument): void {
  if (m.commercial.length === 0) return;
  heading(doc, 'Payment, delivery and certificates', fieldGridHeight(doc, m.commercial, LEAD_TIME_GRID) + 10);
  fieldGrid(doc, m.commercial, LEAD_TIME_GRID);
  space(doc);
}

/** Who prepared the quote and the boxes for the signature, kept together. */
function signature(doc: Doc, m: QuoteDocument): void {
  if (!m.signature) return;
  ensureSpace(doc, FILL_IN_HEIGHT + 30);
  put(doc, `For ${m.letterhead.name}: prepared by ${m.signature.preparedBy}`, leftEdge(doc), doc.y, contentWidth(doc), { font: FONT.bold });
  doc.y += 14;
  fillInBoxes(doc, m.signature.boxes);
  space(doc);
}

/** The drawing fills what is left of the page when that is enough to read it, else it starts the next. */
function drawing(doc: Doc, f: FigureModel): void {
  const room = roomLeft(doc) - HEADING_ROOM;
  const maxHeight = room >= DRAWING_MIN_HEIGHT ? Math.min(room, DRAWING_MAX_HEIGHT) : DRAWING_MAX_HEIGHT;
  heading(doc, 'Drawing', maxHeight);
  figure(doc, f, contentWidth(doc), maxHeight);
}

/**
 * The spring, its prices, the deviations accepted on it and its drawing; `beforeDrawing` puts what a
 * one-line quotation prints there (its payment and delivery terms).
 */
function lineBody(doc: Doc, line: QuoteLineModel, beforeDrawing?: () => void): void {
  heading(doc, line.specification.heading);
  fieldGrid(doc, line.specification.fields, { columns: 2 });
  space(doc);
  prices(doc, line);
  if (line.exceptions.length > 0) {
    heading(doc, 'Accepted deviations from the drawing');
    paragraphs(doc, line.exceptions, { bullet: true });
    space(doc);
  }
  beforeDrawing?.();
  if (line.drawing) drawing(doc, line.drawing);
}

const ITEM_PART_GRID = { columns: 3, labelShare: 0.4 };
const ITEMS_KEEP = 120;

/** One line of a quotation of several: its title and part fields kept with the start of its spring. */
function item(doc: Doc, line: QuoteLineModel): void {
  const keep = fieldGridHeight(doc, line.part, ITEM_PART_GRID) + 80;
  ensureSpace(doc, size.name + gap.heading + keep);
  const x = leftEdge(doc);
  const y = doc.y;
  doc.y = y + put(doc, line.title, x, y, contentWidth(doc), { font: FONT.bold, pt: size.name, fill: colour.accent }) + gap.heading;
  fieldGrid(doc, line.part, ITEM_PART_GRID);
  space(doc, gap.heading);
  lineBody(doc, line);
}

export async function renderQuote(m: QuoteDocument): Promise<Buffer> {
  const open = openDocument(m);
  const { doc } = open;
  documentHeader(doc, m.letterhead, {
    title: m.title,
    fields: [
      { label: 'Quote no.', value: m.issue.number }, { label: 'Date', value: m.issue.date },
      { label: 'Valid until', value: m.issue.validUntil },
    ],
  });
  addressee(doc, m);
  if (m.lines.length === 1) {
    lineBody(doc, m.lines[0]!, () => commercial(doc, m));
  } else {
    if (m.items) {
      // The heading keeps to the table's first rows; a long table goes on over the page.
      heading(doc, 'Items', Math.min(tableHeight(doc, m.items), ITEMS_KEEP));
      drawTable(doc, m.items);
      space(doc);
    }
    for (const line of m.lines) item(doc, line);
    commercial(doc, m);
  }
  heading(doc, 'Terms');
  paragraphs(doc, m.terms, { bullet: true });
  space(doc);
  signature(doc, m);
  notice(doc, m.caution);
  return finish(open, m);
}
