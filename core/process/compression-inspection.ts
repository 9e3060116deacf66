import type { ShopTables, ToleranceGrade } from '../tolerances';
import { demoShopTables, endSquarenessTolerance, freeLengthTolerance, loadTolerance } from '../tolerances';
import type { CompressionDesign } from '../springs/compression/design';
import type { CompressionReport } from '../springs/compression/report';
import { endForms } from '../springs/compression/ends';
import { WIRE_DIAMETER_TOLERANCE_STANDARD } from '../materials/diameter-tolerance';
import type { Finding } from '../result';
import type { Characteristic, InspectionPlan } from './inspection-plan';
import { diameterCharacteristic, HUNDRED_PERCENT_LOAD_TOLERANCE, LOAD_GAUGE, limited, reference, sampledInspection } from './inspection-plan';

function loadCharacteristics(x: CompressionDesign, r: CompressionReport, grade: ToleranceGrade, tables: ShopTables): Characteristic[] {
  return r.loads.map((l, i) => ({ ...loadCharacteristic(x, r, grade, i, tables), atLength: l.length }));
}

function loadCharacteristic(x: CompressionDesign, r: CompressionReport, grade: ToleranceGrade, i: number, tables: ShopTables): Characteristic {
  const l = r.loads[i]!;
  if (l.specifiedForce === null) return reference(`Force at L${i + 1} (reference)`, 'force', l.force, 'load tester', 'calculated');
  const given = x.loads[i]?.tolerancePercent;
  if (given !== undefined) {
    return limited(`Force at L${i + 1}`, 'force', l.specifiedForce, (l.specifiedForce * given) / 100, LOAD_GAUGE, 'drawing',
      grade === 1 || given < HUNDRED_PERCENT_LOAD_TOLERANCE);
  }
  const shop = loadTolerance({ load: l.specifiedForce, grade, activeCoils: r.activeCoils, index: r.springIndex }, tables.load);
  if (!shop.ok) return limited(`Force at L${i + 1}`, 'force', l.specifiedForce, l.specifiedForce / 10, LOAD_GAUGE, 'common trade practice ±10 %', grade === 1);
  return limited(`Force at L${i + 1}`, 'force', l.specifiedForce, shop.value.plusMinus, LOAD_GAUGE, shop.source,
    grade === 1 || shop.value.percent < HUNDRED_PERCENT_LOAD_TOLERANCE);
}

function lengthCharacteristics(x: CompressionDesign, r: CompressionReport, grade: ToleranceGrade, tables: ShopTables): Characteristic[] {
  const loadSpecified = r.loads.some((l) => l.specifiedForce !== null);
  const fl = freeLengthTolerance({ L0: r.freeLength, grade, index: r.springIndex, activeCoils: r.activeCoils, loadSpecified }, tables.freeLength);
  const out: Characteristic[] = [];
  if (fl.ok && !fl.value.reference) out.push(limited('Free length', 'length', r.freeLength, fl.value.plusMinus, 'height gauge', fl.source));
  else out.push(reference('Free length (reference)', 'length', r.freeLength, 'height gauge', fl.ok ? fl.source : fl.message));
  out.push({ ...reference('Solid length (maximum)', 'length', r.solidLength, 'load tester to solid',
    `${r.solidLengthMaximumSource}, d_max = d + wire tolerance (${WIRE_DIAMETER_TOLERANCE_STANDARD}, partly from memory)`),
  upper: r.solidLengthMaximum, reference: false });
  if (endForms[x.ends].ground) {
    const sq = endSquarenessTolerance({ L0: r.freeLength, D: r.meanDiameter, d: x.d, grade, groundEnds: true });
    if (sq.ok) out.push({ ...limited('Squareness e1 (max)', 'length', 0, sq.value.perpendicularity, 'square on surface plate', sq.source), lower: null });
  }
  out.push(reference('Total coils', 'count', r.totalCoils, 'count', 'drawing'));
  return out;
}

/** What to measure on a compression spring, with limits, gauges and the ISO 2859-1 sample for the lot. */
export function compressionInspection(
  x: CompressionDesign, r: CompressionReport, lotSize: number, aql: number, grade: ToleranceGrade, findings: Finding[],
  tables: ShopTables = demoShopTables,
): InspectionPlan {
  const characteristics = [
    ...loadCharacteristics(x, r, grade, tables), diameterCharacteristic(x, r.springIndex, grade), ...lengthCharacteristics(x, r, grade, tables),
  ];
  return sampledInspection(characteristics, lotSize, aql, findings);
}
