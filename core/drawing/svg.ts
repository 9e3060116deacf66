/**
 * SVG markup as plain strings. Only what svg-to-pdfkit renders faithfully: basic shapes, text with
 * explicit presentation attributes, groups with transforms, dash arrays. No CSS, markers or clip paths.
 */
import { ink, fontFamily } from './style';

export interface Point {
  x: number;
  y: number;
}

export type Attrs = Record<string, string | number | undefined>;

export interface Stroke {
  stroke?: string;
  width?: number;
  dash?: string;
}

export interface TextStyle {
  size: number;
  anchor?: 'start' | 'middle' | 'end';
  fill?: string;
  bold?: boolean;
  /** Degrees about the text's own anchor point; −90 reads upward. */
  rotate?: number;
}

const xmlEntities: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' };

export function escapeXml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => xmlEntities[c] ?? c);
}

/** A coordinate or length, to 0.01 px. A non-finite value is a bug upstream, never something to draw. */
export function num(value: number): string {
  if (!Number.isFinite(value)) throw new RangeError(`cannot draw a non-finite coordinate (${value})`);
  const rounded = Math.round(value * 100) / 100;
  return Object.is(rounded, -0) ? '0' : String(rounded);
}

/** A count or plain number for reading: at most `decimals` places, trailing zeros dropped. */
export function plainNumber(value: number, decimals = 2): string {
  const fixed = value.toFixed(decimals);
  const trimmed = fixed.includes('.') ? fixed.replace(/0+$/, '').replace(/\.$/, '') : fixed;
  return trimmed === '-0' ? '0' : trimmed;
}

function attrValue(value: string | number): string {
  return typeof value === 'number' ? num(value) : escapeXml(value);
}

export function attrs(a: Attrs): string {
  return Object.entries(a)
    .filter((entry): entry is [string, string | number] => entry[1] !== undefined)
    .map(([key, value]) => ` ${key}="${attrValue(value)}"`)
    .join('');
}

/** `content` is markup already built by these helpers; plain text goes through `text`. */
export function element(name: string, a: Attrs, content?: string): string {
  return content === undefined ? `<${name}${attrs(a)}/>` : `<${name}${attrs(a)}>${content}</${name}>`;
}

function strokeAttrs(s: Stroke): Attrs {
  return { stroke: s.stroke ?? ink, 'stroke-width': s.width ?? 1, 'stroke-dasharray': s.dash };
}

export function line(a: Point, b: Point, s: Stroke = {}): string {
  return element('line', { x1: a.x, y1: a.y, x2: b.x, y2: b.y, ...strokeAttrs(s) });
}

export function points(list: readonly Point[]): string {
  return list.map((p) => `${num(p.x)},${num(p.y)}`).join(' ');
}

export function polyline(list: readonly Point[], s: Stroke = {}, extra: Attrs = {}): string {
  return element('polyline', { points: points(list), fill: 'none', ...strokeAttrs(s), ...extra });
}

export function polygon(list: readonly Point[], fill: string, s: Stroke | null = null): string {
  const outline: Attrs = s ? { ...strokeAttrs(s), 'stroke-linejoin': 'round' } : { stroke: 'none' };
  return element('polygon', { points: points(list), fill, ...outline });
}

export function circle(c: Point, r: number, fill: string, s: Stroke | null = null): string {
  return element('circle', { cx: c.x, cy: c.y, r, fill, ...(s ? strokeAttrs(s) : { stroke: 'none' }) });
}

export function rect(x: number, y: number, width: number, height: number, fill: string, s: Stroke | null = null): string {
  return element('rect', { x, y, width, height, fill, ...(s ? strokeAttrs(s) : { stroke: 'none' }) });
}

export function text(at: Point, content: string, style: TextStyle): string {
  const rotate = style.rotate ? `rotate(${num(style.rotate)} ${num(at.x)} ${num(at.y)})` : undefined;
  return element('text', {
    x: at.x, y: at.y, 'font-family': fontFamily, 'font-size': style.size, 'font-weight': style.bold ? 'bold' : undefined,
    'text-anchor': style.anchor ?? 'start', fill: style.fill ?? ink, transform: rotate,
  }, escapeXml(content));
}

/** `part` names the group for the UI and for tests that read a drawing back. */
export function group(content: readonly string[], part?: string, a: Attrs = {}): string {
  return element('g', { 'data-part': part, ...a }, content.join(''));
}

export function svgDocument(width: number, height: number, content: readonly string[]): string {
  return element('svg', {
    xmlns: 'http://www.w3.org/2000/svg', width, height, viewBox: `0 0 ${num(width)} ${num(height)}`,
  }, rect(0, 0, width, height, '#ffffff') + content.join(''));
}

// Helvetica advance widths in em for the narrow and wide characters; the rest take 0.556 (digits, most lower case).
const narrow = new Set([...' .,:;!|()[]/-\'', ...'ijlft', ...'rI']);
const wide = new Set([...'mwMW%', ...'ABCDEFGHKNOPQRSUVXYZ']);

/** Approximate advance width of Helvetica text, for layout decisions only (no font metrics in core/). */
export function textWidth(content: string, size: number): number {
  let em = 0;
  for (const c of content) em += narrow.has(c) ? 0.3 : wide.has(c) ? 0.72 : 0.556;
  return em * size;
}
