import { EN_EXTENSION_STATIC_FRACTION, extensionAllowables } from '../../materials';
import { bendingInner, bergstraesser, hookTorsion } from '../factors';
import { fatigueCheck, finiteLife, hasSteelFatigueData } from '../fatigue';
import { coilWireLength, helicalRate, torsionStressPerForce, wireMass } from '../helix';
import { checkSpecified } from '../specified';
import type { ExtensionDesign } from './design';
import { extensionEnds } from './ends';
import { initialTensionStressRange } from './initial-tension';
import type { ExtensionGoverning, ExtensionLoadResult, ExtensionReport } from './report';

function loadResult(
  x: ExtensionDesign, i: number, L0: number, Fi: number, rate: number, perForce: number, k: number,
): ExtensionLoadResult {
  const load = x.loads[i]!;
  const extension = load.length - L0;
  const force = Fi + rate * extension;
  const check = checkSpecified(force, load.force, load.tolerancePercent);
  return {
    length: load.length, extension, force, stress: k * perForce * force, stressUncorrected: perForce * force,
    specifiedForce: check.specified, tolerancePercent: check.tolerancePercent, withinTolerance: check.withinTolerance,
  };
}

/** Inside height of each end from the end of the body: one inside diameter, plus an extended hook's straight length. */
function loopHeight(x: ExtensionDesign, i: 0 | 1): number {
  const end = x.ends[i];
  return extensionEnds[end.form].heightInInsideDiameters * (x.D - x.d) + end.extension;
}

/** Force at which each section reaches its allowable; the smallest governs. */
function safeForce(perForce: number, k: number, kA: number, kB: number, d: number, D: number, allow: { body: number; hookTorsion: number; hookBending: number }) {
  const bendingPerForce = (kA * 16 * D) / (Math.PI * d ** 3) + 4 / (Math.PI * d * d);
  const limits: [ExtensionGoverning, number][] = [
    ['body', allow.body / (k * perForce)],
    ['hook-torsion', allow.hookTorsion / (kB * perForce)],
    ['hook-bending', allow.hookBending / bendingPerForce],
  ];
  limits.sort((a, b) => a[1] - b[1]);
  return { governing: limits[0]![0], force: limits[0]![1], bendingPerForce };
}

/** Geometry, rate, initial tension, body and hook stresses and limits of an extension spring (internal units). */
export function analyseExtension(x: ExtensionDesign): ExtensionReport {
  const { d, D, nb, wire } = x;
  const c = D / d;
  const k = bergstraesser(c);
  // Na = Nb + G/E: the loops add a little compliance (Shigley 9e §10-11, from memory).
  const na = nb + wire.shearModulus / wire.elasticModulus;
  const rate = helicalRate(wire.shearModulus, d, D, na);
  const perForce = torsionStressPerForce(D, d);
  const heights: [number, number] = [loopHeight(x, 0), loopHeight(x, 1)];
  const bodyLength = (nb + 1) * d;
  const L0 = bodyLength + heights[0] + heights[1];
  const window = initialTensionStressRange(c);
  const Fi = x.initialTension ?? window.centre / perForce;
  // Section A bends about the loop's mean radius r1 ≈ D/2, so C1 = C; section B turns about the side-bend radius r2.
  const tighter = x.ends[1].bendRadius < x.ends[0].bendRadius ? x.ends[1] : x.ends[0];
  const r2 = tighter.bendRadius;
  // Assumed only when the radius used is one the drawing did not give (a given radius is never "assumed").
  const r2Assumed = x.ends[0].bendRadius === x.ends[1].bendRadius
    ? x.ends[0].bendRadiusAssumed && x.ends[1].bendRadiusAssumed : tighter.bendRadiusAssumed;
  const kA = bendingInner(c);
  const kB = hookTorsion((2 * r2) / d);
  const fraction = extensionAllowables[wire.family];
  const Rm = wire.tensileStrength;
  const allow = { body: fraction.body * Rm, hookTorsion: fraction.hookTorsion * Rm, hookBending: fraction.hookBending * Rm };
  const loads: ExtensionLoadResult[] = [];
  for (let i = 0; i < x.loads.length; i++) loads.push(loadResult(x, i, L0, Fi, rate, perForce, k));
  const largest = loads.reduce((m, l) => Math.max(m, l.force), Fi);
  const safe = safeForce(perForce, k, kA, kB, d, D, allow);
  const loopWire = (extensionEnds[x.ends[0].form].wireInCoils + extensionEnds[x.ends[1].form].wireInCoils) * Math.PI * D;
  const wireLength = nb * coilWireLength(D, d) + loopWire + x.ends[0].extension + x.ends[1].extension;
  const fatigue = x.duty.type === 'cyclic' && hasSteelFatigueData(wire.family)
    ? fatigueCheck(k * perForce * (Fi + rate * (x.duty.between[0] - L0)), k * perForce * (Fi + rate * (x.duty.between[1] - L0)), Rm, false,
      finiteLife('extension', x.duty.cycles, false, Rm))
    : null;
  const safeExtension = Math.max(0, (safe.force - Fi) / rate);
  return {
    kind: 'extension', units: x.units, material: wire.gradeId, wireDiameter: d, ends: [x.ends[0].form, x.ends[1].form],
    springIndex: c, meanDiameter: D, outerDiameter: D + d, innerDiameter: D - d, bodyCoils: nb, activeCoils: na, rate,
    bodyLength, loopHeights: heights, freeLength: L0, specifiedFreeLength: x.specifiedFreeLength,
    initialTension: Fi, initialTensionProposed: x.initialTension === null, initialTensionStress: perForce * Fi,
    initialTensionStressRange: { min: window.min, max: window.max },
    loads, tensileStrength: Rm, tensileStrengthBasis: wire.tensileStrengthBasis,
    shearModulus: wire.shearModulus, elasticModulus: wire.elasticModulus,
    stressCorrectionFactor: k, hookBendingFactor: kA, hookTorsionFactor: kB,
    hookBendRadius: r2, hookBendRadiusAssumed: r2Assumed,
    bodyStress: k * perForce * largest, hookBendingStress: safe.bendingPerForce * largest, hookTorsionStress: kB * perForce * largest,
    allowables: { ...allow, bodyEn: EN_EXTENSION_STATIC_FRACTION * Rm, source: fraction.source },
    maximumSafeForce: safe.force, maximumSafeExtension: safeExtension, maximumSafeLength: L0 + safeExtension,
    governing: safe.governing,
    wireLength, mass: wireMass(d, wireLength, wire.density), fatigue, findings: [],
  };
}
