import type { Finding } from '../result';
import type { ExtensionReport } from '../springs/extension/report';
import type { ExtensionRequirementInternal } from '../requirement';
import { guideClearance } from './clearance';
import type { Miss } from './misses';
import { overMax, underMin } from './misses';

/** Warnings a designed extension spring should not carry; a missing stop and cyclic duty are the customer's to know. */
const disqualifying = new Set(['initial-tension-too-low', 'index-outside-preferred', 'fatigue-marginal', 'hook-bend-tight', 'temperature-below-grade']);

const rules = (f: Finding) => f.severity === 'error' || (f.severity === 'warning' && disqualifying.has(f.code));

/** Whether the engine's report of an extension design meets the requirement; empty when it does. */
export function extensionMisses(req: ExtensionRequirementInternal, r: ExtensionReport): Miss[] {
  const e = req.envelope;
  const out: (Miss | null)[] = [
    e.maxOuterDiameter === undefined ? null : overMax('max-outer-diameter', 'envelope.maxOuterDiameter', 'length', r.outerDiameter, e.maxOuterDiameter),
    e.bore === undefined ? null : overMax('bore', 'envelope.bore', 'length', r.outerDiameter + guideClearance.fractionOfMeanDiameter * r.meanDiameter, e.bore),
    e.maxFreeLength === undefined ? null : overMax('max-free-length', 'envelope.maxFreeLength', 'length', r.freeLength, e.maxFreeLength),
    underMin('coil-clearance', req.loads[0]!.path, 'length', req.loads[0]!.length, r.freeLength * (1 + 1e-9)),
    overMax('initial-tension', 'initialTension.max', 'force', r.initialTension, req.initialTension.max),
    underMin('initial-tension', 'initialTension.min', 'force', r.initialTension, req.initialTension.min),
    overMax('initial-tension', 'function', 'stress', r.initialTensionStress, r.initialTensionStressRange.max),
    underMin('initial-tension', 'function', 'stress', r.initialTensionStress, r.initialTensionStressRange.min),
    overMax('working-stress', 'function', 'stress', r.bodyStress, r.allowables.body),
    overMax('hook-stress', 'function', 'stress', r.hookTorsionStress, r.allowables.hookTorsion),
    overMax('hook-stress', 'function', 'stress', r.hookBendingStress, r.allowables.hookBending),
  ];
  r.loads.forEach((l, i) => {
    const asked = req.loads.find((x) => Math.abs(x.length - l.length) <= 1e-9 * x.length);
    if (l.withinTolerance !== false || !asked) return;
    const band = (asked.force * asked.tolerancePercent) / 100;
    out.push(l.force > asked.force ? overMax('load-tolerance', `${asked.path}.force`, 'force', l.force, asked.force + band)
      : underMin('load-tolerance', `${asked.path}.force`, 'force', l.force, asked.force - band));
    void i;
  });
  const found = out.filter((m): m is Miss => m !== null);
  if (found.length > 0) return found;
  return r.findings.filter(rules).map((f) => ({
    limit: 'review' as const, path: f.path, quantity: 'count' as const, value: 1, bound: 0, sense: 'max' as const, relative: 1, note: `${f.code}: ${f.message}`,
  }));
}
