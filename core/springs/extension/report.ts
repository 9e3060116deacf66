import type { CoilReport } from '../report-base';
import { coilReportQuantities } from '../report-base';
import type { QuantityMap } from '../../units';
import type { FatigueResult } from '../fatigue';
import { fatigueQuantities } from '../fatigue';
import type { ExtensionEndForm } from '../../spec/extension';

export interface ExtensionLoadResult {
  length: number;
  extension: number;
  force: number;
  /** Corrected (EN 13906 k) body stress. */
  stress: number;
  stressUncorrected: number;
  specifiedForce: number | null;
  tolerancePercent: number | null;
  withinTolerance: boolean | null;
}

export type ExtensionGoverning = 'body' | 'hook-torsion' | 'hook-bending';

/** Analysis of an extension spring, internal units; lengths are inside the ends. */
export interface ExtensionReport extends CoilReport {
  kind: 'extension';
  ends: [ExtensionEndForm, ExtensionEndForm];
  bodyCoils: number;
  activeCoils: number;
  rate: number;
  bodyLength: number;
  loopHeights: [number, number];
  freeLength: number;
  specifiedFreeLength: number | null;
  initialTension: number;
  initialTensionProposed: boolean;
  initialTensionStress: number;
  initialTensionStressRange: { min: number; max: number };
  loads: ExtensionLoadResult[];
  shearModulus: number;
  stressCorrectionFactor: number;
  hookBendingFactor: number;
  hookTorsionFactor: number;
  hookBendRadius: number;
  hookBendRadiusAssumed: boolean;
  /** At the largest load. */
  bodyStress: number;
  hookBendingStress: number;
  hookTorsionStress: number;
  allowables: { body: number; hookTorsion: number; hookBending: number; bodyEn: number; source: string };
  /** Largest force before the first section reaches its allowable, and which section that is. */
  maximumSafeForce: number;
  maximumSafeExtension: number;
  maximumSafeLength: number;
  governing: ExtensionGoverning;
  fatigue: FatigueResult | null;
}

export const extensionReportQuantities: QuantityMap = {
  ...coilReportQuantities,
  rate: 'rate', bodyCoils: 'count', activeCoils: 'count',
  stressCorrectionFactor: 'ratio', hookBendingFactor: 'ratio', hookTorsionFactor: 'ratio',
  bodyLength: 'length', loopHeights: 'length', freeLength: 'length', specifiedFreeLength: 'length',
  initialTension: 'force', initialTensionStress: 'stress', initialTensionStressRange: { min: 'stress', max: 'stress' },
  loads: { length: 'length', extension: 'length', force: 'force', stress: 'stress', stressUncorrected: 'stress', specifiedForce: 'force', tolerancePercent: 'percent' },
  shearModulus: 'stress', hookBendRadius: 'length',
  bodyStress: 'stress', hookBendingStress: 'stress', hookTorsionStress: 'stress',
  allowables: { body: 'stress', hookTorsion: 'stress', hookBending: 'stress', bodyEn: 'stress' },
  maximumSafeForce: 'force', maximumSafeExtension: 'length', maximumSafeLength: 'length',
  fatigue: fatigueQuantities,
};
