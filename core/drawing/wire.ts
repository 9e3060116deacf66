/**
 * Wire shapes the extension and torsion views share: the close-wound body, wire bent along any
 * centreline (loops, hooks, legs) and closed rings. Model units in, screen points out through `screen`.
 */
import type { CoilStroke, Hand } from './coils';
import { coilStrokes, omittedTurnsMark, wireOutline } from './coils';
import type { Point } from './svg';
import { group, polygon } from './svg';
import { ink, lineWeight, paper } from './style';

export type ToScreen = (p: Point) => Point;

const outlineStroke = { stroke: ink, width: lineWeight.thick };

/** A wire outline as drawn: thick visible edges, paper inside so it hides what lies behind it. */
export function wireShape(outline: readonly Point[], screen: ToScreen): string {
  return polygon(outline.map(screen), paper, outlineStroke);
}

export interface WoundBody {
  d: number;
  /** Mean radius. */
  R: number;
  turns: number;
  hand: Hand;
}

/** Close wound: each turn lies against the last, so the wire centre advances d a turn, from d/2 to (n + ½)·d. */
export function woundStrokes(b: WoundBody): CoilStroke[] {
  return coilStrokes(b.turns, (t) => b.d / 2 + t * b.d, b.R, b.hand);
}

/** The body between x = 0 and (n + 1)·d; far half turns first so the near ones paint over them. */
export function woundBodyView(b: WoundBody, screen: ToScreen): string {
  const strokes = woundStrokes(b);
  const ordered = [...strokes.filter((s) => !s.front), ...strokes.filter((s) => s.front)];
  return group([
    ...ordered.map((s) => wireShape(wireOutline(s, b.d / 2), screen)),
    omittedTurnsMark(b.turns, (t) => b.d / 2 + t * b.d, b.R, screen),
  ], 'coils');
}

const sub = (a: Point, b: Point): Point => ({ x: a.x - b.x, y: a.y - b.y });
const offset = (p: Point, n: Point, k: number): Point => ({ x: p.x + n.x * k, y: p.y + n.y * k });

function unit(v: Point): Point {
  const length = Math.hypot(v.x, v.y);
  return { x: v.x / length, y: v.y / length };
}

/** Left of the direction of travel: the direction turned a quarter turn back. */
const leftOf = (direction: Point): Point => ({ x: direction.y, y: -direction.x });

function halfCircle(centre: Point, from: Point, radius: number, segments = 8): Point[] {
  const start = Math.atan2(from.y, from.x);
  return Array.from({ length: segments + 1 }, (_, i) => {
    const a = start + (Math.PI * i) / segments;
    return { x: centre.x + radius * Math.cos(a), y: centre.y + radius * Math.sin(a) };
  });
}

/** Mitred offset at an inner vertex, limited so a sharp bend cannot throw a spike; a wire doubling back keeps its side. */
function miter(before: Point, after: Point, radius: number): Point {
  const sum = { x: before.x + after.x, y: before.y + after.y };
  if (Math.hypot(sum.x, sum.y) < 1e-6) return { x: before.x * radius, y: before.y * radius };
  const n = unit(sum);
  const k = Math.min(radius / (n.x * before.x + n.y * before.y), 3 * radius);
  return { x: n.x * k, y: n.y * k };
}

/** Drops points that repeat the one before, so every segment has a direction. */
function distinct(points: readonly Point[]): Point[] {
  return points.filter((p, i) => i === 0 || Math.hypot(p.x - (points[i - 1] as Point).x, p.y - (points[i - 1] as Point).y) > 1e-9);
}

/**
 * Outline of a wire of radius `radius` bent along `centre`: the two edges mitred at the bends and a
 * round end at each end. A centreline that is a single point is a wire seen end on: a circle.
 */
export function bentWireOutline(centre: readonly Point[], radius: number): Point[] {
  const points = distinct(centre);
  const first = points[0] as Point;
  if (points.length < 2) return halfCircle(first, { x: 1, y: 0 }, radius, 16).concat(halfCircle(first, { x: -1, y: 0 }, radius, 16));
  const normals = points.slice(1).map((p, i) => leftOf(unit(sub(p, points[i] as Point))));
  const at = (i: number): Point => {
    const before = normals[Math.max(0, i - 1)] as Point;
    const after = normals[Math.min(normals.length - 1, i)] as Point;
    return i === 0 || i === points.length - 1 ? { x: after.x * radius, y: after.y * radius } : miter(before, after, radius);
  };
  const left = points.map((p, i) => offset(p, at(i), 1));
  const right = points.map((p, i) => offset(p, at(i), -1)).reverse();
  const last = points[points.length - 1] as Point;
  const lastNormal = normals[normals.length - 1] as Point;
  const firstNormal = normals[0] as Point;
  return [
    ...left, ...halfCircle(last, lastNormal, radius), ...right,
    ...halfCircle(first, { x: -firstNormal.x, y: -firstNormal.y }, radius),
  ];
}

/** Points of the circle of `radius` round `centre` from angle `from` to `to` (radians, screen sense). */
export function arcPoints(centre: Point, radius: number, from: number, to: number, step = Math.PI / 24): Point[] {
  const count = Math.max(2, Math.ceil(Math.abs(to - from) / step));
  return Array.from({ length: count + 1 }, (_, i) => {
    const a = from + ((to - from) * i) / count;
    return { x: centre.x + radius * Math.cos(a), y: centre.y + radius * Math.sin(a) };
  });
}

/**
 * A closed ring of wire (mean radius `radius`) seen at an angle: `facing` is the cosine of the angle
 * between its plane and the drawing's (1 face on), which narrows it across the axis.
 */
export function ringShape(centre: Point, radius: number, wireRadius: number, screen: ToScreen, facing = 1): string {
  const across = Math.abs(facing) * radius;
  const circle = arcPoints({ x: 0, y: 0 }, 1, 0, 2 * Math.PI).slice(1);
  const edge = (rx: number, ry: number) => circle.map((p) => screen({ x: centre.x + p.x * rx, y: centre.y + p.y * ry }));
  const inner = across > wireRadius ? [polygon(edge(radius - wireRadius, across - wireRadius), paper, outlineStroke)] : [];
  return [polygon(edge(radius + wireRadius, across + wireRadius), paper, outlineStroke), ...inner].join('');
}
