import { bergstraesser, wahl } from '../factors';
import { coilWireLength, helicalRate, torsionStressPerForce, wireMass } from '../helix';
import { fatigueCheck } from '../fatigue';
import { bucklingDeflection, seatingCoefficient, slendernessLimit } from './buckling';
import { minimumCoilGapSum, outsideDiameterGrowth } from './clearance';
import { endForms, solidLength } from './ends';
import { naturalFrequency } from './surge';
import { solveCoiledDeflection } from './set-removal';
import { checkSpecified } from '../specified';
import type { CompressionDesign } from './design';
import type { CompressionLoadResult, CompressionReport, SetRemovalResult } from './report';

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

function setRemoval(x: CompressionDesign, Ls: number, perDeflection: number, k: number, allowable: number): SetRemovalResult {
  const s0 = x.L0 - Ls;
  const tauY = x.wire.allowableStaticFraction.beforeSetRemoval * x.wire.tensileStrength;
  const solution = solveCoiledDeflection(s0, tauY / perDeflection);
  const ratio = (k * perDeflection * s0) / allowable;
  const afterLimit = x.wire.allowableStaticFraction.afterSetRemoval * x.wire.tensileStrength;
  const reachable = solution.reachable;
  return {
    required: ratio > 1,
    coiledFreeLength: reachable ? Ls + solution.coiledDeflection : null,
    expectedSet: reachable ? solution.expectedSet : null,
    ratio,
    setFraction: reachable ? solution.expectedSet / solution.coiledDeflection : null,
    achievable: perDeflection * s0 <= afterLimit,
  };
}

/** Geometry, rate, stresses, limits and manufacturing quantities of a compression spring (internal units). */
export function analyseCompression(x: CompressionDesign): CompressionReport {
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
  const wireLength = na * coilWireLength(D, pitch) + (nt - na) * Math.PI * D;
  const loads: CompressionLoadResult[] = [];
  for (let i = 0; i < x.loads.length; i++) loads.push(loadResult(x, rate, perForce, k, i));
  const fatigue = x.duty.type === 'cyclic'
    ? fatigueCheck(
      k * perForce * rate * (L0 - x.duty.between[0]),
      k * perForce * rate * (L0 - x.duty.between[1]),
      wire.tensileStrength, x.duty.peened)
    : null;
  const sK = bucklingDeflection(L0, D, nu, wire.shearModulus, wire.elasticModulus);
  return {
    kind: 'compression', units: x.units, material: wire.gradeId, wireDiameter: d, ends: x.ends,
    springIndex: c, meanDiameter: D, outerDiameter: D + d, innerDiameter: D - d, activeCoils: na, totalCoils: nt,
    freeLength: L0, pitch, rate, solidLength: Ls, solidForce, storedEnergyAtSolid: (solidForce * (L0 - Ls)) / 2,
    tensileStrength: wire.tensileStrength, tensileStrengthBasis: wire.tensileStrengthBasis,
    tensileStrengthSource: wire.tensileStrengthSource,
    shearModulus: wire.shearModulus, elasticModulus: wire.elasticModulus, density: wire.density,
    stressCorrectionFactor: k, wahlFactor: wahl(c),
    stressAtSolid: k * perForce * solidForce, stressAtSolidUncorrected: perForce * solidForce,
    allowableStress: allowable,
    allowableStressSetRemoved: wire.allowableStaticFraction.afterSetRemoval * wire.tensileStrength,
    loads,
    minimumWorkingLength: Ls + minimumCoilGapSum(D, d, na, x.duty.type === 'cyclic'),
    coilGapSum: minimumCoilGapSum(D, d, na, x.duty.type === 'cyclic'),
    bucklingDeflection: sK,
    slendernessLimit: slendernessLimit(nu, wire.shearModulus, wire.elasticModulus),
    slenderness: L0 / D,
    outerDiameterAtSolid: D + d + outsideDiameterGrowth(pitch, d, D),
    naturalFrequency: naturalFrequency(d, D, na, wire.shearModulus, wire.density),
    wireLength,
    mass: wireMass(d, wireLength, wire.density),
    setRemoval: setRemoval(x, Ls, perForce * rate, k, allowable),
    fatigue,
    findings: [],
  };
}
