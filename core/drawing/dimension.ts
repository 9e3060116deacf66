/**
 * Dimensioning in the manner of ISO 129-1: thin dimension and extension lines, filled arrowheads
 * terminating on the extension lines, text parallel to the dimension line and readable from the bottom
 * or the right, reference dimensions in parentheses.
 */
import type { Point } from './svg';
import { group, line, polygon, text, textWidth } from './svg';
import { arrowSize, dash, fontSize, ink, lineWeight } from './style';

const thin = { width: lineWeight.thin };
/** Extension lines start this far from the feature and run this far past the dimension line. */
const extensionGap = 2;
const extensionOvershoot = 3;

function unit(a: Point, b: Point): Point {
  const length = Math.hypot(b.x - a.x, b.y - a.y) || 1;
  return { x: (b.x - a.x) / length, y: (b.y - a.y) / length };
}

const along = (p: Point, u: Point, distance: number): Point => ({ x: p.x + u.x * distance, y: p.y + u.y * distance });

/** A filled arrowhead with its tip at `tip`, pointing in the direction from `from` to `tip`. */
export function arrowhead(tip: Point, from: Point, size: { length: number; width: number } = arrowSize): string {
  const u = unit(from, tip);
  const base = along(tip, u, -size.length);
  const half = size.width / 2;
  const left = { x: base.x - u.y * half, y: base.y + u.x * half };
  const right = { x: base.x + u.y * half, y: base.y - u.x * half };
  return polygon([tip, left, right], ink);
}

export interface DimensionOptions {
  /** Reference (auxiliary) dimension: the value is shown in parentheses. */
  reference?: boolean;
  size?: number;
}

/** Text angle in degrees, in [−90°, 90°): readable from the bottom or the right of the sheet. */
function readableAngle(u: Point): number {
  const degrees = (Math.atan2(u.y, u.x) * 180) / Math.PI;
  if (degrees >= 90) return degrees - 180;
  if (degrees < -90) return degrees + 180;
  return degrees;
}

/** Baseline point that keeps the glyphs on the `away` side of the dimension line, clear of it. */
function textAnchor(middle: Point, angle: number, away: Point, size: number): Point {
  const radians = (angle * Math.PI) / 180;
  const up = { x: Math.sin(radians), y: -Math.cos(radians) };
  const facing = up.x * away.x + up.y * away.y > 0;
  return along(middle, away, facing ? 3 : 3 + size * 0.72);
}

/**
 * Dimension between features `a` and `b`, drawn `offset` px to the left of the direction a→b
 * (negative: to the right). Arrows go outside when the text and arrowheads do not fit between them.
 */
export function linearDimension(a: Point, b: Point, offset: number, label: string, options: DimensionOptions = {}): string {
  const u = unit(a, b);
  const normal = { x: u.y, y: -u.x };
  const side = Math.sign(offset) || 1;
  const shift = (p: Point, d: number): Point => ({ x: p.x + normal.x * d, y: p.y + normal.y * d });
  const start = shift(a, offset);
  const end = shift(b, offset);
  const size = options.size ?? fontSize.label;
  const content = options.reference ? `(${label})` : label;
  const length = Math.hypot(end.x - start.x, end.y - start.y);
  const inside = length >= textWidth(content, size) + 2 * arrowSize.length + 4;
  const parts = [
    line(shift(a, side * extensionGap), shift(a, offset + side * extensionOvershoot), thin),
    line(shift(b, side * extensionGap), shift(b, offset + side * extensionOvershoot), thin),
    ...dimensionLine(start, end, u, inside),
  ];
  const middle = inside ? along(start, u, length / 2) : along(end, u, arrowSize.length + 4 + textWidth(content, size) / 2);
  const angle = readableAngle(u);
  parts.push(text(textAnchor(middle, angle, { x: normal.x * side, y: normal.y * side }, size), content, {
    size, anchor: 'middle', rotate: angle === 0 ? undefined : angle,
  }));
  return group(parts, 'dimension');
}

function dimensionLine(start: Point, end: Point, u: Point, inside: boolean): string[] {
  if (inside) return [line(start, end, thin), arrowhead(start, end), arrowhead(end, start)];
  const tail = arrowSize.length + 4;
  return [
    line(along(start, u, -tail), along(end, u, tail), thin),
    arrowhead(start, along(start, u, -1)),
    arrowhead(end, along(end, u, 1)),
  ];
}

/** Leader from a feature (arrow tip) up to a horizontal shoulder carrying the label. */
export function leader(tip: Point, knee: Point, label: string, size: number = fontSize.label): string {
  const rightward = knee.x >= tip.x;
  const width = textWidth(label, size) + 4;
  const shoulderEnd = { x: knee.x + (rightward ? width : -width), y: knee.y };
  return group([
    line(tip, knee, thin),
    line(knee, shoulderEnd, thin),
    arrowhead(tip, knee),
    text({ x: (knee.x + shoulderEnd.x) / 2, y: knee.y - 3 }, label, { size, anchor: 'middle' }),
  ], 'leader');
}

/** Centre line (ISO 128 long-dashed dotted, thin). */
export function centreLine(a: Point, b: Point): string {
  return line(a, b, { width: lineWeight.thin, dash: dash.chain });
}
