/** Diagram scaffolding shared by every chart: plot area, grid, axes with ticks, markers and a legend. */
import type { Scale } from './axes';
import type { Point, Stroke } from './svg';
import { circle, group, line, polygon, rect, text, textWidth } from './svg';
import { dash, fontSize, gridColour, ink, lineWeight, mutedInk, paper } from './style';

export interface PlotArea {
  left: number;
  top: number;
  right: number;
  bottom: number;
}

export interface Chart {
  width: number;
  height: number;
  area: PlotArea;
  x: Scale;
  y: Scale;
}

export interface ChartSize {
  width?: number;
  height?: number;
}

const margins = { left: 58, right: 16, top: 14, bottom: 40 };

export function plotArea(width: number, height: number): PlotArea {
  return { left: margins.left, top: margins.top, right: width - margins.right, bottom: height - margins.bottom };
}

/** Plot coordinates of a data point. */
export function at(c: Chart, x: number, y: number): Point {
  return { x: c.x.map(x), y: c.y.map(y) };
}

function xAxis(c: Chart, label: string): string[] {
  const { area } = c;
  const ticks = c.x.ticks.map((v) => {
    const x = c.x.map(v);
    return line({ x, y: area.top }, { x, y: area.bottom }, { stroke: gridColour, width: lineWeight.thin })
      + line({ x, y: area.bottom }, { x, y: area.bottom + 4 }, { width: lineWeight.thin })
      + text({ x, y: area.bottom + 14 }, c.x.label(v), { size: fontSize.small, anchor: 'middle' });
  });
  const middle = (area.left + area.right) / 2;
  const title = text({ x: middle, y: area.bottom + 30 }, label, { size: fontSize.label, anchor: 'middle' });
  return [group(ticks, 'x-ticks'), title];
}

function yAxis(c: Chart, label: string): string[] {
  const { area } = c;
  const ticks = c.y.ticks.map((v) => {
    const y = c.y.map(v);
    return line({ x: area.left, y }, { x: area.right, y }, { stroke: gridColour, width: lineWeight.thin })
      + line({ x: area.left - 4, y }, { x: area.left, y }, { width: lineWeight.thin })
      + text({ x: area.left - 6, y: y + 3 }, c.y.label(v), { size: fontSize.small, anchor: 'end' });
  });
  const middle = (area.top + area.bottom) / 2;
  const title = text({ x: 14, y: middle }, label, { size: fontSize.label, anchor: 'middle', rotate: -90 });
  return [group(ticks, 'y-ticks'), title];
}

/** Grid, tick marks and labels, the frame round the plot area and the axis titles. */
export function axesMarkup(c: Chart, labels: { x: string; y: string }): string {
  const { area } = c;
  return group([
    ...xAxis(c, labels.x),
    ...yAxis(c, labels.y),
    rect(area.left, area.top, area.right - area.left, area.bottom - area.top, 'none', { width: lineWeight.thin }),
  ], 'axes');
}

export type MarkerShape = 'circle' | 'square' | 'diamond';

export function marker(p: Point, shape: MarkerShape, colour: string, size = 3.2): string {
  if (shape === 'circle') return circle(p, size, colour, { stroke: paper, width: 0.8 });
  const r = shape === 'square' ? size * 0.9 : size * 1.25;
  const corners = shape === 'square'
    ? [{ x: p.x - r, y: p.y - r }, { x: p.x + r, y: p.y - r }, { x: p.x + r, y: p.y + r }, { x: p.x - r, y: p.y + r }]
    : [{ x: p.x, y: p.y - r }, { x: p.x + r, y: p.y }, { x: p.x, y: p.y + r }, { x: p.x - r, y: p.y }];
  return polygon(corners, colour, { stroke: paper, width: 0.8 });
}

/** A label beside a point, kept inside the plot area. */
export function pointLabel(c: Chart, p: Point, label: string, dx = 5, dy = -5): string {
  const width = textWidth(label, fontSize.small);
  const flip = p.x + dx + width > c.area.right;
  const x = flip ? p.x - Math.abs(dx) : p.x + dx;
  const y = Math.max(c.area.top + fontSize.small, Math.min(c.area.bottom - 3, p.y + dy));
  return text({ x, y }, label, { size: fontSize.small, anchor: flip ? 'end' : 'start', fill: ink });
}

/** A vertical line at data value `x` across the plot area, with its label at the top. */
export function verticalMarker(c: Chart, x: number, label: string, s: Stroke): string {
  const px = c.x.map(x);
  const onLeft = px + textWidth(label, fontSize.small) + 3 > c.area.right;
  const style = { size: fontSize.small, anchor: onLeft ? 'end' : 'start', fill: s.stroke ?? mutedInk } as const;
  return group([
    line({ x: px, y: c.area.top }, { x: px, y: c.area.bottom }, s),
    text({ x: onLeft ? px - 3 : px + 3, y: c.area.top + 10 }, label, style),
  ], 'marker');
}

export interface LegendEntry {
  label: string;
  stroke: Stroke;
}

/** Legend in a top corner of the plot area, the one the data leave free. */
export function legend(c: Chart, entries: LegendEntry[], corner: 'left' | 'right' = 'right'): string {
  const rowHeight = 12;
  const width = Math.max(...entries.map((e) => textWidth(e.label, fontSize.small))) + 34;
  const left = corner === 'right' ? c.area.right - width - 6 : c.area.left + 6;
  // Below the labels of vertical markers, which sit along the top edge.
  const top = c.area.top + 16;
  const rows = entries.map((e, i) => {
    const y = top + 8 + i * rowHeight;
    return line({ x: left + 6, y: y - 3 }, { x: left + 24, y: y - 3 }, e.stroke)
      + text({ x: left + 28, y }, e.label, { size: fontSize.small });
  });
  const height = entries.length * rowHeight + 4;
  const frame = rect(left, top, width, height, paper, { stroke: gridColour, width: lineWeight.thin });
  return group([frame, ...rows], 'legend');
}

export const dashed = (colour: string): Stroke => ({ stroke: colour, width: lineWeight.thin * 1.5, dash: dash.dashed });
