import type { ToleranceGrade } from '../tolerances';
import { legLengthTolerance } from '../tolerances';
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

function legCharacteristic(i: number, length: number, grade: ToleranceGrade): Characteristic {
  const name = `Leg ${i + 1} length`;
  const tol = legLengthTolerance({ length, grade });
  return tol.ok ? limited(name, 'length', length, tol.value, 'calliper', tol.source)
    : reference(`${name} (tolerance by agreement)`, 'length', length, 'calliper', tol.message);
}

/** What to measure on a torsion spring: torque at angle, free angle, diameters, legs. */
export function torsionInspection(
  x: TorsionDesign, r: TorsionReport, lotSize: number, aql: number, grade: ToleranceGrade, findings: Finding[],
): InspectionPlan {
  const characteristics = r.loads.map((_l, i) => torqueCharacteristic(x, r, grade, i));
  if (x.freeAngle !== null) {
    const plusMinus = x.freeAngleTolerance ?? realisticFreeAngleTolerance(r.bodyCoils);
    characteristics.push(limited('Free angle between legs', 'angle', x.freeAngle, plusMinus, 'protractor',
      x.freeAngleTolerance === null ? `${TORSION_TOLERANCE_SOURCE}; ±(2° + 1.5° per coil), from memory` : 'drawing'));
  }
  characteristics.push(diameterCharacteristic(x, r.springIndex, grade));
  r.legLengths.forEach((length, i) => characteristics.push(legCharacteristic(i, length, grade)));
  return sampledInspection(characteristics, lotSize, aql, findings);
}
