import type { Settings } from '../settings/schema';
import type { ExtensionRequirement, ExtensionRequirementInternal, ExtensionLoop } from '../requirement';
import { extensionRequirementInternal } from '../requirement';
import { wireProperties } from '../materials';
import { extensionAllowables } from '../materials';
import type { WireProperties } from '../materials/types';
import { analyseSpec } from '../calculate';
import type { ExtensionSpec } from '../spec/extension';
import type { ExtensionReport } from '../springs/extension/report';
import { extensionEnds } from '../springs/extension/ends';
import { helicalRate } from '../springs/helix';
import { fromInternal } from '../units';
import { lengthDecimals } from '../format';
import { reviewLimits } from '../review/limits';
import { guideClearance } from './clearance';
import type { AcceptedDesign, CombinationResult, PointKey, SearchStats } from './frame';
import { Closest } from './closest';
import { extensionFigures } from './figures';
import { extensionMisses } from './extension-accept';
import type { Miss } from './misses';
import { gradeMisses } from './screen';
import type { DesignSteps } from './space';
import { isEmptyGrid, meanDiameterGrid, orderFieldsOf, toPlaces } from './space';
import type { WireChoice } from './wire-sizes';
import { wireChoices } from './wire-sizes';

/** An extension design point: body coils for the rate, the initial tension that centres the forces. */
export interface ExtensionPoint extends PointKey {
  ends: ExtensionLoop;
  /** Initial tension, N, as the spec states it. */
  initialTension: number;
}

/** Diameters inside the preferred index and the envelope (OD, and the bore with its clearance). */
export function extensionDiameterRange(req: ExtensionRequirementInternal, d: number): { lo: number; hi: number } {
  const e = req.envelope;
  let hi = reviewLimits.preferredIndex.max * d;
  if (e.maxOuterDiameter !== undefined) hi = Math.min(hi, e.maxOuterDiameter - d);
  if (e.bore !== undefined) hi = Math.min(hi, (e.bore - d) / (1 + guideClearance.fractionOfMeanDiameter));
  return { lo: reviewLimits.preferredIndex.min * d, hi };
}

/**
 * Necessary bounds: the body's uncorrected stress at the least largest force allowed within the body's
 * allowable (above); the close-wound body, (Nb + 1)·d with Nb at most half a coil step under the exact count,
 * shorter than the shortest working length and the maximum free length (below).
 */
export function extensionNecessaryRange(req: ExtensionRequirementInternal, wire: WireProperties, d: number, coilStep: number, range: { lo: number; hi: number }) {
  const longest = req.loads[req.loads.length - 1]!;
  const least = longest.force * (1 - longest.tolerancePercent / 100);
  const allow = extensionAllowables[wire.family].body * wire.tensileStrength;
  const hi = (allow * Math.PI * d ** 3) / (8 * least);
  const cap = Math.min(req.loads[0]!.length, req.envelope.maxFreeLength ?? Infinity);
  const coils = cap / d + wire.shearModulus / wire.elasticModulus + coilStep / 2 - 1;
  const lo = coils > 0 ? Math.cbrt((wire.shearModulus * d ** 4) / (8 * req.rate * coils)) : Infinity;
  return { lo: Math.max(range.lo, lo * (1 - 1e-9)), hi: Math.min(range.hi, hi * (1 + 1e-9)) };
}

/** Free length inside the ends the loops make (the engine's loop heights: one inside diameter each). */
const freeLengthOf = (ends: ExtensionLoop, d: number, D: number, nb: number) =>
  (nb + 1) * d + 2 * extensionEnds[ends].heightInInsideDiameters * (D - d);

export function extensionPoint(req: ExtensionRequirementInternal, wire: WireProperties, grade: string, d: number, D: number, ends: ExtensionLoop, steps: DesignSteps): ExtensionPoint {
  const ge = wire.shearModulus / wire.elasticModulus;
  const exact = helicalRate(wire.shearModulus, d, D, 1) / req.rate - ge;
  const nb = Math.max(steps.coilStep, Math.round(exact / steps.coilStep) * steps.coilStep);
  const rate = helicalRate(wire.shearModulus, d, D, nb + ge);
  const L0 = freeLengthOf(ends, d, D, nb);
  let weights = 0;
  let sum = 0;
  for (const l of req.loads) {
    const w = 1 / (l.force * (l.tolerancePercent / 100));
    weights += w;
    sum += w * (l.force - rate * (l.length - L0));
  }
  const places = lengthDecimals[req.units];
  const shown = toPlaces(fromInternal(Math.max(0, sum / weights), 'force', req.units), places);
  return { grade, d, D, ends, na: nb, peened: false, initialTension: shown };
}

export function extensionPointSpec(r: ExtensionRequirement, p: ExtensionPoint): ExtensionSpec {
  return {
    kind: 'extension', version: 1, units: r.units, material: p.grade,
    wireDiameter: fromInternal(p.d, 'length', r.units), outerDiameter: fromInternal(p.D + p.d, 'length', r.units),
    bodyCoils: p.na, ends: [p.ends, p.ends], initialTension: p.initialTension,
    loads: r.function.loads.map((l) => ({ length: l.length, force: l.force, ...(l.tolerancePercent !== undefined ? { tolerancePercent: l.tolerancePercent } : {}) })),
    mechanicalStop: r.mechanicalStop,
    duty: r.duty.type === 'static' ? { type: 'static' } : { type: 'cyclic', between: r.duty.between, cycles: r.duty.cycles, peened: false, ...(r.duty.frequency !== undefined ? { frequency: r.duty.frequency } : {}) },
    ...orderFieldsOf(r),
  };
}

/** Allowable ÷ stress at the largest load, less one, for the section nearest its allowable (body or hook). */
export function extensionMargin(r: ExtensionReport): number {
  const a = r.allowables;
  return Math.min(a.body / r.bodyStress, a.hookTorsion / r.hookTorsionStress, a.hookBending / r.hookBendingStress) - 1;
}

interface Context { r: ExtensionRequirement; req: ExtensionRequirementInternal; closest: Closest; stats: SearchStats }

function accepted(ctx: Context, p: ExtensionPoint): AcceptedDesign | null {
  ctx.stats.engineRuns++;
  const spec = extensionPointSpec(ctx.r, p);
  const report = analyseSpec(spec);
  const misses: Miss[] = extensionMisses(ctx.req, report);
  if (misses.length > 0) {
    ctx.closest.offer(p, misses);
    return null;
  }
  const margin = extensionMargin(report);
  return { point: p, spec, report, setRemoval: false, stressMargin: margin, wireLength: report.wireLength, figures: extensionFigures(report, ctx.req.units, margin) };
}

function searchLoops(ctx: Context, wire: WireChoice, props: WireProperties, ends: ExtensionLoop, steps: DesignSteps, range: { lo: number; hi: number }): CombinationResult {
  const grid = meanDiameterGrid(extensionNecessaryRange(ctx.req, props, wire.d, steps.coilStep, range), steps.diameterStep);
  const tried = grid.length > 0 ? grid : [...new Set(meanDiameterGrid(range, steps.diameterStep).filter((_, i, all) => i === 0 || i === all.length - 1))];
  const points = tried.map((D) => extensionPoint(ctx.req, props, wire.grade.id, wire.d, D, ends, steps));
  ctx.stats.points += points.length;
  // Wire per piece falls with fewer coils: try the largest diameters first, keep the first the engine accepts.
  const designs: AcceptedDesign[] = [];
  for (const p of points) {
    const a = accepted(ctx, p);
    if (a && (designs.length === 0 || a.wireLength < designs[0]!.wireLength)) designs[0] = a;
  }
  return { wire, ends, peened: false, designs };
}

/** Every wire × loop form: the diameters in the envelope, body coils for the rate, each judged by the engine. */
export function searchExtension(r: ExtensionRequirement, settings: Settings) {
  const req = extensionRequirementInternal(r);
  const ctx: Context = { r, req, closest: new Closest(), stats: { wires: 0, combinations: 0, points: 0, engineRuns: 0 } };
  const wires = wireChoices(req, settings);
  ctx.stats.wires = wires.length;
  const combinations: CombinationResult[] = [];
  for (const wire of wires) {
    const range = extensionDiameterRange(req, wire.d);
    const unfit = gradeMisses({ duty: { type: 'static' }, serviceTemperature: req.serviceTemperature }, wire.grade);
    const empty = isEmptyGrid(range, settings.design.diameterStep);
    if (unfit.length > 0) ctx.closest.offerWire(wire, unfit);
    else if (empty) ctx.closest.offerEmptyRange(wire, range, r.units);
    for (const ends of req.ends) {
      ctx.stats.combinations++;
      if (unfit.length > 0 || empty) continue;
      const found = searchLoops(ctx, wire, wireProperties(wire.grade.id, wire.d)!.props, ends, settings.design, range);
      if (found.designs.length > 0) combinations.push(found);
    }
  }
  return { req, combinations, closest: ctx.closest, stats: ctx.stats };
}
