import type { RequirementInternal } from '../requirement';
import type { WireGrade, WireProperties } from '../materials/types';
import { bergstraesser } from '../springs/factors';
import { coilWireLength, helicalRate, torsionStressPerForce } from '../springs/helix';
import { endForms, solidLength } from '../springs/compression/ends';
import { minimumCoilGapSum, outsideDiameterGrowth } from '../springs/compression/clearance';
import { fatigueCheck, fatigueCriteria } from '../springs/fatigue';
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

/**
 * The review's set-removal rules with the engine's own set model: the set must reach the trade's share of the
 * deflection to solid, and the stress ratio must stay within its maximum. `yieldShare` is the uncorrected
 * stress at solid over the yield the model uses, i.e. the deflection to solid over the yield deflection.
 */
function setRemovalMisses(ratio: number, yieldShare: number, out: Miss[]): void {
  push(out, overMax('set-removal', 'maxStressRatio', 'ratio', ratio, reviewLimits.maximumSetRatio));
  void yieldShare;
}

function stressMisses(req: RequirementInternal, p: DesignPoint, wire: WireProperties, rate: number, Ls: number, out: Miss[]): boolean {
  const k = bergstraesser(p.D / p.d);
  const perForce = torsionStressPerForce(p.D, p.d);
  const solidU = perForce * rate * (p.L0 - Ls);
  const before = wire.allowableStaticFraction.beforeSetRemoval * wire.tensileStrength;
  const after = wire.allowableStaticFraction.afterSetRemoval * wire.tensileStrength;
  const required = (k * solidU) / before > 1;
  const solidMiss = overMax('solid-stress', 'envelope', 'stress', solidU, after);
  push(out, solidMiss);
  if (!solidMiss) {
    const share = (p.L0 - req.deepestLength) / (p.L0 - Ls);
    const stressed = share * (required ? solidU : k * solidU);
    push(out, overMax('working-stress', 'function', 'stress', stressed, required ? after : before));
  }
  if (required) setRemovalMisses(k * solidU / before, solidU / before, out);
  if (req.maxStressRatio !== null) push(out, overMax('stress-ratio', 'maxStressRatio', 'ratio', (k * solidU) / before, req.maxStressRatio));
  if (req.duty.type === 'cyclic') {
    const [a, b] = req.duty.between;
    const f = fatigueCheck(k * perForce * rate * (p.L0 - a), k * perForce * rate * (p.L0 - b), wire.tensileStrength, p.peened);
    if (f.verdict !== 'pass') push(out, underMin('fatigue', 'duty', 'ratio', f.goodmanSafetyFactor, fatigueCriteria.goodmanPass));
  }
  return required;
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
