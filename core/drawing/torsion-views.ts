/**
 * The two views of a torsion spring at free position: the side view of the close-wound body with its
 * legs, and the end view from the leg-2 end with both legs and, dashed, leg 2 at the working angles.
 * Both share the vertical coordinate, so the views line up across the sheet.
 */
import type { TorsionReport } from '../springs/torsion/report';
import type { Extent } from './common';
import { extentOf, unionExtent } from './common';
import type { ViewPlacement } from './compression-view';
import { toScreen } from './compression-view';
import { centreLine } from './dimension';
import { arcLine, freeAngleArc } from './torsion-angle';
import type { Leg, LegLayout } from './torsion-legs';
import { legCentreline, loadedLeg } from './torsion-legs';
import type { Point } from './svg';
import { group, polyline } from './svg';
import { dash, lineWeight } from './style';
import type { WoundBody } from './wire';
import { bentWireOutline, ringShape, wireShape, woundBodyView, woundStrokes } from './wire';

export interface TorsionGeometry {
  body: WoundBody;
  LK: number;
  layout: LegLayout;
  /** Working angles, degrees from free. */
  angles: number[];
}

export function torsionGeometry(report: TorsionReport, layout: LegLayout): TorsionGeometry {
  return {
    body: { d: report.wireDiameter, R: report.meanDiameter / 2, turns: report.bodyCoils, hand: report.windDirection },
    LK: report.bodyLength, layout, angles: report.loads.map((l) => l.angle),
  };
}

/** Each leg lies in the plane of the last coil at its end: leg 1 at the left end of the side view. */
function legAxial(g: TorsionGeometry, i: 0 | 1): number {
  return i === 0 ? g.body.d / 2 : g.LK - g.body.d / 2;
}

/**
 * A leg in the side view: it lies in the plane of the end coil, so it is seen edge on, as a bar at its
 * end of the body. The bar runs on to the end of the body's outermost stroke, which the simplified view
 * puts at a half turn rather than where the wire leaves the coil.
 */
function sideLeg(g: TorsionGeometry, i: 0 | 1): Point[] {
  const strokes = woundStrokes(g.body);
  const bodyEnd = i === 0 ? strokes[0]?.from : strokes[strokes.length - 1]?.to;
  const ys = [...legCentreline(g.layout.legs[i], g.body.d), ...(bodyEnd ? [bodyEnd] : [])].map((p) => p.y);
  const x = legAxial(g, i);
  return [{ x, y: Math.min(...ys) }, { x, y: Math.max(...ys) }];
}

const grow = (e: Extent, by: number): Extent => ({ left: e.left - by, top: e.top - by, right: e.right + by, bottom: e.bottom + by });

export function sideExtent(g: TorsionGeometry): Extent {
  const outer = g.body.R + g.body.d / 2;
  return unionExtent([{ left: 0, top: -outer, right: g.LK, bottom: outer }, grow(extentOf([...sideLeg(g, 0), ...sideLeg(g, 1)]), g.body.d / 2)]);
}

export function loadedLegs(g: TorsionGeometry): Leg[] {
  return g.angles.map((a) => loadedLeg(g.layout, a));
}

export function endExtent(g: TorsionGeometry): Extent {
  const outer = g.body.R + g.body.d / 2;
  const legs = [...g.layout.legs, ...loadedLegs(g)].flatMap((leg) => legCentreline(leg, g.body.d));
  const arc = freeAngleArc(g.layout);
  return unionExtent([
    { left: -outer, top: -outer, right: outer, bottom: outer },
    grow(extentOf([...legs, ...(arc ? arcLine(arc) : [])]), g.body.d / 2),
  ]);
}

function legShape(centre: Point[], g: TorsionGeometry, screen: (p: Point) => Point): string {
  return wireShape(bentWireOutline(centre, g.body.d / 2), screen);
}

export function sideView(g: TorsionGeometry, v: ViewPlacement): string {
  const screen = toScreen(v);
  const overhang = Math.max(6, g.body.d * v.scale);
  const start = screen({ x: 0, y: 0 });
  const end = screen({ x: g.LK, y: 0 });
  return group([
    woundBodyView(g.body, screen),
    group([legShape(sideLeg(g, 0), g, screen), legShape(sideLeg(g, 1), g, screen)], 'legs'),
    group([centreLine({ x: start.x - overhang, y: start.y }, { x: end.x + overhang, y: end.y })], 'centre-line'),
  ], 'side-view');
}

/** Thin dashed centrelines of leg 2 at each working angle, as alternative positions are drawn. */
function workingPositions(g: TorsionGeometry, screen: (p: Point) => Point): string {
  const stroke = { width: lineWeight.thin, dash: dash.dashed };
  return group(loadedLegs(g).map((leg) => polyline(legCentreline(leg, g.body.d).map(screen), stroke)), 'working-positions');
}

function centreLines(g: TorsionGeometry, screen: (p: Point) => Point): string {
  const reach = g.body.R + g.body.d / 2 + Math.max(3, g.body.d);
  return group([
    centreLine(screen({ x: -reach, y: 0 }), screen({ x: reach, y: 0 })),
    centreLine(screen({ x: 0, y: -reach }), screen({ x: 0, y: reach })),
  ], 'centre-line');
}

/** Leg 1 lies behind the body, leg 2 in front of it. */
export function endView(g: TorsionGeometry, v: ViewPlacement): string {
  const screen = toScreen(v);
  const [leg1, leg2] = g.layout.legs.map((leg) => legShape(legCentreline(leg, g.body.d), g, screen));
  return group([
    group([leg1 ?? ''], 'leg'),
    group([ringShape({ x: 0, y: 0 }, g.body.R, g.body.d / 2, screen)], 'body-end'),
    group([leg2 ?? ''], 'leg'),
    workingPositions(g, screen),
    centreLines(g, screen),
  ], 'end-view');
}
