/**
 * What the extension and torsion sheets and diagrams share: the sheet's layout, fitting a view into its
 * box, the data block beside the views, the texts of angles, hands and specified values, and load points
 * on a characteristic.
 */
import { formatQuantity } from '../format';
import type { Quantity, UnitSystem } from '../units';
import type { Chart, LegendEntry } from './chart';
import { marker, pointLabel } from './chart';
import type { WindDirection } from './compression-data';
import type { ViewPlacement } from './compression-view';
import type { Point } from './svg';
import { group, line, plainNumber, textWidth } from './svg';
import type { TableRow } from './table';
import { cellPadding, dataTable } from './table';
import { fontSize, ink, lineWeight, seriesColours } from './style';
import { windTerms } from '../vocabulary';

/** A screen rectangle. */
export interface Box {
  left: number;
  top: number;
  width: number;
  height: number;
}

/** What a view covers, in model units. */
export interface Extent {
  left: number;
  top: number;
  right: number;
  bottom: number;
}

export function extentOf(points: readonly Point[]): Extent {
  const xs = points.map((p) => p.x);
  const ys = points.map((p) => p.y);
  return { left: Math.min(...xs), top: Math.min(...ys), right: Math.max(...xs), bottom: Math.max(...ys) };
}

export function unionExtent(parts: readonly Extent[]): Extent {
  return {
    left: Math.min(...parts.map((p) => p.left)), top: Math.min(...parts.map((p) => p.top)),
    right: Math.max(...parts.map((p) => p.right)), bottom: Math.max(...parts.map((p) => p.bottom)),
  };
}

/** The largest scale at which `extent` fits `box`, centred in it. */
export function fitView(extent: Extent, box: Box): ViewPlacement {
  const width = extent.right - extent.left;
  const height = extent.bottom - extent.top;
  const scale = Math.max(1e-6, Math.min(box.width / width, box.height / height));
  return {
    scale,
    origin: {
      x: box.left + (box.width - width * scale) / 2 - extent.left * scale,
      y: box.top + (box.height - height * scale) / 2 - extent.top * scale,
    },
  };
}

/** The drawing's short words for the wind, from the shared vocabulary. */
export const windText: Record<WindDirection, string> = { right: windTerms.right.short, left: windTerms.left.short, either: windTerms.either.short };

const sheetMargin = 8;

/** A drawing sheet: the views on the left, the data block down the right (a third of the width, 130–180 px). */
export function sheetLayout(width: number, height: number): { views: Box; table: Box } {
  const tableWidth = Math.min(180, Math.max(130, width * 0.32));
  const inner = height - 2 * sheetMargin;
  return {
    views: { left: sheetMargin, top: sheetMargin, width: width - tableWidth - 3 * sheetMargin, height: inner },
    table: { left: width - sheetMargin - tableWidth, top: sheetMargin, width: tableWidth, height: inner },
  };
}

/** Degrees as drawings write them: no space before the sign. */
export function angleText(degrees: number, tolerance?: number): string {
  const value = `${plainNumber(degrees, 1)}°`;
  return tolerance === undefined ? value : `${value} ±${plainNumber(tolerance, 1)}°`;
}

/** The value the drawing asks for, with its tolerance; without one, the value the design gives. */
export function specifiedText(
  value: { actual: number; specified: number | null; tolerancePercent: number | null }, quantity: Quantity, units: UnitSystem,
): string {
  if (value.specified === null) return formatQuantity(value.actual, quantity, units);
  const text = formatQuantity(value.specified, quantity, units);
  return value.tolerancePercent === null ? text : `${text} ±${plainNumber(value.tolerancePercent, 1)} %`;
}

/** First column as wide as its longest entry; a three-column table splits the rest for its two values. */
function columnWidths(rows: TableRow[], width: number, size: number): number[] {
  const ruled = rows.filter((r) => r.cells.length > 1);
  const first = Math.max(...ruled.map((r) => textWidth(r.cells[0] ?? '', size))) + 2 * cellPadding;
  const cells = Math.max(...ruled.map((r) => r.cells.length));
  const rest = width - first;
  return cells === 3 ? [first, rest * 0.45, rest * 0.55] : [first, rest];
}

/** The data block: tables stacked from the top of `box`, rows as tall as the box allows (at most 13 px). */
export function dataBlock(tables: TableRow[][], box: Box): string {
  const shown = tables.filter((t) => t.length > 0);
  const count = shown.reduce((sum, t) => sum + t.length, 0);
  const gap = 6;
  const rowHeight = Math.min(13, (box.height - gap * (shown.length - 1)) / Math.max(1, count));
  const size = Math.min(fontSize.small, rowHeight * 0.68);
  let y = box.top;
  return shown.map((rows) => {
    const table = dataTable({ x: box.left, y }, rows, { columns: columnWidths(rows, box.width, size), rowHeight, size });
    y += table.height + gap;
    return table.markup;
  }).join('');
}

/** A load on a diagram, in the units the axes read. */
export interface LoadPoint {
  x: number;
  y: number;
  label: string;
  /** The value the drawing asks for at `x` and its tolerance, shown as a bar. */
  specified: number | null;
  tolerancePercent: number | null;
}

function toleranceBar(c: Chart, p: LoadPoint): string[] {
  if (p.specified === null || p.tolerancePercent === null) return [];
  const band = p.specified * (p.tolerancePercent / 100);
  const low = { x: c.x.map(p.x), y: c.y.map(p.specified - band) };
  const high = { x: c.x.map(p.x), y: c.y.map(p.specified + band) };
  const thin = { stroke: ink, width: lineWeight.thin };
  const tick = (q: Point) => line({ x: q.x - 3, y: q.y }, { x: q.x + 3, y: q.y }, thin);
  return [line(low, high, thin), tick(low), tick(high)];
}

/** Labels go below right of their point, clear of a characteristic that rises to the right. */
export const risingLabel = { dx: 6, dy: 12 } as const;

/** Markers at the loads, with their labels and tolerance bars. */
export function loadPoints(c: Chart, points: readonly LoadPoint[]): string {
  return group(points.flatMap((p) => {
    const at = { x: c.x.map(p.x), y: c.y.map(p.y) };
    return [
      ...toleranceBar(c, p), marker(at, 'circle', seriesColours.secondary),
      pointLabel(c, at, p.label, risingLabel.dx, risingLabel.dy),
    ];
  }), 'test-loads');
}

/** The legend's line for the tolerance bars, when a load has one. */
export function toleranceLegend(points: readonly LoadPoint[], quantity: string): LegendEntry[] {
  if (!points.some((p) => p.specified !== null && p.tolerancePercent !== null)) return [];
  return [{ label: `specified ${quantity} and tolerance`, stroke: { stroke: ink, width: lineWeight.thin } }];
}

/** The upper end of a load's tolerance band, so a diagram's axis reaches it. */
export function upperValue(p: LoadPoint): number {
  return Math.max(p.y, (p.specified ?? 0) * (1 + (p.tolerancePercent ?? 0) / 100));
}
