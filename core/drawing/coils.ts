/**
 * Side view of a helical coil, simplified in the manner of ISO 2162-1: each half turn is a straight
 * stroke between the extreme points of the outline; the wire keeps its true thickness so the drawing
 * also reads as a view. Model units, x along the axis, y across it (positive downward, as on screen).
 */
import type { Point } from './svg';

export type Hand = 'right' | 'left';

export interface CoilStroke {
  from: Point;
  to: Point;
  /** Half turn nearer the viewer; the far ones are partly hidden behind it. */
  front: boolean;
}

/** Turn numbers at the stroke ends: every half turn, then the fractional end if there is one. */
function strokeTurns(totalTurns: number): number[] {
  const halves = Math.floor(totalTurns * 2 + 1e-9);
  const turns = Array.from({ length: halves + 1 }, (_, i) => i / 2);
  if (totalTurns - halves / 2 > 1e-6) turns.push(totalTurns);
  return turns;
}

/**
 * Strokes of a helix of `totalTurns` turns with mean radius `radius`; `axialAt(t)` is the axial position
 * of the wire centre after t turns. A right-hand helix seen from the side with its axis horizontal has
 * its near strokes running from upper left to lower right.
 */
export function coilStrokes(
  totalTurns: number, axialAt: (turns: number) => number, radius: number, hand: Hand,
): CoilStroke[] {
  const sign = hand === 'right' ? -1 : 1;
  const vertices = strokeTurns(totalTurns).map((t) => ({ x: axialAt(t), y: sign * radius * Math.cos(2 * Math.PI * t) }));
  return vertices.slice(1).map((to, i) => ({ from: vertices[i] as Point, to, front: i % 2 === 0 }));
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
