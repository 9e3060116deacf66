/**
 * Dimensions of the torsion spring views: LK and De on the side view; in the end view each leg's length
 * along it, on the side away from the other leg; and where those lie, for other labels to keep clear of.
 */
import type { TorsionReport } from '../springs/torsion/report';
import type { Box } from './common';
import type { ViewPlacement } from './compression-view';
import { toScreen } from './compression-view';
import { linearDimension } from './dimension';
import { torsionLength } from './torsion-data';
import type { Leg } from './torsion-legs';
import { legCentreline, legEnd } from './torsion-legs';
import type { TorsionGeometry } from './torsion-views';
import { loadedLegs, sideExtent } from './torsion-views';
import type { Polyline } from './torsion-clearance';
import type { Point } from './svg';
import { textWidth } from './svg';
import { fontSize } from './style';

export interface TorsionDimensionInput {
  report: TorsionReport;
  g: TorsionGeometry;
  side: ViewPlacement;
  end: ViewPlacement;
  /** Where the end view's own labels may go. */
  endBox: Box;
}

/** LK's dimension line below the side view, in screen units. */
function bodyLengthTier(g: TorsionGeometry, side: ViewPlacement): number {
  return toScreen(side)({ x: 0, y: sideExtent(g).bottom }).y + 18;
}

export function sideDimensions({ report, g, side }: TorsionDimensionInput): string[] {
  const screen = toScreen(side);
  const outer = g.body.R + g.body.d / 2;
  const foot = screen({ x: 0, y: outer });
  return [
    linearDimension(foot, screen({ x: g.LK, y: outer }), foot.y - bodyLengthTier(g, side),
      `LK = ${torsionLength(report, report.bodyLength)}`),
    linearDimension(screen({ x: 0, y: outer }), screen({ x: 0, y: -outer }), 16,
      `De = ${torsionLength(report, report.outerDiameter)}`),
  ];
}

/**
 * The leg from where it leaves the body to its end, and the side of it its dimension goes to (+1: left
 * of its direction): away from the other leg's end, or where that lies in line, away from the axis.
 */
function legSpan(leg: Leg, other: Leg): { tip: Point; side: 1 | -1 } {
  const tip = legEnd(leg);
  const left = { x: leg.direction.y, y: -leg.direction.x };
  const leftOf = (p: Point) => left.x * (p.x - leg.start.x) + left.y * (p.y - leg.start.y);
  const away = [leftOf(legEnd(other)), leftOf({ x: 0, y: 0 })].find((v) => Math.abs(v) > 1e-6) ?? -1;
  return { tip, side: away > 0 ? -1 : 1 };
}

const legOffset = 14;

export function legDimensions({ report, g, end }: TorsionDimensionInput): string[] {
  const screen = toScreen(end);
  return g.layout.legs.map((leg, i) => {
    const { tip, side } = legSpan(leg, g.layout.legs[1 - i] as Leg);
    return linearDimension(screen(leg.start), screen(tip), side * legOffset, torsionLength(report, report.legLengths[i as 0 | 1]));
  });
}

/**
 * Where the leg dimensions draw, for labels to keep clear of: the extension and dimension lines, and
 * the band beside them their text takes, as far past the leg's end as text put outside would reach.
 */
function legDimensionLines(report: TorsionReport, g: TorsionGeometry, end: ViewPlacement): Polyline[] {
  const screen = toScreen(end);
  return g.layout.legs.flatMap((leg, i) => {
    const { tip, side } = legSpan(leg, g.layout.legs[1 - i] as Leg);
    const [a, b] = [screen(leg.start), screen(tip)];
    const length = Math.hypot(b.x - a.x, b.y - a.y) || 1;
    const u = { x: (b.x - a.x) / length, y: (b.y - a.y) / length };
    const n = { x: u.y * side, y: -u.x * side };
    const at = (p: Point, k: number, beyond = 0): Point => ({ x: p.x + n.x * k + u.x * beyond, y: p.y + n.y * k + u.y * beyond });
    const reach = textWidth(torsionLength(report, report.legLengths[i as 0 | 1]), fontSize.label) + 11;
    return [[a, at(a, legOffset), at(b, legOffset), b], [at(a, legOffset + 8), at(b, legOffset + 8, reach)]];
  });
}

/** Screen polylines of the legs, working positions and leg dimensions in the end view. */
export function endViewLines(report: TorsionReport, g: TorsionGeometry, end: ViewPlacement): Polyline[] {
  const screen = toScreen(end);
  const legs = [...g.layout.legs, ...loadedLegs(g)].map((leg) => legCentreline(leg, g.body.d).map(screen));
  return [...legs, ...legDimensionLines(report, g, end)];
}

/** The band LK's text takes below the side view, as far right as text put outside would reach. */
export function sideLabelBand({ report, g, side }: TorsionDimensionInput): Polyline[] {
  const screen = toScreen(side);
  const y = bodyLengthTier(g, side);
  const left = screen({ x: 0, y: 0 }).x;
  const right = screen({ x: g.LK, y: 0 }).x + 11 + textWidth(`LK = ${torsionLength(report, report.bodyLength)}`, fontSize.label);
  return [[{ x: left, y }, { x: right, y }], [{ x: left, y: y + 12 }, { x: right, y: y + 12 }]];
}
