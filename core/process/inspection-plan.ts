import type { Quantity } from '../units';
import type { ToleranceGrade } from '../tolerances';
import {
  coilDiameterTolerance, commercialOdTolerance, endSquarenessTolerance, freeLengthTolerance, loadTolerance,
} from '../tolerances';
import { samplingPlan } from '../inspection/sampling';
import type { CompressionDesign } from '../springs/compression/design';
import type { CompressionReport } from '../springs/compression/report';
import { endForms } from '../springs/compression/ends';
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

/** Load tolerances tighter than this call for testing every piece (shop-practice notes §6.2, common practice). */
export const HUNDRED_PERCENT_LOAD_TOLERANCE = 5;
const LOAD_GAUGE = 'load tester (compress once to solid first)';

const limited = (name: string, quantity: Quantity, nominal: number, plusMinus: number, gauge: string, source: string, everyPiece = false): Characteristic => ({
  name, atLength: null, quantity, nominal, lower: nominal - plusMinus, upper: nominal + plusMinus, reference: false, gauge, source, everyPiece,
});

const reference = (name: string, quantity: Quantity, nominal: number, gauge: string, source: string): Characteristic => ({
  name, atLength: null, quantity, nominal, lower: null, upper: null, reference: true, gauge, source, everyPiece: false,
});

function loadCharacteristics(x: CompressionDesign, r: CompressionReport, grade: ToleranceGrade): Characteristic[] {
  return r.loads.map((l, i) => ({ ...loadCharacteristic(x, r, grade, i), atLength: l.length }));
}

function loadCharacteristic(x: CompressionDesign, r: CompressionReport, grade: ToleranceGrade, i: number): Characteristic {
  const l = r.loads[i]!;
  if (l.specifiedForce === null) return reference(`Force at L${i + 1} (reference)`, 'force', l.force, 'load tester', 'calculated');
  const given = x.loads[i]?.tolerancePercent;
  if (given !== undefined) {
    return limited(`Force at L${i + 1}`, 'force', l.specifiedForce, (l.specifiedForce * given) / 100, LOAD_GAUGE, 'drawing',
      grade === 1 || given < HUNDRED_PERCENT_LOAD_TOLERANCE);
  }
  const shop = loadTolerance({ load: l.specifiedForce, grade, activeCoils: r.activeCoils, index: r.springIndex });
  if (!shop.ok) return limited(`Force at L${i + 1}`, 'force', l.specifiedForce, l.specifiedForce / 10, LOAD_GAUGE, 'common trade practice ±10 %', grade === 1);
  return limited(`Force at L${i + 1}`, 'force', l.specifiedForce, shop.value.plusMinus, LOAD_GAUGE, shop.source,
    grade === 1 || shop.value.percent < HUNDRED_PERCENT_LOAD_TOLERANCE);
}

function diameterCharacteristic(x: CompressionDesign, r: CompressionReport, grade: ToleranceGrade): Characteristic {
  const tol = x.units === 'inch'
    ? commercialOdTolerance({ d: x.d, index: r.springIndex })
    : coilDiameterTolerance({ D: r.meanDiameter, index: r.springIndex, grade });
  const [name, nominal] = x.diameterGiven === 'inner' ? ['Inside diameter', r.innerDiameter] : ['Outside diameter', r.outerDiameter];
  if (!tol.ok) return reference(`${name} (tolerance by agreement)`, 'length', nominal, 'calliper', tol.message);
  return limited(name, 'length', nominal, tol.value, x.diameterGiven === 'inner' ? 'plug gauge / calliper' : 'ring gauge / calliper', tol.source);
}

function lengthCharacteristics(x: CompressionDesign, r: CompressionReport, grade: ToleranceGrade): Characteristic[] {
  const loadSpecified = r.loads.some((l) => l.specifiedForce !== null);
  const fl = freeLengthTolerance({ L0: r.freeLength, grade, index: r.springIndex, activeCoils: r.activeCoils, loadSpecified });
  const out: Characteristic[] = [];
  if (fl.ok && !fl.value.reference) out.push(limited('Free length', 'length', r.freeLength, fl.value.plusMinus, 'height gauge', fl.source));
  else out.push(reference('Free length (reference)', 'length', r.freeLength, 'height gauge', fl.ok ? fl.source : fl.message));
  out.push({ ...reference('Solid length (maximum)', 'length', r.solidLength, 'load tester to solid', 'calculated, d × coils per end type'),
    upper: r.solidLength, reference: false });
  if (endForms[x.ends].ground) {
    const sq = endSquarenessTolerance({ L0: r.freeLength, D: r.meanDiameter, d: x.d, grade, groundEnds: true });
    if (sq.ok) out.push({ ...limited('Squareness e1 (max)', 'length', 0, sq.value.perpendicularity, 'square on surface plate', sq.source), lower: null });
  }
  out.push(reference('Total coils', 'count', r.totalCoils, 'count', 'drawing'));
  return out;
}

/** What to measure, with limits, gauges and the ISO 2859-1 sample for the lot. */
export function compressionInspection(
  x: CompressionDesign, r: CompressionReport, lotSize: number, aql: number, grade: ToleranceGrade, findings: Finding[],
): InspectionPlan {
  const characteristics = [
    ...loadCharacteristics(x, r, grade), diameterCharacteristic(x, r, grade), ...lengthCharacteristics(x, r, grade),
  ];
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
