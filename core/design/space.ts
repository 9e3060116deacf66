import type { CompressionEnds, CompressionSpec } from '../spec/compression';
import type { CompressionRequirement, RequirementInternal } from '../requirement';
import type { WireProperties } from '../materials/types';
import { lengthDecimals } from '../format';
import { fromInternal, toInternal } from '../units';
import { helicalRate } from '../springs/helix';
import { reviewLimits } from '../review/limits';
import { guideClearance } from './clearance';
import { endForms } from '../springs/compression/ends';

/**
 * The design space the search walks, defined once so the search and any check of it agree: for one wire
 * and end type, mean diameters on the shop's diameter step inside the preferred spring index and the
 * envelope; active coils for the asked rate, rounded to the shop's coil step; the free length that puts
 * the forces in the middle of their tolerances, rounded to the trade's length precision.
 */
export interface DesignPoint {
  grade: string;
  /** Wire and mean coil diameter, mm. */
  d: number;
  D: number;
  ends: CompressionEnds;
  na: number;
  nt: number;
  /** Free length, mm, as the spec will state it (already rounded). */
  L0: number;
  peened: boolean;
}

export interface DesignSteps {
  coilStep: number;
  diameterStep: number;
}

/** Mean diameters (mm) to try for wire d: on the step grid, inside the preferred index and the envelope's necessary bounds. */
export function meanDiameterRange(req: RequirementInternal, d: number): { lo: number; hi: number } {
  const e = req.envelope;
  const c = guideClearance.fractionOfMeanDiameter;
  let lo = reviewLimits.preferredIndex.min * d;
  let hi = reviewLimits.preferredIndex.max * d;
  if (e.minInnerDiameter !== undefined) lo = Math.max(lo, e.minInnerDiameter + d);
  if (e.rod !== undefined) lo = Math.max(lo, (e.rod + d) / (1 - c));
  if (e.maxOuterDiameter !== undefined) hi = Math.min(hi, e.maxOuterDiameter - d);
  // The bore limit with no diameter growth, the least the bore can ask: D + d ≤ bore − c·D.
  if (e.bore !== undefined) hi = Math.min(hi, (e.bore - d) / (1 + c));
  return { lo, hi };
}

/**
 * The envelope's diameters narrowed by two necessary conditions, so the walk skips diameters that cannot
 * pass. Above: the uncorrected stress 8·F·D/(π·d³) of the least force allowed at the shortest load length
 * must stay within the allowable after set removal, the largest allowable the review uses. Below: the solid
 * length d·(na + inactive coils + solid allowance), with na at most half a coil step under the exact count,
 * must stay under the shortest working length and the maximum solid length.
 */
export function necessaryDiameterRange(
  req: RequirementInternal, wire: WireProperties, d: number, ends: CompressionEnds, coilStep: number, range: { lo: number; hi: number },
): { lo: number; hi: number } {
  const shortest = req.loads[req.loads.length - 1]!;
  const leastForce = shortest.force * (1 - shortest.tolerancePercent / 100);
  const allowable = wire.allowableStaticFraction.afterSetRemoval * wire.tensileStrength;
  const hi = leastForce > 0 ? (allowable * Math.PI * d ** 3) / (8 * leastForce) : Infinity;
  const form = endForms[ends];
  const cap = Math.min(req.deepestLength, req.envelope.maxSolidLength ?? Infinity);
  const coils = cap / d - form.inactiveCoils - form.solidExtra + coilStep / 2;
  const lo = coils > 0 ? Math.cbrt((wire.shearModulus * d ** 4) / (8 * req.rate * coils)) : Infinity;
  return { lo: Math.max(range.lo, lo * (1 - 1e-9)), hi: Math.min(range.hi, hi * (1 + 1e-9)) };
}

export function meanDiameterGrid(range: { lo: number; hi: number }, step: number): number[] {
  const out: number[] = [];
  const first = Math.ceil(range.lo / step - 1e-9);
  const last = Math.floor(range.hi / step + 1e-9);
  for (let i = last; i >= first; i--) out.push(Math.round(i * step * 1e6) / 1e6);
  return out;
}

export function isEmptyGrid(range: { lo: number; hi: number }, step: number): boolean {
  return Math.ceil(range.lo / step - 1e-9) > Math.floor(range.hi / step + 1e-9);
}

/** A length rounded to `places` decimals, the way the spec states it. */
export function toPlaces(value: number, places: number): number {
  const scale = 10 ** places;
  return Math.round(value * scale) / scale;
}

/** Active coils for the asked rate, to the nearest coil step (at least one step). */
export function activeCoilsFor(req: RequirementInternal, wire: WireProperties, d: number, D: number, coilStep: number): number {
  const exact = helicalRate(wire.shearModulus, d, D, 1) / req.rate;
  return Math.max(coilStep, Math.round(exact / coilStep) * coilStep);
}

/**
 * Free length that centres the forces in their tolerances with the actual rate R. Two loads: the length
 * where the relative misses, each over its tolerance, are equal and opposite; one load: L1 + F1/R.
 */
export function centredFreeLength(req: RequirementInternal, rate: number): number {
  const loads = req.loads;
  if (loads.length === 1) return loads[0]!.length + loads[0]!.force / rate;
  let weights = 0;
  let sum = 0;
  for (const l of loads) {
    const a = rate / (l.force * (l.tolerancePercent / 100));
    weights += a;
    sum += 1 / (l.tolerancePercent / 100) + a * l.length;
  }
  return sum / weights;
}

/** Rounds an internal length to the trade's precision in the requirement's units and back. */
export function roundedLength(req: RequirementInternal, mm: number): number {
  const places = lengthDecimals[req.units];
  const shown = toPlaces(fromInternal(mm, 'length', req.units), places);
  return toInternal(shown, 'length', req.units);
}

export function designPoint(
  req: RequirementInternal, wire: WireProperties, grade: string, d: number, D: number, ends: CompressionEnds,
  inactive: number, steps: DesignSteps, peened: boolean,
): DesignPoint {
  const na = activeCoilsFor(req, wire, d, D, steps.coilStep);
  const rate = helicalRate(wire.shearModulus, d, D, na);
  return { grade, d, D, ends, na, nt: na + inactive, L0: roundedLength(req, centredFreeLength(req, rate)), peened };
}

const out = (v: number, units: CompressionRequirement['units']) => fromInternal(v, 'length', units);

/** What every kind's designed spec carries over from the requirement: service, breaks, tolerances, finish, origin. */
export function orderFieldsOf(r: Pick<CompressionRequirement, 'serviceTemperature' | 'reference'> & { choices: Pick<CompressionRequirement['choices'], 'quantities' | 'toleranceGrade' | 'finish'> }) {
  const c = r.choices;
  return {
    ...(r.serviceTemperature ? { serviceTemperature: r.serviceTemperature } : {}),
    ...(c.quantities ? { quantities: c.quantities } : {}),
    ...(c.toleranceGrade !== undefined ? { toleranceGrade: c.toleranceGrade } : {}),
    ...(c.finish !== undefined ? { finish: c.finish } : {}),
    ...(r.reference ? { notes: `Designed from the requirement ${r.reference}` } : {}),
  };
}

/** The spec of a design point, in the requirement's units, with the requirement's loads, duty and order choices. */
export function pointSpec(r: CompressionRequirement, p: DesignPoint): CompressionSpec {
  const f = r.function;
  const loads = f.type === 'two-loads' ? f.loads : [f.load];
  const duty: CompressionSpec['duty'] = r.duty.type === 'static' ? { type: 'static' }
    : { type: 'cyclic', between: r.duty.between, cycles: r.duty.cycles, peened: p.peened, ...(r.duty.frequency !== undefined ? { frequency: r.duty.frequency } : {}) };
  const places = lengthDecimals[r.units];
  return {
    kind: 'compression', version: 1, units: r.units, material: p.grade,
    wireDiameter: out(p.d, r.units), outerDiameter: out(p.D + p.d, r.units),
    totalCoils: p.nt, ends: p.ends, freeLength: toPlaces(out(p.L0, r.units), places),
    loads: loads.map((l) => ({ length: l.length, force: l.force, ...(l.tolerancePercent !== undefined ? { tolerancePercent: l.tolerancePercent } : {}) })),
    seating: r.seating, duty,
    freeParameters: loads.length >= 2 ? ['freeLength', 'coils', 'wireDiameter'] : ['freeLength'],
    ...(p.peened ? { shotPeen: true } : {}),
    ...orderFieldsOf(r),
  };
}
