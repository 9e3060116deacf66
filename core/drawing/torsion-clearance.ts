/**
 * Label placement in the torsion end view, where legs, their working positions and the free angle's
 * arc cross at angles no fixed rule foresees: candidate places are scored by their clearance from what
 * is drawn. Screen coordinates throughout.
 */
import type { Box } from './common';
import type { Point } from './svg';

export type Polyline = Point[];

function distanceToSegment(p: Point, a: Point, b: Point): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const t = Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / (dx * dx + dy * dy || 1)));
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}

/** The least distance from any of `points` to any of `lines`; unbounded when nothing is drawn. */
export function clearance(points: readonly Point[], lines: readonly Polyline[]): number {
  let least = Infinity;
  for (const l of lines) {
    for (let i = 1; i < l.length; i++) {
      for (const p of points) least = Math.min(least, distanceToSegment(p, l[i - 1] as Point, l[i] as Point));
    }
  }
  return least;
}

/** A text's box, by its left edge and baseline. */
export interface TextBox {
  left: number;
  baseline: number;
  width: number;
  height: number;
}

/** Points spread over the box (five across, three down), close enough that no line crosses unseen. */
export function boxSamples(b: TextBox): Point[] {
  return Array.from({ length: 15 }, (_, i) => ({
    x: b.left + (b.width * (i % 5)) / 4, y: b.baseline - (b.height * Math.floor(i / 5)) / 2,
  }));
}

export function boxOutline(b: TextBox): Polyline {
  const [x0, x1, y0, y1] = [b.left, b.left + b.width, b.baseline - b.height, b.baseline];
  return [{ x: x0, y: y0 }, { x: x1, y: y0 }, { x: x1, y: y1 }, { x: x0, y: y1 }, { x: x0, y: y0 }];
}

export function inside(points: readonly Point[], box: Box): boolean {
  return points.every((p) => p.x >= box.left && p.x <= box.left + box.width && p.y >= box.top && p.y <= box.top + box.height);
}
