import type { ShopTables, ToleranceGrade } from '../tolerances';
import { demoShopTables, plusMinusTolerance } from '../tolerances';
import type { TorsionDesign } from '../springs/torsion/design';
import type { TorsionReport } from '../springs/torsion/report';
import { realisticFreeAngleTolerance } from '../review/torsion';
import type { Finding } from '../result';
import { DEFAULT_LOAD_TOLERANCE_PERCENT } from '../springs/specified';
import type { Characteristic, InspectionPlan } from './inspection-plan';
import { diameterCharacteristic, HUNDRED_PERCENT_LOAD_TOLERANCE, limited, reference, sampledInspection } from './inspection-plan';

/** No sourced torsion-spring tolerance table was found (DIN 2194): limits not on the drawing are the shop's. */
export const TORSION_TOLERANCE_SOURCE = 'shop-entered: no sourced torsion tolerance table (DIN 2194 not found)';
const GAUGE = 'torque tester on an arbor';

function torqueCharacteristic(x: TorsionDesign, r: TorsionReport, grade: ToleranceGrade, i: number): Characteristic {
  const l = r.loads[i]!;
  const name = `Torque at ${l.angle}°`;
  if (l.specifiedTorque === null) return reference(`${name} (reference)`, 'torque', l.torque, GAUGE, 'calculated');
  const percent = x.loads[i]?.tolerancePercent ?? DEFAULT_LOAD_TOLERANCE_PERCENT;
  const source = x.loads[i]?.tolerancePercent !== undefined ? 'drawing' : `${TORSION_TOLERANCE_SOURCE}; ±10 % common trade practice`;
  return limited(name, 'torque', l.specifiedTorque, (l.specifiedTorque * percent) / 100, GAUGE, source,
    grade === 1 || percent < HUNDRED_PERCENT_LOAD_TOLERANCE);
}

/** The free angle's limits: the drawing's, else the shop's free-angle table, else the realistic rule from memory. */
function freeAngleCharacteristic(x: TorsionDesign, r: TorsionReport, freeAngle: number, tables: ShopTables): Characteristic {
  const name = 'Free angle between legs';
  if (x.freeAngleTolerance !== null) return limited(name, 'angle', freeAngle, x.freeAngleTolerance, 'protractor', 'drawing');
  const shop = plusMinusTolerance(tables.freeAngle, r.bodyCoils);
  if (shop.ok) return limited(name, 'angle', freeAngle, shop.value, 'protractor', shop.source);
  return limited(name, 'angle', freeAngle, realisticFreeAngleTolerance(r.bodyCoils), 'protractor',
    `${shop.message}; ±(2° + 1.5° per coil), from memory`);
}

function legCharacteristic(length: number, i: number, tables: ShopTables): Characteristic {
  const shop = plusMinusTolerance(tables.legLength, length);
  return shop.ok ? limited(`Leg ${i + 1} length`, 'length', length, shop.value, 'calliper', shop.source)
    : reference(`Leg ${i + 1} length`, 'length', length, 'calliper', `${TORSION_TOLERANCE_SOURCE}; ${shop.message}`);
}

/** What to measure on a torsion spring: torque at angle, free angle, diameters, legs. */
export function torsionInspection(
  x: TorsionDesign, r: TorsionReport, lotSize: number, aql: number, grade: ToleranceGrade, findings: Finding[],
  tables: ShopTables = demoShopTables,
): InspectionPlan {
  const characteristics = r.loads.map((_l, i) => torqueCharacteristic(x, r, grade, i));
  if (x.freeAngle !== null) characteristics.push(freeAngleCharacteristic(x, r, x.freeAngle, tables));
  characteristics.push(diameterCharacteristic(x, r.springIndex, grade));
  r.legLengths.forEach((length, i) => characteristics.push(legCharacteristic(length, i, tables)));
  return sampledInspection(characteristics, lotSize, aql, findings);
}
