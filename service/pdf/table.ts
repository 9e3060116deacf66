/**
 * A ruled table drawn cell by cell: rows are measured first, never split, and the header row repeats at
 * the top of each page the table continues on.
 */
import type { TableModel } from '../../core/documents';
import { FONT } from './fonts';
import type { Doc } from './layout';
import { contentWidth, leftEdge, put, roomLeft, textHeight } from './layout';
import { colour, size } from './style';

export interface TableOptions {
  x?: number;
  width?: number;
  pt?: number;
  /** Room to write in by hand (a "Measured" column). */
  minRowHeight?: number;
}

const PAD = 3.5;

interface Frame {
  x: number;
  widths: number[];
  pt: number;
  minRow: number;
}

function frame(doc: Doc, t: TableModel, o: TableOptions): Frame {
  const width = o.width ?? contentWidth(doc);
  const total = t.columns.reduce((s, c) => s + c.weight, 0);
  return {
    x: o.x ?? leftEdge(doc), widths: t.columns.map((c) => (width * c.weight) / total),
    pt: o.pt ?? size.body, minRow: o.minRowHeight ?? 0,
  };
}

function cellsHeight(doc: Doc, cells: readonly string[], f: Frame, font: string): number {
  let h = 0;
  cells.forEach((c, i) => { h = Math.max(h, textHeight(doc, c, f.widths[i]! - 2 * PAD, font, f.pt)); });
  return h + 2 * PAD;
}

function drawRow(doc: Doc, t: TableModel, cells: readonly string[], f: Frame, h: number, header: boolean): void {
  const y = doc.y;
  let x = f.x;
  const width = f.widths.reduce((a, b) => a + b, 0);
  if (header) doc.rect(f.x, y, width, h).fill(colour.shade);
  cells.forEach((c, i) => {
    const w = f.widths[i]!;
    doc.rect(x, y, w, h).lineWidth(0.5).strokeColor(colour.rule).stroke();
    put(doc, c, x + PAD, y + PAD, w - 2 * PAD, { font: header ? FONT.bold : FONT.body, pt: f.pt, align: t.columns[i]!.align });
    x += w;
  });
  doc.y = y + h;
}

/** The height the whole table takes when it fits on one page. */
export function tableHeight(doc: Doc, t: TableModel, o: TableOptions = {}): number {
  const f = frame(doc, t, o);
  const rows = t.rows.reduce((sum, r) => sum + Math.max(f.minRow, cellsHeight(doc, r, f, FONT.body)), 0);
  return cellsHeight(doc, t.columns.map((c) => c.header), f, FONT.bold) + rows;
}

export function drawTable(doc: Doc, t: TableModel, o: TableOptions = {}): void {
  const f = frame(doc, t, o);
  const headers = t.columns.map((c) => c.header);
  const headerH = cellsHeight(doc, headers, f, FONT.bold);
  const heights = t.rows.map((r) => Math.max(f.minRow, cellsHeight(doc, r, f, FONT.body)));
  if (roomLeft(doc) < headerH + (heights[0] ?? 0)) doc.addPage();
  drawRow(doc, t, headers, f, headerH, true);
  t.rows.forEach((r, i) => {
    const h = heights[i]!;
    if (roomLeft(doc) < h) {
      doc.addPage();
      drawRow(doc, t, headers, f, headerH, true);
    }
    drawRow(doc, t, r, f, h, false);
  });
}
