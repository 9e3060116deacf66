import { bergstraesser, directShear, wahl } from '../factors';
import { coilWireLength, helicalRate, torsionStressPerForce, wireMass } from '../helix';
import { fatigueCheck, finiteLife, hasSteelFatigueData } from '../fatigue';
import { bucklingDeflection, seatingCoefficient, slendernessLimit } from './buckling';
import { minimumCoilGapSum, outsideDiameterGrowth } from './clearance';
import { endForms, maximumSolidLength, solidLength } from './ends';
import { naturalFrequency } from './surge';
import { coiledDeflectionFor, coiledLimits, SET_STROKES } from './set-removal';
import type { CoiledBound, SetRemovalGoverning, SetRemovalMethod } from './set-removal';
import { EN_COMPRESSION_SOLID_FRACTION, EN_COMPRESSION_SOLID_SOURCE } from '../../materials/allowables';
import { wireDiameterTolerance } from '../../materials/diameter-tolerance';
import { checkSpecified } from '../specified';
import type { CompressionDesign } from './design';
import type { CoilerSettings, CompressionLoadResult, CompressionReport, SetRemovalResult, SetRemovalVerdict } from './report';

function loadResult(x: CompressionDesign, rate: number, perForce: number, k: number, i: number): CompressionLoadResult {
  const load = x.loads[i]!;
  const deflection = x.L0 - load.length;
  const force = rate * deflection;
  const check = checkSpecified(force, load.force, load.tolerancePercent);
  return {
    length: load.length, deflection, force, stress: k * perForce * force, stressUncorrected: perForce * force,
    specifiedForce: check.specified, tolerancePercent: check.tolerancePercent, withinTolerance: check.withinTolerance,
  };
}

/** What the set-removal decision reads of a design: the wire, the coils, the end form and the free length. */
export type SetRemovalInput = Pick<CompressionDesign, 'wire' | 'd' | 'D' | 'na' | 'ends' | 'L0'>;

const HANDBOOK_BASIS = 'stress with the direct-shear factor Ks (Shigley 9e Eq. 10-2) against the before / after set-removal ' +
  'fractions of Shigley 9e Table 10-6; the set model yields on this stress';
const EN_BASIS = `uncorrected stress 8FD/(πd³) against ${EN_COMPRESSION_SOLID_SOURCE}; the set model yields on this stress, ` +
  'and after presetting the limit is the fully plastic wire\'s 4/3 of it (derived: no EN limit after presetting is known)';

/**
 * One method's verdict: `factor` turns the uncorrected stress 8FD/(πd³) into the method's basis stress, and
 * `before` / `after` are its allowables before and after set removal.
 */
function verdict(
  x: SetRemovalInput, method: SetRemovalMethod, basis: string, factor: number, before: number, after: number,
  Ls: number, perDeflection: number,
): SetRemovalVerdict {
  const s0 = x.L0 - Ls;
  const stressAtSolid = factor * perDeflection * s0;
  const sY = before / (factor * perDeflection);
  const required = s0 > sY;
  const coiledDeflection = coiledDeflectionFor(s0, sY);
  const reachable = !Number.isNaN(coiledDeflection);
  const expectedSet = coiledDeflection - s0;
  const coiled = reachable ? Ls + coiledDeflection : null;
  const coiledPitch = coiled === null ? null : endForms[x.ends].pitch(coiled, x.d, x.na);
  const bound: CoiledBound | null = coiled === null ? 'beyond-fully-plastic'
    : expectedSet > coiledLimits.maximumSetPerFinishedDeflection * s0 ? 'set-over-deflection'
      : required && (coiledPitch ?? 0) > coiledLimits.maximumPitchPerMeanDiameter * x.D ? 'pitch-over-coiler' : null;
  return {
    method, basis, stressAtSolid, allowableBefore: before, allowableAfter: after,
    required, ratio: stressAtSolid / before,
    coiledFreeLength: bound === null ? coiled : null,
    expectedSet: reachable ? expectedSet : null,
    coiledPitch,
    setFraction: reachable && coiledDeflection > 0 ? expectedSet / coiledDeflection : null,
    achievable: stressAtSolid <= after,
    bound,
  };
}

/** Larger is stricter: fails after set removal, then passes a physical limit, then needs set removal, then the larger set. */
function strictness(v: SetRemovalVerdict): number {
  if (!v.achievable) return 4;
  if (v.bound !== null) return 3;
  return v.required ? 1 + (v.setFraction ?? 0) : 0;
}

/**
 * Both methods' verdicts and the governing one for a finished spring, `perDeflection` the uncorrected stress
 * per mm of deflection (8·D·rate/(π·d³)). Exported so the design search screens with the same decision.
 */
export function setRemoval(x: SetRemovalInput, Ls: number, perDeflection: number, c: number, governedBy: SetRemovalGoverning): SetRemovalResult {
  const Rm = x.wire.tensileStrength;
  const f = x.wire.allowableStaticFraction;
  const handbook = verdict(x, 'handbook', HANDBOOK_BASIS, directShear(c), f.beforeSetRemoval * Rm, f.afterSetRemoval * Rm, Ls, perDeflection);
  const en13906 = verdict(x, 'en13906', EN_BASIS, 1, EN_COMPRESSION_SOLID_FRACTION * Rm,
    (4 / 3) * EN_COMPRESSION_SOLID_FRACTION * Rm, Ls, perDeflection);
  const governing: SetRemovalMethod = governedBy !== 'stricter' ? governedBy
    : strictness(en13906) > strictness(handbook) ? 'en13906' : 'handbook';
  const v = governing === 'handbook' ? handbook : en13906;
  // Fields listed one by one: a spread here made the analysis several times slower (npm run bench).
  return {
    method: v.method, basis: v.basis, stressAtSolid: v.stressAtSolid, allowableBefore: v.allowableBefore,
    allowableAfter: v.allowableAfter, required: v.required, ratio: v.ratio, coiledFreeLength: v.coiledFreeLength,
    expectedSet: v.expectedSet, coiledPitch: v.coiledPitch, setFraction: v.setFraction, achievable: v.achievable,
    bound: v.bound, governing, governedBy, methods: { handbook, en13906 },
  };
}

function coilerSettings(x: CompressionDesign, set: SetRemovalResult, finishedPitch: number): CoilerSettings {
  const freeLength = !set.required ? x.L0 : set.coiledFreeLength;
  const pitch = freeLength === null ? null : endForms[x.ends].pitch(freeLength, x.d, x.na);
  return {
    freeLength, pitch, totalCoils: x.nt, activeCoils: x.na,
    wireLength: x.na * coilWireLength(x.D, pitch ?? finishedPitch) + (x.nt - x.na) * Math.PI * x.D,
    expectedSet: set.required ? set.expectedSet ?? 0 : 0,
    pressStrokes: set.required ? SET_STROKES : 0,
  };
}

/** Geometry, rate, stresses, limits and manufacturing quantities of a compression spring (internal units). */
export function analyseCompression(x: CompressionDesign, governedBy: SetRemovalGoverning = 'stricter'): CompressionReport {
  const { d, D, na, nt, L0, wire } = x;
  const c = D / d;
  const k = bergstraesser(c);
  const rate = helicalRate(wire.shearModulus, d, D, na);
  const perForce = torsionStressPerForce(D, d);
  const Ls = solidLength(x.ends, d, nt);
  const pitch = endForms[x.ends].pitch(L0, d, na);
  const solidForce = rate * (L0 - Ls);
  const allowable = wire.allowableStaticFraction.beforeSetRemoval * wire.tensileStrength;
  const nu = seatingCoefficient[x.seating];
  const set = setRemoval(x, Ls, perForce * rate, c, governedBy);
  const coiler = coilerSettings(x, set, pitch);
  const wireLength = coiler.wireLength;
  const dMax = d + wireDiameterTolerance(d);
  const LsMax = maximumSolidLength(x.ends, dMax, nt);
  const gaps = minimumCoilGapSum(D, d, na, x.duty.type === 'cyclic');
  const loads: CompressionLoadResult[] = [];
  for (let i = 0; i < x.loads.length; i++) loads.push(loadResult(x, rate, perForce, k, i));
  const fatigue = x.duty.type === 'cyclic' && hasSteelFatigueData(wire.family)
    ? fatigueCheck(
      k * perForce * rate * (L0 - x.duty.between[0]),
      k * perForce * rate * (L0 - x.duty.between[1]),
      wire.tensileStrength, x.duty.peened, finiteLife('compression', x.duty.cycles, x.duty.peened, wire.tensileStrength))
    : null;
  const sK = bucklingDeflection(L0, D, nu, wire.shearModulus, wire.elasticModulus);
  return {
    kind: 'compression', units: x.units, material: wire.gradeId, wireDiameter: d, ends: x.ends,
    springIndex: c, meanDiameter: D, outerDiameter: D + d, innerDiameter: D - d, activeCoils: na, totalCoils: nt,
    freeLength: L0, pitch, rate, solidLength: Ls,
    solidLengthMaximum: LsMax, solidLengthMaximumSource: endForms[x.ends].maximumSolidSource, wireDiameterMaximum: dMax,
    solidForce, storedEnergyAtSolid: (solidForce * (L0 - Ls)) / 2,
    tensileStrength: wire.tensileStrength, tensileStrengthBasis: wire.tensileStrengthBasis,
    tensileStrengthSource: wire.tensileStrengthSource,
    shearModulus: wire.shearModulus, elasticModulus: wire.elasticModulus, density: wire.density,
    stressCorrectionFactor: k, wahlFactor: wahl(c),
    stressAtSolid: k * perForce * solidForce, stressAtSolidUncorrected: perForce * solidForce,
    allowableStress: allowable,
    allowableStressSetRemoved: wire.allowableStaticFraction.afterSetRemoval * wire.tensileStrength,
    loads,
    minimumWorkingLength: LsMax + gaps,
    coilGapSum: gaps,
    bucklingDeflection: sK,
    slendernessLimit: slendernessLimit(nu, wire.shearModulus, wire.elasticModulus),
    slenderness: L0 / D,
    outerDiameterAtSolid: D + d + outsideDiameterGrowth(pitch, d, D),
    naturalFrequency: naturalFrequency(d, D, na, wire.shearModulus, wire.density),
    wireLength,
    mass: wireMass(d, wireLength, wire.density),
    setRemoval: set,
    coiler,
    fatigue,
    findings: [],
  };
}
