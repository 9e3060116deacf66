/**
 * The ends of an extension spring in the side view, each in the plane of the drawing: a closed ring for
 * full and side loops (the side loop raised at the body's side, off the axis), a ring with its crossing
 * wire for a crossover loop, a ring open next to the body for a machine loop, and a straight length of
 * wire on the axis ending in an open hook for an extended hook. A loop turned about the axis (the
 * relative loop position) narrows across the axis as its plane turns away from the drawing's.
 * Model units: x along the axis, y across.
 */
import type { ExtensionEndForm } from '../spec/extension';
import type { Extent } from './common';
import type { Point } from './svg';
import { group } from './svg';
import type { ToScreen } from './wire';
import { bentWireOutline, ringShape, wireShape } from './wire';

export interface LoopEnd {
  form: ExtensionEndForm;
  /** Inside height: from the end of the body to the inside of the loop. */
  height: number;
  /** The body's end face, and the direction along the axis away from the body. */
  face: number;
  out: 1 | -1;
  /** Cosine of the angle between the loop's plane and the drawing's: 1 face on, −1 turned half round. */
  facing: number;
}

export interface LoopWire {
  d: number;
  /** Mean radius of the body. */
  R: number;
  /** Inside diameter of the body. */
  Di: number;
}

/** How much of an open loop or hook is left open, next to the body (radians). */
const opening = { 'machine-loop': (50 * Math.PI) / 180, 'extended-hook': (70 * Math.PI) / 180 } as const;

/** Inside diameter of the ring: the whole height, except an extended hook's straight length. */
function ringInside(end: LoopEnd, wire: LoopWire): number {
  return end.form === 'extended-hook' ? Math.min(end.height, wire.Di) : end.height;
}

/** Mean radius of the ring of wire. */
export function loopRadius(end: LoopEnd, wire: LoopWire): number {
  return (ringInside(end, wire) + wire.d) / 2;
}

/** Edge on, a loop would fold onto the axis; it is drawn no narrower than this. */
const leastFacing = 0.08;

/** A point in the loop's own plane as the drawing shows it. */
function seen(end: LoopEnd, p: Point): Point {
  const sign = end.facing < 0 ? -1 : 1;
  return { x: p.x, y: p.y * sign * Math.max(leastFacing, Math.abs(end.facing)) };
}

/** In the loop's plane: the near side lies on the body's last coil, the far inside edge `height` from the end face. */
function planeCentre(end: LoopEnd, wire: LoopWire): Point {
  const inside = ringInside(end, wire);
  return { x: end.face + end.out * (end.height - inside / 2), y: end.form === 'side-loop' ? -wire.R : 0 };
}

export function loopCentre(end: LoopEnd, wire: LoopWire): Point {
  return seen(end, planeCentre(end, wire));
}

/** The inside of the loop, where the free length is measured to. */
export function loopInside(end: LoopEnd, wire: LoopWire): Point {
  return { x: end.face + end.out * end.height, y: loopCentre(end, wire).y };
}

export function loopExtent(end: LoopEnd, wire: LoopWire): Extent {
  const c = loopCentre(end, wire);
  const r = loopRadius(end, wire);
  const across = Math.abs(seen(end, { x: 0, y: r }).y) + wire.d / 2;
  return { left: c.x - r - wire.d / 2, top: c.y - across, right: c.x + r + wire.d / 2, bottom: c.y + across };
}

/** The ring's point at `angle` (radians) from the side facing the body, as the drawing shows it. */
function ringPoint(end: LoopEnd, wire: LoopWire, angle: number): Point {
  const c = planeCentre(end, wire);
  const r = loopRadius(end, wire);
  // Angle 0 faces the body: +x from the left end's ring (out = −1), −x from the right end's.
  return seen(end, { x: c.x - end.out * r * Math.cos(angle), y: c.y + r * Math.sin(angle) });
}

function ringArc(end: LoopEnd, wire: LoopWire, from: number, to: number): Point[] {
  const count = Math.ceil(Math.abs(to - from) / (Math.PI / 24));
  return Array.from({ length: count + 1 }, (_, i) => ringPoint(end, wire, from + ((to - from) * i) / count));
}

function loopWires(end: LoopEnd, wire: LoopWire): Point[][] {
  const c = loopCentre(end, wire);
  const nearFace = { x: end.face - (end.out * wire.d) / 2, y: c.y };
  switch (end.form) {
    case 'machine-loop':
      return [ringArc(end, wire, 0, 2 * Math.PI - opening['machine-loop'])];
    case 'extended-hook':
      return [[nearFace, ...ringArc(end, wire, 0, 2 * Math.PI - opening['extended-hook'])]];
    case 'crossover-loop':
      // The end coil crosses over from the top of the body to the ring's lower side.
      return [[{ x: nearFace.x, y: -wire.R }, ringPoint(end, wire, Math.PI / 3)]];
    default:
      return [];
  }
}

function closed(form: ExtensionEndForm): boolean {
  return form === 'full-loop' || form === 'side-loop' || form === 'crossover-loop';
}

export function loopView(end: LoopEnd, wire: LoopWire, screen: ToScreen): string {
  const facing = seen(end, { x: 0, y: 1 }).y;
  const ring = closed(end.form) ? [ringShape(loopCentre(end, wire), loopRadius(end, wire), wire.d / 2, screen, facing)] : [];
  const wires = loopWires(end, wire).map((centre) => wireShape(bentWireOutline(centre, wire.d / 2), screen));
  return group([...ring, ...wires], 'loop', { 'data-form': end.form });
}
