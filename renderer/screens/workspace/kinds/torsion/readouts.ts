import { formatQuantity as q, significant } from '../../../../../core/format';
import type { TorsionReport } from '../../../../../core/springs/torsion/report';
import { symbols as s } from '../../../../../core/vocabulary';
import type { LoadRow, Readout, StressBar } from '../../results/readout-data';
import { askedText } from '../../results/asked';

export function torsionFigures(r: TorsionReport): Readout[] {
  const u = r.units;
  return [
    { name: 'Rate per degree', symbol: 'R°', value: q(r.ratePerDegree, 'torqueRatePerDegree', u) },
    { name: 'Rate per turn', symbol: 'Rt', value: q(r.ratePerTurn, 'torqueRatePerTurn', u) },
    { name: 'Spring index', symbol: s.springIndex, value: significant(r.springIndex) },
    { name: 'Body / active coils', symbol: `${s.bodyCoils} / ${s.activeCoils}`, value: `${significant(r.bodyCoils)} / ${significant(r.activeCoils)}` },
    { name: 'Outside / inside diameter', symbol: `${s.outerDiameter} / ${s.innerDiameter}`, value: `${q(r.outerDiameter, 'length', u)} / ${q(r.innerDiameter, 'length', u)}` },
    { name: 'Inside diameter at full load', symbol: `${s.innerDiameter} at α max`, value: q(r.insideDiameterAtLoad, 'length', u) },
    { name: 'Arbor clearance', symbol: 'c', value: r.arborClearance === null ? 'no arbor given' : q(r.arborClearance, 'length', u) },
    { name: 'Body length at full load', symbol: s.bodyLength, value: q(r.bodyLengthAtLoad, 'length', u) },
    { name: 'Largest safe deflection', symbol: 'α max', value: `${significant(r.maximumSafeAngle)}°` },
    { name: 'Wire length / mass', symbol: 'l / m', value: `${q(r.wireLength, 'length', u)} / ${q(r.mass, 'mass', u)}` },
    { name: 'Tensile strength', symbol: s.tensileStrength, value: `${q(r.tensileStrength, 'stress', u)} (${r.tensileStrengthBasis})` },
  ];
}

export function torsionBars(r: TorsionReport): StressBar[] {
  const bars: StressBar[] = r.loads.map((l, i) => ({ label: `σ at ${s.angle(i + 1)}`, value: l.stress, allowable: r.allowableStress, basis: 'corrected bending stress' }));
  if (r.fatigue) bars.push({ label: 'σ max in cycle', value: r.fatigue.stressMax, allowable: r.fatigue.limit, basis: `repeated-bending limit for ${significant(r.fatigue.cycles)} cycles` });
  return bars;
}

/** Rows of the load table: working angle, torque, what the drawing asks. */
export function torsionLoadRows(r: TorsionReport): LoadRow[] {
  return r.loads.map((l, i) => ({
    point: s.angle(i + 1), at: `${significant(l.angle)}°`, load: q(l.torque, 'torque', r.units),
    asked: askedText(l.specifiedTorque, l.tolerancePercent, 'torque', r.units), within: l.withinTolerance,
  }));
}
