import type { CoilReport } from '../report-base';
import { coilReportQuantities } from '../report-base';
import type { QuantityMap } from '../../units';
import type { FatigueResult } from '../fatigue';
import { fatigueQuantities } from '../fatigue';
import type { CompressionEnds } from '../../spec/compression';

export interface CompressionLoadResult {
  length: number;
  deflection: number;
  force: number;
  /** Corrected (EN 13906-1 k) torsional stress. */
  stress: number;
  stressUncorrected: number;
  /** Force the drawing asks for at this length, and whether the spring meets it within tolerance. */
  specifiedForce: number | null;
  tolerancePercent: number | null;
  withinTolerance: boolean | null;
}

export interface SetRemovalResult {
  required: boolean;
  /** Free length to coil to, before pressing to solid. */
  /** Null when the set model cannot reach the finished free length (beyond a fully plastic section). */
  coiledFreeLength: number | null;
  expectedSet: number | null;
  /** Corrected stress at solid ÷ allowable before set removal (the trade's "stress ratio"). */
  ratio: number;
  /** Set as a fraction of the coiled deflection to solid (trade rule: at least 10 %). */
  setFraction: number | null;
  /** False when even pressing to solid cannot bring the uncorrected solid stress within the set-removed allowable. */
  achievable: boolean;
}

/** Analysis of one compression spring. Internal units here; `compressionReportQuantities` converts out. */
export interface CompressionReport extends CoilReport {
  kind: 'compression';
  ends: CompressionEnds;
  activeCoils: number;
  totalCoils: number;
  freeLength: number;
  pitch: number;
  rate: number;
  solidLength: number;
  solidForce: number;
  storedEnergyAtSolid: number;
  tensileStrengthSource: string;
  shearModulus: number;
  density: number;
  stressCorrectionFactor: number;
  wahlFactor: number;
  stressAtSolid: number;
  stressAtSolidUncorrected: number;
  allowableStress: number;
  allowableStressSetRemoved: number;
  loads: CompressionLoadResult[];
  minimumWorkingLength: number;
  coilGapSum: number;
  bucklingDeflection: number | null;
  slendernessLimit: number;
  slenderness: number;
  outerDiameterAtSolid: number;
  naturalFrequency: number;
  setRemoval: SetRemovalResult;
  fatigue: FatigueResult | null;
}

export const compressionReportQuantities: QuantityMap = {
  ...coilReportQuantities,
  freeLength: 'length', activeCoils: 'count', totalCoils: 'count',
  stressCorrectionFactor: 'ratio', wahlFactor: 'ratio', slendernessLimit: 'ratio', slenderness: 'ratio',
  naturalFrequency: 'frequency',
  pitch: 'length', rate: 'rate', solidLength: 'length', solidForce: 'force', storedEnergyAtSolid: 'energy',
  shearModulus: 'stress', density: 'density',
  stressAtSolid: 'stress', stressAtSolidUncorrected: 'stress', allowableStress: 'stress',
  allowableStressSetRemoved: 'stress',
  loads: {
    length: 'length', deflection: 'length', force: 'force', stress: 'stress', stressUncorrected: 'stress',
    specifiedForce: 'force', tolerancePercent: 'percent',
  },
  minimumWorkingLength: 'length', coilGapSum: 'length', bucklingDeflection: 'length',
  outerDiameterAtSolid: 'length',
  setRemoval: { coiledFreeLength: 'length', expectedSet: 'length', ratio: 'ratio', setFraction: 'ratio' },
  fatigue: fatigueQuantities,
};
