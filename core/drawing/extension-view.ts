/** Side view of an extension spring at free length: close-wound body, the two ends, the centre line. */
import type { ExtensionReport } from '../springs/extension/report';
import type { Hand } from './coils';
import type { Extent } from './common';
import { unionExtent } from './common';
import type { ViewPlacement } from './compression-view';
import { toScreen } from './compression-view';
import { centreLine } from './dimension';
import type { LoopEnd, LoopWire } from './extension-loops';
import { loopExtent, loopView } from './extension-loops';
import { group } from './svg';
import type { WoundBody } from './wire';
import { woundBodyView } from './wire';

/** The spring in model units (the report's internal mm); the body runs from x = 0 to x = LK. */
export interface ExtensionGeometry {
  wire: LoopWire;
  body: WoundBody;
  LK: number;
  ends: [LoopEnd, LoopEnd];
}

/** `loopAngle`: the second end turned about the axis from the first, degrees (0 in line). */
export function extensionGeometry(report: ExtensionReport, hand: Hand, loopAngle = 0): ExtensionGeometry {
  const d = report.wireDiameter;
  const LK = report.bodyLength;
  return {
    wire: { d, R: report.meanDiameter / 2, Di: report.innerDiameter },
    body: { d, R: report.meanDiameter / 2, turns: report.bodyCoils, hand },
    LK,
    ends: [
      { form: report.ends[0], height: report.loopHeights[0], face: 0, out: -1, facing: 1 },
      { form: report.ends[1], height: report.loopHeights[1], face: LK, out: 1, facing: Math.cos((loopAngle * Math.PI) / 180) },
    ],
  };
}

export function extensionExtent(g: ExtensionGeometry): Extent {
  const outer = g.wire.R + g.wire.d / 2;
  return unionExtent([{ left: 0, top: -outer, right: g.LK, bottom: outer }, ...g.ends.map((e) => loopExtent(e, g.wire))]);
}

/** The ends first, so the body's end coils paint over the wire where the loops rise from them. */
export function extensionView(g: ExtensionGeometry, v: ViewPlacement): string {
  const screen = toScreen(v);
  const extent = extensionExtent(g);
  // The centre line runs a little past both ends, as on any turned-part drawing.
  const overhang = Math.max(6, g.wire.d * v.scale);
  const start = screen({ x: extent.left, y: 0 });
  const end = screen({ x: extent.right, y: 0 });
  return group([
    group(g.ends.map((e) => loopView(e, g.wire, screen)), 'loops'),
    woundBodyView(g.body, screen),
    group([centreLine({ x: start.x - overhang, y: start.y }, { x: end.x + overhang, y: end.y })], 'centre-line'),
  ], 'view');
}
