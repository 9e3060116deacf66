/**
 * Where a torsion spring's legs lie, seen along the axis from the end of leg 2: model units, the axis at
 * the origin, y down as on screen, angles in degrees measured clockwise on screen.
 *
 * The wire leaves the body at each end; a tangential leg carries on along the coil's tangent there, a
 * radial one turns straight out. Seen from the leg-2 end, a right-hand body turns anticlockwise as it
 * comes towards the viewer, so leg 2 leaves anticlockwise and leg 1 (at the far end) clockwise; a
 * left-hand body the other way round. Loading turns leg 2 about the axis: winding up (closing) turns it
 * the way the coils run towards it. The free angle is measured from leg 2 to leg 1 the way loading
 * turns leg 2, so that loading reduces it; without one from the drawing it follows from the body coils.
 */
import type { LegForm } from '../spec/torsion';
import type { TorsionReport } from '../springs/torsion/report';
import type { Point } from './svg';

export interface Leg {
  /** Where the leg leaves the body, on the mean circle. */
  start: Point;
  /** Unit vector along the leg. */
  direction: Point;
  length: number;
  form: LegForm;
}

export interface LegLayout {
  legs: [Leg, Leg];
  /** Degrees, in [0, 360). */
  freeAngle: number;
  /** Whether the free angle is the drawing's own, rather than the one the body coils give. */
  specified: boolean;
  /** The way loading turns leg 2: +1 clockwise on screen, −1 anticlockwise. */
  loadSense: 1 | -1;
  /** The body the legs leave: mean radius and wire diameter. */
  wire: { R: number; d: number };
}

export interface LegInput {
  freeAngle?: number;
  legForms?: [LegForm, LegForm];
}

const rad = (degrees: number) => (degrees * Math.PI) / 180;
const unitAt = (degrees: number): Point => ({ x: Math.cos(rad(degrees)), y: Math.sin(rad(degrees)) });
const mod360 = (degrees: number) => ((degrees % 360) + 360) % 360;

/** Angle of the point where a leg leaves the body, from the leg's direction. */
function exitAngle(direction: number, form: LegForm, leavesClockwise: boolean): number {
  if (form === 'radial') return direction;
  return leavesClockwise ? direction - 90 : direction + 90;
}

/** Free angle the body coils give: the two exits lie Nb turns apart round the coil. */
function angleFromCoils(r: TorsionReport, forms: [LegForm, LegForm], hand: 1 | -1, sense: 1 | -1): number {
  const exit1 = 0;
  const exit2 = exit1 - 360 * hand * r.bodyCoils;
  // Invert exitAngle: the direction a leg points in, from where it leaves.
  const direction = (exit: number, form: LegForm, clockwise: boolean) => (form === 'radial' ? exit : clockwise ? exit + 90 : exit - 90);
  return mod360(sense * (direction(exit1, forms[0], hand === 1) - direction(exit2, forms[1], hand === -1)));
}

/**
 * Legs upright enough for the side view to show them: their bisector points up when they are close
 * together (within about 70°), otherwise to the right, away from the side view beside the end view.
 */
function bisector(freeAngle: number): number {
  const half = rad(freeAngle / 2);
  return Math.abs(Math.cos(half)) > Math.abs(Math.sin(half)) + 0.25 ? -90 : 0;
}

export function legLayout(r: TorsionReport, input: LegInput = {}): LegLayout {
  const hand = r.windDirection === 'right' ? 1 : -1;
  const loadSense = (r.loadDirection === 'closing' ? -hand : hand) as 1 | -1;
  const forms = input.legForms ?? ['tangent', 'tangent'];
  const specified = input.freeAngle !== undefined;
  const freeAngle = mod360(input.freeAngle ?? angleFromCoils(r, forms, hand, loadSense));
  const direction2 = bisector(freeAngle) - (loadSense * freeAngle) / 2;
  const direction1 = direction2 + loadSense * freeAngle;
  const leg = (direction: number, i: 0 | 1, clockwise: boolean): Leg => {
    const exit = unitAt(exitAngle(direction, forms[i], clockwise));
    const R = r.meanDiameter / 2;
    return { start: { x: R * exit.x, y: R * exit.y }, direction: unitAt(direction), length: r.legLengths[i], form: forms[i] };
  };
  // Right hand: leg 1 leaves clockwise, leg 2 anticlockwise.
  return {
    legs: [leg(direction1, 0, hand === 1), leg(direction2, 1, hand === -1)], freeAngle, specified, loadSense,
    wire: { R: r.meanDiameter / 2, d: r.wireDiameter },
  };
}

/** A point turned about the axis by `degrees`, clockwise on screen. */
export function turned(p: Point, degrees: number): Point {
  const c = Math.cos(rad(degrees));
  const s = Math.sin(rad(degrees));
  return { x: p.x * c - p.y * s, y: p.x * s + p.y * c };
}

/** Where the straight length of the leg ends. */
export function legEnd(leg: Leg): Point {
  return { x: leg.start.x + leg.direction.x * leg.length, y: leg.start.y + leg.direction.y * leg.length };
}

/** Radius of a hooked leg's end bend, in wire diameters. */
const hookRadius = 1.5;

/**
 * The leg's wire centreline: straight for its length, and for a hooked leg a half turn back towards the
 * axis side at the end.
 */
export function legCentreline(leg: Leg, d: number): Point[] {
  const end = legEnd(leg);
  if (leg.form !== 'hooked') return [leg.start, end];
  const left = { x: leg.direction.y, y: -leg.direction.x };
  const towardAxis = left.x * -end.x + left.y * -end.y > 0 ? 1 : -1;
  const r = hookRadius * d;
  const centre = { x: end.x + left.x * r * towardAxis, y: end.y + left.y * r * towardAxis };
  const from = Math.atan2(end.y - centre.y, end.x - centre.x);
  const sweep = Math.PI * (towardAxis === 1 ? -1 : 1);
  const bend = Array.from({ length: 13 }, (_, i) => {
    const a = from + (sweep * i) / 12;
    return { x: centre.x + r * Math.cos(a), y: centre.y + r * Math.sin(a) };
  });
  return [leg.start, ...bend];
}

/** Leg 2 at a working angle: turned about the axis the way loading turns it. */
export function loadedLeg(layout: LegLayout, angle: number): Leg {
  const leg = layout.legs[1];
  const degrees = layout.loadSense * angle;
  return { ...leg, start: turned(leg.start, degrees), direction: turned(leg.direction, degrees) };
}
