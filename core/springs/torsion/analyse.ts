import { EN_TORSION_STATIC_FRACTION, torsionAllowables } from '../../materials';
import { TORSION_UNWIND_FACTOR, TORSION_UNWIND_SOURCE } from '../../materials/allowables';
import { bendingInner, bendingOuter, enBending } from '../factors';
import { coilWireLength, wireMass } from '../helix';
import { checkSpecified } from '../specified';
import type { TorsionDesign } from './design';
import { torsionFatigueFraction, TORSION_FATIGUE_SOURCE } from './fatigue';
import { bendingStressPerMoment, legCoils, torqueRatePerDegreeEn, torqueRatePerTurn } from './rate';
import type { TorsionLoadResult, TorsionReport } from './report';

function loadResult(x: TorsionDesign, i: number, perDegree: number, ki: number, q: number, perMoment: number): TorsionLoadResult {
  const load = x.loads[i]!;
  const torque = perDegree * load.angle;
  const check = checkSpecified(torque, load.torque, load.tolerancePercent);
  return {
    angle: load.angle, torque, stress: ki * perMoment * torque, stressEn: q * perMoment * torque,
    specifiedTorque: check.specified, tolerancePercent: check.tolerancePercent, withinTolerance: check.withinTolerance,
  };
}

/**
 * Mean diameter when wound up by θ degrees: D' = D·Nb/(Nb + θc), θc the body's share of the deflection in
 * turns (Shigley 9e §10-12; EN 13906-3 Di,α = D·n/(n + α/360°) − d, from memory). Opening loads unwind the
 * body, and the same relation gives a larger diameter.
 */
function loadedMeanDiameter(x: TorsionDesign, na: number, angle: number): number {
  const bodyTurns = (angle / 360) * (x.nb / na);
  const sign = x.loadDirection === 'closing' ? 1 : -1;
  return (x.D * x.nb) / (x.nb + sign * bodyTurns);
}

function fatigueOf(x: TorsionDesign, perDegree: number, ki: number, perMoment: number): TorsionReport['fatigue'] {
  if (x.duty.type !== 'cyclic') return null;
  const fraction = torsionFatigueFraction(x.wire.family, x.duty.cycles, x.duty.peened);
  if (fraction === null) return null;
  const stressMax = ki * perMoment * perDegree * Math.max(x.duty.between[0], x.duty.between[1]);
  const limit = fraction * x.wire.tensileStrength;
  return {
    stressMax, limit, fractionOfTensile: fraction, cycles: x.duty.cycles, peened: x.duty.peened,
    source: TORSION_FATIGUE_SOURCE, verdict: stressMax <= limit ? 'pass' : 'fail',
  };
}

/** Rates, torques, bending stresses, diameter under load and arbor clearance of a torsion spring (internal units). */
export function analyseTorsion(x: TorsionDesign): TorsionReport {
  const { d, D, nb, wire } = x;
  const c = D / d;
  const na = nb + legCoils(x.legs[0].length, x.legs[1].length, D);
  const perTurn = torqueRatePerTurn(wire.elasticModulus, d, D, na);
  const perDegree = perTurn / 360;
  const ki = bendingInner(c);
  const q = enBending(c);
  const perMoment = bendingStressPerMoment(d);
  const loads: TorsionLoadResult[] = [];
  for (let i = 0; i < x.loads.length; i++) loads.push(loadResult(x, i, perDegree, ki, q, perMoment));
  let maxAngle = 0;
  for (const l of x.loads) maxAngle = Math.max(maxAngle, l.angle);
  if (x.duty.type === 'cyclic') maxAngle = Math.max(maxAngle, x.duty.between[0], x.duty.between[1]);
  const Dl = loadedMeanDiameter(x, na, maxAngle);
  const insideLoaded = Dl - d;
  const clearance = x.arborDiameter === null ? null : insideLoaded - x.arborDiameter;
  const family = torsionAllowables[wire.family];
  const unwinding = x.loadDirection === 'opening';
  const direction = unwinding ? TORSION_UNWIND_FACTOR : 1;
  const allowable = direction * family.bending * wire.tensileStrength;
  const wireLength = nb * coilWireLength(D, d) + x.legs[0].length + x.legs[1].length;
  return {
    kind: 'torsion', units: x.units, material: wire.gradeId, wireDiameter: d, springIndex: c,
    meanDiameter: D, outerDiameter: D + d, innerDiameter: D - d, bodyCoils: nb, activeCoils: na,
    legLengths: [x.legs[0].length, x.legs[1].length],
    ratePerTurn: perTurn, ratePerDegree: perDegree,
    ratePerDegreeTheoretical: torqueRatePerDegreeEn(wire.elasticModulus, d, D, na),
    bendingFactorInner: ki, bendingFactorOuter: bendingOuter(c), enBendingFactor: q, loads,
    maximumAngle: maxAngle, meanDiameterAtLoad: Dl, insideDiameterAtLoad: insideLoaded, outsideDiameterAtLoad: Dl + d,
    arborDiameter: x.arborDiameter, arborClearance: clearance,
    arborClearanceFraction: clearance === null ? null : clearance / insideLoaded,
    // Close wound: L = d·(Nb + 1); winding up adds a coil per turn of body deflection (newcombspring.com, reprinting SMI).
    bodyLength: d * (nb + 1),
    bodyLengthAtLoad: d * (nb + 1 + (x.loadDirection === 'closing' ? (maxAngle / 360) * (nb / na) : 0)),
    tensileStrength: wire.tensileStrength, tensileStrengthBasis: wire.tensileStrengthBasis, elasticModulus: wire.elasticModulus,
    allowableStress: allowable, allowableStressEn: direction * EN_TORSION_STATIC_FRACTION * wire.tensileStrength,
    allowableSource: unwinding ? `${family.source}; ${TORSION_UNWIND_SOURCE}` : family.source,
    maximumSafeAngle: allowable / (ki * perMoment * perDegree),
    windDirection: x.windDirection, loadDirection: x.loadDirection,
    wireLength, mass: wireMass(d, wireLength, wire.density),
    fatigue: fatigueOf(x, perDegree, ki, perMoment),
    findings: [],
  };
}
