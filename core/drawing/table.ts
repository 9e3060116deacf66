/** A ruled data block of text cells, as drawings carry their technical data beside the view. */
import type { Point } from './svg';
import { group, line, rect, text, textWidth } from './svg';
import { ink, lineWeight, paper } from './style';

export interface TableRow {
  /** One cell spans the whole row (a heading); otherwise one cell per column. */
  cells: string[];
  bold?: boolean;
}

export interface TableOptions {
  columns: number[];
  rowHeight: number;
  size: number;
}

export const cellPadding = 3;

const ELLIPSIS = '...';

/** Text cut with an ellipsis to the cell's width, so a long part number never runs across the view. */
export function fitText(content: string, width: number, size: number, bold = false): string {
  const room = (width - 2 * cellPadding) / (bold ? 1.06 : 1);
  if (textWidth(content, size) <= room) return content;
  const chars = [...content];
  // No glyph is narrower than 0.3 em, which bounds how many can fit before measuring.
  let kept = Math.min(chars.length, Math.ceil(room / (0.3 * size)));
  while (kept > 0 && textWidth(`${chars.slice(0, kept).join('').trimEnd()}${ELLIPSIS}`, size) > room) kept--;
  return `${chars.slice(0, kept).join('').trimEnd()}${ELLIPSIS}`;
}

function rowMarkup(row: TableRow, top: number, left: number, o: TableOptions): string[] {
  const baseline = top + o.rowHeight / 2 + o.size * 0.36;
  const edges = o.columns.reduce<number[]>((acc, w) => [...acc, (acc[acc.length - 1] ?? left) + w], [left]);
  const spans = row.cells.length === 1;
  const style = { size: o.size, bold: row.bold };
  const widthOf = (i: number) => (spans ? edges[edges.length - 1]! - left : (o.columns[i] ?? 0));
  const cells = row.cells.map((cell, i) => text({ x: (edges[i] ?? left) + cellPadding, y: baseline }, fitText(cell, widthOf(i), o.size, row.bold), style));
  const rule = (x: number) => line({ x, y: top }, { x, y: top + o.rowHeight }, { width: lineWeight.thin });
  const rules = spans ? [] : edges.slice(1, -1).map(rule);
  return [...cells, ...rules];
}

/** The table with its top left corner at `at`; returns the markup and the height it takes. */
export function dataTable(at: Point, rows: TableRow[], o: TableOptions): { markup: string; width: number; height: number } {
  const width = o.columns.reduce((sum, w) => sum + w, 0);
  const height = rows.length * o.rowHeight;
  const parts = [rect(at.x, at.y, width, height, paper, { stroke: ink, width: lineWeight.thin })];
  rows.forEach((row, i) => {
    const top = at.y + i * o.rowHeight;
    if (i > 0) parts.push(line({ x: at.x, y: top }, { x: at.x + width, y: top }, { width: lineWeight.thin }));
    parts.push(...rowMarkup(row, top, at.x, o));
  });
  return { markup: group(parts, 'data-block'), width, height };
}
