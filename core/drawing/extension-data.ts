/** The data block beside an extension spring view, with the symbols of ISO 2162-2 / EN 13906-2. */
import { materialRow } from './material-row';
import { formatQuantity } from '../format';
import type { ExtensionReport } from '../springs/extension/report';
import { angleText, specifiedText, windText } from './common';
import type { WindDirection } from './compression-data';
import { plainNumber } from './svg';
import type { TableRow } from './table';
import { extensionEndTerms, symbols as s } from '../vocabulary';

/** Angle of one loop to the other about the axis (0° in line), as the drawing asks for it. */
export interface LoopPosition {
  angle: number;
  tolerance?: number;
}

export function extensionLength(report: ExtensionReport, value: number): string {
  return formatQuantity(value, 'length', report.units);
}

function endRows(report: ExtensionReport): [string, string][] {
  const [first, second] = report.ends.map((form) => extensionEndTerms[form].short);
  return first === second ? [['Ends', `${first}, both`]] : [['End 1', first ?? ''], ['End 2', second ?? '']];
}

export function extensionParameterRows(
  report: ExtensionReport, stated: { directionOfWind?: WindDirection; loopPosition?: LoopPosition } = {},
): TableRow[] {
  const r = report;
  const length = (v: number) => extensionLength(r, v);
  const rows: [string, string][] = [
    [s.wireDiameter, length(r.wireDiameter)],
    [s.outerDiameter, length(r.outerDiameter)],
    [s.bodyCoils, plainNumber(r.bodyCoils)],
    [s.freeLength, length(r.freeLength)],
    [s.initialTension, formatQuantity(r.initialTension, 'force', r.units)],
    [s.rate, formatQuantity(r.rate, 'rate', r.units)],
    [s.maximumSafeLength, length(r.maximumSafeLength)],
    [s.maximumSafeForce, formatQuantity(r.maximumSafeForce, 'force', r.units)],
    ...endRows(r),
  ];
  if (stated.directionOfWind) rows.push(['Wind', windText[stated.directionOfWind]]);
  const loop = stated.loopPosition;
  if (loop) rows.push(['Loop position', angleText(loop.angle, loop.tolerance)]);
  return [materialRow(r.material), ...rows.map((cells) => ({ cells }))];
}

export function extensionLoadRows(report: ExtensionReport): TableRow[] {
  if (report.loads.length === 0) return [];
  return [
    { cells: ['', 'L', 'F'], bold: true },
    ...report.loads.map((load, i) => ({
      cells: [String(i + 1), extensionLength(report, load.length), specifiedText({
        actual: load.force, specified: load.specifiedForce, tolerancePercent: load.tolerancePercent,
      }, 'force', report.units)],
    })),
  ];
}
