import type { Quantity } from '../units';
import type { ToleranceGrade } from '../tolerances';
import { coilDiameterTolerance, commercialOdTolerance } from '../tolerances';
import { samplingPlan } from '../inspection/sampling';
import type { CoilBody } from '../springs/coil-body';
import type { Finding } from '../result';

/** One characteristic the inspector measures: nominal, limits (null = reference only), gauge, source of the limits. */
export interface Characteristic {
  name: string;
  /** The test length a force is measured at; null for other characteristics. */
  atLength: number | null;
  quantity: Quantity;
  nominal: number;
  lower: number | null;
  upper: number | null;
  reference: boolean;
  gauge: string;
  source: string;
  /** Every piece, not a sample (grade 1, or a load tolerance under ±5 %). */
  everyPiece: boolean;
}

export interface InspectionPlan {
  lotSize: number;
  aql: number;
  code: string | null;
  sampleSize: number;
  accept: number;
  reject: number;
  hundredPercent: boolean;
  samplingSource: string;
  characteristics: Characteristic[];
}

/** Load tolerances tighter than this call for testing every piece (common trade practice). */
export const HUNDRED_PERCENT_LOAD_TOLERANCE = 5;
export const LOAD_GAUGE = 'load tester (compress once to solid first)';

export const limited = (name: string, quantity: Quantity, nominal: number, plusMinus: number, gauge: string, source: string, everyPiece = false): Characteristic => ({
  name, atLength: null, quantity, nominal, lower: nominal - plusMinus, upper: nominal + plusMinus, reference: false, gauge, source, everyPiece,
});

export const reference = (name: string, quantity: Quantity, nominal: number, gauge: string, source: string): Characteristic => ({
  name, atLength: null, quantity, nominal, lower: null, upper: null, reference: true, gauge, source, everyPiece: false,
});

/** OD (or ID where the drawing gives it): EN 15800 coil-diameter table for metric jobs, the trade OD table for inch jobs. */
export function diameterCharacteristic(x: CoilBody, index: number, grade: ToleranceGrade): Characteristic {
  const tol = x.units === 'inch'
    ? commercialOdTolerance({ d: x.d, index })
    : coilDiameterTolerance({ D: x.D, index, grade });
  const [name, nominal] = x.diameterGiven === 'inner' ? ['Inside diameter', x.D - x.d] : ['Outside diameter', x.D + x.d];
  if (!tol.ok) return reference(`${name} (tolerance by agreement)`, 'length', nominal, 'calliper', tol.message);
  return limited(name, 'length', nominal, tol.value, x.diameterGiven === 'inner' ? 'plug gauge / calliper' : 'ring gauge / calliper', tol.source);
}

/** The ISO 2859-1 level II normal single sample for the lot, around the given characteristics. */
export function sampledInspection(characteristics: Characteristic[], lotSize: number, aql: number, findings: Finding[]): InspectionPlan {
  const plan = lotSize >= 2 ? samplingPlan({ lotSize, aql }) : null;
  if (plan && !plan.ok) {
    findings.push({ code: plan.code, severity: 'warning', message: plan.message, path: 'aql', fix: 'choose an AQL from the table, or agree a plan' });
  }
  const sampled = plan?.ok ? plan.value : null;
  const hundred = sampled === null || sampled.hundredPercent;
  return {
    lotSize, aql, code: sampled?.code ?? null,
    sampleSize: hundred ? lotSize : sampled.sampleSize,
    accept: sampled?.accept ?? 0, reject: sampled?.reject ?? 1, hundredPercent: hundred,
    samplingSource: plan?.ok ? plan.source : 'lot too small for a sampling plan: inspect every piece',
    characteristics,
  };
}
