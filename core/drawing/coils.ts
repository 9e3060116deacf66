/**
 * Side view of a helical coil, simplified in the manner of ISO 2162-1: each half turn is a straight
 * stroke between the extreme points of the outline; the wire keeps its true thickness so the drawing
 * also reads as a view. Model units, x along the axis, y across it (positive downward, as on screen).
 */
import type { Point } from './svg';
import { group, line } from './svg';
import { dash, lineWeight } from './style';

export type Hand = 'right' | 'left';

export interface CoilStroke {
  from: Point;
  to: Point;
  /** Half turn nearer the viewer; the far ones are partly hidden behind it. */
  front: boolean;
}

/**
 * A body of more turns than this is drawn as ISO 2162-1 allows for long springs: a few turns at each
 * end at their true places, the middle turns left out and marked by thin chain lines through the wire
 * centres. It keeps a drawing (and every print of it) the same size whatever the coil count.
 */
export const MAX_DRAWN_TURNS = 24;
/** Turns drawn at each end of a body that is shortened. */
export const TURNS_DRAWN_EACH_END = 4;

interface StrokeVertex { turns: number; half: number }

/** Turn numbers at the stroke ends: every half turn (only the end groups of a long body), then the fractional end. */
function strokeVertices(totalTurns: number): StrokeVertex[] {
  const halves = Math.floor(totalTurns * 2 + 1e-9);
  const kept = totalTurns > MAX_DRAWN_TURNS ? 2 * TURNS_DRAWN_EACH_END : Infinity;
  const head = Array.from({ length: Math.min(halves, kept) + 1 }, (_, i) => i);
  const tail = kept === Infinity ? [] : Array.from({ length: kept + 1 }, (_, i) => halves - kept + i);
  const vertices = [...head, ...tail.filter((h) => h > head[head.length - 1]!)].map((h) => ({ turns: h / 2, half: h }));
  if (totalTurns - halves / 2 > 1e-6) vertices.push({ turns: totalTurns, half: halves + 1 });
  return vertices;
}

/** The turns left out of a long body's drawing (from, to), or null when every turn is drawn. */
export function omittedTurns(totalTurns: number): { from: number; to: number } | null {
  if (!(totalTurns > MAX_DRAWN_TURNS)) return null;
  const halves = Math.floor(totalTurns * 2 + 1e-9);
  return { from: TURNS_DRAWN_EACH_END, to: (halves - 2 * TURNS_DRAWN_EACH_END) / 2 };
}

/**
 * Strokes of a helix of `totalTurns` turns with mean radius `radius`; `axialAt(t)` is the axial position
 * of the wire centre after t turns. A right-hand helix seen from the side with its axis horizontal has
 * its near strokes running from upper left to lower right. A long body has no strokes in its omitted middle.
 */
export function coilStrokes(
  totalTurns: number, axialAt: (turns: number) => number, radius: number, hand: Hand,
): CoilStroke[] {
  const sign = hand === 'right' ? -1 : 1;
  const vertices = strokeVertices(totalTurns).map((v) => ({ ...v, x: axialAt(v.turns), y: sign * radius * Math.cos(2 * Math.PI * v.turns) }));
  const strokes: CoilStroke[] = [];
  vertices.slice(1).forEach((to, i) => {
    const from = vertices[i]!;
    if (to.half - from.half === 1) strokes.push({ from: { x: from.x, y: from.y }, to: { x: to.x, y: to.y }, front: from.half % 2 === 0 });
  });
  return strokes;
}

/** The mark of omitted turns: thin chain lines along both rows of wire centres across the gap. */
export function omittedTurnsMark(
  totalTurns: number, axialAt: (turns: number) => number, radius: number, screen: (p: Point) => Point,
): string {
  const gap = omittedTurns(totalTurns);
  if (!gap) return '';
  const [a, b] = [axialAt(gap.from), axialAt(gap.to)];
  return group([-radius, radius].map((y) => line(screen({ x: a, y }), screen({ x: b, y }), { width: lineWeight.thin, dash: dash.chain })), 'omitted-turns');
}

/** Half circle from `fromAngle`, sampled evenly plus at its extreme points so the outline reaches them. */
function arc(centre: Point, radius: number, fromAngle: number, segments: number): Point[] {
  const even = Array.from({ length: segments + 1 }, (_, i) => fromAngle + (Math.PI * i) / segments);
  const quarter = Math.PI / 2;
  const extremes = [1, 2].map((k) => (Math.floor(fromAngle / quarter) + k) * quarter).filter((a) => a < fromAngle + Math.PI);
  return [...even, ...extremes].sort((a, b) => a - b)
    .map((a) => ({ x: centre.x + radius * Math.cos(a), y: centre.y + radius * Math.sin(a) }));
}

/** Outline of the wire along a stroke: two straight edges and two round ends. */
export function wireOutline(stroke: CoilStroke, wireRadius: number, segments = 8): Point[] {
  const direction = Math.atan2(stroke.to.y - stroke.from.y, stroke.to.x - stroke.from.x);
  return [
    ...arc(stroke.to, wireRadius, direction - Math.PI / 2, segments),
    ...arc(stroke.from, wireRadius, direction + Math.PI / 2, segments),
  ];
}

function clipHalfPlane(polygon: Point[], inside: (p: Point) => boolean, cut: (a: Point, b: Point) => Point): Point[] {
  const out: Point[] = [];
  polygon.forEach((current, i) => {
    const previous = polygon[(i + polygon.length - 1) % polygon.length] as Point;
    if (inside(current)) {
      if (!inside(previous)) out.push(cut(previous, current));
      out.push(current);
    } else if (inside(previous)) {
      out.push(cut(previous, current));
    }
  });
  return out;
}

function atX(x: number): (a: Point, b: Point) => Point {
  return (a, b) => ({ x, y: a.y + ((b.y - a.y) * (x - a.x)) / (b.x - a.x) });
}

/** A polygon cut to the slab xMin ≤ x ≤ xMax: how ground end faces appear in the side view. */
export function clipToSlab(polygon: Point[], xMin: number, xMax: number): Point[] {
  const left = clipHalfPlane(polygon, (p) => p.x >= xMin, atX(xMin));
  return clipHalfPlane(left, (p) => p.x <= xMax, atX(xMax));
}
