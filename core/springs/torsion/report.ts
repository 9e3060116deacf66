import type { CoilReport } from '../report-base';
import { coilReportQuantities } from '../report-base';
import type { QuantityMap } from '../../units';

export interface TorsionLoadResult {
  angle: number;
  torque: number;
  /** Ki-corrected bending stress at the inside of the coil. */
  stress: number;
  /** The same with EN 13906-3's q. */
  stressEn: number;
  specifiedTorque: number | null;
  tolerancePercent: number | null;
  withinTolerance: boolean | null;
}

/** Analysis of a torsion spring, internal units (mm, N·mm, MPa, degrees). */
export interface TorsionReport extends CoilReport {
  kind: 'torsion';
  bodyCoils: number;
  activeCoils: number;
  legLengths: [number, number];
  ratePerTurn: number;
  ratePerDegree: number;
  ratePerDegreeTheoretical: number;
  bendingFactorInner: number;
  bendingFactorOuter: number;
  enBendingFactor: number;
  loads: TorsionLoadResult[];
  /** At the largest working angle. */
  maximumAngle: number;
  meanDiameterAtLoad: number;
  insideDiameterAtLoad: number;
  outsideDiameterAtLoad: number;
  arborDiameter: number | null;
  arborClearance: number | null;
  /** Clearance as a fraction of the loaded inside diameter. */
  arborClearanceFraction: number | null;
  bodyLength: number;
  bodyLengthAtLoad: number;
  allowableStress: number;
  allowableStressEn: number;
  allowableSource: string;
  /** Largest deflection (degrees) before the corrected stress reaches the allowable. */
  maximumSafeAngle: number;
  windDirection: 'right' | 'left';
  loadDirection: 'closing' | 'opening';
  /** Cyclic duty: the highest corrected stress against the repeated-bending limit for the cycles. */
  fatigue: { stressMax: number; limit: number; fractionOfTensile: number; cycles: number; peened: boolean; source: string; verdict: 'pass' | 'fail' } | null;
}

export const torsionReportQuantities: QuantityMap = {
  ...coilReportQuantities,
  legLengths: 'length', bodyCoils: 'count', activeCoils: 'count',
  bendingFactorInner: 'ratio', bendingFactorOuter: 'ratio', enBendingFactor: 'ratio',
  maximumAngle: 'angle', maximumSafeAngle: 'angle', arborClearanceFraction: 'ratio',
  ratePerTurn: 'torqueRatePerTurn', ratePerDegree: 'torqueRatePerDegree', ratePerDegreeTheoretical: 'torqueRatePerDegree',
  loads: { angle: 'angle', torque: 'torque', stress: 'stress', stressEn: 'stress', specifiedTorque: 'torque', tolerancePercent: 'percent' },
  meanDiameterAtLoad: 'length', insideDiameterAtLoad: 'length', outsideDiameterAtLoad: 'length',
  arborDiameter: 'length', arborClearance: 'length', bodyLength: 'length', bodyLengthAtLoad: 'length',
  allowableStress: 'stress', allowableStressEn: 'stress',
  fatigue: { stressMax: 'stress', limit: 'stress', fractionOfTensile: 'ratio', cycles: 'count' },
};
