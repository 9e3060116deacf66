/** Label–value pairs laid out in columns: the data blocks of both documents. */
import type { Field } from '../../core/documents';
import { FONT } from './fonts';
import type { Doc } from './layout';
import { contentWidth, ensureSpace, leftEdge, put, textHeight } from './layout';
import { colour, gap, size } from './style';

export interface GridOptions {
  columns: number;
  /** Share of each column given to the label. */
  labelShare?: number;
  x?: number;
  width?: number;
}

interface Grid {
  x: number;
  column: number;
  label: number;
  value: number;
}

const COLUMN_GAP = 14;

function grid(doc: Doc, o: GridOptions): Grid {
  const width = o.width ?? contentWidth(doc);
  const column = (width - (o.columns - 1) * COLUMN_GAP) / o.columns;
  const label = column * (o.labelShare ?? 0.45);
  return { x: o.x ?? leftEdge(doc), column, label, value: column - label - 4 };
}

/** The width a value gets in a grid laid out with these options. */
export const gridValueWidth = (doc: Doc, o: GridOptions): number => grid(doc, o).value;

function rowHeight(doc: Doc, row: readonly Field[], g: Grid): number {
  let h = 0;
  for (const f of row) {
    h = Math.max(h, textHeight(doc, f.label, g.label, FONT.body, size.small), textHeight(doc, f.value, g.value, FONT.bold));
  }
  return h + 2 * gap.line;
}

function rows<T>(items: readonly T[], per: number): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < items.length; i += per) out.push(items.slice(i, i + per));
  return out;
}

export function fieldGridHeight(doc: Doc, fields: readonly Field[], o: GridOptions): number {
  const g = grid(doc, o);
  return rows(fields, o.columns).reduce((sum, r) => sum + rowHeight(doc, r, g), 0);
}

/** Label–value pairs in columns, read across; each row as tall as its tallest value. */
export function fieldGrid(doc: Doc, fields: readonly Field[], o: GridOptions): void {
  const g = grid(doc, o);
  for (const row of rows(fields, o.columns)) {
    const h = rowHeight(doc, row, g);
    ensureSpace(doc, h);
    const y = doc.y;
    row.forEach((f, i) => {
      const x = g.x + i * (g.column + COLUMN_GAP);
      put(doc, f.label, x, y + gap.line + 1, g.label, { pt: size.small, fill: colour.muted });
      put(doc, f.value, x + g.label + 4, y + gap.line, g.value, { font: FONT.bold });
      doc.moveTo(x, y + h).lineTo(x + g.column, y + h).lineWidth(0.3).strokeColor('#d4d4d4').stroke();
    });
    doc.y = y + h;
  }
}
