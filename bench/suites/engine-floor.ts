import { findGrade } from '../../core/materials/catalog';
import { EN_COMPRESSION_SOLID_FRACTION, staticAllowables } from '../../core/materials/allowables';
import { wireDiameterTolerance } from '../../core/materials/diameter-tolerance';
import { clampToRange, compiledStrength, modulusBandAt, strengthInto } from '../../core/materials/lookup';
import type { StrengthScratch } from '../../core/materials/lookup';
import { reviewLimits as lim } from '../../core/review/limits';
import { setControlTolerance } from '../../core/review/compression';
import { EDGE_TOLERANCE } from '../../core/materials/properties';
import { specBounds } from '../../core/spec/bounds';
import type { Bound } from '../../core/spec/bounds';
import { bergstraesser, directShear, wahl } from '../../core/springs/factors';
import { ENDURANCE_CYCLES, finiteLife, infiniteLifeCheck, TORSIONAL_ULTIMATE_RATIO } from '../../core/springs/fatigue';
import { DEFAULT_LOAD_TOLERANCE_PERCENT } from '../../core/springs/specified';
import { coilWireLength, helicalRate, torsionStressPerForce, wireMass } from '../../core/springs/helix';
import { bucklingDeflection, seatingCoefficient, slendernessLimit } from '../../core/springs/compression/buckling';
import { minimumCoilGapSum, outsideDiameterGrowth } from '../../core/springs/compression/clearance';
import { endForms, maximumSolidLength, solidLength } from '../../core/springs/compression/ends';
import { naturalFrequency, SURGE_MARGIN } from '../../core/springs/compression/surge';
import { coiledDeflectionFor, coiledLimits } from '../../core/springs/compression/set-removal';
import { toInternal } from '../../core/units';
import type { Quantity, UnitSystem } from '../../core/units';

/**
 * What the floor writes per spec, slot by slot: the report field it stands for (a path into the report
 * `calculate` returns) and what it measures, so the floor converts it out as the engine does and the bench
 * checks it against the engine's own number. `-` marks the floor's own bookkeeping.
 */
export const FLOOR_FIELDS = [
  ['springIndex', 'ratio'], ['meanDiameter', 'length'], ['outerDiameter', 'length'], ['innerDiameter', 'length'],
  ['activeCoils', 'count'], ['totalCoils', 'count'], ['pitch', 'length'], ['rate', 'rate'], ['solidLength', 'length'],
  ['solidLengthMaximum', 'length'], ['wireDiameterMaximum', 'length'], ['solidForce', 'force'],
  ['storedEnergyAtSolid', 'energy'], ['tensileStrength', 'stress'], ['shearModulus', 'stress'],
  ['elasticModulus', 'stress'], ['stressCorrectionFactor', 'ratio'], ['wahlFactor', 'ratio'], ['stressAtSolid', 'stress'],
  ['stressAtSolidUncorrected', 'stress'], ['allowableStress', 'stress'], ['allowableStressSetRemoved', 'stress'],
  ['loads.0.deflection', 'length'], ['loads.0.force', 'force'], ['loads.0.stress', 'stress'],
  ['loads.0.stressUncorrected', 'stress'], ['minimumWorkingLength', 'length'], ['coilGapSum', 'length'],
  ['bucklingDeflection', 'length'], ['slendernessLimit', 'ratio'], ['slenderness', 'ratio'],
  ['outerDiameterAtSolid', 'length'], ['naturalFrequency', 'frequency'], ['mass', 'mass'], ['wireLength', 'length'],
  ['coiler.freeLength', 'length'], ['coiler.expectedSet', 'length'], ['freeLength', 'length'], ['loads.0.length', 'length'],
  ['fatigue.stressMax', 'stress'], ['fatigue.goodmanSafetyFactor', 'ratio'], ['fatigue.gerberSafetyFactor', 'ratio'],
  ...(['handbook', 'en13906'] as const).flatMap((m) => [
    [`setRemoval.methods.${m}.stressAtSolid`, 'stress'], [`setRemoval.methods.${m}.allowableBefore`, 'stress'],
    [`setRemoval.methods.${m}.allowableAfter`, 'stress'], [`setRemoval.methods.${m}.ratio`, 'ratio'],
    [`setRemoval.methods.${m}.coiledFreeLength`, 'length'], [`setRemoval.methods.${m}.expectedSet`, 'length'],
    [`setRemoval.methods.${m}.coiledPitch`, 'length'], [`setRemoval.methods.${m}.setFraction`, 'ratio'],
  ] as const),
  ['-findings', 'count'], ['-strictness', 'count'],
] as const satisfies readonly (readonly [string, Quantity])[];

export const FLOOR_OUTPUTS = FLOOR_FIELDS.length;
const slot = (path: string): number => FLOOR_FIELDS.findIndex(([p]) => p === path);
const METHODS = slot('setRemoval.methods.handbook.stressAtSolid');
const FINDINGS = slot('-findings');
const STRICTNESS = slot('-strictness');

/**
 * The review's finding codes for a compression spring, one bit each: the floor decides the same findings
 * as the engine (the bench compares the sets), without writing their messages.
 */
export const FLOOR_FINDINGS = [
  'wire-diameter-outside-grade', 'strength-from-fit', 'index-not-makeable', 'index-outside-preferred',
  'solid-stress-over-set-removed-allowable', 'coiled-length-out-of-bounds', 'set-removal-required',
  'set-below-length-tolerance', 'set-ratio-high', 'working-length-below-solid', 'coil-clearance', 'buckling',
  'near-buckling', 'load-outside-tolerance', 'over-determined', 'grinding-fine-wire', 'few-active-coils',
  'outside-en15800-scope', 'temperature-above-grade', 'temperature-below-grade', 'grade-not-for-cyclic-duty', 'surge',
  'no-fatigue-data', 'fatigue-fail', 'fatigue-marginal',
] as const;
const bit = (code: (typeof FLOOR_FINDINGS)[number]): number => 1 << FLOOR_FINDINGS.indexOf(code);

/** Out-conversion factor per slot and unit system, as core/units defines it (no offsets among these). */
const outFactors: Record<UnitSystem, Float64Array> = {
  metric: Float64Array.from(FLOOR_FIELDS, ([p, q]) => (p.startsWith('-') ? 1 : toInternal(1, q, 'metric'))),
  inch: Float64Array.from(FLOOR_FIELDS, ([p, q]) => (p.startsWith('-') ? 1 : toInternal(1, q, 'inch'))),
};

const SPEC_KEYS = new Set([
  'kind', 'version', 'units', 'material', 'wireDiameter', 'outerDiameter', 'innerDiameter', 'meanDiameter', 'materialOverrides',
  'notes', 'totalCoils', 'activeCoils', 'ends', 'freeLength', 'loads', 'seating', 'duty', 'freeParameters', 'quantities',
  'toleranceGrade', 'finish', 'bakeSpecification', 'aql', 'directionOfWind', 'shotPeen', 'serviceTemperature',
]);

type Raw = Record<string, unknown>;

const isPositive = (v: unknown): v is number => typeof v === 'number' && v > 0 && v < Number.POSITIVE_INFINITY;
const inBound = (v: number, b: Bound, f: number): boolean => v * f >= b.min * (1 - 1e-12) && v * f <= b.max * (1 + 1e-12);
const positiveIn = (v: unknown, b: Bound, f: number): v is number => isPositive(v) && inBound(v, b, f);
const optionalIn = (v: unknown, b: Bound, f: number): boolean => v === undefined || positiveIn(v, b, f);

function loadValid(l: unknown, L0: number, lengthF: number, forceF: number): boolean {
  if (typeof l !== 'object' || l === null || Array.isArray(l)) return false;
  const load = l as Raw;
  for (const k in load) if (k !== 'length' && k !== 'force' && k !== 'tolerancePercent') return false;
  const t = load.tolerancePercent;
  return positiveIn(load.length, specBounds.length, lengthF) && load.length < L0 && optionalIn(load.force, specBounds.force, forceF)
    && (t === undefined || (isPositive(t) && t <= 100 && load.force !== undefined));
}

function dutyValid(duty: unknown, L0: number, lengthF: number): boolean {
  if (duty === undefined) return true;
  if (typeof duty !== 'object' || duty === null) return false;
  const d = duty as Raw;
  if (d.type === 'static') return Object.keys(d).length === 1;
  if (d.type !== 'cyclic') return false;
  for (const k in d) if (k !== 'type' && k !== 'between' && k !== 'cycles' && k !== 'peened' && k !== 'frequency') return false;
  const b = d.between;
  return Array.isArray(b) && b.length === 2 && positiveIn(b[0], specBounds.length, lengthF) && positiveIn(b[1], specBounds.length, lengthF)
    && b[0] < L0 && b[1] < L0 && b[0] !== b[1] && positiveIn(d.cycles, specBounds.cycles, 1)
    && (d.peened === undefined || typeof d.peened === 'boolean') && optionalIn(d.frequency, specBounds.frequency, 1);
}

/** The order fields and overrides the bench specs leave out: present ones are checked by type and bound. */
function extrasValid(s: Raw, units: UnitSystem): boolean {
  const o = s.materialOverrides;
  if (o !== undefined) {
    if (typeof o !== 'object' || o === null) return false;
    const m = o as Raw;
    const sf = toInternal(1, 'stress', units);
    if (!optionalIn(m.shearModulus, specBounds.shearModulus, sf) || !optionalIn(m.elasticModulus, specBounds.elasticModulus, sf)
      || !optionalIn(m.tensileStrength, specBounds.tensileStrength, sf) || !optionalIn(m.density, specBounds.density, toInternal(1, 'density', units))) return false;
  }
  const t = s.serviceTemperature as Raw | undefined;
  if (t !== undefined && !(typeof t.min === 'number' && typeof t.max === 'number' && t.max >= t.min)) return false;
  return (s.notes === undefined || typeof s.notes === 'string') && (s.finish === undefined || typeof s.finish === 'string')
    && (s.quantities === undefined || Array.isArray(s.quantities)) && (s.freeParameters === undefined || Array.isArray(s.freeParameters));
}

/** Validation of a raw compression spec as numbers: shape, types, bounds, end form, coil count and lengths. */
function rawValid(s: Raw): boolean {
  for (const k in s) if (!SPEC_KEYS.has(k)) return false;
  if (s.kind !== 'compression' || (s.version !== undefined && s.version !== 1)) return false;
  const units = s.units;
  if (units !== 'metric' && units !== 'inch') return false;
  const f = toInternal(1, 'length', units);
  const d = s.wireDiameter;
  const given = (s.outerDiameter !== undefined ? 1 : 0) + (s.innerDiameter !== undefined ? 1 : 0) + (s.meanDiameter !== undefined ? 1 : 0);
  if (typeof s.material !== 'string' || findGrade(s.material) === undefined || !positiveIn(d, specBounds.wireDiameter, f) || given !== 1) return false;
  const cd = specBounds.coilDiameter;
  if (!optionalIn(s.outerDiameter, cd, f) || !optionalIn(s.innerDiameter, cd, f) || !optionalIn(s.meanDiameter, cd, f)) return false;
  const D = s.outerDiameter !== undefined ? (s.outerDiameter as number) - d : s.innerDiameter !== undefined ? (s.innerDiameter as number) + d : s.meanDiameter as number;
  const form = typeof s.ends === 'string' && Object.hasOwn(endForms, s.ends) ? endForms[s.ends as keyof typeof endForms] : undefined;
  if (!form || !(D / d >= 2) || (s.totalCoils === undefined) === (s.activeCoils === undefined)) return false;
  if (!optionalIn(s.totalCoils, specBounds.coils, 1) || !optionalIn(s.activeCoils, specBounds.coils, 1)) return false;
  const nt = (s.totalCoils as number | undefined) ?? (s.activeCoils as number) + form.inactiveCoils;
  if (nt - form.inactiveCoils < 1 || !positiveIn(s.freeLength, specBounds.length, f) || d * (nt + form.solidExtra) >= s.freeLength) return false;
  if (s.seating !== undefined && !(typeof s.seating === 'string' && Object.hasOwn(seatingCoefficient, s.seating))) return false;
  const loads = s.loads ?? [];
  if (!Array.isArray(loads) || loads.length > 8) return false;
  for (const l of loads) if (!loadValid(l, s.freeLength, f, toInternal(1, 'force', units))) return false;
  return dutyValid(s.duty, s.freeLength, f) && extrasValid(s, units);
}

/** One set-removal method's decision as numbers, written from `o`: the report's eight numbers and the strictness. */
function methodVerdict(L0: number, Ls: number, d: number, D: number, na: number, pitchOf: (L: number, d: number, na: number) => number,
  factor: number, perDeflection: number, before: number, after: number, out: Float64Array, o: number): number {
  const s0 = L0 - Ls;
  const stressAtSolid = factor * perDeflection * s0;
  const sY = before / (factor * perDeflection);
  const required = s0 > sY;
  const coiledDeflection = coiledDeflectionFor(s0, sY);
  const reachable = !Number.isNaN(coiledDeflection);
  const expectedSet = coiledDeflection - s0;
  const coiled = Ls + coiledDeflection;
  const pitch = reachable ? pitchOf(coiled, d, na) : Number.NaN;
  const bound = !reachable || expectedSet > coiledLimits.maximumSetPerFinishedDeflection * s0
    || (required && pitch > coiledLimits.maximumPitchPerMeanDiameter * D);
  const setFraction = reachable && coiledDeflection > 0 ? expectedSet / coiledDeflection : Number.NaN;
  out[o] = stressAtSolid; out[o + 1] = before; out[o + 2] = after; out[o + 3] = stressAtSolid / before;
  out[o + 4] = bound ? Number.NaN : coiled; out[o + 5] = reachable ? expectedSet : Number.NaN; out[o + 6] = pitch; out[o + 7] = setFraction;
  return stressAtSolid > after ? 4 : bound ? 3 : required ? 1 + (reachable && coiledDeflection > 0 ? setFraction : 0) : 0;
}

/** The share a size may pass a grade's range by and still count as inside (core/materials/properties.ts). */
const EDGE = EDGE_TOLERANCE;

const scratch: StrengthScratch = { min: 0, max: null, basis: 'table', source: '', verified: false, fitIndex: -1 };

/**
 * The fair floor of `calculate` for a compression spec: the same work as numbers. It validates the raw input
 * (shape, types, bounds, coil count, lengths), converts it in, looks the wire up for real (strength table or
 * fit, modulus band, density, allowables by family, size range), computes the report's numbers through the
 * same formulas (geometry, rate, solid lengths, stresses with both factors, both set-removal methods and the
 * governing one, load results, gaps, buckling, surge, wire length, mass, fatigue), decides the review's
 * findings (the same codes, one bit each, with the real EN 15800 tolerance lookup where the engine makes it)
 * and converts the numbers out to the spec's units. It writes into a Float64Array: no objects, no strings
 * (no finding messages, sources or unit maps). Returns false for a spec `calculate` refuses.
 */
export function floorCalculate(raw: unknown, out: Float64Array, at: number): boolean {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) return false;
  const s = raw as Raw;
  if (!rawValid(s)) return false;
  const units = s.units as UnitSystem;
  const f = toInternal(1, 'length', units);
  const d = (s.wireDiameter as number) * f;
  const D = s.meanDiameter !== undefined ? (s.meanDiameter as number) * f
    : s.outerDiameter !== undefined ? (s.outerDiameter as number) * f - d : (s.innerDiameter as number) * f + d;
  const ends = s.ends as keyof typeof endForms;
  const form = endForms[ends];
  const nt = (s.totalCoils as number | undefined) ?? (s.activeCoils as number) + form.inactiveCoils;
  const na = nt - form.inactiveCoils;
  const L0 = (s.freeLength as number) * f;
  const grade = findGrade(s.material as string)!;
  const strength = compiledStrength(grade);
  strengthInto(strength, d, scratch);
  const band = modulusBandAt(grade.moduli.bands, clampToRange(grade.diameterRange, d));
  const G = band.G;
  const Rm = scratch.min;
  const fractions = staticAllowables[grade.family];
  const c = D / d;
  const k = bergstraesser(c);
  const rate = helicalRate(G, d, D, na);
  const perForce = torsionStressPerForce(D, d);
  const Ls = solidLength(ends, d, nt);
  const pitch = form.pitch(L0, d, na);
  const solidForce = rate * (L0 - Ls);
  const dMax = d + wireDiameterTolerance(d);
  const LsMax = maximumSolidLength(ends, dMax, nt);
  const duty = s.duty as Raw | undefined;
  const cyclic = duty?.type === 'cyclic';
  const gaps = minimumCoilGapSum(D, d, na, cyclic);
  const seating = (s.seating ?? 'both-fixed') as keyof typeof seatingCoefficient;
  const nu = seatingCoefficient[seating];
  const loads = (s.loads ?? []) as Raw[];
  const load = loads[0];
  const deflection = load ? L0 - (load.length as number) * f : Number.NaN;
  const perDeflection = perForce * rate;
  const o = at * FLOOR_OUTPUTS;
  const m = o + METHODS;
  const hb = methodVerdict(L0, Ls, d, D, na, form.pitch, directShear(c), perDeflection, fractions.beforeSetRemoval * Rm, fractions.afterSetRemoval * Rm, out, m);
  const en = methodVerdict(L0, Ls, d, D, na, form.pitch, 1, perDeflection, EN_COMPRESSION_SOLID_FRACTION * Rm, (4 / 3) * EN_COMPRESSION_SOLID_FRACTION * Rm, out, m + 8);
  const g = en > hb ? m + 8 : m;
  const strictness = en > hb ? en : hb;
  const required = out[g]! > out[g + 1]!;
  const coiledFree = required ? out[g + 4]! : L0;
  const coiledPitch = Number.isNaN(coiledFree) ? pitch : form.pitch(coiledFree, d, na);
  const wireLength = na * coilWireLength(D, coiledPitch) + (nt - na) * Math.PI * D;
  const sK = bucklingDeflection(L0, D, nu, G, band.E) ?? Number.NaN;
  const frequency = naturalFrequency(d, D, na, G, grade.density.value);
  out[o] = c; out[o + 1] = D; out[o + 2] = D + d; out[o + 3] = D - d; out[o + 4] = na; out[o + 5] = nt;
  out[o + 6] = pitch; out[o + 7] = rate; out[o + 8] = Ls; out[o + 9] = LsMax; out[o + 10] = dMax;
  out[o + 11] = solidForce; out[o + 12] = (solidForce * (L0 - Ls)) / 2; out[o + 13] = Rm; out[o + 14] = G;
  out[o + 15] = band.E; out[o + 16] = k; out[o + 17] = wahl(c); out[o + 18] = k * perForce * solidForce;
  out[o + 19] = perForce * solidForce; out[o + 20] = fractions.beforeSetRemoval * Rm; out[o + 21] = fractions.afterSetRemoval * Rm;
  out[o + 22] = deflection; out[o + 23] = rate * deflection; out[o + 24] = k * perForce * rate * deflection;
  out[o + 25] = perForce * rate * deflection; out[o + 26] = LsMax + gaps; out[o + 27] = gaps;
  out[o + 28] = sK; out[o + 29] = slendernessLimit(nu, G, band.E);
  out[o + 30] = L0 / D; out[o + 31] = D + d + outsideDiameterGrowth(pitch, d, D);
  out[o + 32] = frequency; out[o + 33] = wireMass(d, wireLength, grade.density.value); out[o + 34] = wireLength;
  out[o + 35] = coiledFree; out[o + 36] = required && !Number.isNaN(out[g + 5]!) ? out[g + 5]! : 0; out[o + 37] = L0; out[o + 38] = load ? (load.length as number) * f : Number.NaN;
  let findings = 0;
  const steel = grade.family !== 'non-ferrous';
  if (cyclic && steel) {
    const a = k * perForce * rate * (L0 - ((duty.between as number[])[0]!) * f);
    const b = k * perForce * rate * (L0 - ((duty.between as number[])[1]!) * f);
    const peened = duty.peened === true;
    const ta = (Math.max(a, b) - Math.min(a, b)) / 2;
    const tm = (Math.max(a, b) + Math.min(a, b)) / 2;
    const infinite = infiniteLifeCheck(ta, tm, peened, TORSIONAL_ULTIMATE_RATIO * Rm);
    out[o + 39] = Math.max(a, b); out[o + 40] = infinite.goodman ?? Number.NaN; out[o + 41] = infinite.gerber ?? Number.NaN;
    const cycles = duty.cycles as number;
    const life = cycles < ENDURANCE_CYCLES ? finiteLife('compression', cycles, peened, Rm) : null;
    if (life) findings |= Math.max(a, b) <= life.limit ? 0 : bit('fatigue-fail');
    else if (infinite.verdict !== 'pass') findings |= bit(`fatigue-${infinite.verdict}`);
  } else {
    out[o + 39] = Number.NaN; out[o + 40] = Number.NaN; out[o + 41] = Number.NaN;
  }
  if (!(d >= grade.diameterRange.min * (1 - EDGE) && d <= grade.diameterRange.max * (1 + EDGE))) findings |= bit('wire-diameter-outside-grade');
  const temperature = s.serviceTemperature as { min: number; max: number } | undefined;
  if (temperature && toInternal(temperature.max, 'temperature', units) > grade.serviceTemperature.max) findings |= bit('temperature-above-grade');
  if (temperature && toInternal(temperature.min, 'temperature', units) < grade.serviceTemperature.min) findings |= bit('temperature-below-grade');
  if (scratch.basis === 'fit') findings |= bit('strength-from-fit');
  if (c > lim.makeableIndex.max) findings |= bit('index-not-makeable');
  else if (c < lim.preferredIndex.min || c > lim.preferredIndex.max) findings |= bit('index-outside-preferred');
  if (strictness === 4) findings |= bit('solid-stress-over-set-removed-allowable');
  else if (required) {
    if (Number.isNaN(out[g + 4]!)) findings |= bit('coiled-length-out-of-bounds');
    else {
      findings |= bit('set-removal-required');
      const tolerance = setControlTolerance({ freeLength: L0, toleranceGrade: s.toleranceGrade as 1 | 2 | 3 | undefined, springIndex: c, activeCoils: na });
      const set = out[g + 5]!;
      if (tolerance && (Number.isNaN(set) ? 0 : set) < tolerance.plusMinus) findings |= bit('set-below-length-tolerance');
    }
    if (out[g + 3]! > lim.maximumSetRatio) findings |= bit('set-ratio-high');
  }
  let deepest = Number.POSITIVE_INFINITY;
  let forced = 0;
  for (let i = 0; i < loads.length; i++) {
    const li = loads[i]!;
    const length = (li.length as number) * f;
    if (length < deepest) deepest = length;
    if (li.force === undefined) continue;
    forced++;
    const force = rate * (L0 - length);
    const asked = (li.force as number) * toInternal(1, 'force', units);
    const t = (li.tolerancePercent as number | undefined) ?? DEFAULT_LOAD_TOLERANCE_PERCENT;
    if (!(Math.abs(force - asked) <= ((asked * t) / 100) * (1 + 1e-9))) findings |= bit('load-outside-tolerance');
  }
  if (cyclic) for (const len of duty.between as number[]) if (len * f < deepest) deepest = len * f;
  if (deepest < Number.POSITIVE_INFINITY) {
    if (deepest <= Ls) findings |= bit('working-length-below-solid');
    else if (deepest < LsMax + gaps) findings |= bit('coil-clearance');
    const working = L0 - deepest;
    if (!Number.isNaN(sK) && working >= sK) findings |= bit('buckling');
    if (!Number.isNaN(sK) && working < sK && working >= (1 - lim.bucklingMargin) * sK) findings |= bit('near-buckling');
  }
  if (forced > 0) {
    const free = (s.freeParameters ?? []) as string[];
    const missing = forced >= 2 ? !free.includes('freeLength') || !free.includes('coils') || !free.includes('wireDiameter')
      : free.includes('freeLength') ? false : !free.includes('coils') || !free.includes('wireDiameter');
    if (missing) findings |= bit('over-determined');
  }
  if (form.ground && d < lim.minimumGroundWire) findings |= bit('grinding-fine-wire');
  if (na < lim.minimumActiveCoils) findings |= bit('few-active-coils');
  const scope = lim.en15800;
  if (d < scope.d.min || d > scope.d.max || D < scope.D.min || D > scope.D.max || L0 > scope.L0Max || na < scope.nMin
    || c < scope.w.min || c > scope.w.max) findings |= bit('outside-en15800-scope');
  if (cyclic) {
    if (!grade.dynamicGrade) findings |= bit('grade-not-for-cyclic-duty');
    if (duty.frequency !== undefined && frequency < SURGE_MARGIN * (duty.frequency as number)) findings |= bit('surge');
    if (!steel) findings |= bit('no-fatigue-data');
  }
  out[o + FINDINGS] = findings;
  out[o + STRICTNESS] = strictness;
  const factors = outFactors[units];
  for (let i = 0; i < FLOOR_OUTPUTS; i++) out[o + i] = out[o + i]! / factors[i]!;
  return true;
}
