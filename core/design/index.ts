import type { Result } from '../result';
import { fail, fieldError, ok } from '../result';
import type { Settings } from '../settings/schema';
import { parseRequirement } from '../requirement';
import type { Requirement, RequirementInternal } from '../requirement';
import { DEFAULT_QUANTITIES } from '../costing/estimate';
import { fromInternal } from '../units';
import { findGrade } from '../materials';
import { REVIEW_CAUTION, STORED_ENERGY_CAUTION } from '../documents/cautions';
import { searchCompression } from './search';
import { rankCombinations } from './rank';
import type { PricedDesign } from './rank';
import { lossReasons } from './reasons';
import { explainInfeasible } from './explain';
import { guideClearance } from './clearance';
import type { CandidateFigures, DesignAnswer, DesignCandidate } from './types';

export type * from './types';
export { searchCompression } from './search';
export { requirementMisses } from './accept';
export { guideClearance } from './clearance';
export { standardWireSizes, wireChoices } from './wire-sizes';
export { designPoint, meanDiameterGrid, meanDiameterRange, pointSpec } from './space';

export const DEFAULT_CANDIDATE_LIMIT = 10;

function figures(req: RequirementInternal, p: PricedDesign): CandidateFigures {
  const r = p.report;
  const len = (v: number) => fromInternal(v, 'length', req.units);
  const force = (v: number) => fromInternal(v, 'force', req.units);
  return {
    material: r.material, gradeName: findGrade(r.material)?.name ?? r.material,
    wireDiameter: len(r.wireDiameter), outerDiameter: len(r.outerDiameter), innerDiameter: len(r.innerDiameter),
    meanDiameter: len(r.meanDiameter), springIndex: r.springIndex, ends: r.ends, activeCoils: r.activeCoils, totalCoils: r.totalCoils,
    freeLength: len(r.freeLength), solidLength: len(r.solidLength), rate: fromInternal(r.rate, 'rate', req.units),
    forces: r.loads.map((l) => ({ length: len(l.length), force: force(l.force), asked: force(l.specifiedForce ?? l.force) })),
    stressRatio: r.setRemoval.ratio, stressMargin: p.stressMargin, setRemoval: r.setRemoval.required,
    shotPeened: p.point.peened, wireLengthPerPiece: len(r.wireLength), massPerPiece: fromInternal(r.mass, 'mass', req.units),
    fatigueSafetyFactor: r.fatigue ? r.fatigue.goodmanSafetyFactor : null,
  };
}

function finishError(r: Requirement, settings: Settings) {
  const f = r.choices.finish;
  if (f === undefined || f === 'none' || settings.finishes.some((x) => x.id === f)) return null;
  return fieldError('unknown-finish', 'choices.finish', `finish "${f}" is not in the shop's finishes (${settings.finishes.map((x) => x.id).join(', ') || 'none listed'})`);
}

/** Designs that meet a requirement, cheapest first by the shop's own costing; or why none can. */
export function designFromRequirement(raw: unknown, settings: Settings, limit = DEFAULT_CANDIDATE_LIMIT): Result<DesignAnswer> {
  const parsed = parseRequirement(raw);
  if (!parsed.ok) return parsed;
  const r = parsed.value;
  const finish = finishError(r, settings);
  if (finish) return fail([finish]);
  const quantity = r.choices.mainQuantity ?? r.choices.quantities?.[0] ?? DEFAULT_QUANTITIES[0]!;
  const outcome = searchCompression(r, settings);
  const ranked = rankCombinations(outcome.req, outcome.combinations, settings, quantity);
  const top = ranked.slice(0, limit);
  const reasons = lossReasons(top, settings, quantity);
  const candidates: DesignCandidate[] = top.map((p, i) => ({
    rank: i + 1, spec: p.spec, figures: figures(outcome.req, p), quantity, unitPrice: p.price.unitPrice,
    currency: settings.defaults.currency, priced: p.priced, missing: p.missing, reasons: reasons[i]!,
    remarks: p.report.findings.filter((f) => f.severity !== 'error').map((f) => f.message),
  }));
  return ok({
    kind: 'compression', units: r.units, mainQuantity: quantity, currency: settings.defaults.currency, candidates,
    feasibleCount: ranked.length,
    searched: { ...outcome.stats, costed: outcome.combinations.reduce((a, c) => a + c.designs.length, 0) },
    infeasible: ranked.length === 0 ? explainInfeasible(outcome.req, outcome.closest, outcome.stats.wires, outcome.req.wireSizes) : null,
    clearanceRule: `Bore: outside diameter at solid (EN 13906-1 growth) + ${100 * guideClearance.fractionOfMeanDiameter} % of the mean diameter ≤ bore; rod: inside diameter − ${100 * guideClearance.fractionOfMeanDiameter} % of the mean diameter ≥ rod (${guideClearance.source}).`,
    caution: `${STORED_ENERGY_CAUTION} ${REVIEW_CAUTION}`,
  });
}
