/**
 * Angular dimensioning in the end view of a torsion spring (ISO 129-1): the free angle between the legs
 * as an arc centred where the legs' centrelines meet, with extension lines along a leg wherever the arc
 * falls beyond it; and the working positions of leg 2 marked at their ends with their angle of
 * deflection (no Greek symbols on the sheet: the PDF's standard font has none).
 */
import type { ViewPlacement } from './compression-view';
import { toScreen } from './compression-view';
import { arrowhead } from './dimension';
import type { Leg, LegLayout } from './torsion-legs';
import type { Point } from './svg';
import { group, line, polyline, text, textWidth } from './svg';
import { fontSize, lineWeight } from './style';
import type { Polyline, TextBox } from './torsion-clearance';
import { boxSamples, clearance } from './torsion-clearance';
import { arcPoints } from './wire';

const thin = { width: lineWeight.thin };
const dot = (a: Point, b: Point) => a.x * b.x + a.y * b.y;
const cross = (a: Point, b: Point) => a.x * b.y - a.y * b.x;
const along = (p: Point, u: Point, k: number): Point => ({ x: p.x + u.x * k, y: p.y + u.y * k });

/** Where the two leg centrelines meet; midway between the legs' starts when they lie in one line. */
function vertex(a: Leg, b: Leg): Point | null {
  const sine = cross(a.direction, b.direction);
  if (Math.abs(sine) < Math.sin((3 * Math.PI) / 180)) {
    // Parallel and pointing the same way: no angle between them to draw.
    if (dot(a.direction, b.direction) > 0) return null;
    return { x: (a.start.x + b.start.x) / 2, y: (a.start.y + b.start.y) / 2 };
  }
  const gap = { x: b.start.x - a.start.x, y: b.start.y - a.start.y };
  return along(a.start, a.direction, cross(gap, b.direction) / sine);
}

/** Arc radius that meets both legs where it can, else the nearest to them; null when it would run far off. */
function arcRadius(q: Point, legs: readonly Leg[]): number | null {
  const from = legs.map((leg) => dot({ x: q.x - leg.start.x, y: q.y - leg.start.y }, leg.direction));
  const low = Math.max(0, ...from.map((s) => -s));
  const high = Math.min(...legs.map((leg, i) => leg.length - (from[i] as number)));
  const longest = Math.max(...legs.map((leg) => leg.length));
  const radius = high > low ? low + 0.6 * (high - low) : Math.max(low, 0.6 * longest);
  return radius > 1.5 * longest ? null : radius;
}

/** Thin extension line along the leg's centreline out to the arc, when the arc falls beyond the leg. */
function extension(leg: Leg, q: Point, radius: number, screen: (p: Point) => Point): string[] {
  const onLeg = dot({ x: q.x - leg.start.x, y: q.y - leg.start.y }, leg.direction) + radius;
  if (onLeg >= 0 && onLeg <= leg.length) return [];
  const near = along(leg.start, leg.direction, onLeg < 0 ? 0 : leg.length);
  const far = along(leg.start, leg.direction, onLeg);
  const a = screen(near);
  const b = screen(far);
  const length = Math.hypot(b.x - a.x, b.y - a.y) || 1;
  const u = { x: (b.x - a.x) / length, y: (b.y - a.y) / length };
  return [line(along(a, u, 2), along(b, u, 3), thin)];
}

export interface AngleArc {
  vertex: Point;
  radius: number;
  /** Start (along leg 2) and sweep to leg 1, radians, clockwise on screen. */
  from: number;
  sweep: number;
}

/** The free angle's arc, from leg 2 round to leg 1 the way loading turns leg 2; null when there is none to draw. */
export function freeAngleArc(layout: LegLayout): AngleArc | null {
  const [leg1, leg2] = layout.legs;
  const q = vertex(leg1, leg2);
  const radius = q && arcRadius(q, layout.legs);
  if (!q || radius === null || layout.freeAngle < 1) return null;
  const arc = {
    vertex: q, radius, from: Math.atan2(leg2.direction.y, leg2.direction.x),
    sweep: (layout.loadSense * layout.freeAngle * Math.PI) / 180,
  };
  return { ...arc, radius: clearOfBody(arc, layout.wire) };
}

/** An arc that would cross the body passes round outside it, a wire and a half clear. */
function clearOfBody(arc: AngleArc, wire: LegLayout['wire']): number {
  const clear = wire.R + 2 * wire.d;
  const crosses = arcLine(arc).some((p) => Math.hypot(p.x, p.y) < clear);
  return crosses ? Math.hypot(arc.vertex.x, arc.vertex.y) + clear : arc.radius;
}

export function arcLine(arc: AngleArc): Point[] {
  return arcPoints(arc.vertex, arc.radius, arc.from, arc.from + arc.sweep, Math.PI / 90);
}

/** Where the free angle's text goes: just outside the arc, at the place along it clearest of `avoid`. */
export function freeAngleLabelBox(arc: AngleArc, v: ViewPlacement, label: string, avoid: readonly Polyline[]): TextBox {
  const c = toScreen(v)(arc.vertex);
  const width = textWidth(label, fontSize.label);
  const height = fontSize.label * 0.72;
  const place = (fraction: number): TextBox => {
    const u = { x: Math.cos(arc.from + arc.sweep * fraction), y: Math.sin(arc.from + arc.sweep * fraction) };
    const reach = arc.radius * v.scale + 4 + (Math.abs(u.x) * width + Math.abs(u.y) * height) / 2;
    const centre = along(c, u, reach);
    return { left: centre.x - width / 2, baseline: centre.y + height / 2, width, height };
  };
  const boxes = [0.5, 0.4, 0.6, 0.3, 0.7, 0.2, 0.8].map(place);
  const clear = boxes.map((b) => clearance(boxSamples(b), avoid));
  const first = clear.findIndex((distance) => distance >= 5);
  const best = first >= 0 ? first : clear.indexOf(Math.max(...clear));
  return boxes[best] as TextBox;
}

export function freeAngleDimension(arc: AngleArc, layout: LegLayout, v: ViewPlacement, label: string, box: TextBox): string {
  const screen = toScreen(v);
  const points = arcLine(arc).map(screen);
  const [leg1, leg2] = layout.legs;
  return group([
    ...extension(leg1, arc.vertex, arc.radius, screen), ...extension(leg2, arc.vertex, arc.radius, screen),
    polyline(points, thin),
    arrowhead(points[0] as Point, points[1] as Point),
    arrowhead(points[points.length - 1] as Point, points[points.length - 2] as Point),
    text({ x: box.left, y: box.baseline }, label, { size: fontSize.label }),
  ], 'free-angle');
}

/** Each working position of leg 2, marked beyond its end with its angle. */
export function workingAngleLabels(positions: readonly { end: Point; direction: Point; label: string }[], v: ViewPlacement): string {
  const screen = toScreen(v);
  return group(positions.map((p) => {
    const at = along(screen(p.end), p.direction, 4 + textWidth(p.label, fontSize.small) / 2);
    return text({ x: at.x, y: at.y + 3 }, p.label, { size: fontSize.small, anchor: 'middle' });
  }), 'working-angles');
}
