/** Side view of a compression spring at free length: coils, ground faces and the centre line. */
import type { CompressionEnds } from '../spec/compression';
import type { CompressionReport } from '../springs/compression/report';
import { endForms } from '../springs/compression/ends';
import type { CoilStroke, Hand } from './coils';
import { clipToSlab, coilStrokes, omittedTurnsMark, wireOutline } from './coils';
import type { Point } from './svg';
import { group, polygon } from './svg';
import { centreLine } from './dimension';
import { ink, lineWeight, paper } from './style';

/** The spring in model units (the report's internal mm). */
export interface SpringGeometry {
  d: number;
  /** Mean radius. */
  R: number;
  L0: number;
  nt: number;
  ends: CompressionEnds;
  /** Turns at each end closed down to touching (pitch d). */
  closedPerEnd: number;
}

export function springGeometry(report: CompressionReport, ends: CompressionEnds = report.ends): SpringGeometry {
  const closed = ends === 'closed' || ends === 'closed-ground';
  const inactive = report.totalCoils - report.activeCoils;
  return {
    d: report.wireDiameter, R: report.meanDiameter / 2, L0: report.freeLength,
    nt: report.totalCoils, ends, closedPerEnd: closed ? Math.max(0, inactive / 2) : 0,
  };
}

/**
 * Axial position of the wire centre after t turns: closed end turns at pitch d, the rest evenly spread.
 * Ground ends put the wire centre on the end face (half the wire ground away); unground ends sit d/2 in.
 */
export function axialProfile(g: SpringGeometry): (turns: number) => number {
  const offset = endForms[g.ends].ground ? 0 : g.d / 2;
  const spread = g.nt - 2 * g.closedPerEnd;
  const pitch = (g.L0 - 2 * offset - 2 * g.closedPerEnd * g.d) / spread;
  const clamp = (v: number, hi: number) => Math.min(Math.max(v, 0), hi);
  return (t) => offset + g.d * clamp(t, g.closedPerEnd) + pitch * clamp(t - g.closedPerEnd, spread)
    + g.d * clamp(t - g.closedPerEnd - spread, g.closedPerEnd);
}

export function springStrokes(g: SpringGeometry, hand: Hand): CoilStroke[] {
  return coilStrokes(g.nt, axialProfile(g), g.R, hand);
}

export interface ViewPlacement {
  /** Screen point of the spring's left end face on the axis. */
  origin: Point;
  scale: number;
}

export const toScreen = (v: ViewPlacement) => (p: Point): Point => ({
  x: v.origin.x + p.x * v.scale, y: v.origin.y + p.y * v.scale,
});

function strokeOutline(s: CoilStroke, g: SpringGeometry, screen: (p: Point) => Point): string {
  const outline = wireOutline(s, g.d / 2);
  const cut = endForms[g.ends].ground ? clipToSlab(outline, 0, g.L0) : outline;
  return polygon(cut.map(screen), paper, { stroke: ink, width: lineWeight.thick });
}

/** Far strokes first so the near ones paint over them: hidden lines disappear without clipping. */
export function springView(g: SpringGeometry, hand: Hand, v: ViewPlacement): string {
  const screen = toScreen(v);
  const strokes = springStrokes(g, hand);
  const ordered = [...strokes.filter((s) => !s.front), ...strokes.filter((s) => s.front)];
  // The centre line runs a little past both end faces, as on any turned-part drawing.
  const overhang = Math.max(6, g.d * v.scale);
  const start = screen({ x: 0, y: 0 });
  const end = screen({ x: g.L0, y: 0 });
  return group([
    group(ordered.map((s) => strokeOutline(s, g, screen)), 'coils'),
    omittedTurnsMark(g.nt, axialProfile(g), g.R, screen),
    group([centreLine({ x: start.x - overhang, y: start.y }, { x: end.x + overhang, y: end.y })], 'centre-line'),
  ], 'view');
}
