/**
 * Dimensions of the extension spring's side view: the loop heights above it; below it the wire leader,
 * then LK, then L0 between the insides of the two ends; the outside diameter to the left.
 */
import type { ExtensionReport } from '../springs/extension/report';
import type { ViewPlacement } from './compression-view';
import { toScreen } from './compression-view';
import { leader, linearDimension } from './dimension';
import { extensionLength } from './extension-data';
import { loopInside } from './extension-loops';
import type { ExtensionGeometry } from './extension-view';
import { extensionExtent } from './extension-view';
import type { Point } from './svg';
import { textWidth } from './svg';
import { fontSize } from './style';
import { woundStrokes } from './wire';

/** The wire leader's run from its arrow to the shoulder carrying the label. */
const leaderRun = { x: 14, y: 20 };

export interface ExtensionDimensionInput {
  report: ExtensionReport;
  g: ExtensionGeometry;
  v: ViewPlacement;
}

/** Below the wire leader: LK, then L0 between the insides of the two ends. */
export function lengthDimensions({ report, g, v }: ExtensionDimensionInput): string[] {
  const screen = toScreen(v);
  const bottom = extensionExtent(g).bottom;
  const left = loopInside(g.ends[0], g.wire);
  const right = loopInside(g.ends[1], g.wire);
  const y = Math.max(left.y, right.y);
  const outer = g.wire.R + g.wire.d / 2;
  return [
    linearDimension(screen({ x: 0, y: outer }), screen({ x: g.LK, y: outer }), -((bottom - outer) * v.scale + leaderRun.y + 20),
      `LK = ${extensionLength(report, report.bodyLength)}`),
    linearDimension(screen({ x: left.x, y }), screen({ x: right.x, y }), -((bottom - y) * v.scale + leaderRun.y + 38),
      `L0 = ${extensionLength(report, report.freeLength)}`),
  ];
}

/**
 * Inside height of each end, above the view, from the end of the body to the inside of the loop; ends of
 * one height are dimensioned once, as ISO 129-1 writes repeated features (2× …).
 */
export function loopDimensions({ report, g, v }: ExtensionDimensionInput): string[] {
  const screen = toScreen(v);
  const top = extensionExtent(g).top;
  const [first, second] = report.loopHeights.map((h) => extensionLength(report, h));
  const labels = first === second ? [`2× LH = ${first}`] : [`LH = ${first}`, `LH = ${second}`];
  // From the inside of the loop towards the body, so text that does not fit goes over the body.
  return labels.map((label, i) => {
    const end = g.ends[i as 0 | 1];
    const inside = loopInside(end, g.wire);
    const rise = (inside.y - top) * v.scale + 14;
    return linearDimension(screen(inside), screen({ x: end.face, y: inside.y }), end.out === 1 ? -rise : rise, label);
  });
}

export function diameterDimension({ report, g, v }: ExtensionDimensionInput): string {
  const screen = toScreen(v);
  const outer = g.wire.R + g.wire.d / 2;
  const left = extensionExtent(g).left;
  return linearDimension(screen({ x: 0, y: outer }), screen({ x: 0, y: -outer }), -left * v.scale + 16,
    `De = ${extensionLength(report, report.outerDiameter)}`);
}

/**
 * Leader from below to the wire of the coil under the middle of the body, its label centred there: below
 * the body only the extension lines at the two end faces cross its way.
 */
export function wireLeader({ report, g, v }: ExtensionDimensionInput): string {
  const label = `d = ${extensionLength(report, g.wire.d)}`;
  const screen = toScreen(v);
  const tipX = screen({ x: g.LK / 2, y: 0 }).x - (textWidth(label, fontSize.label) + 4) / 2 - leaderRun.x;
  const bottoms = woundStrokes(g.body).flatMap((s) => [s.from, s.to]).filter((p) => p.y > 0);
  const nearest = (p: Point) => Math.abs(screen(p).x - tipX);
  const bottom = bottoms.sort((a, b) => nearest(a) - nearest(b))[0] ?? { x: g.LK / 2, y: g.wire.R };
  const tip = screen({ x: bottom.x, y: bottom.y + g.wire.d / 2 });
  return leader(tip, { x: tip.x + leaderRun.x, y: tip.y + leaderRun.y }, label);
}
