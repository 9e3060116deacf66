import { findGrade } from '../../core/materials/catalog';
import { EN_COMPRESSION_SOLID_FRACTION, staticAllowables } from '../../core/materials/allowables';
import { wireDiameterTolerance } from '../../core/materials/diameter-tolerance';
import { clampToRange, compiledStrength, modulusBandAt, strengthInto } from '../../core/materials/lookup';
import type { StrengthScratch } from '../../core/materials/lookup';
import type { Spec } from '../../core/spec';
import { bergstraesser, directShear, wahl } from '../../core/springs/factors';
import { coilWireLength, helicalRate, torsionStressPerForce, wireMass } from '../../core/springs/helix';
import { bucklingDeflection, seatingCoefficient, slendernessLimit } from '../../core/springs/compression/buckling';
import { minimumCoilGapSum, outsideDiameterGrowth } from '../../core/springs/compression/clearance';
import { endForms, maximumSolidLength, solidLength } from '../../core/springs/compression/ends';
import { naturalFrequency } from '../../core/springs/compression/surge';
import { coiledDeflectionFor, coiledLimits } from '../../core/springs/compression/set-removal';
import { MM_PER_IN } from '../../core/units';

/** The numbers the floor writes per spec: the report's numeric outputs for a one-load compression spring. */
export const FLOOR_OUTPUTS = 40;

/** One set-removal method's decision as numbers: [strictness, coiled free length (NaN: none), expected set]. */
function methodVerdict(L0: number, Ls: number, d: number, D: number, na: number, pitchOf: (L: number, d: number, na: number) => number,
  factor: number, perDeflection: number, before: number, after: number, into: Float64Array, o: number): void {
  const s0 = L0 - Ls;
  const stressAtSolid = factor * perDeflection * s0;
  const sY = before / (factor * perDeflection);
  const required = s0 > sY;
  const coiledDeflection = coiledDeflectionFor(s0, sY);
  const reachable = !Number.isNaN(coiledDeflection);
  const expectedSet = coiledDeflection - s0;
  const coiled = Ls + coiledDeflection;
  const pitch = reachable ? pitchOf(coiled, d, na) : 0;
  const bound = !reachable || expectedSet > coiledLimits.maximumSetPerFinishedDeflection * s0
    || (required && pitch > coiledLimits.maximumPitchPerMeanDiameter * D);
  const setFraction = reachable && coiledDeflection > 0 ? expectedSet / coiledDeflection : 0;
  into[o] = stressAtSolid > after ? 4 : bound ? 3 : required ? 1 + setFraction : 0;
  into[o + 1] = required ? (bound ? Number.NaN : coiled) : L0;
  into[o + 2] = required && reachable ? expectedSet : 0;
}

const verdicts = new Float64Array(6);

const scratch: StrengthScratch = { min: 0, max: null, basis: 'table', source: '', verified: false, fitIndex: -1 };

/**
 * The fair floor of a compression analysis: the same numbers the engine's report gives (geometry, rate,
 * solid length and its maximum, stresses with both correction factors, both set-removal methods' verdicts
 * and the governing one, load results, buckling, gaps, surge, wire length and mass), through the same formulas and the real wire
 * lookup (strength table or fit, modulus band, density, allowables by family), but writing into a
 * Float64Array: no objects, strings, findings or unit maps. The engine's time over this is its overhead.
 */
export function floorAnalysis(s: Extract<Spec, { kind: 'compression' }>, out: Float64Array, at: number): void {
  const f = s.units === 'inch' ? MM_PER_IN : 1;
  const d = s.wireDiameter * f;
  const D = s.meanDiameter !== undefined ? s.meanDiameter * f : s.outerDiameter !== undefined ? s.outerDiameter * f - d : s.innerDiameter! * f + d;
  const form = endForms[s.ends];
  const nt = s.totalCoils ?? s.activeCoils! + form.inactiveCoils;
  const na = nt - form.inactiveCoils;
  const L0 = s.freeLength * f;
  const grade = findGrade(s.material)!;
  strengthInto(compiledStrength(grade), d, scratch);
  const band = modulusBandAt(grade.moduli.bands, clampToRange(grade.diameterRange, d));
  const G = band.G;
  const Rm = scratch.min;
  const fractions = staticAllowables[grade.family];
  const c = D / d;
  const k = bergstraesser(c);
  const rate = helicalRate(G, d, D, na);
  const perForce = torsionStressPerForce(D, d);
  const Ls = solidLength(s.ends, d, nt);
  const pitch = form.pitch(L0, d, na);
  const solidForce = rate * (L0 - Ls);
  const dMax = d + wireDiameterTolerance(d);
  const LsMax = maximumSolidLength(s.ends, dMax, nt);
  const gaps = minimumCoilGapSum(D, d, na, s.duty.type === 'cyclic');
  const nu = seatingCoefficient[s.seating];
  const load = s.loads[0];
  const deflection = load ? L0 - load.length * f : 0;
  const perDeflection = perForce * rate;
  methodVerdict(L0, Ls, d, D, na, form.pitch, directShear(c), perDeflection, fractions.beforeSetRemoval * Rm, fractions.afterSetRemoval * Rm, verdicts, 0);
  methodVerdict(L0, Ls, d, D, na, form.pitch, 1, perDeflection, EN_COMPRESSION_SOLID_FRACTION * Rm, (4 / 3) * EN_COMPRESSION_SOLID_FRACTION * Rm, verdicts, 3);
  const g = verdicts[3]! > verdicts[0]! ? 3 : 0;
  const coiledFree = verdicts[g + 1]!;
  const coiledPitch = Number.isNaN(coiledFree) ? pitch : form.pitch(coiledFree, d, na);
  const wireLength = na * coilWireLength(D, coiledPitch) + (nt - na) * Math.PI * D;
  const o = at * FLOOR_OUTPUTS;
  out[o + 36] = verdicts[g]!; out[o + 37] = coiledFree; out[o + 38] = verdicts[g + 2]!; out[o + 39] = wireLength;
  out[o] = c; out[o + 1] = D; out[o + 2] = D + d; out[o + 3] = D - d; out[o + 4] = na; out[o + 5] = nt;
  out[o + 6] = pitch; out[o + 7] = rate; out[o + 8] = Ls; out[o + 9] = LsMax; out[o + 10] = dMax;
  out[o + 11] = solidForce; out[o + 12] = (solidForce * (L0 - Ls)) / 2; out[o + 13] = Rm; out[o + 14] = G;
  out[o + 15] = band.E; out[o + 16] = k; out[o + 17] = wahl(c); out[o + 18] = k * perForce * solidForce;
  out[o + 19] = perForce * solidForce; out[o + 20] = fractions.beforeSetRemoval * Rm; out[o + 21] = fractions.afterSetRemoval * Rm;
  out[o + 22] = directShear(c) * perForce * solidForce; out[o + 23] = EN_COMPRESSION_SOLID_FRACTION * Rm;
  out[o + 24] = deflection; out[o + 25] = rate * deflection; out[o + 26] = k * perForce * rate * deflection;
  out[o + 27] = perForce * rate * deflection; out[o + 28] = LsMax + gaps; out[o + 29] = gaps;
  out[o + 30] = bucklingDeflection(L0, D, nu, G, band.E) ?? Number.NaN; out[o + 31] = slendernessLimit(nu, G, band.E);
  out[o + 32] = L0 / D; out[o + 33] = D + d + outsideDiameterGrowth(pitch, d, D);
  out[o + 34] = naturalFrequency(d, D, na, G, grade.density.value); out[o + 35] = wireMass(d, wireLength, grade.density.value);
}
