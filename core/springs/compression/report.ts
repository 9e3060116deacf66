import type { CoilReport } from '../report-base';
import { coilReportQuantities } from '../report-base';
import type { QuantityMap } from '../../units';
import type { FatigueResult } from '../fatigue';
import { fatigueQuantities } from '../fatigue';
import type { CompressionEnds } from '../../spec/compression';
import type { CoiledBound, SetRemovalGoverning, SetRemovalMethod } from './set-removal';

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

/** One method's set-removal verdict: every decision is taken on the one stress named in `basis`. */
export interface SetRemovalVerdict {
  method: SetRemovalMethod;
  /** The stress the decisions use and the sources of its limits. */
  basis: string;
  /** Basis stress at solid length. */
  stressAtSolid: number;
  /** Limit without set removal; the set-removal model yields at this same stress. */
  allowableBefore: number;
  /** Limit after set removal on the same stress. */
  allowableAfter: number;
  /** Stress at solid over the limit before set removal: exactly when the expected set is above zero. */
  required: boolean;
  /** Stress at solid ÷ limit before set removal (the trade's "stress ratio"). */
  ratio: number;
  /** Free length to coil to, before pressing to solid; null when a physical limit is passed (`bound`). */
  coiledFreeLength: number | null;
  /** Set the model predicts; null when no coiled length reaches the finished one. */
  expectedSet: number | null;
  /** Pitch of the active coils at the coiled free length; null when unreachable. */
  coiledPitch: number | null;
  /** Set as a fraction of the coiled deflection to solid. */
  setFraction: number | null;
  /** False when even after set removal the stress at solid is over the method's limit. */
  achievable: boolean;
  /** The physical limit the coiled length passes, if any. */
  bound: CoiledBound | null;
}

export interface SetRemovalResult extends SetRemovalVerdict {
  /** The method whose verdict routes the job, and the shop setting that chose it. */
  governing: SetRemovalMethod;
  governedBy: SetRemovalGoverning;
  methods: Record<SetRemovalMethod, SetRemovalVerdict>;
}

/** What the coiler is set to: the spring as coiled, before any set removal. */
export interface CoilerSettings {
  /** Null when set removal is needed but no coiled length is within the physical limits. */
  freeLength: number | null;
  pitch: number | null;
  totalCoils: number;
  activeCoils: number;
  /** Developed wire per piece at the coiled pitch (the press does not change the wire's length). */
  wireLength: number;
  expectedSet: number;
  pressStrokes: number;
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
  /** Handbook solid length d·(Nt + solidExtra), nominal wire (Machinery's Handbook 31e Table 3). */
  solidLength: number;
  /** Largest solid length with the wire at its upper tolerance (EN 13906-1 for closed ends; handbook form otherwise). */
  solidLengthMaximum: number;
  solidLengthMaximumSource: string;
  wireDiameterMaximum: number;
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
  coiler: CoilerSettings;
  fatigue: FatigueResult | null;
}

const setRemovalQuantities: QuantityMap = {
  stressAtSolid: 'stress', allowableBefore: 'stress', allowableAfter: 'stress',
  coiledFreeLength: 'length', expectedSet: 'length', coiledPitch: 'length', ratio: 'ratio', setFraction: 'ratio',
};

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
  solidLengthMaximum: 'length', wireDiameterMaximum: 'length',
  setRemoval: { ...setRemovalQuantities, methods: { handbook: setRemovalQuantities, en13906: setRemovalQuantities } },
  coiler: {
    freeLength: 'length', pitch: 'length', wireLength: 'length', expectedSet: 'length',
    totalCoils: 'count', activeCoils: 'count', pressStrokes: 'count',
  },
  fatigue: fatigueQuantities,
};
