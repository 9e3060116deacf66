import type { RequirementInternal } from '../requirement';
import type { WireGrade, WireProperties } from '../materials/types';
import { bergstraesser } from '../springs/factors';
import { coilWireLength, helicalRate, torsionStressPerForce } from '../springs/helix';
import { endForms, solidLength } from '../springs/compression/ends';
import { minimumCoilGapSum, outsideDiameterGrowth } from '../springs/compression/clearance';
import { fatigueCheck, fatigueCriteria, finiteLife, hasSteelFatigueData } from '../springs/fatigue';
import { setRemoval } from '../springs/compression/analyse';
import type { SetRemovalResult } from '../springs/compression/report';
import { coiledLimits } from '../springs/compression/set-removal';
import { setControlTolerance } from '../review/compression';
import { reviewLimits } from '../review/limits';
import { boreLimit, rodLimit } from './clearance';
import type { DesignPoint } from './space';
import type { Miss } from './misses';
import { overMax, underMin } from './misses';

/**
 * The quick screen of a design point with the engine's own formulas: the checks a design must pass to meet
 * the requirement, each a necessary condition of the engine's review, so the screen never drops a point the
 * engine would keep. Survivors are analysed and reviewed by the engine before they are offered.
 */
export interface Screened {
  misses: Miss[];
  /** Developed wire length per piece, mm (the engine's helix length), to order survivors by wire used. */
  wireLength: number;
  setRemovalRequired: boolean;
}

function push(out: Miss[], m: Miss | null): void {
  if (m) out.push(m);
}

function envelopeMisses(req: RequirementInternal, p: DesignPoint, pitch: number, out: Miss[]): void {
  const e = req.envelope;
  const od = p.D + p.d;
  const id = p.D - p.d;
  if (e.maxOuterDiameter !== undefined) push(out, overMax('max-outer-diameter', 'envelope.maxOuterDiameter', 'length', od, e.maxOuterDiameter));
  if (e.bore !== undefined) {
    push(out, overMax('bore', 'envelope.bore', 'length', od + outsideDiameterGrowth(pitch, p.d, p.D), boreLimit(e.bore, p.D)));
  }
  if (e.minInnerDiameter !== undefined) push(out, underMin('min-inner-diameter', 'envelope.minInnerDiameter', 'length', id, e.minInnerDiameter));
  if (e.rod !== undefined) push(out, underMin('rod', 'envelope.rod', 'length', id, rodLimit(e.rod, p.D)));
}

function loadMisses(req: RequirementInternal, rate: number, L0: number, out: Miss[]): void {
  for (const l of req.loads) {
    const force = rate * (L0 - l.length);
    const band = (l.force * l.tolerancePercent) / 100;
    push(out, overMax('load-tolerance', `${l.path}.force`, 'force', force, l.force + band));
    push(out, underMin('load-tolerance', `${l.path}.force`, 'force', force, l.force - band));
  }
  if (req.rateTolerancePercent !== null) {
    const band = (req.rate * req.rateTolerancePercent) / 100;
    push(out, overMax('rate-tolerance', 'function.rate', 'rate', rate, req.rate + band));
    push(out, underMin('rate-tolerance', 'function.rate', 'rate', rate, req.rate - band));
  }
}

/** The coiled length's bound as a miss, by the quantity that bounds it (the review's coiled-length-out-of-bounds error). */
function boundMiss(p: DesignPoint, Ls: number, set: SetRemovalResult): Miss | null {
  if (set.bound === 'pitch-over-coiler') {
    return overMax('set-removal', 'function', 'length', set.coiledPitch ?? 0, coiledLimits.maximumPitchPerMeanDiameter * p.D);
  }
  if (set.bound === 'set-over-deflection') {
    return overMax('set-removal', 'function', 'length', set.expectedSet ?? 0, coiledLimits.maximumSetPerFinishedDeflection * (p.L0 - Ls));
  }
  return set.bound === null ? null : overMax('solid-stress', 'envelope', 'stress', set.stressAtSolid, set.allowableAfter);
}

/**
 * The review's set-removal rules on the engine's own decision (both methods, the stricter governing, as
 * analyseSpec judges a spec): within the allowable after set removal, a coiled length inside the coiler's and
 * the model's bounds, a set the first-off can measure against the free-length tolerance, and the stress ratio.
 */
function setRemovalMisses(req: RequirementInternal, p: DesignPoint, Ls: number, set: SetRemovalResult, out: Miss[]): void {
  const solidMiss = overMax('solid-stress', 'envelope', 'stress', set.stressAtSolid, set.allowableAfter);
  push(out, solidMiss);
  if (solidMiss || !set.achievable || !set.required) return;
  push(out, boundMiss(p, Ls, set));
  const tolerance = set.bound === null
    ? setControlTolerance({ freeLength: p.L0, toleranceGrade: req.toleranceGrade, springIndex: p.D / p.d, activeCoils: p.na })
    : null;
  if (tolerance) push(out, underMin('set-removal', 'function', 'length', set.expectedSet ?? 0, tolerance.plusMinus));
  push(out, overMax('set-removal', 'function', 'ratio', set.ratio, reviewLimits.maximumSetRatio));
}

function stressMisses(req: RequirementInternal, p: DesignPoint, wire: WireProperties, rate: number, Ls: number, out: Miss[]): boolean {
  const c = p.D / p.d;
  const perForce = torsionStressPerForce(p.D, p.d);
  const set = setRemoval({ wire, d: p.d, D: p.D, na: p.na, ends: p.ends, L0: p.L0 }, Ls, perForce * rate, c, 'stricter');
  setRemovalMisses(req, p, Ls, set, out);
  if (req.maxStressRatio !== null) push(out, overMax('stress-ratio', 'maxStressRatio', 'ratio', set.ratio, req.maxStressRatio));
  if (req.duty.type === 'cyclic' && hasSteelFatigueData(wire.family)) {
    const [a, b] = req.duty.between;
    const k = bergstraesser(c);
    const life = finiteLife('compression', req.duty.cycles, p.peened, wire.tensileStrength);
    const f = fatigueCheck(k * perForce * rate * (p.L0 - a), k * perForce * rate * (p.L0 - b), wire.tensileStrength, p.peened, life);
    if (f.verdict === 'pass') return set.required;
    // Under the endurance cycles the verdict is the finite-life limit's, else Goodman's.
    // No factor on a fail: the Zimmerli lines do not reach the wire, so no safety is shown (0).
    push(out, life ? overMax('fatigue-life', 'duty', 'stress', f.stressMax, life.limit)
      : underMin('fatigue', 'duty', 'ratio', f.goodmanSafetyFactor ?? 0, fatigueCriteria.goodmanPass));
  }
  return set.required;
}

/** Limits that rule out a whole grade: cyclic duty on a grade not made for it, a service temperature outside its range. */
export function gradeMisses(req: Pick<RequirementInternal, 'duty' | 'serviceTemperature'>, grade: WireGrade): Miss[] {
  const out: Miss[] = [];
  if (req.duty.type === 'cyclic' && !grade.dynamicGrade) {
    out.push({ limit: 'grade-duty', path: 'duty', quantity: 'count', value: 0, bound: 1, sense: 'min', relative: 1,
      note: `${grade.name} is not a grade for cyclic duty` });
  }
  const t = req.serviceTemperature;
  if (t) {
    push(out, overMax('grade-temperature', 'serviceTemperature.max', 'temperature', t.max, grade.serviceTemperature.max));
    push(out, underMin('grade-temperature', 'serviceTemperature.min', 'temperature', t.min, grade.serviceTemperature.min));
  }
  return out;
}

export function screenPoint(req: RequirementInternal, wire: WireProperties, p: DesignPoint): Screened {
  const out: Miss[] = [];
  const form = endForms[p.ends];
  const rate = helicalRate(wire.shearModulus, p.d, p.D, p.na);
  const Ls = solidLength(p.ends, p.d, p.nt);
  const pitch = form.pitch(p.L0, p.d, p.na);
  envelopeMisses(req, p, pitch, out);
  loadMisses(req, rate, p.L0, out);
  const e = req.envelope;
  if (e.maxSolidLength !== undefined) push(out, overMax('max-solid-length', 'envelope.maxSolidLength', 'length', Ls, e.maxSolidLength));
  if (e.maxFreeLength !== undefined) push(out, overMax('max-free-length', 'envelope.maxFreeLength', 'length', p.L0, e.maxFreeLength));
  push(out, underMin('active-coils', 'function', 'count', p.na, reviewLimits.minimumActiveCoils));
  const gaps = minimumCoilGapSum(p.D, p.d, p.na, req.duty.type === 'cyclic');
  const clearanceMiss = underMin('coil-clearance', 'function', 'length', req.deepestLength, Ls + gaps);
  push(out, clearanceMiss);
  const required = clearanceMiss || p.L0 <= Ls ? false : stressMisses(req, p, wire, rate, Ls, out);
  const wireLength = p.na * coilWireLength(p.D, pitch) + (p.nt - p.na) * Math.PI * p.D;
  return { misses: out, wireLength, setRemovalRequired: required };
}
