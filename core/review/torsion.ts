import type { Finding } from '../result';
import { formatQuantity, significant } from '../format';
import type { TorsionDesign } from '../springs/torsion/design';
import type { TorsionReport } from '../springs/torsion/report';
import { add, NO_FATIGUE_DATA_FIX, noFatigueData, reviewIndex, reviewScope13906, reviewServiceTemperature } from './common';
import { hasSteelFatigueData } from '../springs/fatigue';
import { TORSION_UNWIND_FACTOR } from '../materials/allowables';
import type { Sink } from './common';
import { reviewLimits as lim } from './limits';

/**
 * Free-angle tolerance the trade can hold, growing with the body coils: about ±(2° + 1.5° per coil)
 * (from memory, common practice; torsion tolerances are otherwise shop-entered, DIN 2194 not found).
 */
export const realisticFreeAngleTolerance = (bodyCoils: number): number => 2 + 1.5 * bodyCoils;

function reviewDirection(x: TorsionDesign, r: TorsionReport, out: Sink): void {
  if (x.loadDirection === 'opening') {
    add(out, 'warning', 'loaded-against-wind', 'loadDirection',
      'loaded to unwind the body: the residual stresses from coiling work against it, so the allowable is lowered to ' +
      `${formatQuantity(r.allowableStress, 'stress', x.units)} (${TORSION_UNWIND_FACTOR} × the usual)`,
      'wind the spring the other hand so the load closes it');
  }
}

function reviewArbor(x: TorsionDesign, r: TorsionReport, out: Sink): void {
  if (r.arborClearance === null || r.arborClearanceFraction === null) {
    if (x.loadDirection === 'closing') {
      add(out, 'note', 'arbor-not-given', 'arborDiameter',
        `no arbor diameter given: the inside diameter closes to ${formatQuantity(r.insideDiameterAtLoad, 'length', x.units)} at ${significant(r.maximumAngle)}°`);
    }
    return;
  }
  if (r.arborClearance <= 0) {
    add(out, 'error', 'binds-on-arbor', 'arborDiameter',
      `the inside diameter closes to ${formatQuantity(r.insideDiameterAtLoad, 'length', x.units)} at ${significant(r.maximumAngle)}°: the spring binds on the arbor`,
      'use a smaller arbor, more coils, or a larger coil diameter');
  } else if (r.arborClearanceFraction < lim.minimumArborClearance) {
    add(out, 'warning', 'arbor-clearance-small', 'arborDiameter',
      `arbor clearance ${formatQuantity(r.arborClearance, 'length', x.units)} is under ${100 * lim.minimumArborClearance} % of the loaded inside diameter`,
      'use an arbor about 90 % of the smallest loaded inside diameter');
  }
}

function reviewStress(x: TorsionDesign, r: TorsionReport, out: Sink): void {
  const u = x.units;
  r.loads.forEach((l, i) => {
    if (l.stress > r.allowableStress) {
      add(out, 'error', 'bending-stress-over-allowable', `loads[${i}].angle`,
        `bending stress ${formatQuantity(l.stress, 'stress', u)} at ${significant(l.angle)}° is over the allowable ${formatQuantity(r.allowableStress, 'stress', u)} (safe to ${significant(r.maximumSafeAngle)}°)`,
        'reduce the angle, add coils, or use heavier wire');
    }
    if (l.withinTolerance === false && l.specifiedTorque !== null) {
      add(out, 'error', 'torque-outside-tolerance', `loads[${i}].torque`,
        `torque at ${significant(l.angle)}° is ${formatQuantity(l.torque, 'torque', u)}; the drawing asks ${formatQuantity(l.specifiedTorque, 'torque', u)} ±${l.tolerancePercent} %`,
        'adjust the body coils or the leg lengths');
    }
  });
  if (x.duty.type === 'cyclic' && !hasSteelFatigueData(x.wire.family)) {
    add(out, 'warning', 'no-fatigue-data', 'duty', noFatigueData(x.wire.gradeName), NO_FATIGUE_DATA_FIX);
  }
  if (r.fatigue && r.fatigue.verdict === 'fail') {
    add(out, 'error', 'fatigue-fail', 'duty',
      `cyclic bending stress ${formatQuantity(r.fatigue.stressMax, 'stress', u)} is over ${Math.round(100 * r.fatigue.fractionOfTensile)} % of tensile strength recommended for ${significant(r.fatigue.cycles)} cycles`,
      r.fatigue.peened ? 'reduce the working angle' : 'shot peen, or reduce the working angle');
  }
}

function reviewLegs(x: TorsionDesign, r: TorsionReport, out: Sink): void {
  x.legs.forEach((leg, i) => {
    if (leg.bendRadius !== null && leg.bendRadius < lim.minimumLegBendRadius * x.d) {
      add(out, 'warning', 'leg-bend-tight', `legs[${i}].bendRadius`,
        `leg bend radius ${formatQuantity(leg.bendRadius, 'length', x.units)} is under the wire diameter: the bend may crack`,
        'bend the leg over a radius of at least d');
    }
  });
  const realistic = realisticFreeAngleTolerance(r.bodyCoils);
  if (x.freeAngleTolerance !== null && x.freeAngleTolerance < realistic) {
    add(out, 'warning', 'angle-tolerance-tight', 'freeAngleTolerance',
      `free angle ±${x.freeAngleTolerance}° is tighter than the ±${significant(realistic)}° the trade holds on ${significant(r.bodyCoils)} coils`,
      'accept a wider free-angle tolerance, or specify the torque at angle instead');
  }
}

/** The maker's review of a torsion spring. */
export function reviewTorsion(x: TorsionDesign, r: TorsionReport): Finding[] {
  const out: Finding[] = [...x.wireFindings];
  reviewIndex(x, r.springIndex, out);
  reviewDirection(x, r, out);
  reviewArbor(x, r, out);
  reviewStress(x, r, out);
  reviewLegs(x, r, out);
  reviewScope13906(x, r.springIndex, r.bodyCoils, 'EN 13906-3', out);
  reviewServiceTemperature(x, out);
  return out;
}
