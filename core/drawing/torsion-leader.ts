/** The leader to the wire in the torsion spring's end view, placed where it keeps clearest of the rest. */
import type { ViewPlacement } from './compression-view';
import { toScreen } from './compression-view';
import { leader } from './dimension';
import { torsionLength } from './torsion-data';
import type { TorsionDimensionInput } from './torsion-dimensions';
import type { TorsionGeometry } from './torsion-views';
import type { Polyline } from './torsion-clearance';
import { boxSamples, clearance, inside } from './torsion-clearance';
import type { Point } from './svg';
import { textWidth } from './svg';
import { fontSize } from './style';
import { arcPoints } from './wire';

/** Runs from the arrow to the shoulder (screen px, outward across and along the axis of the sheet). */
const runs = [{ x: 12, y: 16 }, { x: 8, y: 30 }, { x: 26, y: 8 }];

/** Points on the wire's edge a leader may end on: round the body, and along both legs on either side. */
function wireEdge(g: TorsionGeometry): Point[] {
  const outer = g.body.R + g.body.d / 2;
  const body = Array.from({ length: 24 }, (_, k) => ({ x: outer * Math.cos((k * Math.PI) / 12), y: outer * Math.sin((k * Math.PI) / 12) }));
  const legs = g.layout.legs.flatMap((leg) => [0.5, 0.75, 0.9].flatMap((f) => [1, -1].map((side) => ({
    x: leg.start.x + leg.direction.x * leg.length * f + leg.direction.y * side * (g.body.d / 2),
    y: leg.start.y + leg.direction.y * leg.length * f - leg.direction.x * side * (g.body.d / 2),
  }))));
  return [...body, ...legs];
}

/** Leader from `at` on the wire, away from the axis, its label on a shoulder beyond. */
function leaderPlace(at: Point, screen: (p: Point) => Point, run: Point, width: number) {
  const tip = screen(at);
  const sx = at.x >= -1e-9 ? 1 : -1;
  const sy = at.y >= 0 ? 1 : -1;
  const knee = { x: tip.x + sx * run.x, y: tip.y + sy * run.y };
  const label = { left: Math.min(knee.x, knee.x + sx * width), baseline: knee.y, width, height: 12 };
  const along = [0.25, 0.5, 0.75].map((t) => ({ x: tip.x + (knee.x - tip.x) * t, y: tip.y + (knee.y - tip.y) * t }));
  return { tip, knee, label: boxSamples(label), run: along };
}

/** The body's outline in the end view, which a label must not cover either. */
function bodyOutline(g: TorsionGeometry, end: ViewPlacement): Polyline {
  return arcPoints({ x: 0, y: 0 }, g.body.R + g.body.d / 2, 0, 2 * Math.PI).map(toScreen(end));
}

/** Leader to the wire in the end view, where it keeps clearest of everything in `avoid`. */
export function wireLeader({ report, g, end, endBox }: TorsionDimensionInput, avoid: readonly Polyline[]): string {
  const screen = toScreen(end);
  const label = `d = ${torsionLength(report, g.body.d)}`;
  const width = textWidth(label, fontSize.label) + 4;
  const lines = [...avoid, bodyOutline(g, end)];
  const places = runs.flatMap((run) => wireEdge(g).map((at) => leaderPlace(at, screen, run, width)));
  // The run starts on the wire, so only its label has to keep clear of the body's outline.
  const score = (p: ReturnType<typeof leaderPlace>) => (inside(p.label, endBox)
    ? Math.min(clearance(p.label, lines), clearance(p.run.slice(1), avoid)) : -Infinity);
  const best = places.reduce((a, b) => (score(b) > score(a) ? b : a));
  return leader(best.tip, best.knee, label);
}
