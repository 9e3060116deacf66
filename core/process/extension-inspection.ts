import type { ToleranceGrade } from '../tolerances';
import { din2097LengthTolerance, extensionFreeLengthTolerance, extensionLoadTolerance, loopPositionTolerance } from '../tolerances';
import type { ExtensionDesign } from '../springs/extension/design';
import type { ExtensionReport } from '../springs/extension/report';
import type { Finding } from '../result';
import type { Characteristic, InspectionPlan } from './inspection-plan';
import { diameterCharacteristic, HUNDRED_PERCENT_LOAD_TOLERANCE, limited, reference, sampledInspection } from './inspection-plan';

const GAUGE = 'load tester (extend once to the largest working length first)';

function loadCharacteristic(x: ExtensionDesign, r: ExtensionReport, grade: ToleranceGrade, i: number): Characteristic {
  const l = r.loads[i]!;
  const name = `Force at L${i + 1}`;
  if (l.specifiedForce === null) return { ...reference(`${name} (reference)`, 'force', l.force, GAUGE, 'calculated'), atLength: l.length };
  const given = x.loads[i]?.tolerancePercent;
  // Inch jobs: the trade extension load table by index, L/F and wire; metric: the drawing's or ±10 %.
  const trade = x.units === 'inch' && l.extension > 0
    ? extensionLoadTolerance({ index: r.springIndex, lengthOverDeflection: r.freeLength / l.extension, d: x.d })
    : null;
  const percent = given ?? (trade?.ok ? trade.value : 10);
  const source = given !== undefined ? 'drawing' : trade?.ok ? trade.source : 'common trade practice ±10 %';
  return { ...limited(name, 'force', l.specifiedForce, (l.specifiedForce * percent) / 100, GAUGE, source,
    grade === 1 || percent < HUNDRED_PERCENT_LOAD_TOLERANCE), atLength: l.length };
}

function freeLengthCharacteristic(x: ExtensionDesign, r: ExtensionReport): Characteristic {
  const tol = x.units === 'inch' ? extensionFreeLengthTolerance({ L0: r.freeLength }) : din2097LengthTolerance({ L0: r.freeLength, index: r.springIndex });
  const name = 'Free length inside ends';
  return tol.ok ? limited(name, 'length', r.freeLength, tol.value, 'calliper', tol.source)
    : reference(`${name} (tolerance by agreement)`, 'length', r.freeLength, 'calliper', tol.message);
}

/** What to measure on an extension spring: loads at length, free length, OD, loop position, initial tension. */
export function extensionInspection(
  x: ExtensionDesign, r: ExtensionReport, lotSize: number, aql: number, grade: ToleranceGrade, findings: Finding[],
): InspectionPlan {
  const characteristics = r.loads.map((_l, i) => loadCharacteristic(x, r, grade, i));
  characteristics.push(freeLengthCharacteristic(x, r), diameterCharacteristic(x, r.springIndex, grade));
  const loop = loopPositionTolerance({ totalCoils: r.bodyCoils });
  if (loop.ok || x.loopAngleTolerance !== null) {
    // Loops not given a position are made in line (0°), common trade practice.
    const name = x.loopAngle === null ? 'Relative loop position (loops in line)' : 'Relative loop position';
    const plusMinus = x.loopAngleTolerance ?? (loop.ok ? loop.value : 0);
    characteristics.push(limited(name, 'angle', x.loopAngle ?? 0, plusMinus, 'protractor', x.loopAngleTolerance === null && loop.ok ? loop.source : 'drawing'));
  }
  characteristics.push(reference('Initial tension (reference)', 'force', r.initialTension, GAUGE, 'calculated'));
  return sampledInspection(characteristics, lotSize, aql, findings);
}
