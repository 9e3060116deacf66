import type { Settings } from '../settings/schema';
import type { CompressionRequirement, RequirementInternal } from '../requirement';
import { requirementInternal } from '../requirement';
import { wireProperties } from '../materials';
import type { WireProperties } from '../materials/types';
import { analyseSpec } from '../calculate';
import type { CompressionReport } from '../springs/compression/report';
import type { CompressionEnds } from '../spec/compression';
import type { AcceptedDesign, CombinationResult, SearchStats } from './frame';
import { endForms } from '../springs/compression/ends';
import type { DesignPoint, DesignSteps } from './space';
import { designPoint, isEmptyGrid, meanDiameterGrid, meanDiameterRange, necessaryDiameterRange, pointSpec } from './space';
import { gradeMisses, screenPoint } from './screen';
import { requirementMisses } from './accept';
import type { Miss } from './misses';
import type { WireChoice } from './wire-sizes';
import { wireChoices } from './wire-sizes';
import { Closest } from './closest';
import { compressionFigures } from './figures';

export interface SearchOutcome {
  req: RequirementInternal;
  combinations: CombinationResult[];
  closest: Closest;
  stats: SearchStats;
}

interface Context {
  r: CompressionRequirement;
  req: RequirementInternal;
  steps: DesignSteps;
  closest: Closest;
  stats: SearchStats;
}

function engineCheck(ctx: Context, point: DesignPoint): AcceptedDesign | null {
  ctx.stats.engineRuns++;
  const spec = pointSpec(ctx.r, point);
  const report = analyseSpec(spec);
  const misses: Miss[] = requirementMisses(ctx.req, report);
  if (misses.length === 0) {
    const margin = stressMargin(ctx.req, report);
    return { point, spec, report, setRemoval: report.setRemoval.required, stressMargin: margin, wireLength: report.wireLength,
      figures: compressionFigures(report, ctx.req.units, margin, point.peened) };
  }
  ctx.closest.offer(point, misses);
  return null;
}

/**
 * Allowable ÷ stress at the shortest working length, less one, on the governing set-removal method's stress
 * basis and its allowable before or after set removal, as the review compares them at solid.
 */
export function stressMargin(req: RequirementInternal, r: CompressionReport): number {
  const share = (r.freeLength - req.deepestLength) / (r.freeLength - r.solidLength);
  const s = r.setRemoval;
  return (s.required ? s.allowableAfter : s.allowableBefore) / (share * s.stressAtSolid) - 1;
}

/** Walks one combination's diameters; the engine then judges survivors in order of wire used. */
function searchCombination(ctx: Context, wire: WireChoice, props: WireProperties, range: { lo: number; hi: number }, ends: CompressionEnds, peened: boolean): CombinationResult {
  const inactive = endForms[ends].inactiveCoils;
  const necessary = meanDiameterGrid(necessaryDiameterRange(ctx.req, props, wire.d, ends, ctx.steps.coilStep, range), ctx.steps.diameterStep);
  // Nothing can pass: the envelope's two edges still show the estimator what the wire misses, and by how much.
  const envelope = necessary.length > 0 ? [] : meanDiameterGrid(range, ctx.steps.diameterStep);
  const grid = necessary.length > 0 ? necessary : [...new Set([envelope[0]!, envelope[envelope.length - 1]!])];
  const survivors: { point: DesignPoint; wireLength: number }[] = [];
  for (const D of grid) {
    ctx.stats.points++;
    const point = designPoint(ctx.req, props, wire.grade.id, wire.d, D, ends, inactive, ctx.steps, peened);
    const s = screenPoint(ctx.req, props, point);
    if (s.misses.length === 0) survivors.push({ point, wireLength: s.wireLength });
    else ctx.closest.offer(point, s.misses);
  }
  survivors.sort((a, b) => a.wireLength - b.wireLength);
  const designs: AcceptedDesign[] = [];
  for (const s of survivors) {
    const accepted = engineCheck(ctx, s.point);
    if (!accepted) continue;
    if (designs.length === 0) designs.push(accepted);
    if (!accepted.setRemoval) {
      if (designs[0] !== accepted) designs.push(accepted);
      break;
    }
  }
  return { wire, ends, peened, designs };
}

/**
 * Every wire × end type (× peened, when cyclic duty allows it): the mean diameters in the envelope, the
 * coils for the rate, screened with the engine's formulas, the survivors analysed and reviewed by the engine.
 */
export function searchCompression(r: CompressionRequirement, settings: Settings): SearchOutcome {
  const req = requirementInternal(r);
  const ctx: Context = { r, req, steps: settings.design, closest: new Closest(), stats: { wires: 0, combinations: 0, points: 0, engineRuns: 0 } };
  const wires = wireChoices(req, settings);
  ctx.stats.wires = wires.length;
  const peening = req.duty.type === 'cyclic' && req.duty.peeningAllowed ? [false, true] : [false];
  const combinations: CombinationResult[] = [];
  for (const wire of wires) {
    const range = meanDiameterRange(req, wire.d);
    const unfit = gradeMisses(req, wire.grade);
    const empty = isEmptyGrid(range, settings.design.diameterStep);
    if (unfit.length > 0) ctx.closest.offerWire(wire, unfit);
    else if (empty) ctx.closest.offerEmptyRange(wire, range, ctx.req.units);
    let props: WireProperties | undefined;
    for (const ends of req.ends) {
      for (const peened of peening) {
        ctx.stats.combinations++;
        if (empty || unfit.length > 0) continue;
        props ??= wireProperties(wire.grade.id, wire.d)!.props;
        const found = searchCombination(ctx, wire, props, range, ends, peened);
        if (found.designs.length > 0) combinations.push(found);
      }
    }
  }
  return { req, combinations, closest: ctx.closest, stats: ctx.stats };
}
