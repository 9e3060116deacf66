import type { Result } from '../result';
import { fail, fieldError, ok } from '../result';
import type { Settings } from '../settings/schema';
import type { Spec } from '../spec';
import { parseRequirement, requirementInternal, extensionRequirementInternal } from '../requirement';
import type { Requirement } from '../requirement';
import { DEFAULT_QUANTITIES } from '../costing/estimate';
import { analyseSpec } from '../calculate';
import { REVIEW_CAUTION, STORED_ENERGY_CAUTION } from '../documents/cautions';
import { searchCompression } from './search';
import { searchExtension } from './extension-search';
import { searchTorsion, torsionMisses, torsionRequirementInternal } from './torsion-search';
import { rankCombinations } from './rank';
import { lossReasons } from './reasons';
import { explainInfeasible } from './explain';
import { guideClearance } from './clearance';
import { requirementMisses } from './accept';
import { extensionMisses } from './extension-accept';
import type { Miss } from './misses';
import type { DesignAnswer, DesignCandidate } from './types';

export type * from './types';
export type { Miss } from './misses';
export { searchCompression } from './search';
export { searchExtension } from './extension-search';
export { searchTorsion } from './torsion-search';
export { requirementMisses } from './accept';
export { guideClearance } from './clearance';
export { standardWireSizes, wireChoices } from './wire-sizes';
export { designPoint, meanDiameterGrid, meanDiameterRange, pointSpec } from './space';

export const DEFAULT_CANDIDATE_LIMIT = 10;

function finishError(r: Requirement, settings: Settings) {
  const f = r.choices.finish;
  if (f === undefined || f === 'none' || settings.finishes.some((x) => x.id === f)) return null;
  return fieldError('unknown-finish', 'choices.finish', `finish "${f}" is not in the shop's finishes (${settings.finishes.map((x) => x.id).join(', ') || 'none listed'})`);
}

/** What a spec misses of a requirement when the engine analyses it alone; empty when it meets it. */
export function specMisses(r: Requirement, spec: Spec): Miss[] {
  if (spec.kind !== r.kind) {
    return [{ limit: 'review', path: 'kind', quantity: 'count', value: 1, bound: 0, sense: 'max', relative: 1, note: `the spec is a ${spec.kind} spring; the requirement asks for a ${r.kind} spring` }];
  }
  if (r.kind === 'compression' && spec.kind === 'compression') return requirementMisses(requirementInternal(r), analyseSpec(spec));
  if (r.kind === 'extension' && spec.kind === 'extension') return extensionMisses(extensionRequirementInternal(r), analyseSpec(spec));
  if (r.kind === 'torsion' && spec.kind === 'torsion') return torsionMisses(torsionRequirementInternal(r), analyseSpec(spec));
  return [];
}

const clearanceRule = `Bore: outside diameter (compression: at solid, with the EN 13906-1 growth) + ${100 * guideClearance.fractionOfMeanDiameter} % of the mean diameter ≤ bore; ` +
  `rod: inside diameter − ${100 * guideClearance.fractionOfMeanDiameter} % of the mean diameter ≥ rod (${guideClearance.source}).`;

/** Designs that meet a requirement, cheapest first by the shop's own costing; or why none can. */
export function designFromRequirement(raw: unknown, settings: Settings, limit = DEFAULT_CANDIDATE_LIMIT): Result<DesignAnswer> {
  const parsed = parseRequirement(raw);
  if (!parsed.ok) return parsed;
  const r = parsed.value;
  const finish = finishError(r, settings);
  if (finish) return fail([finish]);
  const quantity = r.choices.mainQuantity ?? r.choices.quantities?.[0] ?? DEFAULT_QUANTITIES[0]!;
  const outcome = r.kind === 'compression' ? searchCompression(r, settings)
    : r.kind === 'extension' ? searchExtension(r, settings) : searchTorsion(r, settings);
  const ranked = rankCombinations(outcome.combinations, settings, quantity);
  const top = ranked.slice(0, limit);
  const reasons = lossReasons(top, settings, quantity);
  const candidates: DesignCandidate[] = top.map((p, i) => ({
    rank: i + 1, spec: p.spec, figures: p.figures, quantity, unitPrice: p.price.unitPrice,
    currency: settings.defaults.currency, priced: p.priced, missing: p.missing, reasons: reasons[i]!,
    remarks: p.report.findings.filter((f) => f.severity !== 'error').map((f) => f.message),
  }));
  return ok({
    kind: r.kind, units: r.units, mainQuantity: quantity, currency: settings.defaults.currency, candidates,
    feasibleCount: ranked.length,
    searched: { ...outcome.stats, costed: outcome.combinations.reduce((a, c) => a + c.designs.length, 0) },
    infeasible: ranked.length === 0 ? explainInfeasible(outcome.req, outcome.closest, outcome.stats.wires, outcome.req.wireSizes) : null,
    clearanceRule,
    caution: `${STORED_ENERGY_CAUTION} ${REVIEW_CAUTION}`,
  });
}
