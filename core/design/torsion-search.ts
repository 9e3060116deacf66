import type { Settings } from '../settings/schema';
import type { TorsionRequirement } from '../requirement';
import { wireProperties, torsionAllowables } from '../materials';
import type { WireProperties } from '../materials/types';
import { analyseSpec } from '../calculate';
import type { Finding } from '../result';
import type { TorsionSpec } from '../spec/torsion';
import type { TorsionReport } from '../springs/torsion/report';
import { bendingStressPerMoment, legCoils, torqueRatePerTurn } from '../springs/torsion/rate';
import { DEFAULT_LOAD_TOLERANCE_PERCENT } from '../springs/specified';
import { findGrade } from '../materials';
import { fromInternal, toInternal } from '../units';
import type { UnitSystem } from '../units';
import { reviewLimits } from '../review/limits';
import type { AcceptedDesign, CombinationResult, PointKey, SearchStats } from './frame';
import { Closest } from './closest';
import type { Miss } from './misses';
import { overMax, underMin } from './misses';
import { gradeMisses } from './screen';
import { isEmptyGrid, meanDiameterGrid, orderFieldsOf, toPlaces } from './space';
import type { DesignSteps } from './space';
import type { WireAsk, WireChoice } from './wire-sizes';
import { wireChoices } from './wire-sizes';
import type { CandidateFigures } from './types';

/** A torsion requirement in internal units (mm, N·mm, degrees, °C). */
export interface TorsionRequirementInternal extends WireAsk {
  kind: 'torsion';
  units: UnitSystem;
  envelope: { arbor?: number; maxOuterDiameter?: number; maxBodyLength?: number };
  legs: [number, number];
  torques: { torque: number; tolerancePercent: number; path: string }[];
  stroke: number;
  /** Torque per degree the function asks for. */
  rate: number;
  serviceTemperature?: { min: number; max: number };
}

export function torsionRequirementInternal(r: TorsionRequirement): TorsionRequirementInternal {
  const mm = (v: number | undefined) => (v === undefined ? undefined : toInternal(v, 'length', r.units));
  const torques = r.function.torques.map((t, i) => ({
    torque: toInternal(t.torque, 'torque', r.units), tolerancePercent: t.tolerancePercent ?? DEFAULT_LOAD_TOLERANCE_PERCENT, path: `function.torques[${i}]`,
  }));
  const t = r.serviceTemperature;
  return {
    kind: 'torsion', units: r.units,
    envelope: { arbor: mm(r.envelope.arbor), maxOuterDiameter: mm(r.envelope.maxOuterDiameter), maxBodyLength: mm(r.envelope.maxBodyLength) },
    legs: [mm(r.legs[0].length)!, mm(r.legs[1].length)!], torques, stroke: r.function.stroke,
    rate: (torques[1]!.torque - torques[0]!.torque) / r.function.stroke,
    serviceTemperature: t && { min: toInternal(t.min, 'temperature', r.units), max: toInternal(t.max, 'temperature', r.units) },
    grades: r.choices.grades, families: r.choices.families, wireSizes: r.choices.wireSizes,
  };
}

/** A torsion design point: body coils for the rate, and the first position's deflection from free, degrees. */
export interface TorsionPoint extends PointKey {
  firstAngle: number;
}

/** Diameters inside the preferred index, the maximum outside diameter and clear of the arbor when free. */
export function torsionDiameterRange(req: TorsionRequirementInternal, d: number): { lo: number; hi: number } {
  let lo = reviewLimits.preferredIndex.min * d;
  let hi = reviewLimits.preferredIndex.max * d;
  if (req.envelope.maxOuterDiameter !== undefined) hi = Math.min(hi, req.envelope.maxOuterDiameter - d);
  if (req.envelope.arbor !== undefined) lo = Math.max(lo, req.envelope.arbor + d);
  return { lo, hi };
}

/**
 * Bending stress at the second position is at least 32·M/(π·d³) (the curvature factor is above one), so a
 * wire too thin for the least torque allowed there, at the grade's allowable, cannot carry it at any diameter.
 */
export function wireTooThin(req: TorsionRequirementInternal, wire: WireProperties, d: number): Miss | null {
  const last = req.torques[1]!;
  const least = last.torque * (1 - last.tolerancePercent / 100);
  return overMax('working-stress', 'function', 'stress', bendingStressPerMoment(d) * least, torsionAllowables[wire.family].bending * wire.tensileStrength);
}

export function torsionPoint(req: TorsionRequirementInternal, wire: WireProperties, grade: string, d: number, D: number, steps: DesignSteps): TorsionPoint {
  const legs = legCoils(req.legs[0], req.legs[1], D);
  const exact = torqueRatePerTurn(wire.elasticModulus, d, D, 1) / (360 * req.rate) - legs;
  const nb = Math.max(steps.coilStep, Math.round(exact / steps.coilStep) * steps.coilStep);
  const perDegree = torqueRatePerTurn(wire.elasticModulus, d, D, nb + legs) / 360;
  // First position's deflection: the torques' misses, each over its tolerance, equal and opposite.
  let weights = 0;
  let sum = 0;
  req.torques.forEach((t, i) => {
    const w = 1 / (t.torque * (t.tolerancePercent / 100));
    weights += w * perDegree;
    sum += w * (t.torque - perDegree * (i === 0 ? 0 : req.stroke));
  });
  return { grade, d, D, ends: 'legs', na: nb, peened: false, firstAngle: toPlaces(Math.max(0, sum / weights), 1) };
}

export function torsionPointSpec(r: TorsionRequirement, p: TorsionPoint): TorsionSpec {
  const [t1, t2] = r.function.torques;
  const tol = (t: typeof t1) => (t.tolerancePercent !== undefined ? { tolerancePercent: t.tolerancePercent } : {});
  return {
    kind: 'torsion', version: 1, units: r.units, material: p.grade,
    wireDiameter: fromInternal(p.d, 'length', r.units), outerDiameter: fromInternal(p.D + p.d, 'length', r.units),
    bodyCoils: p.na, legs: [{ ...r.legs[0] }, { ...r.legs[1] }], windDirection: r.windDirection, loadDirection: 'closing',
    ...(r.envelope.arbor !== undefined ? { arborDiameter: r.envelope.arbor } : {}),
    loads: [{ angle: p.firstAngle, torque: t1.torque, ...tol(t1) }, { angle: toPlaces(p.firstAngle + r.function.stroke, 1), torque: t2.torque, ...tol(t2) }],
    duty: r.duty.type === 'static' ? { type: 'static' }
      : { type: 'cyclic', between: [p.firstAngle, toPlaces(p.firstAngle + r.function.stroke, 1)], cycles: r.duty.cycles, peened: p.peened },
    ...(p.peened ? { shotPeen: true } : {}),
    ...orderFieldsOf(r),
  };
}

const disqualifying = new Set(['arbor-clearance-small', 'index-outside-preferred', 'leg-bend-tight', 'temperature-below-grade', 'loaded-against-wind']);
const rules = (f: Finding) => f.severity === 'error' || (f.severity === 'warning' && disqualifying.has(f.code));

/** Whether the engine's report of a torsion design meets the requirement; empty when it does. */
export function torsionMisses(req: TorsionRequirementInternal, r: TorsionReport): Miss[] {
  const e = req.envelope;
  const out: (Miss | null)[] = [
    e.maxOuterDiameter === undefined ? null : overMax('max-outer-diameter', 'envelope.maxOuterDiameter', 'length', Math.max(r.outerDiameter, r.outsideDiameterAtLoad), e.maxOuterDiameter),
    e.maxBodyLength === undefined ? null : overMax('max-free-length', 'envelope.maxBodyLength', 'length', r.bodyLengthAtLoad, e.maxBodyLength),
    r.arborClearanceFraction === null ? null : underMin('arbor', 'envelope.arbor', 'ratio', r.arborClearanceFraction, reviewLimits.minimumArborClearance),
  ];
  r.loads.forEach((l, i) => {
    const asked = req.torques[i];
    if (!asked || l.withinTolerance !== false) return;
    const band = (asked.torque * asked.tolerancePercent) / 100;
    out.push(l.torque > asked.torque ? overMax('load-tolerance', `${asked.path}.torque`, 'torque', l.torque, asked.torque + band)
      : underMin('load-tolerance', `${asked.path}.torque`, 'torque', l.torque, asked.torque - band));
  });
  const last = r.loads[r.loads.length - 1];
  if (last) out.push(overMax('working-stress', 'function', 'stress', last.stress, r.allowableStress));
  const found = out.filter((m): m is Miss => m !== null);
  if (found.length > 0) return found;
  return r.findings.filter(rules).map((f) => ({
    limit: 'review' as const, path: f.path, quantity: 'count' as const, value: 1, bound: 0, sense: 'max' as const, relative: 1, note: `${f.code}: ${f.message}`,
  }));
}

function figures(r: TorsionReport, u: UnitSystem, margin: number, peened: boolean): CandidateFigures {
  const len = (v: number) => fromInternal(v, 'length', u);
  return {
    material: r.material, gradeName: findGrade(r.material)?.name ?? r.material,
    wireDiameter: len(r.wireDiameter), outerDiameter: len(r.outerDiameter), innerDiameter: len(r.innerDiameter), meanDiameter: len(r.meanDiameter),
    springIndex: r.springIndex, ends: 'legs', activeCoils: r.activeCoils, totalCoils: r.bodyCoils, freeLength: len(r.bodyLength),
    solidLength: null, rate: fromInternal(r.ratePerDegree, 'torque', u), initialTension: null,
    forces: r.loads.map((l) => ({ length: l.angle, force: fromInternal(l.torque, 'torque', u), asked: fromInternal(l.specifiedTorque ?? l.torque, 'torque', u) })),
    stressRatio: null, stressMargin: margin, setRemoval: false, shotPeened: peened,
    wireLengthPerPiece: len(r.wireLength), massPerPiece: fromInternal(r.mass, 'mass', u), fatigueSafetyFactor: null,
  };
}

interface Context { r: TorsionRequirement; req: TorsionRequirementInternal; closest: Closest; stats: SearchStats }

function accepted(ctx: Context, p: TorsionPoint): AcceptedDesign | null {
  ctx.stats.engineRuns++;
  const spec = torsionPointSpec(ctx.r, p);
  const report = analyseSpec(spec);
  const misses = torsionMisses(ctx.req, report);
  if (misses.length > 0) {
    ctx.closest.offer(p, misses);
    return null;
  }
  const last = report.loads[report.loads.length - 1]!;
  const margin = report.allowableStress / last.stress - 1;
  return { point: p, spec, report, setRemoval: false, stressMargin: margin, wireLength: report.wireLength, figures: figures(report, ctx.req.units, margin, p.peened) };
}

function searchWire(ctx: Context, wire: WireChoice, props: WireProperties, grid: number[], steps: DesignSteps, peened: boolean): CombinationResult {
  const designs: AcceptedDesign[] = [];
  for (const D of grid) {
    ctx.stats.points++;
    const a = accepted(ctx, { ...torsionPoint(ctx.req, props, wire.grade.id, wire.d, D, steps), peened });
    if (a && (designs.length === 0 || a.wireLength < designs[0]!.wireLength)) designs[0] = a;
  }
  return { wire, ends: 'legs', peened, designs };
}

/** Every wire (× peened, when cyclic duty allows it): the diameters in the envelope, body coils for the rate, judged by the engine. */
export function searchTorsion(r: TorsionRequirement, settings: Settings) {
  const req = torsionRequirementInternal(r);
  const ctx: Context = { r, req, closest: new Closest(), stats: { wires: 0, combinations: 0, points: 0, engineRuns: 0 } };
  const wires = wireChoices(req, settings);
  ctx.stats.wires = wires.length;
  const peening = r.duty.type === 'cyclic' && r.duty.peeningAllowed ? [false, true] : [false];
  const combinations: CombinationResult[] = [];
  for (const wire of wires) {
    const range = torsionDiameterRange(req, wire.d);
    const unfit = gradeMisses({ duty: { type: 'static' }, serviceTemperature: req.serviceTemperature }, wire.grade);
    if (unfit.length > 0) { ctx.closest.offerWire(wire, unfit); continue; }
    if (isEmptyGrid(range, settings.design.diameterStep)) { ctx.closest.offerEmptyRange(wire, range, req.units); continue; }
    const props = wireProperties(wire.grade.id, wire.d)!.props;
    const thin = wireTooThin(req, props, wire.d);
    if (thin) { ctx.closest.offerWire(wire, [thin]); continue; }
    const grid = meanDiameterGrid(range, settings.design.diameterStep);
    for (const peened of peening) {
      ctx.stats.combinations++;
      const found = searchWire(ctx, wire, props, grid, settings.design, peened);
      if (found.designs.length > 0) combinations.push(found);
    }
  }
  return { req, combinations, closest: ctx.closest, stats: ctx.stats };
}
