import type { Finding } from '../result';
import type { CompressionReport } from '../springs/compression/report';
import type { RequirementInternal } from '../requirement';
import { reviewLimits } from '../review/limits';
import { boreLimit, rodLimit } from './clearance';
import type { Miss } from './misses';
import { overMax, underMin } from './misses';

/**
 * Warnings that rule a design out of the search's answers: a spring offered to a customer should not
 * need them explained. Buckling is accepted when a bore or a rod guides the spring.
 */
const disqualifyingWarnings = new Set([
  'coil-clearance', 'set-below-length-tolerance', 'set-ratio-high', 'index-outside-preferred',
  'grinding-fine-wire', 'fatigue-marginal', 'surge', 'grade-not-for-cyclic-duty', 'temperature-below-grade',
  'over-determined', 'buckling',
]);

function disqualifies(f: Finding, guided: boolean): boolean {
  if (f.severity === 'error') return true;
  if (f.severity !== 'warning') return false;
  return f.code === 'buckling' ? !guided : disqualifyingWarnings.has(f.code);
}

function envelopeMisses(req: RequirementInternal, r: CompressionReport): Miss[] {
  const e = req.envelope;
  const out = [
    e.maxOuterDiameter === undefined ? null : overMax('max-outer-diameter', 'envelope.maxOuterDiameter', 'length', r.outerDiameter, e.maxOuterDiameter),
    e.bore === undefined ? null : overMax('bore', 'envelope.bore', 'length', r.outerDiameterAtSolid, boreLimit(e.bore, r.meanDiameter)),
    e.minInnerDiameter === undefined ? null : underMin('min-inner-diameter', 'envelope.minInnerDiameter', 'length', r.innerDiameter, e.minInnerDiameter),
    e.rod === undefined ? null : underMin('rod', 'envelope.rod', 'length', r.innerDiameter, rodLimit(e.rod, r.meanDiameter)),
    e.maxSolidLength === undefined ? null : overMax('max-solid-length', 'envelope.maxSolidLength', 'length', r.solidLength, e.maxSolidLength),
    e.maxFreeLength === undefined ? null : overMax('max-free-length', 'envelope.maxFreeLength', 'length', r.freeLength, e.maxFreeLength),
  ];
  return out.filter((m): m is Miss => m !== null);
}

function functionMisses(req: RequirementInternal, r: CompressionReport): Miss[] {
  const out: (Miss | null)[] = [];
  r.loads.forEach((l) => {
    const asked = req.loads.find((x) => Math.abs(x.length - l.length) <= 1e-9 * x.length);
    if (l.withinTolerance === false && asked) {
      const band = (asked.force * asked.tolerancePercent) / 100;
      out.push(l.force > asked.force ? overMax('load-tolerance', `${asked.path}.force`, 'force', l.force, asked.force + band)
        : underMin('load-tolerance', `${asked.path}.force`, 'force', l.force, asked.force - band));
    }
  });
  if (req.rateTolerancePercent !== null) {
    const band = (req.rate * req.rateTolerancePercent) / 100;
    out.push(overMax('rate-tolerance', 'function.rate', 'rate', r.rate, req.rate + band));
    out.push(underMin('rate-tolerance', 'function.rate', 'rate', r.rate, req.rate - band));
  }
  if (req.maxStressRatio !== null) out.push(overMax('stress-ratio', 'maxStressRatio', 'ratio', r.setRemoval.ratio, req.maxStressRatio));
  out.push(underMin('active-coils', 'function', 'count', r.activeCoils, reviewLimits.minimumActiveCoils));
  return out.filter((m): m is Miss => m !== null);
}

/** The findings that rule the design out, as misses of the review. */
function reviewMisses(req: RequirementInternal, r: CompressionReport): Miss[] {
  const guided = req.envelope.bore !== undefined || req.envelope.rod !== undefined;
  return r.findings.filter((f) => disqualifies(f, guided)).map((f) => ({
    limit: 'review' as const, path: f.path, quantity: 'count' as const, value: 1, bound: 0, sense: 'max' as const, relative: 1,
    note: `${f.code}: ${f.message}`,
  }));
}

/**
 * Whether the engine's report of a design meets the requirement: every limit of the requirement, no error
 * finding, and none of the warnings a designed spring should be free of. Empty when it meets it.
 */
export function requirementMisses(req: RequirementInternal, r: CompressionReport): Miss[] {
  return [...envelopeMisses(req, r), ...functionMisses(req, r), ...reviewMisses(req, r)];
}
